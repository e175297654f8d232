package org.stellabar.table;

import java.util.Objects;

/**
 * A column of finite doubles. Non-finite values are refused here, so that no writer ever has to
 * decide how to print NaN or Infinity. An integer column holds whole numbers only (at most
 * 2^53 in magnitude, so that each is exact as a double), and writers write them as integers.
 *
 * @param name ASCII identifier
 * @param unit unit string (see the package documentation), "" if dimensionless
 * @param description one line
 * @param values the values, copied in and out
 * @param integer whether the values are whole numbers to be written as integers
 */
public record NumberColumn(String name, String unit, String description, double[] values, boolean integer)
        implements Column {

    /** The largest magnitude below which every whole number is exact as a double: 2^53. */
    private static final double EXACT_INTEGERS = 9007199254740992.0;

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies arrays in.
     *
     * @param name ASCII identifier
     * @param unit unit string (see the package documentation), "" if dimensionless
     * @param description one line
     * @param values the values, copied in and out
     * @param integer whether the values are whole numbers to be written as integers
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
            if (integer && (values[i] != Math.rint(values[i]) || Math.abs(values[i]) > EXACT_INTEGERS)) {
                throw new IllegalStateException("integer column " + name + " row " + (i + 1) + " is " + values[i]
                        + "; it holds whole numbers up to 2^53 only");
            }
        }
    }

    /**
     * A column of real numbers.
     *
     * @param name ASCII identifier
     * @param unit unit string, "" if dimensionless
     * @param description one line
     * @param values the values, copied
     */
    public NumberColumn(String name, String unit, String description, double[] values) {
        this(name, unit, description, values, false);
    }

    /** @return the column's name, unit, description and kind as a declaration */
    public Quantity quantity() {
        return new Quantity(name, unit, description, integer);
    }

    /**
     * @param i the row, 0-based
     * @return the value in row i of an integer column, as a long
     */
    public long getLong(int i) {
        return (long) values[i];
    }

    /** @return whether every value of an integer column fits a 32-bit signed integer */
    public boolean fitsInt32() {
        for (double v : values) {
            if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
                return false;
            }
        }
        return true;
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
