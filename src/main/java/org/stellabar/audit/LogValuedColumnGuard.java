package org.stellabar.audit;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.stream.Collectors;

/**
 * Recognises mapped columns that look like log10 values read as linear ones: a profile whose
 * temperatures, densities or pressures were written as logarithms (as evolution codes often do)
 * and read without saying so. Read as linear numbers such columns still audit to the end, and
 * describe a star that is cold, degenerate, Coulomb-coupled and unstable; the command line warns
 * (or refuses, under {@code --strict}) instead, naming the column and the likely fix.
 *
 * <p>The rules, on every finite cell of the column converted to CGS (rows that the audit would
 * refuse count too, so that the hint comes before the row errors):
 * <ul>
 *   <li>Temperature: every value below {@value #COLDEST_TEMPERATURE} K. The gas + radiation
 *       description of a stellar interior starts far above it (photospheres of the coolest brown
 *       dwarfs have a few hundred K, from memory), while log10 of any stellar temperature is
 *       below 11.</li>
 *   <li>Pressure: every value below {@value #LOWEST_PRESSURE} dyn/cm2, where the solar photosphere
 *       has about 10⁵ dyn/cm2 (from memory) and log10 of any stellar pressure is below 40.</li>
 *   <li>Density or pressure: some values negative, and all within ±{@value #LOG_SPAN}, as log10
 *       of values from interstellar (10⁻²⁴ g/cm3) to nuclear (10¹⁵ g/cm3) densities would be
 *       (orders of magnitude common practice).</li>
 * </ul>
 * The thresholds flag logarithms, not unusual stars: a linear column passes unless no cell of it
 * belongs to a stellar interior. Nothing here prints; the caller reports.
 */
public final class LogValuedColumnGuard {

    /** Temperature [K] below which every cell of a column means log10(T) rather than T. */
    public static final double COLDEST_TEMPERATURE = 100.0;
    /** Pressure [dyn/cm2] below which every cell of a column means log10(P) rather than P. */
    public static final double LOWEST_PRESSURE = 100.0;
    /** |value| within which negative densities or pressures read like log10 values. */
    public static final double LOG_SPAN = 30.0;

    /**
     * One column that looks like log10 values.
     *
     * @param column the mapped column
     * @param finding what its values look like, e.g. "every value is below 100 K (largest 7.2 K)"
     */
    public record Finding(MappedColumn column, String finding) {
        /**
         * Canonical constructor: no component may be null.
         *
         * @param column the mapped column
         * @param finding what its values look like, e.g. "every value is below 100 K (largest 7.2 K)"
         */
        public Finding {
            Objects.requireNonNull(column, "column");
            Objects.requireNonNull(finding, "finding");
        }

        /**
         * @return one line: the column, the finding, and the fix ({@code --log KEY}, the option that
         *     declares a column as log10 values)
         */
        public String message() {
            String key = column.quantity().key();
            return "column '" + column.column() + "' (" + key + "): " + finding + ", as log10 values would be;"
                    + " if it holds log10(" + key + "), declare it with --log " + key;
        }
    }

    private LogValuedColumnGuard() {
    }

    /**
     * @param source the table as read
     * @param columns the columns mapped to quantities (others are ignored)
     * @return the columns that look like log10 values, in the given order; empty when none does
     */
    public static List<Finding> inspect(ProfileSource source, Collection<MappedColumn> columns) {
        List<Finding> findings = new ArrayList<>();
        for (MappedColumn c : columns) {
            ProfileQuantity q = c.quantity();
            if (q != ProfileQuantity.TEMPERATURE && q != ProfileQuantity.DENSITY && q != ProfileQuantity.PRESSURE) {
                continue;
            }
            double lowest = Double.POSITIVE_INFINITY;
            double highest = Double.NEGATIVE_INFINITY;
            int finite = 0;
            for (int row = 0; row < source.rowCount(); row++) {
                if (c.index() >= source.width(row)) {
                    continue;
                }
                double v = source.number(row, c.index()) * c.factor();
                if (Double.isFinite(v)) {
                    lowest = Math.min(lowest, v);
                    highest = Math.max(highest, v);
                    finite++;
                }
            }
            if (finite == 0) {
                continue;
            }
            String unit = q == ProfileQuantity.TEMPERATURE ? "K" : q == ProfileQuantity.DENSITY ? "g/cm3" : "dyn/cm2";
            if (q == ProfileQuantity.TEMPERATURE && highest < COLDEST_TEMPERATURE) {
                findings.add(new Finding(c, "every value is below " + number(COLDEST_TEMPERATURE) + " K (largest "
                        + number(highest) + " K)"));
            } else if (q == ProfileQuantity.PRESSURE && highest < LOWEST_PRESSURE && lowest > 0.0) {
                findings.add(new Finding(c, "every value is below " + number(LOWEST_PRESSURE) + " dyn/cm2 (largest "
                        + number(highest) + " dyn/cm2)"));
            } else if (q != ProfileQuantity.TEMPERATURE && lowest < 0.0 && lowest >= -LOG_SPAN
                    && highest <= LOG_SPAN) {
                findings.add(new Finding(c, "values are negative and all within " + number(-LOG_SPAN) + ".."
                        + number(LOG_SPAN) + " " + unit + " (from " + number(lowest) + " to " + number(highest) + ")"));
            }
        }
        return List.copyOf(findings);
    }

    /**
     * @param findings at least one finding
     * @return the findings' messages on one line, joined by "; "
     */
    public static String oneLine(List<Finding> findings) {
        return findings.stream().map(Finding::message).collect(Collectors.joining("; "));
    }

    private static String number(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e6) {
            return Long.toString((long) value);
        }
        return String.format(Locale.ROOT, "%.4g", value);
    }
}
