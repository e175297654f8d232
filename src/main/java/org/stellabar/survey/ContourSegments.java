package org.stellabar.survey;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a quantity sampled on a rectangular grid crosses a level: the line segments of marching
 * squares (Lorensen &amp; Cline 1987, in its two-dimensional form), with the crossing on each
 * cell edge found by linear interpolation between the two grid values. A cell with a missing
 * corner (a failed model, given as NaN here and nowhere else) has no segment. A saddle cell
 * (opposite corners on the same side) is resolved by the mean of its four corners.
 */
public final class ContourSegments {

    private ContourSegments() {
    }

    /**
     * @param x the grid's x coordinates, length nx (any monotonic order)
     * @param y the grid's y coordinates, length ny
     * @param values values[i][j] at (x[i], y[j]); NaN where there is no value
     * @param level the level
     * @return segments {x1, y1, x2, y2}
     */
    public static List<double[]> at(double[] x, double[] y, double[][] values, double level) {
        List<double[]> segments = new ArrayList<>();
        for (int i = 0; i + 1 < x.length; i++) {
            for (int j = 0; j + 1 < y.length; j++) {
                // corners counter-clockwise: (i,j) (i+1,j) (i+1,j+1) (i,j+1)
                double[] cx = {x[i], x[i + 1], x[i + 1], x[i]};
                double[] cy = {y[j], y[j], y[j + 1], y[j + 1]};
                double[] v = {values[i][j], values[i + 1][j], values[i + 1][j + 1], values[i][j + 1]};
                boolean missing = false;
                for (double c : v) {
                    missing |= Double.isNaN(c);
                }
                if (missing) {
                    continue;
                }
                List<double[]> crossings = new ArrayList<>();
                for (int e = 0; e < 4; e++) {
                    int a = e;
                    int b = (e + 1) % 4;
                    boolean aAbove = v[a] >= level;
                    boolean bAbove = v[b] >= level;
                    if (aAbove != bAbove) {
                        double t = (level - v[a]) / (v[b] - v[a]);
                        crossings.add(new double[] {cx[a] + t * (cx[b] - cx[a]), cy[a] + t * (cy[b] - cy[a])});
                    }
                }
                if (crossings.size() == 2) {
                    segments.add(segment(crossings.get(0), crossings.get(1)));
                } else if (crossings.size() == 4) {
                    double centre = (v[0] + v[1] + v[2] + v[3]) / 4.0;
                    boolean firstAbove = v[0] >= level;
                    // the centre on the first corner's side joins the edges around the other corners
                    if ((centre >= level) == firstAbove) {
                        segments.add(segment(crossings.get(0), crossings.get(1)));
                        segments.add(segment(crossings.get(2), crossings.get(3)));
                    } else {
                        segments.add(segment(crossings.get(3), crossings.get(0)));
                        segments.add(segment(crossings.get(1), crossings.get(2)));
                    }
                }
            }
        }
        return segments;
    }

    private static double[] segment(double[] a, double[] b) {
        return new double[] {a[0], a[1], b[0], b[1]};
    }
}
