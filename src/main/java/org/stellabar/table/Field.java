package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * One named value of a {@link Summary}: a finite number, an integer, text, a flag, a nested
 * summary, a list of summaries, or a table.
 *
 * @param name ASCII identifier, the JSON key
 * @param value a {@code Double}, {@code Long}, {@code String}, {@code Boolean}, {@link Summary},
 *     {@code List<Summary>}, {@code List<Long>} (e.g. row numbers) or {@link Table}
 * @param unit unit string, "" if none
 * @param description one line
 */
public record Field(String name, Object value, String unit, String description) {

    public Field {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(value, "value of " + name);
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(description, "description");
        if (value instanceof Double d && !Double.isFinite(d)) {
            throw new IllegalStateException("field " + name + " is " + d + "; a summary holds finite numbers only");
        }
        if (value instanceof List<?> list) {
            boolean summaries = list.stream().allMatch(Summary.class::isInstance);
            boolean integers = list.stream().allMatch(Long.class::isInstance);
            if (!summaries && !integers) {
                throw new IllegalArgumentException("field " + name + ": a list holds summaries or integers only");
            }
            value = List.copyOf(list);
        } else if (!(value instanceof Double || value instanceof Long || value instanceof String
                || value instanceof Boolean || value instanceof Summary || value instanceof Table)) {
            throw new IllegalArgumentException("field " + name + ": unsupported value type " + value.getClass());
        }
    }
}
