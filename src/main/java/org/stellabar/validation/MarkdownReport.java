package org.stellabar.validation;

import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.stellabar.physics.Constants;
import org.stellabar.table.Version;

/**
 * The validation report as Markdown. Deterministic: no dates, no paths of the machine, numbers in
 * fixed formats, families and checks in a fixed order, so that the committed report is exactly
 * what the command writes for the committed code.
 */
public final class MarkdownReport {

    /** Folder of the charts, relative to the report. */
    public static final String CHART_FOLDER = "charts";
    /** Significant digits of our values in the tables. */
    static final int OUR_DIGITS = 12;

    private MarkdownReport() {
    }

    /**
     * @param report the results
     * @return the report text, lines ending in '\n'
     */
    public static String render(ValidationReport report) {
        StringBuilder md = new StringBuilder();
        md.append("# stellabar validation report\n\n");
        md.append("Written by `stellabar validate` (stellabar ").append(Version.current()).append("; constants: ")
                .append(Constants.RELEASE).append("). Regenerate it from the project folder with "
                        + "`./stellabar validate`, which rewrites this file and `" + CHART_FOLDER + "/`; a test "
                        + "fails when the committed file differs from what the code writes.\n\n");
        md.append("Every reference value sits in a CSV table beside this file. Each table's header names its "
                + "source, how the values were obtained and what its tolerance allows; each row says where its "
                + "value comes from (*provenance*). Tables of computed values were written by the scripts in "
                + "`scripts/` (`/usr/bin/python3 validation/scripts/NAME.py` regenerates them exactly; they need "
                + "Python 3 and mpmath). A check passes when |ours − reference| (divided by |reference| for a "
                + "relative tolerance) is at most the tolerance; *dev/tol* is that deviation in units of the "
                + "tolerance.\n\n");
        List<CheckResult> failures = report.failures();
        if (failures.isEmpty()) {
            md.append("**Result: all ").append(report.checkCount()).append(" checks in ")
                    .append(report.families().size()).append(" families pass.**\n\n");
        } else {
            md.append("**Result: ").append(failures.size()).append(" of ").append(report.checkCount())
                    .append(" checks FAIL.** They are listed first.\n\n");
            md.append("## Failures\n\n");
            md.append("| family | check | reference | ours | deviation | tolerance | dev/tol | provenance | where |\n");
            md.append("| --- | --- | ---: | ---: | ---: | ---: | ---: | --- | --- |\n");
            for (CheckResult c : failures) {
                md.append("| ").append(c.family()).append(" | ").append(cell(c.label())).append(" | ")
                        .append(c.reference()).append(unitSuffix(c)).append(" | ")
                        .append(Numbers.significant(c.ours(), OUR_DIGITS)).append(" | ")
                        .append(Numbers.brief(c.deviation())).append(" | ").append(tolerance(c)).append(" | ")
                        .append(Numbers.brief(c.ratio())).append(" | ").append(c.provenance().label()).append(" | ")
                        .append(cell(c.origin())).append(" |\n");
            }
            md.append('\n');
        }
        summary(md, report);
        provenance(md, report);
        for (FamilyResult f : report.families()) {
            family(md, f);
        }
        return md.toString();
    }

    private static void summary(StringBuilder md, ValidationReport report) {
        md.append("## Summary\n\n");
        md.append("| family | checks | worst dev/tol | worst check | result |\n");
        md.append("| --- | ---: | ---: | --- | --- |\n");
        for (FamilyResult f : report.families()) {
            CheckResult worst = f.worst();
            md.append("| [").append(f.title()).append("](#").append(anchor(f.id())).append(") | ")
                    .append(f.checks().size()).append(" | ").append(Numbers.brief(worst.ratio())).append(" | ")
                    .append(cell(worst.label())).append(" | ")
                    .append(f.passed() ? "pass" : "**FAIL** (" + f.failures().size() + ")").append(" |\n");
        }
        md.append('\n');
    }

    private static void provenance(StringBuilder md, ValidationReport report) {
        Map<Provenance, Integer> counts = new EnumMap<>(Provenance.class);
        for (FamilyResult f : report.families()) {
            for (CheckResult c : f.checks()) {
                counts.merge(c.provenance(), 1, Integer::sum);
            }
        }
        md.append("## Where the reference values come from\n\n");
        md.append("| provenance | checks | meaning |\n| --- | ---: | --- |\n");
        for (Provenance p : Provenance.values()) {
            md.append("| ").append(p.label()).append(" | ").append(counts.getOrDefault(p, 0)).append(" | ")
                    .append(meaning(p)).append(" |\n");
        }
        md.append('\n');
    }

