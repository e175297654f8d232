package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.stellabar.charts.ChartFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * Merges the parts of a sharded {@code sequence} or {@code grid} ({@link TablePart}) into the files
 * of the unsharded run: the set is checked ({@link PartSet}), the whole job is rebuilt from the
 * recorded arguments (by the command that owns them: {@link WholeJob}), the parts' columns are
 * joined in K order under the whole job's metadata and written by the job's own writer.
 */
public final class TableMerge {

    /** A whole job, rebuilt from its recorded arguments, that can write itself from joined columns. */
    public interface WholeJob {

        /**
         * @param rows the whole job's rows, from the parts
         * @param extras the parts' job-specific counts, summed over the parts
         * @return the whole job's table without rows: its name, metadata and columns
         */
        Table schema(int rows, Map<String, Long> extras);

        /**
         * Writes what the unsharded run writes.
         *
         * @param table the whole table
         * @param folder where to write
         * @param chartFormats image formats
         * @return the files, in order
         * @throws IOException when a file cannot be written
         */
        List<Path> write(Table table, Path folder, Set<ChartFormat> chartFormats) throws IOException;
    }

    /**
     * What was merged and written.
     *
     * @param job the job's name
     * @param parts how many parts
     * @param rows rows of the whole table
     * @param files files written
     */
    public record Result(String job, int parts, int rows, List<Path> files) {
        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param job the job's name
         * @param parts how many parts
         * @param rows rows of the whole table
         * @param files files written
         */
        public Result {
            files = List.copyOf(files);
        }
    }

    private TableMerge() {
    }

    /**
     * @param files the part files
     * @param jobs how to rebuild each job from its arguments, by job name
     * @param folder where to write
     * @param chartFormats image formats
     * @param toolVersion this stellabar's version
     * @return what was written
     * @throws IOException when a file cannot be written
     * @throws BadInputException for a bad set of parts, in one line
     */
    public static Result merge(List<Path> files, Map<String, Function<List<String>, WholeJob>> jobs, Path folder,
            Set<ChartFormat> chartFormats, String toolVersion) throws IOException {
        List<TablePart.Header> parts = PartSet.checked(files, TablePart::readHeader, toolVersion);
        TablePart.Header first = parts.get(0);
        Function<List<String>, WholeJob> rebuild = jobs.get(first.job());
        if (rebuild == null) {
            throw new BadInputException(first.file() + ": parts of job \"" + first.job() + "\" cannot be merged; "
                    + "merge takes survey, sequence and grid parts");
        }
        if (!TablePart.contentHash(first.job(), first.arguments()).equals(first.contentHash())) {
            throw new BadInputException(first.file() + ": its arguments do not match its content hash; the file was"
                    + " altered");
        }
        WholeJob job;
        try {
            job = rebuild.apply(first.arguments());
        } catch (RuntimeException e) {
            throw new BadInputException(first.file() + ": its recorded arguments do not make a " + first.job()
                    + " (" + e.getMessage() + ")");
        }
        int rows = 0;
        Map<String, Long> extras = new HashMap<>();
        for (TablePart.Header p : parts) {
            rows += p.rows();
            p.extras().forEach((k, v) -> extras.merge(k, v, Long::sum));
        }
        Table schema = job.schema(rows, extras);
        Map<String, double[]> numbers = new HashMap<>();
        Map<String, String[]> texts = new HashMap<>();
        for (Column c : schema.columns()) {
            if (c instanceof NumberColumn) {
                numbers.put(c.name(), new double[rows]);
            } else {
                texts.put(c.name(), new String[rows]);
            }
        }
        int at = 0;
        for (TablePart.Header p : parts) {
            TablePart.readColumns(p, schema, numbers, texts, at);
            at += p.rows();
        }
        Table.Builder whole = new Table.Builder(schema.name(), schema.metadata());
        for (Column c : schema.columns()) {
            if (c instanceof NumberColumn n) {
                // the schema's quantity keeps the column's unit, description and whether it is integer
                whole.number(n.quantity(), numbers.get(n.name()));
            } else {
                TextColumn t = (TextColumn) c;
                whole.text(t.name(), t.description(), List.of(texts.get(t.name())));
            }
        }
        List<Path> written = new ArrayList<>(job.write(whole.build(), folder, chartFormats));
        return new Result(first.job(), parts.size(), rows, written);
    }
}
