package org.stellabar.charts;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Places point labels so that no two overlap and none covers a marker: a greedy search, label by
 * label in the order given, over candidate boxes on rings around the label's marker (sixteen
 * directions, right and left first; each ring half a label height further out), taking the first
 * that stays inside the plot and clear of every marker and every label placed before it. When no
 * ring up to {@link #RINGS} has room, the candidate with the least overlap is taken (a crowded
 * plot cannot always be labelled cleanly; the test of each figure checks that ours can). Pure
 * geometry in Java2D units (points), deterministic.
 */
public final class LabelPlacer {

    /** Rings of candidates tried around each marker. */
    public static final int RINGS = 12;

    /** Directions of the candidates on a ring, in degrees counter-clockwise from the right. */
    private static final double[] ANGLES = {0, 180, 22.5, -22.5, 157.5, -157.5, 45, -45, 135, -135, 67.5, -67.5,
        112.5, -112.5, 90, -90};

    /**
     * A placed label.
     *
     * @param box where it goes
     * @param detached true if it sits beyond the first ring (drawn with a leader line)
     * @param overlapping true if no candidate was free and the least-overlapping one was taken
     */
    public record Placement(Rectangle2D box, boolean detached, boolean overlapping) {
        public Placement {
            Objects.requireNonNull(box, "box");
        }
    }

    /** Overlap [pt²] below which a candidate counts as free. */
    private static final double FREE = DataObstacles.FREE;

    private LabelPlacer() {
    }

    /**
     * @param x markers' centres, x [pt]
     * @param y markers' centres, y [pt] (downwards)
     * @param widths labels' widths [pt]
     * @param heights labels' heights [pt]
     * @param markerRadius half the marker's size [pt]
     * @param gap space between a marker and its label [pt]
     * @param area where labels may go
     * @return one placement per label, in input order
     */
    public static List<Placement> place(double[] x, double[] y, double[] widths, double[] heights, double markerRadius,
            double gap, Rectangle2D area) {
        return place(x, y, widths, heights, markerRadius, gap, new DataObstacles(area, 0.0));
    }

    /**
     * Places the labels among other things already on the plot.
     *
     * @param obstacles what the labels must not cover (data lines, markers, text placed before);
     *     each marker of the labelled points and each label placed is added to it
     * @return one placement per label, in input order
     */
    static List<Placement> place(double[] x, double[] y, double[] widths, double[] heights, double markerRadius,
            double gap, DataObstacles obstacles) {
        int n = x.length;
        for (int i = 0; i < n; i++) {
            obstacles.addBox(new Rectangle2D.Double(x[i] - markerRadius, y[i] - markerRadius, 2 * markerRadius,
                    2 * markerRadius));
        }
        List<Placement> placed = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Rectangle2D best = null;
            double bestOverlap = Double.MAX_VALUE;
            int bestRing = 0;
            boolean free = false;
            search:
            for (int ring = 0; ring < RINGS; ring++) {
                double d = markerRadius + gap + ring * 0.5 * heights[i];
                for (Rectangle2D c : candidates(x[i], y[i], widths[i], heights[i], d)) {
                    double overlap = obstacles.cost(c);
                    if (overlap < FREE) {
                        best = c;
                        bestRing = ring;
                        free = true;
                        break search;
                    }
                    if (overlap < bestOverlap) {
                        bestOverlap = overlap;
                        best = c;
                        bestRing = ring;
                    }
                }
            }
            obstacles.addBox(best);
            placed.add(new Placement(best, bestRing > 0, !free));
        }
        return placed;
    }

    /**
     * Candidate boxes at distance d from the marker in sixteen directions, right first, then
     * alternating above and below outwards to the left: each box touches the circle of radius d
     * with its nearest edge or corner.
     */
    private static List<Rectangle2D> candidates(double px, double py, double w, double h, double d) {
        List<Rectangle2D> boxes = new ArrayList<>();
        for (double degrees : ANGLES) {
            double c = Math.cos(Math.toRadians(degrees));
            double s = -Math.sin(Math.toRadians(degrees));
            double cx = px + c * d + (Math.abs(c) < 1e-9 ? 0.0 : Math.signum(c) * w / 2);
            double cy = py + s * d + (Math.abs(s) < 1e-9 ? 0.0 : Math.signum(s) * h / 2);
            boxes.add(new Rectangle2D.Double(cx - w / 2, cy - h / 2, w, h));
        }
        return boxes;
    }
}
