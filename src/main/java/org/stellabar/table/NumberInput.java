package org.stellabar.table;

import java.util.Objects;

/**
 * A numeric input with its unit.
 *
 * @param name the input's name
 * @param value the value in {@code unit}, finite
 * @param unit unit string in the table spelling (see the package documentation), "" if none
 * @param description one line, "" if the name says it all
 */
public record NumberInput(String name, double value, String unit, String description) implements Input {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name the input's name
     * @param value the value in {@code unit}, finite
     * @param unit unit string in the table spelling (see the package documentation), "" if none
     * @param description one line, "" if the name says it all
     */
    public NumberInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit of input " + name);
        Objects.requireNonNull(description, "description of input " + name);
        if (!Double.isFinite(value)) {
            throw new IllegalStateException("input " + name + " is " + value + "; metadata holds finite numbers only");
        }
    }

    /** @return the value as Java prints a double (it reads back to the same double), then the unit */
    @Override
    public String text() {
        return unit.isEmpty() ? Double.toString(value) : value + " " + unit;
    }
}
