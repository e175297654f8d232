package org.stellabar.observed;

import java.util.Objects;

/**
 * Why one star of a catalogue has no estimate.
 *
 * @param row the catalogue's data row, counted from 1
 * @param kind the kind of problem
 * @param message one line naming the value and what is allowed
 */
public record StarProblem(int row, ProblemKind kind, String message) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param row the catalogue's data row, counted from 1
     * @param kind the kind of problem
     * @param message one line naming the value and what is allowed
     */
    public StarProblem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
    }

    /** @return "row 7: above_eddington: ..." */
    public String describe() {
        return "row " + row + ": " + kind + ": " + message;
    }
}
