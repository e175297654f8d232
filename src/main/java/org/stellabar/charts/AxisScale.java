package org.stellabar.charts;

/** How an axis maps values to length. */
public enum AxisScale {
    /** Equal steps in value give equal lengths. */
    LINEAR,
    /**
     * Equal factors give equal lengths (ticks at powers of ten). Values that are zero or
     * negative cannot be shown and are left out of the chart.
     */
    LOG
}
