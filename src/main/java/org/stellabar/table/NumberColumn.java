package org.stellabar.table;

import java.util.Objects;

/**
 * A column of finite doubles. Non-finite values are refused here, so that no writer ever has to
 * decide how to print NaN or Infinity.
 *
 * @param name ASCII identifier
 * @param unit unit string (see the package documentation), "" if dimensionless
 * @param description one line
 * @param values the values, copied in and out
 */
public record NumberColumn(String name, String unit, String description, double[] values) implements Column {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies arrays in.
     *
     * @param name ASCII identifier
     * @param unit unit string (see the package documentation), "" if dimensionless
     * @param description one line
     * @param values the values, copied in and out
     */
    public NumberColumn {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(description, "description");
        values = values.clone();
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalStateException("column " + name + " row " + (i + 1) + " is " + values[i]
                        + "; a table holds finite numbers only");
            }
        }
    }

    /** @return the column's name, unit and description as a declaration */
    public Quantity quantity() {
        return new Quantity(name, unit, description);
    }

    /** @return a copy of the {@code values} component, so that this record stays unchanged */
    @Override
    public double[] values() {
        return values.clone();
    }

    /**
     * @param i row, 0-based
     * @return the value in row i (0-based), without copying the array
     */
    public double get(int i) {
        return values[i];
    }

    @Override
    public int size() {
        return values.length;
    }
}
