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
        if (!allAllowed(values, integer)) {
            refuseFirst(name, values, integer);
        }
    }

    /** Names the first value refused. */
    private static void refuseFirst(String name, double[] values, boolean integer) {
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

    /** Values checked per task when a long column is checked on several threads. */
    private static final int CHUNK = 1 << 16;

    /**
     * Whether every value is finite (and, for an integer column, whole and at most 2^53): a long
     * column in chunks on all cores (a 10^6-point grid's sixteen columns were a tenth of a
     * second on one core, with the other idle).
     */
    private static boolean allAllowed(double[] values, boolean integer) {
        int chunks = (values.length + CHUNK - 1) / CHUNK;
        if (chunks <= 1) {
            return allAllowed(values, integer, 0, values.length);
        }
        return java.util.stream.IntStream.range(0, chunks).parallel()
                .allMatch(c -> allAllowed(values, integer, c * CHUNK, Math.min(values.length, (c + 1) * CHUNK)));
    }

    private static boolean allAllowed(double[] values, boolean integer, int from, int to) {
        for (int i = from; i < to; i++) {
            double v = values[i];
            // v − v is 0 for a finite v, NaN for NaN and ±Infinity
            if (v - v != 0.0 || integer && (v != Math.rint(v) || Math.abs(v) > EXACT_INTEGERS)) {
                return false;
            }
        }
        return true;
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
