package org.stellabar.output;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.CellTable;

/**
 * Reads comma-separated values as written by {@link CsvWriter} and by most other programs: UTF-8
 * (a byte-order mark is dropped), lines starting with {@code #} are comments, blank lines are
 * skipped, the first other line is the header, every later line a data row. Cells may be quoted
 * with {@code "} (RFC 4180, a doubled quote inside stands for one); a quoted cell may not span
 * lines. Cells are returned as text with surrounding blanks removed: giving them meaning (numbers,
 * units) is the caller's job.
 */
public final class CsvTableReader {

    /**
     * @param file the file
     * @return its header and rows
     * @throws BadInputException if the file is missing or unreadable, is not UTF-8 text, has no
     *     header row, or has an unterminated quote (the message names the file and line)
     */
    public CellTable read(Path file) {
        String source = file.toString();
        // line by line, never the whole file in memory as text: a 10^6-row profile keeps only its cells
        try (BufferedReader in = new BufferedReader(new InputStreamReader(Files.newInputStream(file),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16)) {
            return parse(source, in.lines().iterator());
        } catch (NoSuchFileException e) {
            throw new BadInputException(source + ": no such file");
        } catch (java.io.UncheckedIOException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                throw new BadInputException(source + ": not UTF-8 text; a CSV profile must be a text file");
            }
            throw new BadInputException(source + ": cannot be read (" + e.getCause().getMessage() + ")");
        } catch (IOException e) {
            throw new BadInputException(source + ": cannot be read (" + e.getMessage() + ")");
        }
    }

    /**
     * @param source a name for messages
     * @param lines the lines of the file, without line terminators
     * @return the header and rows
     */
    public CellTable parse(String source, List<String> lines) {
        return parse(source, lines.iterator());
    }

    private CellTable parse(String source, java.util.Iterator<String> lines) {
        List<String> header = null;
        List<CellTable.Row> rows = new ArrayList<>();
        List<String> comments = new ArrayList<>();
        int dataRow = 0;
        for (int i = 0; lines.hasNext(); i++) {
            String line = lines.next();
            if (i == 0 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            String trimmed = line.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                if (header == null && !trimmed.isEmpty()) {
                    comments.add(trimmed.substring(1).strip());
                }
                continue;
            }
            List<String> cells = split(line, source, i + 1);
            if (header == null) {
                header = cells;
            } else {
                dataRow++;
                rows.add(CellTable.Row.of(dataRow, i + 1, cells));
            }
        }
        if (header == null) {
            throw new BadInputException(source + ": no header row; the file is empty or holds only comments");
        }
        return new CellTable(source, header, rows, comments);
    }

    static List<String> split(String line, String source, int lineNumber) {
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        int i = 0;
        int n = line.length();
        while (true) {
            // skip blanks before a cell so that a quote after them still opens a quoted cell
            int start = i;
            while (i < n && (line.charAt(i) == ' ' || line.charAt(i) == '\t')) {
                i++;
            }
            if (i < n && line.charAt(i) == '"') {
                i++;
                cell.setLength(0);
                boolean closed = false;
                while (i < n) {
                    char c = line.charAt(i);
                    if (c == '"') {
                        if (i + 1 < n && line.charAt(i + 1) == '"') {
                            cell.append('"');
                            i += 2;
                            continue;
                        }
                        closed = true;
                        i++;
                        break;
                    }
                    cell.append(c);
                    i++;
                }
                if (!closed) {
                    throw new BadInputException(source + ": line " + lineNumber
                            + ": a quoted cell is not closed on its line; quote characters in a cell are doubled");
                }
                while (i < n && line.charAt(i) != ',') {
                    if (!Character.isWhitespace(line.charAt(i))) {
                        throw new BadInputException(source + ": line " + lineNumber
                                + ": text after a closing quote; a quoted cell ends at its quote");
                    }
                    i++;
                }
                cells.add(cell.toString());
            } else {
                i = start;
                int comma = line.indexOf(',', i);
                int end = comma < 0 ? n : comma;
                cells.add(line.substring(i, end).strip());
                i = end;
            }
            if (i >= n) {
                break;
            }
            i++; // past the comma
            if (i == n) {
                cells.add("");
                break;
            }
        }
        return cells;
    }
}
