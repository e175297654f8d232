package org.stellabar.charts;

/** Which vertical axis a series or a horizontal reference line is measured on. */
public enum YAxisSide {
    /** The left axis, {@link ChartSpec#yAxis()}. */
    PRIMARY,
    /** The right axis, {@link ChartSpec#secondaryYAxis()}; the spec must have one. */
    SECONDARY
}
