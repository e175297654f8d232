package org.stellabar.validation;

import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The checks of one family, with what the report says about its sources.
 *
 * @param id a short identifier, e.g. "lane-emden"
 * @param title the heading in the report
 * @param description paragraphs describing the family and its sources (Markdown), in order
 * @param tables the reference tables read, with their headers
 * @param checks every check, in a stable order
 * @param charts the family's charts
 */
public record FamilyResult(String id, String title, List<String> description, List<ReferenceTable> tables,
        List<CheckResult> checks, List<ReportChart> charts) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param id a short identifier, e.g. "lane-emden"
     * @param title the heading in the report
     * @param description paragraphs describing the family and its sources (Markdown), in order
     * @param tables the reference tables read, with their headers
     * @param checks every check, in a stable order
     * @param charts the family's charts
     */
    public FamilyResult {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(title, "title");
        description = List.copyOf(description);
        tables = List.copyOf(tables);
        checks = List.copyOf(checks);
        charts = List.copyOf(charts);
    }

    /** @return the checks outside their tolerance, in order */
    public List<CheckResult> failures() {
        return checks.stream().filter(c -> !c.passed()).toList();
    }

    /** @return true if every check passed */
    public boolean passed() {
        return checks.stream().allMatch(CheckResult::passed);
    }

    /** @return the check with the largest deviation / tolerance */
    public CheckResult worst() {
        return checks.stream().max(Comparator.comparingDouble(CheckResult::ratio)).orElseThrow();
    }
}
