package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.output.OutputFolder;
import org.stellabar.physics.BadInputException;
import org.stellabar.survey.MassSequence;
import org.stellabar.table.Table;

/**
 * The {@code sequence} job: Eddington standard models over a range of masses as a table and, when
 * asked, its files: {@code sequence.csv}, {@code sequence.json} and the charts
 * {@code sequence-support} and {@code sequence-stability} in both journal widths. One part of a
 * sharded sequence is written as {@code sequence-K-of-N.csv} and {@code .json}, without charts:
 * a chart of a part would show a fragment, and the parts are joined before plotting.
 */
public final class SequenceRun {

    /** The table's formats unless asked otherwise. */
    public static final Set<TableFormat> FORMATS = java.util.Collections.unmodifiableSet(
            java.util.EnumSet.of(TableFormat.CSV, TableFormat.JSON, TableFormat.ECSV));

    /**
     * What to compute.
     *
     * @param sequence the masses and the composition
     * @param shard one part of the masses, or empty for the whole sequence
     */
    public record Request(MassSequence sequence, Optional<Shard> shard) {
        /**
         * Canonical constructor: no component may be null; checks ranges and consistency.
         *
         * @param sequence the masses and the composition
         * @param shard one part of the masses, or empty for the whole sequence
         * @throws BadInputException when there are more parts than masses
         */
        public Request {
            Objects.requireNonNull(sequence, "sequence");
            Objects.requireNonNull(shard, "shard");
            if (shard.isPresent() && shard.get().parts() > sequence.size()) {
                throw new BadInputException("shard " + shard.get().part() + "/" + shard.get().parts()
                        + " is not allowed; there are only " + sequence.size() + " masses to share");
            }
        }

        /**
         * @param sequence the masses and the composition
         * @return the whole sequence
         */
        public static Request whole(MassSequence sequence) {
            return new Request(sequence, Optional.empty());
        }
    }

    /**
     * What was computed and written.
     *
     * @param table the rows of the sequence (or of the part)
     * @param files the files written, in the order written (empty when nothing was asked for)
     */
    public record Result(Table table, List<Path> files) {
        /**
         * Canonical constructor: copies collections in.
         *
         * @param table the rows of the sequence (or of the part)
         * @param files the files written, in the order written (empty when nothing was asked for)
         */
        public Result {
            files = List.copyOf(files);
        }
    }

    /** The job's name: names its files and its parts. */
    public static final String JOB = "sequence";

    private SequenceRun() {
    }

    /**
     * Computes without writing anything.
     *
     * @param request the sequence and the part
     * @return the table, no files
     */
    public static Result compute(Request request) {
        return new Result(table(request), List.of());
    }

    /**
     * Computes, then writes the table as CSV and JSON and, for a whole sequence, its charts.
     *
     * @param request the sequence and the part
     * @param folder where to write (created if needed)
     * @param chartFormats image formats of the charts (one- and two-column widths)
     * @return the table and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(Request request, Path folder, Set<ChartFormat> chartFormats) throws IOException {
        return run(request, folder, chartFormats, FORMATS, List.of());
    }

    /**
     * As {@link #run(Request, Path, Set)}, the table in these formats; a part also writes
     * {@code sequence-K-of-N.part.json} for {@code merge} when the arguments that define the
     * whole sequence are given.
     *
     * @param request the sequence and the part
     * @param folder where to write (created if needed)
     * @param chartFormats image formats of the charts (one- and two-column widths)
     * @param tableFormats the table's formats
     * @param arguments the whole sequence's defining command-line arguments, canonical; empty to
     *     write no part file
     * @return the table and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(Request request, Path folder, Set<ChartFormat> chartFormats, Set<TableFormat> tableFormats,
            List<String> arguments) throws IOException {
        Table table = table(request);
        if (request.shard().isEmpty()) {
            return new Result(table, writeWhole(table, folder, chartFormats, tableFormats));
        }
        Shard shard = request.shard().get();
        OutputFolder out = new OutputFolder(folder);
        String stem = shard.stem(JOB);
        List<Path> files = new ArrayList<>(out.tables(stem, table, tableFormats));
        if (!arguments.isEmpty()) {
            int size = request.sequence().size();
            Path part = folder.resolve(stem + ".part.json");
            TablePart.write(part, new TablePart.Header(null, JOB, arguments, TablePart.contentHash(JOB, arguments),
                    org.stellabar.table.Version.current(), shard, shard.from(size), shard.to(size), size,
                    table.rowCount(), java.util.Map.of()), table);
            files.add(part);
        }
        return new Result(table, files);
    }

    /**
     * Writes a whole sequence's files: its table in the given formats and its charts.
     *
     * @param table the whole sequence
     * @param folder where to write
     * @param chartFormats image formats
     * @param tableFormats the table's formats
     * @return the files, in order
     * @throws IOException when a file cannot be written
     */
    public static List<Path> writeWhole(Table table, Path folder, Set<ChartFormat> chartFormats,
            Set<TableFormat> tableFormats) throws IOException {
        OutputFolder out = new OutputFolder(folder);
        List<Path> files = new ArrayList<>(out.tables(JOB, table, tableFormats));
        files.addAll(FigureExport.bothWidths(SurveyFigures.radiationSupport(table), folder, "sequence-support",
                chartFormats));
        files.addAll(FigureExport.bothWidths(SurveyFigures.stabilityMargin(table), folder, "sequence-stability",
                chartFormats));
        return files;
    }

    private static Table table(Request request) {
        int size = request.sequence().size();
        int from = request.shard().map(s -> s.from(size)).orElse(0);
        int to = request.shard().map(s -> s.to(size)).orElse(size);
        return request.sequence().table(from, to);
    }
}
