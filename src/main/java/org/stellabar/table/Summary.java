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

    /** @return the field with this name, if any */
    public Optional<Field> field(String fieldName) {
        return fields.stream().filter(f -> f.name().equals(fieldName)).findFirst();
    }

    /** @return the numeric value of a field */
    public double number(String fieldName) {
        Object v = field(fieldName).orElseThrow(() -> new IllegalArgumentException("no field " + fieldName)).value();
        return ((Number) v).doubleValue();
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

        /** Adds a number with unit and description. */
        public Builder number(String fieldName, double value, String unit, String description) {
            fields.add(new Field(fieldName, value, unit, description));
            return this;
        }

        /** Adds an integer. */
        public Builder integer(String fieldName, long value, String description) {
            fields.add(new Field(fieldName, value, "", description));
            return this;
        }

        /** Adds text. */
        public Builder text(String fieldName, String value, String description) {
            fields.add(new Field(fieldName, value, "", description));
            return this;
        }

        /** Adds a flag. */
        public Builder flag(String fieldName, boolean value, String description) {
            fields.add(new Field(fieldName, value, "", description));
            return this;
        }

        /** Adds any supported value. */
        public Builder field(String fieldName, Object value, String unit, String description) {
            fields.add(new Field(fieldName, value, unit, description));
            return this;
        }

        /** @return the summary */
        public Summary build() {
            return new Summary(name, metadata, fields);
        }
    }
}
