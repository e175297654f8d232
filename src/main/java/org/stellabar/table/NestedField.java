package org.stellabar.table;

import java.util.Objects;

/**
 * A summary inside a summary, such as the composition inside a state.
 *
 * @param name ASCII identifier
 * @param value the nested summary
 * @param description one line
 */
public record NestedField(String name, Summary value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name ASCII identifier
     * @param value the nested summary
     * @param description one line
     */
    public NestedField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(value, "value of " + name);
        Objects.requireNonNull(description, "description of " + name);
    }
}