    private static String meaning(Provenance p) {
        return switch (p) {
            case PUBLISHED -> "transcribed from the printed source with the source at hand";
            case FROM_MEMORY -> "a published number typed without the source at hand; tolerance widened where "
                    + "the table says so";
            case COMPUTED -> "computed independently of stellabar by a script in `scripts/` (mpmath, 40–50 digits)";
            case CLOSED_FORM -> "the exact value of a closed-form expression, evaluated by a script in `scripts/`";
            case COMMON_PRACTICE -> "a rounded number in common use, quoted without a particular source";
            case IDENTITY -> "a thermodynamic identity checked by finite differences on a grid (no table)";
        };
    }

    private static void family(StringBuilder md, FamilyResult f) {
        md.append("<a id=\"").append(anchor(f.id())).append("\"></a>\n\n");
        md.append("## ").append(f.title()).append("\n\n");
        md.append("Family `").append(f.id()).append("`: ").append(f.checks().size()).append(" checks, ")
                .append(f.passed() ? "all pass" : f.failures().size() + " FAIL").append("; worst dev/tol ")
                .append(Numbers.brief(f.worst().ratio())).append(".\n\n");
        for (String paragraph : f.description()) {
            md.append(paragraph).append("\n\n");
        }
        for (ReferenceTable t : f.tables()) {
            md.append("**`").append(t.file()).append("`** (").append(t.rows().size()).append(" rows), its header:\n\n");
            md.append("```text\n");
            for (String line : t.header()) {
                md.append(line).append('\n');
            }
            md.append("```\n\n");
        }
        if (f.id().equals(ThermodynamicIdentityFamily.ID)) {
            identityTable(md, f);
        } else {
            checkTable(md, f);
        }
        for (ReportChart chart : f.charts()) {
            md.append("![").append(chart.fileStem()).append("](").append(CHART_FOLDER).append('/')
                    .append(chart.fileStem()).append(".svg)\n\n");
            md.append('*').append(chart.caption()).append("*\n\n");
        }
    }

    private static void checkTable(StringBuilder md, FamilyResult f) {
        md.append("| check | unit | reference | ours | deviation | tolerance | dev/tol | provenance | source | result |\n");
        md.append("| --- | --- | ---: | ---: | ---: | ---: | ---: | --- | --- | --- |\n");
        for (CheckResult c : f.checks()) {
            md.append("| ").append(cell(c.label())).append(" | ").append(c.unit()).append(" | ")
                    .append(c.reference()).append(" | ").append(Numbers.significant(c.ours(), OUR_DIGITS))
                    .append(" | ").append(Numbers.brief(c.deviation())).append(" | ").append(tolerance(c))
                    .append(" | ").append(Numbers.brief(c.ratio())).append(" | ").append(c.provenance().label())
                    .append(" | ").append(cell(c.source())).append(" | ").append(c.passed() ? "pass" : "**FAIL**")
                    .append(" |\n");
        }
        md.append('\n');
    }

    private static void identityTable(StringBuilder md, FamilyResult f) {
        md.append("| identity | what it tests | states | worst residual | at | tolerance | result |\n");
        md.append("| --- | --- | ---: | ---: | --- | ---: | --- |\n");
        for (ThermodynamicIdentityFamily.Identity identity : ThermodynamicIdentityFamily.identities()) {
            List<CheckResult> checks = f.checks().stream().filter(c -> c.quantity().equals(identity.key)).toList();
            if (checks.isEmpty()) {
                continue;
            }
            CheckResult worst = checks.stream().max(Comparator.comparingDouble(CheckResult::ratio)).orElseThrow();
            long failed = checks.stream().filter(c -> !c.passed()).count();
            md.append("| ").append(identity.formula).append(" | ").append(identity.meaning).append(" | ")
                    .append(checks.size()).append(" | ").append(Numbers.brief(worst.deviation())).append(" | ")
                    .append(cell(worst.parameters())).append(" | ").append(tolerance(worst)).append(" | ")
                    .append(failed == 0 ? "pass" : "**FAIL** (" + failed + ")").append(" |\n");
        }
        md.append('\n');
    }

    private static String tolerance(CheckResult c) {
        return Numbers.compact(c.tolerance().amount()) + " " + c.tolerance().kind();
    }

    private static String unitSuffix(CheckResult c) {
        return c.unit().isEmpty() ? "" : " " + c.unit();
    }

    /** Keeps a table cell on one line and free of column separators. */
    private static String cell(String text) {
        return text.replace("|", "\\|").replaceAll(";(?! )", "; ");
    }

    static String anchor(String id) {
        return "family-" + id;
    }
}
