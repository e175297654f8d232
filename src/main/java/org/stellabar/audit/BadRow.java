package org.stellabar.audit;

import java.util.Objects;

/**
 * A data row of a profile that cannot be audited, and why.
 *
 * @param row the data-row number as in the file (1 after the header, comments not counted)
 * @param where where it is, for messages, e.g. "row 4 (line 12)"
 * @param problem what is wrong, e.g. a T cell 'abc' that is not a number
 */
public record BadRow(int row, String where, RowProblem problem) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param row the data-row number as in the file (1 after the header, comments not counted)
     * @param where where it is, for messages, e.g. "row 4 (line 12)"
     * @param problem what is wrong, e.g. a T cell 'abc' that is not a number
     */
    public BadRow {
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(problem, "problem");
    }

    /** @return what is wrong, one sentence, e.g. "column 'T' (T): 'abc' is not a finite number" */
    public String reason() {
        return problem.message();
    }

    @Override
    public String toString() {
        return where + ": " + reason();
    }
}
