package org.stellabar.charts;

/** Where the legend goes. Inside positions sit in a corner of the plot area. */
public enum LegendPosition {
    /** No legend (e.g. one series, or every line labelled on the plot). */
    NONE,
    INSIDE_TOP_LEFT,
    INSIDE_TOP_RIGHT,
    INSIDE_BOTTOM_LEFT,
    INSIDE_BOTTOM_RIGHT,
    /** Below the plot area, items side by side. */
    BELOW,
    /** Right of the plot area, items stacked. */
    RIGHT
}
