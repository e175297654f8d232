package org.stellabar.validation;

import org.stellabar.physics.BadInputException;

/**
 * How far our value may lie from a reference value: an absolute amount in the value's unit, or a
 * fraction of the reference value.
 *
 * @param amount the tolerance, positive and finite
 * @param relative true for a fraction of the reference, false for an absolute amount
 */
public record Tolerance(double amount, boolean relative) {

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param amount the tolerance, positive and finite
     * @param relative true for a fraction of the reference, false for an absolute amount
     */
    public Tolerance {
        if (!(amount > 0.0) || !Double.isFinite(amount)) {
            throw new BadInputException("tolerance " + amount + " is not allowed; it must be positive and finite");
        }
    }

    /**
     * @param amount largest allowed |computed − reference|, in the value's unit
     * @return an absolute tolerance
     */
    public static Tolerance absolute(double amount) {
        return new Tolerance(amount, false);
    }

    /**
     * @param fraction largest allowed |computed/reference − 1|
     * @return a relative tolerance
     */
    public static Tolerance relativeTo(double fraction) {
        return new Tolerance(fraction, true);
    }

    /**
     * The deviation measured the way this tolerance is: |ours − reference|, divided by |reference|
     * for a relative tolerance.
     *
     * @param reference the reference value (non-zero for a relative tolerance)
     * @param ours our value
     * @return the deviation, or +∞ when ours is not finite
     */
    public double deviation(double reference, double ours) {
        if (!Double.isFinite(ours)) {
            return Double.POSITIVE_INFINITY;
        }
        double d = Math.abs(ours - reference);
        return relative ? d / Math.abs(reference) : d;
    }

    /** @return "abs" or "rel", as in the tables */
    public String kind() {
        return relative ? "rel" : "abs";
    }
}
