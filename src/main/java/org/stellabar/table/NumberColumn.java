package org.stellabar.table;

import java.util.Arrays;
import java.util.Objects;

/**
 * A column of finite doubles. Non-finite values are refused here, so that no writer ever has to
 * decide how to print NaN or Infinity. An integer column holds whole numbers only (at most
 * 2^53 in magnitude, so that each is exact as a double), and writers write them as integers.
 *
 * <p>Immutable: the public constructors copy the values in and {@link #values()} copies them out,
 * as a record of the project's would. It is a class rather than a record for one reason: a
 * producer that made an array for a column alone can hand it over without a copy
 * ({@link #taking}, {@link Table.Builder#numberTaking}). A table's columns are its largest objects
 * (a 10^6-point grid's fourteen are 112 MB), and on the virtual machines we run on the first
 * touch of fresh memory costs about a millisecond per megabyte (the kernel zeroes every page):
 * without the copies such a grid's peak memory fell from 443 to 325 MB, and its run to CSV took
 * 0.94 of the time (0.83 with its arrays also made on both cores: src/bench/README.md, "Sixth
 * pass").
 */
public final class NumberColumn implements Column {

    /** The largest magnitude below which every whole number is exact as a double: 2^53. */
    private static final double EXACT_INTEGERS = 9007199254740992.0;

    private final String name;
    private final String unit;
    private final String description;
    private final double[] values;
    private final boolean integer;

    /**
     * @param name ASCII identifier
     * @param unit unit string (see the package documentation), "" if dimensionless
     * @param description one line
     * @param values the values, copied
     * @param integer whether the values are whole numbers to be written as integers
     * @throws IllegalStateException when a value is not finite, or an integer column's value is not
     *     a whole number of at most 2^53
     */
    public NumberColumn(String name, String unit, String description, double[] values, boolean integer) {
        this(values.clone(), name, unit, description, integer);
    }

    /** The constructor that checks, for both ways in: {@code values} is kept as it is. */
    private NumberColumn(double[] values, String name, String unit, String description, boolean integer) {
        this.name = Objects.requireNonNull(name, "name");
        this.unit = Objects.requireNonNull(unit, "unit");
        this.description = Objects.requireNonNull(description, "description");
        this.values = Objects.requireNonNull(values, "values");
        this.integer = integer;
        if (!allAllowed(values, integer)) {
            refuseFirst(name, values, integer);
        }
    }

    /**
     * A column that keeps {@code values} itself instead of a copy: for a producer that made the
     * array for this column and lets go of it. The caller must not change the array afterwards.
     *
     * @param name ASCII identifier
     * @param unit unit string, "" if dimensionless
     * @param description one line
     * @param values the values, taken over
     * @param integer whether the values are whole numbers to be written as integers
     * @return the column
     * @throws IllegalStateException as {@link #NumberColumn(String, String, String, double[], boolean)}
     */
    public static NumberColumn taking(String name, String unit, String description, double[] values,
            boolean integer) {
        return new NumberColumn(values, name, unit, description, integer);
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

    /** @return the column's name: an ASCII identifier */
    @Override
    public String name() {
        return name;
    }

    /** @return the unit string, "" if dimensionless */
    @Override
    public String unit() {
        return unit;
    }

    /** @return one line: what the column holds */
    @Override
    public String description() {
        return description;
    }

    /** @return whether the values are whole numbers, to be written as integers */
    public boolean integer() {
        return integer;
    }

    /** @return a copy of the values, so that the column stays unchanged */
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

    /** Equal when name, unit, description, kind and every value (bit for bit, as {@link Arrays#equals(double[], double[])}) are. */
    @Override
    public boolean equals(Object other) {
        return other instanceof NumberColumn c && name.equals(c.name) && unit.equals(c.unit)
                && description.equals(c.description) && integer == c.integer && Arrays.equals(values, c.values);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, unit, description, integer, Arrays.hashCode(values));
    }

    @Override
    public String toString() {
        return "NumberColumn[" + name + (unit.isEmpty() ? "" : " [" + unit + "]") + ", " + values.length
                + (integer ? " integer" : "") + " rows]";
    }
}
