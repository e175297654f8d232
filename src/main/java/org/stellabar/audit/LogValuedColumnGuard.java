package org.stellabar.audit;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
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

    /** What a column holds, which decides the rule it is judged by. */
    public enum Rule {
        /** A temperature [K]: every value below {@link #COLDEST_TEMPERATURE} reads as log10. */
        TEMPERATURE("K"),
        /** A pressure [dyn/cm2]: every value below {@link #LOWEST_PRESSURE}, or negative values within the log span. */
        PRESSURE("dyn/cm2"),
        /** Any other positive quantity (density, luminosity, radius, mass): negative values within the log span. */
        POSITIVE("");

        private final String unit;

        Rule(String unit) {
            this.unit = unit;
        }
    }

    /**
     * One column that looks like log10 values.
     *
     * @param column the column's name in the file
     * @param key the quantity's key, as {@code --log} takes it
     * @param finding what its values look like, e.g. "every value is below 100 K (largest 7.2 K)"
     */
    public record Finding(String column, String key, String finding) {
        /**
         * Canonical constructor: no component may be null.
         *
         * @param column the column's name in the file
         * @param key the quantity's key, as {@code --log} takes it
         * @param finding what its values look like, e.g. "every value is below 100 K (largest 7.2 K)"
         */
        public Finding {
            Objects.requireNonNull(column, "column");
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(finding, "finding");
        }

        /**
         * @return one line: the column, the finding, and the fix ({@code --log KEY}, the option that
         *     declares a column as log10 values)
         */
        public String message() {
            return "column '" + column + "' (" + key + "): " + finding + ", as log10 values would be;"
                    + " if it holds log10(" + key + "), declare it with --log " + key;
        }
    }

    private LogValuedColumnGuard() {
    }

    /**
     * @param source the table as read
     * @param columns the columns mapped to quantities (others than T, ρ and P are ignored)
     * @return the columns that look like log10 values, in the given order; empty when none does
     */
    public static List<Finding> inspect(ProfileSource source, Collection<MappedColumn> columns) {
        List<Finding> findings = new ArrayList<>();
        for (MappedColumn c : columns) {
            Rule rule = switch (c.quantity()) {
                case TEMPERATURE -> Rule.TEMPERATURE;
                case PRESSURE -> Rule.PRESSURE;
                case DENSITY -> Rule.POSITIVE;
                default -> null;
            };
            if (rule != null) {
                judge(rule, source, c.index(), c.factor()).ifPresent(
                        f -> findings.add(new Finding(c.column(), c.quantity().key(), f)));
            }
        }
        return List.copyOf(findings);
    }

    /**
     * Judges one column by one rule.
     *
     * @param rule what the column holds
     * @param source the table as read
     * @param column 0-based column index
     * @param factor multiplies the file's numbers into CGS
     * @return what the values look like, if they look like log10 values; empty otherwise (and for
     *     a column without a finite number)
     */
    public static Optional<String> judge(Rule rule, ProfileSource source, int column, double factor) {
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        for (int row = 0; row < source.rowCount(); row++) {
            if (column < source.width(row)) {
                double v = source.number(row, column) * factor;
                if (Double.isFinite(v)) {
                    lowest = Math.min(lowest, v);
                    highest = Math.max(highest, v);
                }
            }
        }
        if (!(lowest <= highest)) {
            return Optional.empty();
        }
        String unit = rule.unit.isEmpty() ? "" : " " + rule.unit;
        if (rule == Rule.TEMPERATURE && highest < COLDEST_TEMPERATURE) {
            return Optional.of("every value is below " + number(COLDEST_TEMPERATURE) + " K (largest "
                    + number(highest) + " K)");
        }
        if (rule == Rule.PRESSURE && highest < LOWEST_PRESSURE && lowest > 0.0) {
            return Optional.of("every value is below " + number(LOWEST_PRESSURE) + " dyn/cm2 (largest "
                    + number(highest) + " dyn/cm2)");
        }
        if (rule != Rule.TEMPERATURE && lowest < 0.0 && lowest >= -LOG_SPAN && highest <= LOG_SPAN) {
            return Optional.of("values are negative and all within " + number(-LOG_SPAN) + ".." + number(LOG_SPAN)
                    + " (from " + number(lowest) + " to " + number(highest) + unit + ")");
        }
        return Optional.empty();
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
        return String.format(Locale.US, "%.4g", value);
    }
}
