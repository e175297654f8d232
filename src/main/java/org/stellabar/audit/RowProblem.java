package org.stellabar.audit;

import java.util.Objects;

/**
 * What is wrong with one data row of a profile: its kind, the column and cell text it concerns
 * (empty when it concerns the row as a whole) and the sentence the user reads.
 *
 * @param kind what kind of problem
 * @param column the file's column, e.g. "column 'T' (T)", or "" for the whole row
 * @param value the offending cell as written, or ""
 * @param message what is wrong, one sentence without the row's position
 */
public record RowProblem(Kind kind, String column, String value, String message) {

    /** The kinds of row problem. */
    public enum Kind {
        /** Another number of cells than the header. */
        RAGGED,
        /** A cell of a quantity in use is empty. */
        EMPTY_CELL,
        /** A cell of a quantity in use is not a finite number. */
        NOT_A_NUMBER,
        /** A cell overflows once converted to CGS. */
        OVERFLOW,
        /** ρ, T or P is exactly 0: a bad row, unless it is the vacuum surface row. */
        ZERO,
        /** ρ, T or P is negative. */
        NOT_POSITIVE,
        /** r or m is negative. */
        NEGATIVE,
        /** The mass fractions are outside [0, 1] or do not add up. */
        COMPOSITION,
        /** m &gt; 0 at r = 0, or m = 0 at r &gt; 0. */
        CENTRE_MASS,
        /** r or m breaks the order of the shells. */
        OUT_OF_ORDER
    }

    /**
     * Canonical constructor: no component may be null.
     *
     * @param kind what kind of problem
     * @param column the file's column, e.g. "column 'T' (T)", or "" for the whole row
     * @param value the offending cell as written, or ""
     * @param message what is wrong, one sentence without the row's position
     */
    public RowProblem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(message, "message");
    }

    /**
     * @param kind what kind of problem
     * @param message what is wrong
     * @return a problem of the row as a whole
     */
    static RowProblem ofRow(Kind kind, String message) {
        return new RowProblem(kind, "", "", message);
    }

    /** @return true if only a zero ρ, T or P is wrong: perhaps the vacuum surface row */
    public boolean mayBeSurface() {
        return kind == Kind.ZERO;
    }
}
