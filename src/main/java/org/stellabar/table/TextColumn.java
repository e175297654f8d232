package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * A column of text, such as star names or verdicts.
 *
 * @param name ASCII identifier
 * @param description one line
 * @param values the values
 */
public record TextColumn(String name, String description, List<String> values) implements Column {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param name ASCII identifier
     * @param description one line
     * @param values the values
     */
    public TextColumn {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        values = List.copyOf(values);
    }

    @Override
    public String unit() {
        return "";
    }

    @Override
    public int size() {
        return values.size();
    }
}
