package org.stellabar.charts;

/**
 * Decides the range each axis shows, before JFreeChart sees any data. The range covers every
 * point that can be shown and every reference line, with a small margin; a fixed range from the
 * {@link Axis} wins. On a logarithmic axis, zero and negative values cannot be shown and are left
 * out here, so they never reach the axis (JFreeChart's own log autorange would otherwise start
 * at a non-positive bound). A point counts only if both its coordinates can be shown.
 */
final class AxisRanges {

    /** Fraction of the span (of log10 on a log axis) left free at each end. */
    static final double MARGIN = 0.035;

    /**
     * A shown range.
     *
     * @param lower lower end, positive on a log axis
     * @param upper upper end, above lower
     */
    record Shown(double lower, double upper) {
    }

    /**
     * Smallest span of a linear axis, relative to its values: data spread less than this (β of a
     * radiation-dominated star, uniform to 1e-12; ∇_ad within 1e-4 of 1/4) are drawn as the
     * near-constant they are, on an axis whose tick labels stay distinct in four digits.
     */
    static final double MIN_SPAN = 1e-3;

    /** How far beside the data, as a fraction of their span, a non-stretching line is still shown. */
    static final double REACH = 0.25;

    private final Shown x;
    private final Shown y;
    private final Shown secondaryY;

    /** @param spec the chart */
    AxisRanges(ChartSpec spec) {
        this.x = shown(spec, spec.xAxis(), null);
        this.y = shown(spec, spec.yAxis(), YAxisSide.PRIMARY);
        this.secondaryY = spec.secondaryYAxis() == null ? null : shown(spec, spec.secondaryYAxis(), YAxisSide.SECONDARY);
    }

    /** @return the x range */
    Shown x() {
        return x;
    }

    /** @return the range of a vertical axis */
    Shown y(YAxisSide side) {
        return side == YAxisSide.PRIMARY ? y : secondaryY;
    }

    /**
     * @param axis an axis
     * @param v a value on it
     * @return true if the axis can show v (anything finite on a linear axis, positive on a log one)
     */
    static boolean showable(Axis axis, double v) {
        return Double.isFinite(v) && (!axis.isLog() || v > 0);
    }

    private static Shown shown(ChartSpec spec, Axis axis, YAxisSide side) {
        if (axis.hasFixedRange()) {
            return new Shown(axis.lower(), axis.upper());
        }
        boolean log = axis.isLog();
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (Series s : spec.series()) {
            if (side != null && s.axis() != side) {
                continue;
            }
            Axis sy = spec.yAxis(s.axis());
            for (int i = 0; i < s.size(); i++) {
                if (!showable(spec.xAxis(), s.xAt(i)) || !showable(sy, s.yAt(i))) {
                    continue;
                }
                double v = side == null ? s.xAt(i) : s.yAt(i);
                double t = log ? Math.log10(v) : v;
                min = Math.min(min, t);
                max = Math.max(max, t);
            }
        }
        for (ReferenceLine r : spec.referenceLines()) {
            boolean mine = side == null ? r.vertical() : !r.vertical() && r.axis() == side;
            if (mine && r.stretchesRange() && showable(axis, r.value())) {
                double t = log ? Math.log10(r.value()) : r.value();
                min = Math.min(min, t);
                max = Math.max(max, t);
            }
        }
        // a line that does not stretch the range still comes into view when it lies within a
        // quarter of the data's span: a limit just beside the data is worth the small room
        double reachLow = min - REACH * (max - min);
        double reachHigh = max + REACH * (max - min);
        for (ReferenceLine r : spec.referenceLines()) {
            boolean mine = side == null ? r.vertical() : !r.vertical() && r.axis() == side;
            if (mine && !r.stretchesRange() && showable(axis, r.value())) {
                double t = log ? Math.log10(r.value()) : r.value();
                if (t >= reachLow && t <= reachHigh) {
                    min = Math.min(min, t);
                    max = Math.max(max, t);
                }
            }
        }
        if (min > max) {
            // nothing to show: an empty frame with a plain range, rather than a failure
            min = 0;
            max = 1;
        } else if (min == max || log && max - min < 1e-9) {
            // one value: a plain margin round it
            double pad = log ? 0.5 : (min == 0 ? 1 : 0.1 * Math.abs(min));
            min -= pad;
            max += pad;
        } else if (!log && max - min < MIN_SPAN * Math.max(Math.abs(min), Math.abs(max))) {
            // (nearly) constant data: a span of a thousandth of the value, centred on the data,
            // so that tick labels need at most four digits and noise is not blown up; a span of
            // ±10 % would put β = 0.975 beside impossible values above 1
            double centre = 0.5 * (min + max);
            double half = 0.5 * MIN_SPAN * Math.abs(centre);
            min = centre - half;
            max = centre + half;
        } else {
            double pad = MARGIN * (max - min);
            min -= pad;
            max += pad;
        }
        return log ? new Shown(Math.pow(10, min), Math.pow(10, max)) : new Shown(min, max);
    }
}
