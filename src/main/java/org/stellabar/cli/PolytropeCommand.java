package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.stellabar.output.OutputFolder;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.FigureExport;
import org.stellabar.pipeline.SurveyFigures;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;
import org.stellabar.structure.LaneEmdenSummary;
import org.stellabar.table.Summary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code stellabar polytrope}: the Lane-Emden solution of one index, constants and profile. */
@Command(name = "polytrope", header = "Lane-Emden polytrope of any index 0 <= n < 5.", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Lane-Emden polytrope of index n: the surface xi1, theta'(xi1),",
                "omega_n = -xi1^2 theta'(xi1), rho_c/mean rho, W_n (P_c = W_n G M^2/R^4), N_n,",
                "3/(5-n), the relativistic constant K_n, and the dimensionless profile",
                "xi, theta, dtheta/dxi, rho/rho_c, P/P_c, m/M. Everything is dimensionless."},
        footer = {"%nOutput forms: text and json print the constants and the profile; csv",
                "prints the profile table only. With --out, DIR receives",
                "polytrope-n<N>-profile.csv (with '#' metadata lines, the constants among",
                "them) and polytrope-n<N>-summary.json; their names go to stderr.",
                "%nExamples:%n  stellabar polytrope --index 3",
                "  stellabar polytrope --index 1.5 --points 501 --format json \\",
                "      --out profiles/out/n1.5"})
public final class PolytropeCommand implements Callable<Integer> {

    /** Largest profile size accepted. */
    static final int MAX_POINTS = 1_000_000;

    @Spec
    CommandSpec spec;

    @Option(names = "--index", required = true, paramLabel = "N", converter = Quantities.Number.class,
            description = "Polytropic index n, 0 <= n < 5 (dimensionless; e.g. 1.5 for a convective star, 3 for "
                    + "the Eddington standard model). n >= 5 has no finite radius.")
    double index;

    @Option(names = "--points", paramLabel = "K", defaultValue = "101",
            description = "Number of profile radii, evenly spaced in xi from the centre to xi1 (both included), "
                    + "2.." + MAX_POINTS + " (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "Output form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Also write the profile CSV, the summary JSON and the profile chart (one- and two-column"
                    + " widths) into this folder (created if needed).")
    Path out;

    @Mixin
    ChartFormatOption chartFormats;

    @Override
    public Integer call() throws IOException {
        var images = chartFormats.formats(); // refuse a bad format before any work
        if (points < 2 || points > MAX_POINTS) {
            throw new BadInputException("--points: " + points + " is outside 2.." + MAX_POINTS);
        }
        LaneEmdenSolution solution;
        try {
            solution = new LaneEmdenSolver().solve(index);
        } catch (BadInputException e) {
            throw e.about("--index");
        }
        Summary summary = LaneEmdenSummary.of(solution, points);
        PrintWriter stdout = spec.commandLine().getOut();
        if (format == OutputFormat.csv) {
            Printer.print(summary.table("profile"), format, stdout);
        } else {
            Printer.print(summary, format, stdout);
        }
        if (out != null) {
            String stem = "polytrope-n" + indexLabel(index);
            OutputFolder folder = new OutputFolder(out);
            Path csv = folder.csv(stem + "-profile.csv", LaneEmdenSummary.profileWithConstants(solution, points));
            Path json = folder.json(stem + "-summary.json", summary);
            List<Path> charts = FigureExport.bothWidths(SurveyFigures.polytrope(
                    summary.table("profile"), index), out, stem, images);
            PrintWriter err = spec.commandLine().getErr();
            err.println("wrote " + csv);
            err.println("wrote " + json);
            charts.forEach(c -> err.println("wrote " + c));
            err.flush();
        }
        return 0;
    }

    /** "3" for 3.0, "1.5" for 1.5: the index as it reads in a file name. */
    static String indexLabel(double n) {
        return n == Math.rint(n) ? String.format(Locale.ROOT, "%.0f", n) : Double.toString(n);
    }
}
