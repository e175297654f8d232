package org.stellabar.table;

import java.util.Objects;

/**
 * A whole-number input without a unit, such as a number of points.
 *
 * @param name the input's name
 * @param value the value
 * @param description one line, "" if the name says it all
 */
public record IntegerInput(String name, long value, String description) implements Input {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name the input's name
     * @param value the value
     * @param description one line, "" if the name says it all
     */
    public IntegerInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description of input " + name);
    }

    @Override
    public String text() {
        return Long.toString(value);
    }
}
