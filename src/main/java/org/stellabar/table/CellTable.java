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

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param source the file name, for messages
     * @param header the header cells, as written (see {@link ColumnHeading#parse})
     * @param rows the data rows in file order
     * @param comments the text of the comment lines above the header, after their {@code #}, stripped
     */
    public CellTable {
        Objects.requireNonNull(source, "source");
        header = List.copyOf(header);
        rows = List.copyOf(rows);
        comments = List.copyOf(comments);
    }

    /**
     * One data row. The cells are kept packed in one string (separated by NUL, which a text
     * table's cells do not hold): a 10⁶-row profile then costs one string per row instead of one
     * per cell, a third of the memory.
     *
     * @param number data-row number, counted from 1 after the header, comment and blank lines not
     *     counted
     * @param line 1-based line number in the file
     * @param packed the cells as text, unquoted, surrounding blanks removed, joined by NUL
     */
    public record Row(int number, int line, String packed) {

        private static final char SEPARATOR = '\u0000';

        /**
         * Canonical constructor: no component may be null.
         *
         * @param number data-row number, counted from 1 after the header, comment and blank lines not
         *        counted
         * @param line 1-based line number in the file
         * @param packed the cells as text, unquoted, surrounding blanks removed, joined by NUL
         */
        public Row {
            Objects.requireNonNull(packed, "packed");
        }

        /**
         * @param number data-row number
         * @param line 1-based line number in the file
         * @param cells the cells
         * @return the row
         */
        public static Row of(int number, int line, List<String> cells) {
            return new Row(number, line, String.join(String.valueOf(SEPARATOR), cells));
        }

        /** @return the cells as text, in order */
        public List<String> cells() {
            List<String> cells = new java.util.ArrayList<>();
            int start = 0;
            for (int i = 0; i <= packed.length(); i++) {
                if (i == packed.length() || packed.charAt(i) == SEPARATOR) {
                    cells.add(packed.substring(start, i));
                    start = i + 1;
                }
            }
            return cells;
        }
    }
}
