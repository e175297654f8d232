package org.stellabar.table;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.BiConsumer;

/**
 * The inputs of a computation in a stable order, names unique: what {@link Metadata} says a
 * table or summary was computed from.
 *
 * <pre>{@code
 * Inputs inputs = Inputs.builder()
 *         .text("kind", "standard")
 *         .number("M", 7.95e34, "g", "total mass")
 *         .integer("points", 200, "profile rows")
 *         .build();
 * }</pre>
 *
 * @param list the inputs, copied
 */
public record Inputs(List<Input> list) implements Iterable<Input> {

    private static final Inputs NONE = new Inputs(List.of());

    /**
     * Canonical constructor: checks ranges and consistency; copies collections in.
     *
     * @param list the inputs, copied
     */
    public Inputs {
        list = List.copyOf(list);
        Set<String> names = new HashSet<>();
        for (Input i : list) {
            if (!names.add(i.name())) {
                throw new IllegalArgumentException("input " + i.name() + " given twice");
            }
        }
    }

    /** @return no inputs */
    public static Inputs none() {
        return NONE;
    }

    /** @return a builder collecting inputs in order */
    public static Builder builder() {
        return new Builder();
    }

    /** @return whether there are none */
    public boolean isEmpty() {
        return list.isEmpty();
    }

    /**
     * @param name the input's name
     * @return the input with this name, if any
     */
    public Optional<Input> get(String name) {
        return list.stream().filter(i -> i.name().equals(name)).findFirst();
    }

    @Override
    public Iterator<Input> iterator() {
        return list.iterator();
    }

    /**
     * Visits each input as a name and its one-line text ({@link Input#text()}), for writers of
     * prose such as a Markdown report.
     *
     * @param action receives name and text, in order
     */
    public void forEach(BiConsumer<String, String> action) {
        for (Input i : list) {
            action.accept(i.name(), i.text());
        }
    }

    /** Collects inputs in order. */
    public static final class Builder {
        private final List<Input> inputs = new ArrayList<>();

        private Builder() {
        }

        /**
         * Adds an input of any kind.
         *
         * @param input the input
         * @return this builder
         */
        public Builder add(Input input) {
            inputs.add(input);
            return this;
        }

        /**
         * Adds a finite number in {@code unit} ("" if none).
         *
         * @param name the input's name
         * @param value the value, finite
         * @param unit its unit as the unit table spells it
         * @param description one line: what it is
         * @return this builder
         */
        public Builder number(String name, double value, String unit, String description) {
            return add(new NumberInput(name, value, unit, description));
        }

        /**
         * Adds a finite number of a declared quantity, under the quantity's name, unit and description.
         *
         * @param quantity the declared quantity
         * @param value the value in the quantity's unit, finite
         * @return this builder
         */
        public Builder number(Quantity quantity, double value) {
            return add(new NumberInput(quantity.name(), value, quantity.unit(), quantity.description()));
        }

        /**
         * Adds a whole number.
         *
         * @param name the input's name
         * @param value the value
         * @param description one line: what it is
         * @return this builder
         */
        public Builder integer(String name, long value, String description) {
            return add(new IntegerInput(name, value, description));
        }

        /**
         * Adds text.
         *
         * @param name the input's name
         * @param text the text
         * @return this builder
         */
        public Builder text(String name, String text) {
            return add(new TextInput(name, text));
        }

        /** @return the inputs */
        public Inputs build() {
            return new Inputs(inputs);
        }
    }
}
