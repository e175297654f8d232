package org.stellabar.survey;

import java.util.Objects;
import org.stellabar.physics.BadInputException;

/**
 * One axis of a survey: {@code count} values of one input from {@code from} to {@code to}, both
 * included. {@code from} may exceed {@code to} (a descending axis).
 *
 * @param quantity what is swept
 * @param from the first value (CGS, or a pure number)
 * @param to the last value
 * @param count number of values, 1 to {@link #MAX_COUNT} (1: only {@code from}, and {@code to}
 *     must equal it)
 * @param spacing linear or logarithmic steps
 */
public record SurveyAxis(AxisQuantity quantity, double from, double to, int count, AxisSpacing spacing) {

    /** Most values on one axis: 10⁴ × 10⁴ points would be far past any cluster's patience. */
    public static final int MAX_COUNT = 10_000;

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param quantity what is swept
     * @param from the first value (CGS, or a pure number)
     * @param to the last value
     * @param count number of values, 1 to {@link #MAX_COUNT} (1: only {@code from}, and {@code to}
     *     must equal it)
     * @param spacing linear or logarithmic steps
     */
    public SurveyAxis {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(spacing, "spacing");
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new BadInputException("axis " + quantity.word() + ": the ends must be finite");
        }
        if (count < 1 || count > MAX_COUNT) {
            throw new BadInputException("axis " + quantity.word() + ": count " + count + " is outside 1.." + MAX_COUNT);
        }
        if (count == 1 && from != to) {
            throw new BadInputException("axis " + quantity.word() + ": one value needs from = to");
        }
        if (count > 1 && from == to) {
            throw new BadInputException("axis " + quantity.word() + ": from = to gives " + count
                    + " equal values; give count = 1 or two different ends");
        }
        if (spacing == AxisSpacing.log && (from <= 0.0 || to <= 0.0)) {
            throw new BadInputException("axis " + quantity.word() + ": logarithmic steps need both ends positive");
        }
    }

    /**
     * The k-th value. Both ends are returned exactly as given; logarithmic steps are taken as
     * from·(to/from)^(k/(count−1)), which has no cancellation for ends of the same sign.
     *
     * @param k index, 0 to count − 1
     * @return the value
     */
    public double value(int k) {
        if (k < 0 || k >= count) {
            throw new IndexOutOfBoundsException(k);
        }
        if (k == 0) {
            return from;
        }
        if (k == count - 1) {
            return to;
        }
        double f = (double) k / (count - 1);
        return spacing == AxisSpacing.log ? from * Math.pow(to / from, f) : from + (to - from) * f;
    }
}
