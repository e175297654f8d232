package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.stellabar.physics.BadInputException;
import org.stellabar.validation.CheckResult;
import org.stellabar.validation.FamilyResult;
import org.stellabar.validation.ReferenceSource;
import org.stellabar.validation.ReportWriter;
import org.stellabar.validation.Validation;
import org.stellabar.validation.ValidationReport;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar validate}: every reference check, one summary line per family, one report. */
public final class ValidateCommand implements Callable<Integer>, Subcommand {

    /** Exit status when a check fails. */
    public static final int EXIT_CHECK_FAILED = 1;
    /** Failures printed on the terminal before "... and N more". */
    static final int MAX_FAILURES_SHOWN = 40;

    CommandSpec spec;

    Path out;

    Path references;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("validate", this)
                .header("Every published and closed-form check, rerun into one report.")
                .description("Checks stellabar against published, recalled, independently computed",
                        "and closed-form reference values (validation/*.csv) and thermodynamic",
                        "identities; prints one line per family, failures first, and writes",
                        "report.md with its charts. Exit status 0 when every check passes,",
                        "1 when any fails.")
                .footer("%nExamples:%n  stellabar validate%n  stellabar validate --out /tmp/check");
        m.option("-o", "--out").label("DIR").defaultValue("validation")
                .description("Folder for report.md and charts/ (default: ${DEFAULT-VALUE}, the project's validation folder).")
                .field(this, "out");
        m.option("--references").label("DIR")
                .description("Folder of the reference tables (default: ./validation when present, else the tables "
                        + "packaged in the jar).")
                .field(this, "references");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() {
        OutFolder.check(out);
        PrintWriter o = spec.commandLine().getOut();
        ReferenceSource source;
        if (references != null) {
            if (!Files.isDirectory(references)) {
                throw new BadInputException("--references " + references + " is not a folder");
            }
            source = ReferenceSource.folder(references);
        } else {
            source = ReferenceSource.standard();
        }
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw new BadInputException("--out " + out + " is a file; give a folder for report.md and charts/");
        }
        ValidationReport report = Validation.standard().run(source);
        List<Path> written;
        try {
            written = new ReportWriter().write(report, out);
        } catch (IOException e) {
            throw new BadInputException("--out " + out + ": cannot write the report there (" + e.getMessage() + ")");
        }
        o.println("reference tables: " + source.describe());
        List<CheckResult> failures = report.failures();
        if (!failures.isEmpty()) {
            o.println("FAILED CHECKS (" + failures.size() + "):");
            failures.stream().limit(MAX_FAILURES_SHOWN).forEach(c -> o.println("  " + describe(c)));
            if (failures.size() > MAX_FAILURES_SHOWN) {
                o.println("  ... and " + (failures.size() - MAX_FAILURES_SHOWN) + " more (see the report)");
            }
        }
        o.println(String.format(Locale.US, "%-26s %7s %14s  %s", "family", "checks", "worst dev/tol", "result"));
        for (FamilyResult f : report.families()) {
            o.println(String.format(Locale.US, "%-26s %7d %14s  %s", f.id(), f.checks().size(),
                    ratio(f.worst().ratio()), f.passed() ? "pass" : "FAIL (" + f.failures().size() + ")"));
        }
        o.println("report: " + written.get(written.size() - 1) + " (" + (written.size() - 1) + " charts in "
                + out.resolve("charts") + ")");
        o.println(report.passed() ? "all " + report.checkCount() + " checks pass"
                : failures.size() + " of " + report.checkCount() + " checks FAIL");
        o.flush();
        return report.passed() ? 0 : EXIT_CHECK_FAILED;
    }

    private static String describe(CheckResult c) {
        return String.format(Locale.US, "%s: %s: reference %s%s, ours %s, deviation %s (%s), tolerance %s %s [%s; %s]",
                c.family(), c.label(), c.reference(), c.unit().isEmpty() ? "" : " " + c.unit(), number(c.ours()),
                number(c.deviation()), ratio(c.ratio()) + " x tolerance", number(c.tolerance().amount()),
                c.tolerance().kind(), c.provenance().label(), c.origin());
    }

    private static String number(double x) {
        return Double.isFinite(x) ? String.format(Locale.US, "%.6g", x) : "not finite";
    }

    private static String ratio(double x) {
        return Double.isFinite(x) ? String.format(Locale.US, "%.2g", x) : "not finite";
    }
}
