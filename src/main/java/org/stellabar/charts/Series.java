package org.stellabar.charts;

import java.util.List;
import java.util.Objects;
import org.stellabar.table.NumberColumn;

/**
 * One set of points on a chart, built by the caller.
 *
 * <p>Every coordinate must be finite: NaN or an infinity is refused here, with the series and the
 * point named, so that nothing undefined ever reaches a figure. Values a logarithmic axis cannot
 * show (zero, negative) are allowed and left out when the chart is drawn.
 *
 * @param label the legend text in {@link ScriptedText} markup; "" keeps the series out of the
 *     legend
 * @param x the x values, copied in and out
 * @param y the y values, copied in and out, as many as x
 * @param kind line, markers, or both
 * @param axis the vertical axis the y values are measured on
 * @param pointLabels one markup text per point drawn beside its marker (e.g. object names), or
 *     an empty list for none; a "" entry leaves that point unlabelled
 * @param styleSlot which colour, dash and marker shape to use (0, 1, 2 … cycle through the
 *     style), or −1 for automatic: the automatic series take slots 0, 1, 2 … in the order they
 *     are given, so an explicit slot k gives the look of the k-th automatic series (e.g. star
 *     markers in the colour of the model curve)
 */
public record Series(String label, double[] x, double[] y, SeriesKind kind, YAxisSide axis,
        List<String> pointLabels, int styleSlot) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies arrays in; copies collections in.
     *
     * @param label the legend text in {@link ScriptedText} markup; "" keeps the series out of the
     *        legend
     * @param x the x values, copied in and out
     * @param y the y values, copied in and out, as many as x
     * @param kind line, markers, or both
     * @param axis the vertical axis the y values are measured on
     * @param pointLabels one markup text per point drawn beside its marker (e.g. object names), or
     *        an empty list for none; a "" entry leaves that point unlabelled
     * @param styleSlot which colour, dash and marker shape to use (0, 1, 2 … cycle through the
     *        style), or −1 for automatic: the automatic series take slots 0, 1, 2 … in the order they
     *        are given, so an explicit slot k gives the look of the k-th automatic series (e.g. star
     *        markers in the colour of the model curve)
     */
    public Series {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(axis, "axis");
        ScriptedText.parse(label);
        x = x.clone();
        y = y.clone();
        pointLabels = List.copyOf(pointLabels);
        String name = label.isEmpty() ? "(unlabelled series)" : "series \"" + label + "\"";
        if (x.length != y.length) {
            throw new IllegalArgumentException(name + " has " + x.length + " x values but " + y.length
                    + " y values");
        }
        if (x.length == 0) {
            throw new IllegalArgumentException(name + " has no points");
        }
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                throw new IllegalArgumentException(name + " point " + (i + 1) + " is (" + x[i] + ", " + y[i]
                        + "); a chart takes finite numbers only");
            }
        }
        if (!pointLabels.isEmpty() && pointLabels.size() != x.length) {
            throw new IllegalArgumentException(name + " has " + pointLabels.size() + " point labels for "
                    + x.length + " points");
        }
        pointLabels.forEach(ScriptedText::parse);
        if (styleSlot < -1) {
            throw new IllegalArgumentException(name + ": style slot " + styleSlot + " must be -1 (automatic) or >= 0");
        }
    }

    /**
     * @param label legend label, in the charts' markup ("" for none)
     * @param x x values, finite
     * @param y y values, finite, as many as x
     * @return a line on the primary axis
     */
    public static Series line(String label, double[] x, double[] y) {
        return new Series(label, x, y, SeriesKind.LINE, YAxisSide.PRIMARY, List.of(), -1);
    }

    /**
     * @param label legend label, in the charts' markup ("" for none)
     * @param x x values, finite
     * @param y y values, finite, as many as x
     * @return markers on the primary axis
     */
    public static Series points(String label, double[] x, double[] y) {
        return new Series(label, x, y, SeriesKind.POINTS, YAxisSide.PRIMARY, List.of(), -1);
    }

    /**
     * @param label legend label, in the charts' markup ("" for none)
     * @param x the column on the x axis
     * @param y the column on the y axis, as long as x
     * @return a line through two table columns, on the primary axis
     */
    public static Series line(String label, NumberColumn x, NumberColumn y) {
        return line(label, x.values(), y.values());
    }

    /**
     * @param label legend label, in the charts' markup ("" for none)
     * @param x the column on the x axis
     * @param y the column on the y axis, as long as x
     * @return markers at the rows of two table columns, on the primary axis
     */
    public static Series points(String label, NumberColumn x, NumberColumn y) {
        return points(label, x.values(), y.values());
    }

    /**
     * @param newKind line, markers or both
     * @return this series drawn another way
     */
    public Series withKind(SeriesKind newKind) {
        return new Series(label, x, y, newKind, axis, pointLabels, styleSlot);
    }

    /** @return this series measured on the right-hand axis */
    public Series onSecondaryAxis() {
        return new Series(label, x, y, kind, YAxisSide.SECONDARY, pointLabels, styleSlot);
    }

    /**
     * @param labels one text per point, in point order
     * @return this series with a text beside each point
     */
    public Series withPointLabels(List<String> labels) {
        return new Series(label, x, y, kind, axis, labels, styleSlot);
    }

    /**
     * @param slot style slot (see {@link ChartStyle#colour(int)})
     * @return this series in a fixed style slot
     */
    public Series withStyleSlot(int slot) {
        return new Series(label, x, y, kind, axis, pointLabels, slot);
    }

    /** @return a copy of the {@code x} component, so that this record stays unchanged */
    @Override
    public double[] x() {
        return x.clone();
    }

    /** @return a copy of the {@code y} component, so that this record stays unchanged */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** @return the number of points */
    public int size() {
        return x.length;
    }

    /** @return x of point i without copying */
    double xAt(int i) {
        return x[i];
    }

    /** @return y of point i without copying */
    double yAt(int i) {
        return y[i];
    }

    // Records compare arrays by identity; compare contents, as a value should.
    @Override
    public boolean equals(Object o) {
        return o instanceof Series s && label.equals(s.label) && java.util.Arrays.equals(x, s.x)
                && java.util.Arrays.equals(y, s.y) && kind == s.kind && axis == s.axis
                && pointLabels.equals(s.pointLabels) && styleSlot == s.styleSlot;
    }

    @Override
    public int hashCode() {
        return Objects.hash(label, java.util.Arrays.hashCode(x), java.util.Arrays.hashCode(y), kind, axis,
                pointLabels, styleSlot);
    }

    @Override
    public String toString() {
        return "Series[" + label + ", " + x.length + " points, " + kind + ", " + axis + "]";
    }
}
