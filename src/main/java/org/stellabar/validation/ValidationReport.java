package org.stellabar.validation;

import java.util.List;

/**
 * The results of a validation run: every family in a fixed order.
 *
 * @param families the families' results
 */
public record ValidationReport(List<FamilyResult> families) {

    /**
     * Canonical constructor: copies collections in.
     *
     * @param families the families' results
     */
    public ValidationReport {
        families = List.copyOf(families);
    }

    /** @return every failed check, family by family, in order */
    public List<CheckResult> failures() {
        return families.stream().flatMap(f -> f.failures().stream()).toList();
    }

    /** @return true if every check of every family passed */
    public boolean passed() {
        return families.stream().allMatch(FamilyResult::passed);
    }

    /** @return the number of checks */
    public int checkCount() {
        return families.stream().mapToInt(f -> f.checks().size()).sum();
    }
}
