package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * A table as read from a text file, before any meaning is given to it: the header cells and the
 * data rows as text, each row with its data-row number (1 for the first row after the header,
 * comment and blank lines not counted) and its line in the file. Rows may be ragged; deciding
 * what a short row or a non-numeric cell means is the reader's caller's business.
 *
 * @param source the file name, for messages
 * @param header the header cells, as written (see {@link ColumnHeading#parse})
 * @param rows the data rows in file order
 * @param comments the text of the comment lines above the header, after their {@code #}, stripped
 */
public record CellTable(String source, List<String> header, List<Row> rows, List<String> comments) {

    public CellTable {
        Objects.requireNonNull(source, "source");
        header = List.copyOf(header);
        rows = List.copyOf(rows);
        comments = List.copyOf(comments);
    }

    /**
     * One data row.
     *
     * @param number data-row number, counted from 1 after the header, comment and blank lines not
     *     counted
     * @param line 1-based line number in the file
     * @param cells the cells as text, unquoted, surrounding blanks removed
     */
    public record Row(int number, int line, List<String> cells) {

        public Row {
            cells = List.copyOf(cells);
        }
    }
}
