package org.stellabar.charts;

/** How a series is drawn. */
public enum SeriesKind {
    /** A line through the points in the given order (a computed curve). */
    LINE,
    /** A marker at each point, no line (measured or published values, objects). */
    POINTS,
    /** A line with a marker at each point (a coarse sequence). */
    LINE_AND_POINTS,
    /** A closed outline through the points, its inside tinted with the line's colour (a region of a plane). */
    REGION;

    boolean hasLine() {
        return this != POINTS;
    }

    boolean hasMarkers() {
        return this == POINTS || this == LINE_AND_POINTS;
    }
}
