package org.stellabar.charts;

/** How the point labels of a chart are placed. */
public enum LabelLayout {
    /** Each label to the right of its marker (to the left at the right edge); labels may overlap. */
    BESIDE,
    /**
     * Every label of the chart placed so that no two labels overlap and no label covers a marker
     * ({@link LabelPlacer}); a label moved away from its marker is joined to it by a thin line.
     */
    APART
}
