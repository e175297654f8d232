package org.stellabar.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stellabar.table.ColumnHeading;

/**
 * A profile source held column by column, as binary tables (FITS) deliver it: each column either
 * numbers (NaN where the file has a blank or null value) or text. Every row has every column.
 * Rows are numbered from 1 in file order.
 */
public final class ColumnarProfileSource implements ProfileSource {

    private final String name;
    private final List<ColumnHeading> headings;
    private final List<double[]> numbers;
    private final List<List<String>> texts;
    private final int rows;
    private final String recordedComposition;

    private ColumnarProfileSource(String name, List<ColumnHeading> headings, List<double[]> numbers,
            List<List<String>> texts, int rows, String recordedComposition) {
        this.name = name;
        this.recordedComposition = recordedComposition;
        this.headings = List.copyOf(headings);
        this.numbers = numbers;
        this.texts = texts;
        this.rows = rows;
    }

    /** Collects columns in order. */
    public static final class Builder {
        private final String name;
        private final int rows;
        private final List<ColumnHeading> headings = new ArrayList<>();
        private final List<double[]> numbers = new ArrayList<>();
        private final List<List<String>> texts = new ArrayList<>();
        private String recordedComposition;

        /**
         * @param name the file name, for messages
         * @param rows the number of rows
         */
        public Builder(String name, int rows) {
            this.name = Objects.requireNonNull(name, "name");
            this.rows = rows;
        }

        /**
         * @param heading name and unit (null unit: none stated)
         * @param values one number per row, NaN for a missing one
         * @return this builder
         */
        public Builder numbers(ColumnHeading heading, double[] values) {
            if (values.length != rows) {
                throw new IllegalArgumentException("column " + heading.name() + " has " + values.length + " rows, not " + rows);
            }
            headings.add(heading);
            numbers.add(values.clone());
            texts.add(null);
            return this;
        }

        /**
         * @param columnName the name
         * @param values one text per row
         * @return this builder
         */
        public Builder text(String columnName, List<String> values) {
            if (values.size() != rows) {
                throw new IllegalArgumentException("column " + columnName + " has " + values.size() + " rows, not " + rows);
            }
            headings.add(new ColumnHeading(columnName, null));
            numbers.add(null);
            texts.add(List.copyOf(values));
            return this;
        }

        /**
         * @param composition the composition the file records in its metadata, as written, or null
         * @return this builder
         */
        public Builder recordedComposition(String composition) {
            this.recordedComposition = composition == null || composition.isBlank() ? null : composition.strip();
            return this;
        }

        /** @return the source */
        public ColumnarProfileSource build() {
            return new ColumnarProfileSource(name, headings, new ArrayList<>(numbers), new ArrayList<>(texts), rows,
                    recordedComposition);
        }
    }

    @Override
    public Optional<String> recordedComposition() {
        return Optional.ofNullable(recordedComposition);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public List<ColumnHeading> headings() {
        return headings;
    }

    @Override
    public int rowCount() {
        return rows;
    }

    @Override
    public int rowNumber(int row) {
        return row + 1;
    }

    @Override
    public String where(int row) {
        return "row " + (row + 1);
    }

    @Override
    public int width(int row) {
        return headings.size();
    }

    @Override
    public String cell(int row, int column) {
        double[] n = numbers.get(column);
        if (n != null) {
            return Double.isNaN(n[row]) ? "" : Double.toString(n[row]);
        }
        return texts.get(column).get(row);
    }

    @Override
    public double number(int row, int column) {
        double[] n = numbers.get(column);
        if (n != null) {
            return Double.isFinite(n[row]) ? n[row] : Double.NaN;
        }
        return NumberCells.parse(texts.get(column).get(row));
    }
}
