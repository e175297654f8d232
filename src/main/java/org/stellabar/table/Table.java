package org.stellabar.table;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Named columns of equal length with metadata: the end of every computation and the input of
 * every writer and chart.
 *
 * @param name a short file-name-safe identifier, e.g. "profile" or "grid"
 * @param metadata what and from where
 * @param columns the columns, all of one length, names unique
 */
public record Table(String name, Metadata metadata, List<Column> columns) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param name a short file-name-safe identifier, e.g. "profile" or "grid"
     * @param metadata what and from where
     * @param columns the columns, all of one length, names unique
     */
    public Table {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(metadata, "metadata");
        columns = List.copyOf(columns);
        Set<String> names = new LinkedHashSet<>();
        int rows = columns.isEmpty() ? 0 : columns.get(0).size();
        for (Column c : columns) {
            if (!names.add(c.name())) {
                throw new IllegalArgumentException("duplicate column " + c.name() + " in table " + name);
            }
            if (c.size() != rows) {
                throw new IllegalArgumentException("column " + c.name() + " has " + c.size() + " rows, not " + rows);
            }
        }
    }

    /** @return the number of rows */
    public int rowCount() {
        return columns.isEmpty() ? 0 : columns.get(0).size();
    }

    /**
     * @param columnName the column's name
     * @return the column with this name, if any
     */
    public Optional<Column> column(String columnName) {
        return columns.stream().filter(c -> c.name().equals(columnName)).findFirst();
    }

    /**
     * The numeric column with this name.
     *
     * @param columnName the name
     * @return the column
     * @throws IllegalArgumentException if there is none
     */
    public NumberColumn numbers(String columnName) {
        return column(columnName).filter(NumberColumn.class::isInstance).map(NumberColumn.class::cast)
                .orElseThrow(() -> new IllegalArgumentException("table " + name + " has no numeric column "
                        + columnName));
    }

    /**
     * The numeric column of a declared quantity.
     *
     * @param quantity the declaration; its name is looked up
     * @return the column
     * @throws IllegalArgumentException if there is none
     */
    public NumberColumn numbers(Quantity quantity) {
        return numbers(quantity.name());
    }

    /**
     * The same table with only some columns, in the order given (e.g. a narrower view for a
     * terminal).
     *
     * @param names column names, each present
     * @return a new table with the same name and metadata
     * @throws IllegalArgumentException if a name is missing
     */
    public Table select(String... names) {
        List<Column> picked = new ArrayList<>();
        for (String n : names) {
            picked.add(column(n).orElseThrow(() -> new IllegalArgumentException("table " + name + " has no column "
                    + n)));
        }
        return new Table(name, metadata, picked);
    }

    /** A builder that collects columns in order. */
    public static final class Builder {
        private final String name;
        private final Metadata metadata;
        private final List<Column> columns = new ArrayList<>();

        /**
         * @param name table name
         * @param metadata metadata
         */
        public Builder(String name, Metadata metadata) {
            this.name = name;
            this.metadata = metadata;
        }

        /**
         * Adds a numeric column.
         *
         * @param columnName the column's name
         * @param unit its unit as the unit table spells it
         * @param description one line: what it is
         * @param values one finite value per row
         * @return this builder
         */
        public Builder number(String columnName, String unit, String description, double[] values) {
            columns.add(new NumberColumn(columnName, unit, description, values));
            return this;
        }

        /**
         * Adds a numeric column declared by a {@link Quantity}.
         *
         * @param quantity the declared quantity
         * @param values one finite value per row, in the quantity's unit
         * @return this builder
         */
        public Builder number(Quantity quantity, double[] values) {
            columns.add(quantity.column(values));
            return this;
        }

        /**
         * Adds a numeric column declared by a {@link Quantity} that keeps {@code values} itself, not a
         * copy ({@link NumberColumn#taking}): for an array made for this column alone, such as a
         * 10^6-point grid's, which the caller does not change afterwards.
         *
         * @param quantity the declared quantity
         * @param values one finite value per row, in the quantity's unit; taken over
         * @return this builder
         */
        public Builder numberTaking(Quantity quantity, double[] values) {
            columns.add(NumberColumn.taking(quantity.name(), quantity.unit(), quantity.description(), values,
                    quantity.integer()));
            return this;
        }

        /**
         * Adds a text column.
         *
         * @param columnName the column's name
         * @param description one line: what it is
         * @param values one text per row
         * @return this builder
         */
        public Builder text(String columnName, String description, List<String> values) {
            columns.add(new TextColumn(columnName, description, values));
            return this;
        }

        /** @return the table */
        public Table build() {
            return new Table(name, metadata, columns);
        }
    }
}
