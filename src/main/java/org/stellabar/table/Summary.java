package org.stellabar.table;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * An ordered record of named values with units: one state, a model's summary. Fields may nest
 * (a composition inside a state, a profile table inside a model summary).
 *
 * @param name a short identifier
 * @param metadata what and from where
 * @param fields the values in display order, names unique
 */
public record Summary(String name, Metadata metadata, List<Field> fields) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param name a short identifier
     * @param metadata what and from where
     * @param fields the values in display order, names unique
     */
    public Summary {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(metadata, "metadata");
        fields = List.copyOf(fields);
        Set<String> names = new LinkedHashSet<>();
        for (Field f : fields) {
            if (!names.add(f.name())) {
                throw new IllegalArgumentException("duplicate field " + f.name() + " in " + name);
            }
        }
    }

    /**
     * @param fieldName the field's name
     * @return the field with this name, if any
     */
    public Optional<Field> field(String fieldName) {
        return fields.stream().filter(f -> f.name().equals(fieldName)).findFirst();
    }

    /**
     * @param fieldName the name of a number or integer field
     * @return its value
     * @throws IllegalArgumentException if there is no such field or it holds no number
     */
    public double number(String fieldName) {
        Field f = require(fieldName);
        if (f instanceof NumberField n) {
            return n.value();
        } else if (f instanceof IntegerField i) {
            return i.value();
        }
        throw new IllegalArgumentException("field " + fieldName + " of " + name + " is not a number");
    }

    /**
     * @param fieldName the name of a table field
     * @return its table
     * @throws IllegalArgumentException if there is no such field or it holds no table
     */
    public Table table(String fieldName) {
        if (require(fieldName) instanceof TableField t) {
            return t.value();
        }
        throw new IllegalArgumentException("field " + fieldName + " of " + name + " is not a table");
    }

    private Field require(String fieldName) {
        return field(fieldName).orElseThrow(() -> new IllegalArgumentException("no field " + fieldName + " in " + name));
    }

    /** A builder collecting fields in order. */
    public static final class Builder {
        private final String name;
        private final Metadata metadata;
        private final List<Field> fields = new ArrayList<>();

        /**
         * @param name summary name
         * @param metadata metadata
         */
        public Builder(String name, Metadata metadata) {
            this.name = name;
            this.metadata = metadata;
        }

        /**
         * Adds a field of any kind.
         *
         * @param field the field, its name not yet used
         * @return this builder
         */
        public Builder add(Field field) {
            fields.add(Objects.requireNonNull(field, "field"));
            return this;
        }

        /**
         * Adds a finite number with unit ("" if dimensionless) and description.
         *
         * @param fieldName the field's name
         * @param value the value, finite
         * @param unit its unit as the unit table spells it
         * @param description one line: what it is
         * @return this builder
         */
        public Builder number(String fieldName, double value, String unit, String description) {
            return add(new NumberField(fieldName, value, unit, description));
        }

        /**
         * Adds a finite number declared by a {@link Quantity}.
         *
         * @param quantity the declared quantity
         * @param value the value in the quantity's unit, finite
         * @return this builder
         */
        public Builder number(Quantity quantity, double value) {
            return add(quantity.field(value));
        }

        /**
         * Adds an integer.
         *
         * @param fieldName the field's name
         * @param value the value
         * @param description one line: what it is
         * @return this builder
         */
        public Builder integer(String fieldName, long value, String description) {
            return add(new IntegerField(fieldName, value, description));
        }

        /**
         * Adds text.
         *
         * @param fieldName the field's name
         * @param value the text
         * @param description one line: what it is
         * @return this builder
         */
        public Builder text(String fieldName, String value, String description) {
            return add(new TextField(fieldName, value, description));
        }

        /**
         * Adds a flag.
         *
         * @param fieldName the field's name
         * @param value the flag
         * @param description one line: what it is
         * @return this builder
         */
        public Builder flag(String fieldName, boolean value, String description) {
            return add(new FlagField(fieldName, value, description));
        }

        /**
         * Adds a nested summary.
         *
         * @param fieldName the field's name
         * @param value the nested summary
         * @param description one line: what it is
         * @return this builder
         */
        public Builder nested(String fieldName, Summary value, String description) {
            return add(new NestedField(fieldName, value, description));
        }

        /**
         * Adds a list of summaries.
         *
         * @param fieldName the field's name
         * @param value the summaries, in order
         * @param description one line: what it is
         * @return this builder
         */
        public Builder summaries(String fieldName, List<Summary> value, String description) {
            return add(new SummaryListField(fieldName, value, description));
        }

        /**
         * Adds a list of integers.
         *
         * @param fieldName the field's name
         * @param value the integers, in order
         * @param description one line: what it is
         * @return this builder
         */
        public Builder integers(String fieldName, List<Long> value, String description) {
            return add(new IntegerListField(fieldName, value, description));
        }

        /**
         * Adds a table.
         *
         * @param fieldName the field's name
         * @param value the table
         * @param description one line: what it is
         * @return this builder
         */
        public Builder table(String fieldName, Table value, String description) {
            return add(new TableField(fieldName, value, description));
        }

        /** @return the summary */
        public Summary build() {
            return new Summary(name, metadata, fields);
        }
    }
}
