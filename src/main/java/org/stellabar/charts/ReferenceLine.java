package org.stellabar.charts;

import java.util.Objects;

/**
 * A straight line across the whole plot at a fixed value, with its label written beside it:
 * Γ1 = 4/3, a threshold temperature, zero residual.
 *
 * @param vertical true for a line at fixed x, false for a line at fixed y
 * @param value the fixed x or y, finite
 * @param label markup drawn at the line's end, "" for none
 * @param axis for a horizontal line, the vertical axis its value is measured on
 * @param stretchesRange true if a fitted axis range is widened to show the line; false for a
 *     limit the data may be far from, shown only where it lies within a quarter of the data's
 *     span ({@link AxisRanges})
 */
public record ReferenceLine(boolean vertical, double value, String label, YAxisSide axis, boolean stretchesRange) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param vertical true for a line at fixed x, false for a line at fixed y
     * @param value the fixed x or y, finite
     * @param label markup drawn at the line's end, "" for none
     * @param axis for a horizontal line, the vertical axis its value is measured on
     * @param stretchesRange true if a fitted axis range is widened to show the line
     */
    public ReferenceLine {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(axis, "axis");
        ScriptedText.parse(label);
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("reference line \"" + label + "\" at " + value
                    + "; a chart takes finite numbers only");
        }
        if (vertical && axis != YAxisSide.PRIMARY) {
            throw new IllegalArgumentException("reference line \"" + label + "\" is vertical; only a horizontal line "
                    + "belongs to a vertical axis");
        }
    }

    /**
     * @param y the value on the primary y axis, finite
     * @param label the line's label, in the charts' markup
     * @return a line at fixed y on the primary axis
     */
    public static ReferenceLine horizontal(double y, String label) {
        return new ReferenceLine(false, y, label, YAxisSide.PRIMARY, true);
    }

    /**
     * @param x the value on the x axis, finite
     * @param label the line's label, in the charts' markup
     * @return a line at fixed x
     */
    public static ReferenceLine vertical(double x, String label) {
        return new ReferenceLine(true, x, label, YAxisSide.PRIMARY, true);
    }

    /** @return this horizontal line measured on the right-hand axis */
    public ReferenceLine onSecondaryAxis() {
        return new ReferenceLine(vertical, value, label, YAxisSide.SECONDARY, stretchesRange);
    }

    /** @return this line, shown only if the data come near it */
    public ReferenceLine ifInRange() {
        return new ReferenceLine(vertical, value, label, axis, false);
    }
}
