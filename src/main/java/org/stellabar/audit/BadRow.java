package org.stellabar.audit;

import java.util.Objects;

/**
 * A data row of a profile that cannot be audited, and why.
 *
 * @param row the data-row number as in the file (1 after the header, comments not counted)
 * @param where where it is, for messages, e.g. "row 4 (line 12)"
 * @param reason what is wrong, e.g. "T cell 'abc' is not a number"
 */
public record BadRow(int row, String where, String reason) {

    public BadRow {
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(reason, "reason");
    }

    @Override
    public String toString() {
        return where + ": " + reason;
    }
}
