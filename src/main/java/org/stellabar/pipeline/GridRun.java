package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.EosQuantities;
import org.stellabar.output.OutputFolder;
import org.stellabar.output.TableFormat;
import org.stellabar.survey.EosGrid;
import org.stellabar.survey.RegimeLines;
import org.stellabar.survey.SofteningBoundary;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/**
 * The {@code grid} job: the equation of state over a ρ–T or P–T grid written as a table, and
 * the ρ–T plane chart with β lines, the degeneracy line, the pair-creation temperature and
 * optionally the centres of stars.
 */
public final class GridRun {

    /**
     * What was written and how long each stage took.
     *
     * @param table the grid
     * @param files the files written
     * @param computeSeconds time to evaluate the grid [s]
     * @param writeSeconds time to write the table [s]
     */
    public record Result(Table table, List<Path> files, double computeSeconds, double writeSeconds) {
        /**
         * Canonical constructor: copies collections in.
         *
         * @param table the grid
         * @param files the files written
         * @param computeSeconds time to evaluate the grid [s]
         * @param writeSeconds time to write the table [s]
         */
        public Result {
            files = List.copyOf(files);
        }
    }

    /** Temperatures at which the Γ1 = 4/3 boundary is found for the chart. */
    static final int SOFTENING_TEMPERATURES = 120;
    /** Densities scanned at each of them. */
    static final int SOFTENING_SCAN = 120;

    /** The job's name: names its files and its parts. */
    public static final String JOB = "grid";

    private GridRun() {
    }

    /**
     * @param spec the grid request
     * @param folder where to write grid.csv (or .fits, .json) and the charts
     * @param format the table format
     * @param chartFormats image formats of the ρ–T chart (one- and two-column widths)
     * @param markers star centres to mark on the chart
     * @return what was written
     * @throws IOException when a file cannot be written
     */
    public static Result run(EosGrid.Spec spec, Path folder, TableFormat format, Set<ChartFormat> chartFormats,
            List<PlaneFigure.Marker> markers) throws IOException {
        return run(spec, Optional.empty(), folder, format, chartFormats, markers);
    }

    /**
     * The whole grid with its chart, or one part of it: the K-th of N equal parts of the outer
     * (ρ or P) axis, written as {@code grid-K-of-N.csv} (or .fits, .json) without the chart, also
     * for 1/1 ({@link Shard}).
     *
     * @param spec the grid request
     * @param shard the part, or empty for the whole grid
     * @param folder where to write
     * @param format the table format
     * @param chartFormats image formats of the ρ–T chart (whole grid only)
     * @param markers star centres to mark on the chart
     * @return what was written
     * @throws IOException when a file cannot be written
     */
    public static Result run(EosGrid.Spec spec, Optional<Shard> shard, Path folder, TableFormat format,
            Set<ChartFormat> chartFormats, List<PlaneFigure.Marker> markers) throws IOException {
        return run(spec, shard, folder, java.util.EnumSet.of(format), chartFormats, markers);
    }

