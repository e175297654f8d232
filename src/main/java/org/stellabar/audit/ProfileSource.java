package org.stellabar.audit;

import java.util.List;
import org.stellabar.table.ColumnHeading;

/**
 * A profile table as it arrives from a file, before any column has a meaning: headings and
 * cells as text, each row with the number a user sees in the file. CSV and FITS inputs adapt to
 * this.
 */
public interface ProfileSource {

    /** @return the file name, for messages */
    String name();

    /** @return the columns' names and stated units, in file order */
    List<ColumnHeading> headings();

    /** @return the number of data rows */
    int rowCount();

    /**
     * @param row 0-based index among the data rows
     * @return the data-row number a user sees: 1 for the first row after the header, comment
     *     lines not counted
     */
    int rowNumber(int row);

    /**
     * @param row 0-based index among the data rows
     * @return where the row is, for messages, e.g. "row 4 (line 12)"
     */
    String where(int row);

    /**
     * @param row 0-based index among the data rows
     * @return the number of cells in the row (differs from the headings' count in a ragged row)
     */
    int width(int row);

    /**
     * @param row 0-based index among the data rows
     * @param column 0-based column index, below {@link #width(int)}
     * @return the cell as text
     */
    String cell(int row, int column);

    /**
     * @param row 0-based index among the data rows
     * @param column 0-based column index, below {@link #width(int)}
     * @return the cell as a number, or NaN if it is not one (the caller reports it)
     */
    double number(int row, int column);

    /**
     * @return the composition a stellabar profile records in its metadata ("X = 0.7, Y = 0.28,
     *     Z = 0.02 (mu = 0.617…)" or "mu = 0.6"), as written; empty for other files
     */
    default java.util.Optional<String> recordedComposition() {
        return java.util.Optional.empty();
    }
}
