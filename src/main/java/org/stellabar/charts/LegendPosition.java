package org.stellabar.charts;

/**
 * Where the legend goes. Inside positions name the corner tried first: the legend never covers
 * data, and moves to another corner, or below the plot, where the one asked for is taken.
 */
public enum LegendPosition {
    /** No legend (e.g. one series, or every line labelled on the plot). */
    NONE,
    /**
     * Inside the plot, in the first corner (or edge middle) that covers no data; below the plot
     * if there is none. The default.
     */
    AUTO,
    /** Inside the plot area, top left corner. */
    INSIDE_TOP_LEFT,
    /** Inside the plot area, top right corner. */
    INSIDE_TOP_RIGHT,
    /** Inside the plot area, bottom left corner. */
    INSIDE_BOTTOM_LEFT,
    /** Inside the plot area, bottom right corner. */
    INSIDE_BOTTOM_RIGHT,
    /** Below the plot area, items side by side. */
    BELOW,
    /** Right of the plot area, items stacked. */
    RIGHT
}