    /**
     * As {@link #run(EosGrid.Spec, Optional, Path, TableFormat, Set, List)}, the table in several formats.
     *
     * @param spec the grid
     * @param shard the part of the first axis to compute, or empty for all of it
     * @param folder where to write
     * @param formats the table's formats
     * @param chartFormats image formats of the ρ–T chart (whole grid only)
     * @param markers stars to mark on the chart
     * @return the table and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(EosGrid.Spec spec, Optional<Shard> shard, Path folder, Set<TableFormat> formats,
            Set<ChartFormat> chartFormats, List<PlaneFigure.Marker> markers) throws IOException {
        return run(spec, shard, folder, formats, chartFormats, markers, List.of());
    }

    /**
     * As {@link #run(EosGrid.Spec, Optional, Path, Set, Set, List)}; a part also writes
     * {@code grid-K-of-N.part.json} for {@code merge} when the arguments that define the whole
     * grid are given.
     *
     * @param spec the grid
     * @param shard the part of the first axis to compute, or empty for all of it
     * @param folder where to write
     * @param formats the table's formats
     * @param chartFormats image formats of the ρ–T chart (whole grid only)
     * @param markers stars to mark on the chart
     * @param arguments the whole grid's defining command-line arguments, canonical; empty to write
     *     no part file
     * @return the table and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(EosGrid.Spec spec, Optional<Shard> shard, Path folder, Set<TableFormat> formats,
            Set<ChartFormat> chartFormats, List<PlaneFigure.Marker> markers, List<String> arguments)
            throws IOException {
        int from = shard.map(s -> s.from(spec.firstPoints())).orElse(0);
        int to = shard.map(s -> s.to(spec.firstPoints())).orElse(spec.firstPoints());
        long start = System.nanoTime();
        Table table = new EosGrid().evaluate(spec, from, to);
        long computed = System.nanoTime();
        List<Path> files = new ArrayList<>();
        OutputFolder out = new OutputFolder(folder);
        String stem = shard.map(s -> s.stem("grid")).orElse("grid");
        if (shard.isPresent()) {
            files.addAll(out.tables(stem, table, formats));
            if (!arguments.isEmpty()) {
                Path part = folder.resolve(stem + PartSet.SUFFIX);
                TablePart.write(part, new TablePart.Header(null, JOB, arguments, TablePart.contentHash(JOB, arguments),
                        org.stellabar.table.Version.current(), shard.get(), from, to, spec.firstPoints(),
                        table.rowCount(), java.util.Map.of()), table);
                files.add(part);
            }
            long written = System.nanoTime();
            return new Result(table, files, (computed - start) * 1e-9, (written - computed) * 1e-9);
        }
        // The chart needs only the grid's bounds: draw it on its own thread while the table is
        // written (the table's formatting uses the common pool, the file system waits).
        FutureTask<List<Path>> charts = new FutureTask<>(
                () -> FigureExport.bothWidths(chart(spec, table, markers), folder, "rho-T-plane", chartFormats));
        Thread drawing = new Thread(charts, "grid-chart");
        drawing.start();
        try {
            files.addAll(out.tables(stem, table, formats));
        } finally {
            files.addAll(joined(charts));
        }
        long written = System.nanoTime();
        return new Result(table, files, (computed - start) * 1e-9, (written - computed) * 1e-9);
    }

    /**
     * Writes a whole grid's files from its table: the table in the given formats and the ρ–T
     * chart, as the unsharded run does (for a merge of parts).
     *
     * @param spec the grid
     * @param table the whole grid
     * @param folder where to write
     * @param formats the table's formats
     * @param chartFormats image formats of the chart
     * @param markers stars to mark on the chart
     * @return the files, in order
     * @throws IOException when a file cannot be written
     */
    public static List<Path> writeWhole(EosGrid.Spec spec, Table table, Path folder, Set<TableFormat> formats,
            Set<ChartFormat> chartFormats, List<PlaneFigure.Marker> markers) throws IOException {
        List<Path> files = new ArrayList<>(new OutputFolder(folder).tables(JOB, table, formats));
        files.addAll(FigureExport.bothWidths(chart(spec, table, markers), folder, "rho-T-plane", chartFormats));
        return files;
    }

    /** @return the ρ–T chart of a grid (package-private for the figure check) */
    static ChartSpec chart(EosGrid.Spec spec, Table table, List<PlaneFigure.Marker> markers) {
        // read in place: a copy of a 10^6-point grid's column is 8 MB of fresh memory
        NumberColumn rho = table.numbers(EosQuantities.RHO);
        double rhoMin = Double.MAX_VALUE;
        double rhoMax = 0;
        for (int i = 0; i < rho.size(); i++) {
            rhoMin = Math.min(rhoMin, rho.get(i));
            rhoMax = Math.max(rhoMax, rho.get(i));
        }
        if (rho.size() == 0) {
            rhoMin = 1e-10;
            rhoMax = 1e10;
        }
        Table lines = RegimeLines.table(spec.composition(), spec.tMin(), spec.tMax(), 200, RegimeLines.DEFAULT_BETAS);
        ChartSpec plane = PlaneFigure.of(lines, RegimeLines.DEFAULT_BETAS, rhoMin, rhoMax, markers,
                spec.composition().mu());
        if (spec.electrons() == Electrons.classical) {
            return plane;
        }
        // the boundary from the equation of state itself, finer than the grid's rows
        Table region = new SofteningBoundary(spec.composition()).table(spec.tMin(), spec.tMax(), SOFTENING_TEMPERATURES,
                rhoMin, rhoMax, SOFTENING_SCAN);
        return PlaneFigure.withSofteningRegion(plane, region);
    }

    /** The chart files, or the chart's own failure, after the table has been written. */
    private static List<Path> joined(FutureTask<List<Path>> charts) throws IOException {
        try {
            return charts.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while drawing the rho-T chart", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof IOException io) {
                throw io;
            }
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(cause);
        }
    }
}
