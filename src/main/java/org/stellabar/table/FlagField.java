package org.stellabar.table;

import java.util.Objects;

/**
 * A yes/no value.
 *
 * @param name ASCII identifier
 * @param value the flag
 * @param description one line
 */
public record FlagField(String name, boolean value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name ASCII identifier
     * @param value the flag
     * @param description one line
     */
    public FlagField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description of " + name);
    }

    @Override
    public boolean scalar() {
        return true;
    }
}
