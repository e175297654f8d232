package org.stellabar.table;

import java.util.Objects;

/**
 * A table inside a summary, such as a model's radial profile.
 *
 * @param name ASCII identifier
 * @param value the table
 * @param description one line
 */
public record TableField(String name, Table value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name ASCII identifier
     * @param value the table
     * @param description one line
     */
    public TableField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(value, "value of " + name);
        Objects.requireNonNull(description, "description of " + name);
    }
}
