package org.stellabar.table;

import java.util.Objects;

/**
 * Text: a name, a kind, a verdict.
 *
 * @param name ASCII identifier
 * @param value the text
 * @param description one line
 */
public record TextField(String name, String value, String description) implements Field {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name ASCII identifier
     * @param value the text
     * @param description one line
     */
    public TextField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(value, "value of " + name);
        Objects.requireNonNull(description, "description of " + name);
    }

    @Override
    public boolean scalar() {
        return true;
    }
}
