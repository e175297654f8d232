package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.PolytropeRun;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar polytrope}: the Lane-Emden solution of one index, constants and profile. */
public final class PolytropeCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    double index;

    int points;

    OutputFormat format;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    Path out;

    final ChartFormatOption chartFormats = new ChartFormatOption();

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("polytrope", this)
                .header("Lane-Emden polytrope of any index 0 <= n < 5.")
                .description("Lane-Emden polytrope of index n: the surface xi1, theta'(xi1),",
                        "omega_n = -xi1^2 theta'(xi1), rho_c/mean rho, W_n (P_c = W_n G M^2/R^4), N_n,",
                        "3/(5-n), the relativistic constant K_n, and the dimensionless profile",
                        "xi, theta, dtheta/dxi, rho/rho_c, P/P_c, m/M. Everything is dimensionless.")
                .footer("%nOutput forms: text and json print the constants and the profile; csv",
                        "prints the profile table only. With --out, DIR receives",
                        "polytrope-n<N>-profile.csv (with '#' metadata lines, the constants among",
                        "them) and polytrope-n<N>-summary.json; their names go to stderr.",
                        "%nExamples:%n  stellabar polytrope --index 3",
                        "  stellabar polytrope --index 1.5 --points 501 --format json \\",
                        "      --out profiles/out/n1.5");
        quiet.describe(m);
        m.option("--index").label("N").required().converter(new Quantities.Number())
                .description("Polytropic index n, 0 <= n < 5 (dimensionless; e.g. 1.5 for a convective star, 3 for "
                        + "the Eddington standard model). n >= 5 has no finite radius.")
                .field(this, "index");
        m.option("--points").label("K").defaultValue("101")
                .description("Number of profile radii, evenly spaced in xi from the centre to xi1 (both included), "
                        + "2.." + PolytropeRun.MAX_POINTS + " (default: ${DEFAULT-VALUE}).")
                .field(this, "points");
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Output form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "format");
        tableFormats.describe(m);
        m.option("-o", "--out").label("DIR")
                .description("Also write the profile (CSV and ECSV unless --table-formats says otherwise), the summary JSON and the profile chart (one- and two-column"
                        + " widths) into this folder (created if needed).")
                .field(this, "out");
        chartFormats.describe(m);
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        var images = chartFormats.formats();
        if (points < 2 || points > PolytropeRun.MAX_POINTS) {
            throw new BadInputException("--points: " + points + " is outside 2.." + PolytropeRun.MAX_POINTS);
        }
        PolytropeRun.Request request;
        try {
            request = new PolytropeRun.Request(index, points); // --points is checked above: the index is refused
        } catch (BadInputException e) {
            throw e.about("--index");
        }
        PolytropeRun.Result result = out == null ? PolytropeRun.compute(request)
                : PolytropeRun.run(request, out, images,
                        tableFormats.formatsOr(PolytropeRun.FORMATS));
        PrintWriter stdout = spec.commandLine().getOut();
        if (format == OutputFormat.csv) {
            Printer.print(result.profile(), format, stdout);
        } else {
            Printer.print(result.summary(), format, stdout);
        }
        if (!quiet.quiet) {
            Printer.wrote(result.files(), spec.commandLine().getErr());
        }
        return 0;
    }
}
