package org.stellabar.validation;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Units;

/**
 * Reads a reference table: '#' header lines (one of them "family: NAME"), then the column line
 *
 * <pre>
 *   quantity,parameters,value,unit,tolerance,tolerance_kind,provenance,source
 * </pre>
 *
 * then one check per line. Cells hold no commas (the scripts that write tables refuse them), so a
 * plain split suffices. Parameters are {@code name=value} pairs joined by ';'. Every problem is
 * reported with the file and line.
 */
public final class ReferenceTableReader {

    /** The column line every table carries. */
    public static final String COLUMNS = "quantity,parameters,value,unit,tolerance,tolerance_kind,provenance,source";

    private ReferenceTableReader() {
    }

    /**
     * @param source where the tables are
     * @param file the file name
     * @return the parsed table
     * @throws BadInputException for a malformed table (message names file and line)
     */
    public static ReferenceTable read(ReferenceSource source, String file) {
        try (BufferedReader in = new BufferedReader(source.open(file))) {
            return parse(file, in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static ReferenceTable parse(String file, BufferedReader in) throws IOException {
        List<String> header = new ArrayList<>();
        List<ReferenceValue> rows = new ArrayList<>();
        String family = null;
        boolean columnsSeen = false;
        int lineNumber = 0;
        for (String line = in.readLine(); line != null; line = in.readLine()) {
            lineNumber++;
            String where = file + " line " + lineNumber;
            if (line.isBlank()) {
                continue;
            }
            if (line.startsWith("#")) {
                String text = line.length() > 1 && line.charAt(1) == ' ' ? line.substring(2) : line.substring(1);
                if (text.startsWith("family:")) {
                    family = text.substring("family:".length()).strip();
                } else {
                    header.add(text);
                }
                continue;
            }
            if (!columnsSeen) {
                if (!line.strip().equals(COLUMNS)) {
                    throw new BadInputException(where + ": expected the column line \"" + COLUMNS + "\"");
                }
                columnsSeen = true;
                continue;
            }
            rows.add(row(file, lineNumber, line));
        }
        if (family == null) {
            throw new BadInputException(file + ": the header has no \"# family: NAME\" line");
        }
        if (rows.isEmpty()) {
            throw new BadInputException(file + ": no reference rows");
        }
        return new ReferenceTable(file, family, header, rows);
    }

    private static ReferenceValue row(String file, int lineNumber, String line) {
        String where = file + " line " + lineNumber;
        String[] cells = line.split(",", -1);
        if (cells.length != 8) {
            throw new BadInputException(where + ": " + cells.length + " cells; a row has 8 (" + COLUMNS + ")");
        }
        String quantity = cells[0].strip();
        if (quantity.isEmpty()) {
            throw new BadInputException(where + ": the quantity is empty");
        }
        Map<String, String> parameters = new LinkedHashMap<>();
        if (!cells[1].isBlank()) {
            for (String pair : cells[1].split(";")) {
                int eq = pair.indexOf('=');
                if (eq <= 0) {
                    throw new BadInputException(where + ": parameter \"" + pair + "\" is not name=value");
                }
                parameters.put(pair.substring(0, eq).strip(), pair.substring(eq + 1).strip());
            }
        }
        String printed = cells[2].strip();
        double value = Units.parseNumber(where + ": value", printed);
        double amount = Units.parseNumber(where + ": tolerance", cells[4].strip());
        Tolerance tolerance;
        switch (cells[5].strip()) {
            case "abs" -> tolerance = Tolerance.absolute(positive(where, amount));
            case "rel" -> {
                if (value == 0.0) {
                    throw new BadInputException(where + ": a relative tolerance needs a non-zero reference value");
                }
                tolerance = Tolerance.relativeTo(positive(where, amount));
            }
            default -> throw new BadInputException(where + ": tolerance kind \"" + cells[5].strip()
                    + "\" is not abs or rel");
        }
        Provenance provenance = Provenance.parse(cells[6], where);
        return new ReferenceValue(file, lineNumber, quantity, parameters, printed, value, cells[3].strip(), tolerance,
                provenance, cells[7].strip());
    }

    private static double positive(String where, double amount) {
        if (!(amount > 0.0)) {
            throw new BadInputException(where + ": tolerance " + amount + " must be positive");
        }
        return amount;
    }
}
