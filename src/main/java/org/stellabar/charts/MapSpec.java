package org.stellabar.charts;

import java.util.List;
import java.util.Objects;

/**
 * A map over a plane of two inputs: one value per grid node drawn as a coloured cell, a colour
 * bar, and optional contour segments (a stability boundary). Coordinates are as plotted: for a
 * logarithmic axis the caller passes log10 values and says so in the axis label.
 *
 * @param xLabel the x axis's label with its unit
 * @param yLabel the y axis's label with its unit
 * @param x the nodes' x coordinates (ascending or descending, evenly spaced as plotted)
 * @param y the nodes' y coordinates
 * @param values values[i][j] at (x[i], y[j]); NaN marks a node without a value (drawn grey)
 * @param scaleLabel the colour bar's label with its unit
 * @param diverging true to centre the colours on zero (a margin whose sign matters), false
 *     for a sequential scale
 * @param contour segments {x1, y1, x2, y2} to draw in black
 */
public record MapSpec(String xLabel, String yLabel, double[] x, double[] y, double[][] values, String scaleLabel,
        boolean diverging, List<double[]> contour) {

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param xLabel the x axis's label with its unit
     * @param yLabel the y axis's label with its unit
     * @param x the nodes' x coordinates (ascending or descending, evenly spaced as plotted)
     * @param y the nodes' y coordinates
     * @param values values[i][j] at (x[i], y[j]); NaN marks a node without a value (drawn grey)
     * @param scaleLabel the colour bar's label with its unit
     * @param diverging true to centre the colours on zero (a margin whose sign matters), false
     *     for a sequential scale
     * @param contour segments {x1, y1, x2, y2} to draw in black
     */
    public MapSpec {
        Objects.requireNonNull(xLabel, "xLabel");
        Objects.requireNonNull(yLabel, "yLabel");
        Objects.requireNonNull(scaleLabel, "scaleLabel");
        if (x.length < 1 || y.length < 1 || values.length != x.length) {
            throw new IllegalArgumentException("a map needs values[x.length][y.length]");
        }
        for (double[] column : values) {
            if (column.length != y.length) {
                throw new IllegalArgumentException("a map needs values[x.length][y.length]");
            }
        }
        contour = List.copyOf(contour);
    }
}
