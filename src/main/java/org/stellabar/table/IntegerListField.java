package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * A list of whole numbers, such as the data rows a check flagged.
 *
 * @param name ASCII identifier
 * @param value the integers, copied
 * @param description one line
 */
public record IntegerListField(String name, List<Long> value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param name ASCII identifier
     * @param value the integers, copied
     * @param description one line
     */
    public IntegerListField {
        Objects.requireNonNull(name, "name");
        value = List.copyOf(value);
        Objects.requireNonNull(description, "description of " + name);
    }
}
