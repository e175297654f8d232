package org.stellabar.table;

import java.util.Objects;

/**
 * An input that is text: a name, a kind, a file, or a compound such as a composition
 * ("X = 0.7, Y = 0.28, Z = 0.02").
 *
 * @param name the input's name
 * @param text the text
 */
public record TextInput(String name, String text) implements Input {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name the input's name
     * @param text the text
     */
    public TextInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(text, "text of input " + name);
    }
}
