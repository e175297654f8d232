package org.stellabar.output;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.CellTable;

/**
 * Whitespace-separated text tables as evolution and hydrodynamics codes write them: a block of
 * header lines (run parameters, often a line of names over a line of values), then the line of
 * column names, then rows of numbers separated by blanks or tabs.
 *
 * <p>The column-name line is the last line that is not a row of numbers before the first line that
 * is (or the line the caller names); a row of numbers has more numbers than other cells, so that a
 * column of star names does not hide the data; the lines above it are the file's metadata, kept as text.
 * Lines starting with {@code #} and blank lines are ignored everywhere. A number may use a
 * Fortran exponent ({@code 1.5D+07}); such a cell is handed on with an {@code E} so that it reads
 * as a number. A column name may carry its unit in brackets without blanks ({@code rho[g/cm3]}).
 */
public final class TextTableReader {

    private final OptionalInt namesLine;

    /** A reader that finds the column-name line itself. */
    public TextTableReader() {
        this(OptionalInt.empty());
    }

    private TextTableReader(OptionalInt namesLine) {
        this.namesLine = namesLine;
    }

    /**
     * @param line the 1-based line of the file that holds the column names
     * @return a reader that takes the names from that line
     */
    public TextTableReader withNamesLine(int line) {
        if (line < 1) {
            throw new BadInputException("--names-line " + line + " is not allowed; it is a line number, 1 or more");
        }
        return new TextTableReader(OptionalInt.of(line));
    }

    /**
     * @param file a text table (UTF-8)
     * @return the header (column names), the data rows, and the metadata lines above the names as
     *     {@link CellTable#comments()}
     * @throws BadInputException naming the file when it cannot be read or has no row of numbers
     */
    public CellTable read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new BadInputException("PROFILE " + file + ": cannot be read (" + e.getMessage() + ")");
        }
        return parse(file.toString(), lines);
    }

    /**
     * @param source the file name, for messages
     * @param lines the file's lines
     * @return the table
     * @throws BadInputException when there is no column-name line or no row of numbers
     */
    public CellTable parse(String source, List<String> lines) {
        int names = -1;
        if (namesLine.isPresent()) {
            names = namesLine.getAsInt() - 1;
            if (names >= lines.size() || ignored(lines.get(names))) {
                throw new BadInputException("--names-line " + namesLine.getAsInt() + ": line " + namesLine.getAsInt()
                        + " of " + source + (names >= lines.size() ? " does not exist (the file has " + lines.size()
                                + " lines)" : " is blank or a # comment"));
            }
        } else {
            int lastText = -1;
            for (int i = 0; i < lines.size(); i++) {
                if (ignored(lines.get(i))) {
                    continue;
                }
                if (mostlyNumbers(cells(lines.get(i)))) {
                    names = lastText;
                    break;
                }
                lastText = i;
            }
            if (names < 0) {
                throw new BadInputException(source + ": no line of column names above a row of numbers; a text"
                        + " table needs a line of names, then rows of numbers (or give --names-line N)");
            }
        }
        List<String> header = cells(lines.get(names));
        List<String> metadata = new ArrayList<>();
        for (int i = 0; i < names; i++) {
            if (!ignored(lines.get(i))) {
                metadata.add(lines.get(i).strip());
            }
        }
        List<CellTable.Row> rows = new ArrayList<>();
        for (int i = names + 1; i < lines.size(); i++) {
            if (!ignored(lines.get(i))) {
                rows.add(CellTable.Row.of(rows.size() + 1, i + 1, cells(lines.get(i)).stream()
                        .map(TextTableReader::fortranExponent).toList()));
            }
        }
        if (rows.isEmpty()) {
            throw new BadInputException(source + ": no data rows below the column names on line " + (names + 1));
        }
        return new CellTable(source, header, rows, metadata);
    }

    private static boolean ignored(String line) {
        String s = line.strip();
        return s.isEmpty() || s.startsWith("#");
    }

    static List<String> cells(String line) {
        String s = line.strip();
        return s.isEmpty() ? List.of() : List.of(s.split("\\s+"));
    }

    /** A row of data: more of its cells are numbers than not. */
    static boolean mostlyNumbers(List<String> cells) {
        int numbers = 0;
        for (String c : cells) {
            if (isNumber(fortranExponent(c))) {
                numbers++;
            }
        }
        return 2 * numbers > cells.size();
    }

    /**
     * @param lines the first lines of a file
     * @return whether they look like whitespace-separated text rather than CSV: among the lines
     *     that are neither blank nor comments, fewer than half hold a comma
     */
    public static boolean looksLikeText(List<String> lines) {
        int counted = 0;
        int withComma = 0;
        for (String line : lines) {
            if (!ignored(line)) {
                counted++;
                withComma += line.indexOf(',') >= 0 ? 1 : 0;
            }
        }
        return counted > 0 && 2 * withComma < counted;
    }

    private static boolean isNumber(String text) {
        try {
            Double.parseDouble(text);
            return !text.endsWith("d") && !text.endsWith("f") && !text.endsWith("D") && !text.endsWith("F");
        } catch (NumberFormatException e) {
            return false;
        }
    }

    /** "1.5D+07" and "1.5d-3" as Java reads them: D is Fortran's double-precision exponent letter. */
    private static String fortranExponent(String cell) {
        int d = Math.max(cell.indexOf('D'), cell.indexOf('d'));
        if (d > 0 && d < cell.length() - 1) {
            String swapped = cell.substring(0, d) + 'E' + cell.substring(d + 1);
            if (isNumber(swapped)) {
                return swapped;
            }
        }
        return cell;
    }
}
