package org.stellabar.charts;

import java.util.Objects;

/**
 * One axis of a chart: what it shows, in which unit, on which scale, and optionally a fixed
 * range.
 *
 * @param label the quantity in {@link ScriptedText} markup, e.g. "ρ", "Γ_1", "1 − β", "r/R"
 * @param unit a table unit string ("g/cm3", "Msun") or markup ("g cm^{-3}"); "" if dimensionless
 * @param scale linear or logarithmic
 * @param lower the lower end of a fixed range, or NaN for a range fitted to the content
 * @param upper the upper end of a fixed range, or NaN for a range fitted to the content
 * @param reversed true to draw values increasing to the left (or downwards)
 */
public record Axis(String label, String unit, AxisScale scale, double lower, double upper, boolean reversed) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param label the quantity in {@link ScriptedText} markup, e.g. "ρ", "Γ_1", "1 − β", "r/R"
     * @param unit a table unit string ("g/cm3", "Msun") or markup ("g cm^{-3}"); "" if dimensionless
     * @param scale linear or logarithmic
     * @param lower the lower end of a fixed range, or NaN for a range fitted to the content
     * @param upper the upper end of a fixed range, or NaN for a range fitted to the content
     * @param reversed true to draw values increasing to the left (or downwards)
     */
    public Axis {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(scale, "scale");
        ScriptedText.parse(label);
        ScriptedText.parse(UnitText.typeset(unit));
        boolean fixed = !Double.isNaN(lower) || !Double.isNaN(upper);
        if (fixed) {
            if (!Double.isFinite(lower) || !Double.isFinite(upper) || !(lower < upper)) {
                throw new IllegalArgumentException("axis " + label + ": range [" + lower + ", " + upper
                        + "] must be two finite numbers with lower < upper");
            }
            if (scale == AxisScale.LOG && lower <= 0) {
                throw new IllegalArgumentException("axis " + label + ": a logarithmic range must start above 0, not at "
                        + lower);
            }
        }
    }

    /**
     * An axis drawn the usual way round (values increasing to the right or upwards).
     *
     * @param label axis label in the charts' markup
     * @param unit unit as the unit table spells it, "" for none
     * @param scale linear or logarithmic
     * @param lower lower end of a fixed range, or NaN to fit the content
     * @param upper upper end of a fixed range, or NaN to fit the content
     */
    public Axis(String label, String unit, AxisScale scale, double lower, double upper) {
        this(label, unit, scale, lower, upper, false);
    }

    /**
     * @param label axis label in the charts' markup
     * @param unit unit as the unit table spells it, "" for none
     * @return a linear axis with a range fitted to the content
     */
    public static Axis linear(String label, String unit) {
        return new Axis(label, unit, AxisScale.LINEAR, Double.NaN, Double.NaN);
    }

    /**
     * @param label axis label in the charts' markup
     * @param unit unit as the unit table spells it, "" for none
     * @return a logarithmic axis with a range fitted to the content
     */
    public static Axis log(String label, String unit) {
        return new Axis(label, unit, AxisScale.LOG, Double.NaN, Double.NaN);
    }

    /**
     * @param newLower lower end, finite (above 0 on a logarithmic axis)
     * @param newUpper upper end, above newLower
     * @return this axis with a fixed range
     */
    public Axis withRange(double newLower, double newUpper) {
        return new Axis(label, unit, scale, newLower, newUpper, reversed);
    }

    /** @return this axis with values increasing to the left (or downwards), as T_eff on an HR diagram */
    public Axis withReversed() {
        return new Axis(label, unit, scale, lower, upper, true);
    }

    /** @return true if the range is fixed rather than fitted */
    public boolean hasFixedRange() {
        return !Double.isNaN(lower);
    }

    /** @return true on a logarithmic axis */
    public boolean isLog() {
        return scale == AxisScale.LOG;
    }

    /** @return the full axis title in markup: "label [unit]", or the label alone without a unit */
    public String title() {
        String u = UnitText.typeset(unit);
        return u.isEmpty() ? label : label + " [" + u + "]";
    }
}
