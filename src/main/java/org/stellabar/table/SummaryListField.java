package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * A list of summaries, such as validity warnings ({code, message} each). Writers that show an
 * item on one line show its field values joined in order.
 *
 * @param name ASCII identifier
 * @param value the summaries, copied
 * @param description one line
 */
public record SummaryListField(String name, List<Summary> value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param name ASCII identifier
     * @param value the summaries, copied
     * @param description one line
     */
    public SummaryListField {
        Objects.requireNonNull(name, "name");
        value = List.copyOf(value);
        Objects.requireNonNull(description, "description of " + name);
    }
}
