package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.output.OutputFolder;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;
import org.stellabar.structure.LaneEmdenSummary;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * The {@code polytrope} job: the Lane-Emden solution of one index as a summary (constants and the
 * dimensionless profile) and, when asked, its files: {@code polytrope-n<N>-profile.csv} (the
 * constants among the {@code #} notes), {@code polytrope-n<N>-summary.json} and the profile chart
 * in both journal widths.
 */
public final class PolytropeRun {

    /** The profile's formats unless asked otherwise. */
    public static final Set<TableFormat> FORMATS = java.util.Collections.unmodifiableSet(
            java.util.EnumSet.of(TableFormat.CSV, TableFormat.ECSV));

    /** Largest profile size accepted. */
    public static final int MAX_POINTS = 1_000_000;

    /**
     * What to solve.
     *
     * @param index polytropic index n, 0 ≤ n &lt; 5 (dimensionless)
     * @param points number of profile radii, evenly spaced in ξ from the centre to ξ₁, 2 to {@link #MAX_POINTS}
     */
    public record Request(double index, int points) {
        /**
         * Canonical constructor: checks ranges and consistency.
         *
         * @param index polytropic index n, 0 ≤ n &lt; 5 (dimensionless)
         * @param points number of profile radii, evenly spaced in ξ from the centre to ξ₁, 2 to {@link #MAX_POINTS}
         * @throws BadInputException naming the index or the number of points
         */
        public Request {
            LaneEmdenSolver.checkIndex(index);
            index += 0.0; // −0 is 0: no "-0.0" in the output or "n-0" in file names
            if (points < 2 || points > MAX_POINTS) {
                throw new BadInputException("points " + points + " is outside 2.." + MAX_POINTS);
            }
        }
    }

    /**
     * What was computed and written.
     *
     * @param summary the constants with the profile as the table field {@code profile}
     * @param files the files written, in the order written (empty when nothing was asked for)
     */
    public record Result(Summary summary, List<Path> files) {
        /**
         * Canonical constructor: copies collections in.
         *
         * @param summary the constants with the profile as the table field {@code profile}
         * @param files the files written, in the order written (empty when nothing was asked for)
         */
        public Result {
            files = List.copyOf(files);
        }

        /** @return the dimensionless profile table */
        public Table profile() {
            return summary.table("profile");
        }
    }

    private PolytropeRun() {
    }

    /**
     * Solves without writing anything.
     *
     * @param request the index and profile size
     * @return the summary, no files
     */
    public static Result compute(Request request) {
        return new Result(LaneEmdenSummary.of(solve(request), request.points()), List.of());
    }

    /**
     * Solves, then writes the profile CSV, the summary JSON and the profile chart into a folder.
     *
     * @param request the index and profile size
     * @param folder where to write (created if needed)
     * @param chartFormats image formats of the chart (one- and two-column widths)
     * @return the summary and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(Request request, Path folder, Set<ChartFormat> chartFormats) throws IOException {
        return run(request, folder, chartFormats, FORMATS);
    }

    /**
     * As {@link #run(Request, Path, Set)}, the profile in these formats (its summary is always JSON).
     *
     * @param request the index and profile size
     * @param folder where to write (created if needed)
     * @param chartFormats image formats of the chart (one- and two-column widths)
     * @param tableFormats the profile's formats
     * @return the summary and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(Request request, Path folder, Set<ChartFormat> chartFormats, Set<TableFormat> tableFormats)
            throws IOException {
        LaneEmdenSolution solution = solve(request);
        Summary summary = LaneEmdenSummary.of(solution, request.points());
        Result computed = new Result(summary, List.of());
        String stem = "polytrope-n" + indexLabel(request.index());
        OutputFolder out = new OutputFolder(folder);
        List<Path> files = new ArrayList<>();
        files.addAll(out.tables(stem + "-profile", LaneEmdenSummary.profileWithConstants(solution, request.points()),
                tableFormats));
        files.add(out.json(stem + "-summary.json", summary));
        files.addAll(FigureExport.bothWidths(SurveyFigures.polytrope(computed.profile(), request.index()), folder,
                stem, chartFormats));
        return new Result(summary, files);
    }

    private static LaneEmdenSolution solve(Request request) {
        return new LaneEmdenSolver().solve(request.index());
    }

    /**
     * The index as it reads in a file name.
     *
     * @param n polytropic index
     * @return "3" for 3.0, "1.5" for 1.5
     */
    static String indexLabel(double n) {
        return n == Math.rint(n) ? String.format(Locale.US, "%.0f", n) : Double.toString(n);
    }
}
