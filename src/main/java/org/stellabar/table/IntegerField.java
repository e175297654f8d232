package org.stellabar.table;

import java.util.Objects;

/**
 * A whole number without a unit: a count, a row number.
 *
 * @param name ASCII identifier
 * @param value the value
 * @param description one line
 */
public record IntegerField(String name, long value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name ASCII identifier
     * @param value the value
     * @param description one line
     */
    public IntegerField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description of " + name);
    }

    @Override
    public boolean scalar() {
        return true;
    }
}
