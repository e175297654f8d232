package org.stellabar.output;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.stellabar.physics.BadInputException;
import uk.ac.starlink.table.ColumnInfo;
import uk.ac.starlink.table.DescribedValue;
import uk.ac.starlink.table.RowSequence;
import uk.ac.starlink.table.StarTable;
import uk.ac.starlink.table.StoragePolicy;
import uk.ac.starlink.table.TableBuilder;
import uk.ac.starlink.util.FileDataSource;

/**
 * Reads ECSV (astropy's Enhanced CSV) and IVOA VOTable files that any program wrote, through
 * STIL (the Starlink Tables Infrastructure Library, M. B. Taylor, ASP Conf. Ser. 347, 29, 2005),
 * which reads every VOTable serialization (TABLEDATA, BINARY, BINARY2, FITS) and ECSV's YAML
 * header. A column keeps its unit as the file writes it; numbers become doubles (a blank or null
 * value NaN), anything else text. The table's parameters (ECSV meta, VOTable PARAMs and INFOs)
 * come back as lines "name = value unit", for the caller's report.
 */
public final class AstronomyTableReader {

    /** The formats this class reads. */
    public enum Format {
        /** astropy's Enhanced CSV */
        ECSV(new uk.ac.starlink.ecsv.EcsvTableBuilder()),
        /** IVOA VOTable, any version and serialization */
        VOTABLE(new uk.ac.starlink.votable.VOTableBuilder());

        private final TableBuilder builder;

        Format(TableBuilder builder) {
            this.builder = builder;
        }
    }

    /**
     * One column as read.
     *
     * @param name the column's name
     * @param unit the unit as the file writes it, "" when none
     * @param description the file's description, "" when none
     * @param numbers the values of a numeric column (NaN where blank), else null
     * @param text the values of any other column, else null
     */
    public record ReadColumn(String name, String unit, String description, double[] numbers, List<String> text) {

        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param name the column's name
         * @param unit the unit as the file writes it, "" when none
         * @param description the file's description, "" when none
         * @param numbers the values of a numeric column (NaN where blank), else null
         * @param text the values of any other column, else null
         */
        public ReadColumn {
            Objects.requireNonNull(name, "name");
            unit = unit == null ? "" : unit.strip();
            description = description == null ? "" : description;
        }
    }

    /**
     * A table as read.
     *
     * @param source the file, for messages
     * @param rows the number of rows
     * @param columns the columns in file order
     * @param parameters the table's parameters as "name = value unit" lines
     */
    public record ReadTable(String source, int rows, List<ReadColumn> columns, List<String> parameters) {

        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param source the file, for messages
         * @param rows the number of rows
         * @param columns the columns in file order
         * @param parameters the table's parameters as "name = value unit" lines
         */
        public ReadTable {
            columns = List.copyOf(columns);
            parameters = List.copyOf(parameters);
        }
    }

    private AstronomyTableReader() {
    }

    /**
     * @param file the file
     * @param format its format
     * @return the first table in it
     * @throws BadInputException naming the file when it cannot be read as that format
     */
    public static ReadTable read(Path file, Format format) {
        StarTable table;
        try {
            table = format.builder.makeStarTable(new FileDataSource(file.toFile()), false, StoragePolicy.PREFER_MEMORY);
        } catch (IOException | RuntimeException e) {
            throw new BadInputException("PROFILE " + file + ": not a readable " + format.name() + " file ("
                    + oneLine(e) + ")");
        }
        if (table == null) {
            throw new BadInputException("PROFILE " + file + ": holds no " + format.name() + " table");
        }
        int n = table.getColumnCount();
        boolean[] numeric = new boolean[n];
        double[][] numbers = new double[n][];
        List<List<String>> text = new ArrayList<>();
        for (int c = 0; c < n; c++) {
            numeric[c] = Number.class.isAssignableFrom(table.getColumnInfo(c).getContentClass());
            numbers[c] = numeric[c] ? new double[1024] : null;
            text.add(numeric[c] ? null : new ArrayList<>());
        }
        int rows = 0;
        try (RowSequence seq = table.getRowSequence()) {
            while (seq.next()) {
                for (int c = 0; c < n; c++) {
                    Object cell = seq.getCell(c);
                    if (numeric[c]) {
                        if (rows == numbers[c].length) {
                            numbers[c] = Arrays.copyOf(numbers[c], 2 * rows);
                        }
                        numbers[c][rows] = cell instanceof Number num ? num.doubleValue() : Double.NaN;
                    } else {
                        text.get(c).add(cell == null ? "" : String.valueOf(cell));
                    }
                }
                rows++;
            }
        } catch (IOException | RuntimeException e) {
            throw new BadInputException("PROFILE " + file + ": row " + (rows + 1) + " cannot be read (" + oneLine(e) + ")");
        }
        List<ReadColumn> columns = new ArrayList<>();
        for (int c = 0; c < n; c++) {
            ColumnInfo info = table.getColumnInfo(c);
            columns.add(new ReadColumn(info.getName(), info.getUnitString(), info.getDescription(),
                    numeric[c] ? Arrays.copyOf(numbers[c], rows) : null, text.get(c)));
        }
        List<String> parameters = new ArrayList<>();
        for (DescribedValue p : table.getParameters()) {
            String unit = p.getInfo().getUnitString();
            parameters.add(p.getInfo().getName() + " = " + p.getValueAsString(1 << 20)
                    + (unit == null || unit.isBlank() ? "" : " " + unit));
        }
        return new ReadTable(file.toString(), rows, columns, parameters);
    }

    private static String oneLine(Exception e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.replaceAll("\\s+", " ").strip();
    }
}
