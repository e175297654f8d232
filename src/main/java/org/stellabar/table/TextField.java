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
