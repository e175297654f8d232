package org.stellabar.survey;

/** How the values of a survey axis are spaced between its two ends, both included. */
public enum AxisSpacing {
    /** equal steps in the value */
    linear,
    /** equal steps in the logarithm of the value (both ends positive) */
    log
}
