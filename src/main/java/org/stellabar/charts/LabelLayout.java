package org.stellabar.charts;

/** How the point labels of a chart are placed: there is one way, kept as a value for callers that name it. */
public enum LabelLayout {
    /**
     * Every label of the chart placed so that no two labels overlap and no label covers a marker
     * or a data line ({@link LabelPlacer}); a label moved away from its marker is joined to it by
     * a thin line.
     */
    APART
}
