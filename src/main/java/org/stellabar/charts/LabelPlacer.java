package org.stellabar.charts;

import java.awt.geom.Line2D;
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
 * geometry in Java2D units (points), deterministic; a search with inputs seen before in this
 * process (the same chart in another format) is looked up, not repeated ({@link PlacementMemo}).
 */
public final class LabelPlacer {

    /** Rings of candidates tried around each marker. */
    public static final int RINGS = 40;

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
        /**
         * Canonical constructor: no component may be null.
         *
         * @param box where it goes
         * @param detached true if it sits beyond the first ring (drawn with a leader line)
         * @param overlapping true if no candidate was free and the least-overlapping one was taken
         */
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
        if (x.length == 0) {
            // nothing to place: the search would leave the obstacles as they are, after copying
            // and re-filing every data segment three times (most charts label no points)
            return List.of();
        }
        double[] seen = obstacles.fingerprint();
        int n = x.length;
        double[] inputs = new double[3 + 4 * n + seen.length];
        inputs[0] = n;
        inputs[1] = markerRadius;
        inputs[2] = gap;
        System.arraycopy(x, 0, inputs, 3, n);
        System.arraycopy(y, 0, inputs, 3 + n, n);
        System.arraycopy(widths, 0, inputs, 3 + 2 * n, n);
        System.arraycopy(heights, 0, inputs, 3 + 3 * n, n);
        System.arraycopy(seen, 0, inputs, 3 + 4 * n, seen.length);
        DataObstacles start = obstacles.copy();
        PlacementMemo.Outcome outcome = PlacementMemo.placed(new PlacementMemo.Key(inputs),
                () -> search(x.clone(), y.clone(), widths.clone(), heights.clone(), markerRadius, gap, start));
        obstacles.replaceWith(outcome.after());
        return outcome.placements();
    }

    /** The search itself: places the labels among the obstacles, which it adds to. */
    private static PlacementMemo.Outcome search(double[] x, double[] y, double[] widths, double[] heights,
            double markerRadius, double gap, DataObstacles obstacles) {
        int n = x.length;
        int[] order = java.util.stream.IntStream.range(0, n).toArray();
        List<Placement> best = null;
        DataObstacles bestObstacles = null;
        long bestFailures = Long.MAX_VALUE;
        double bestLeaders = Double.MAX_VALUE;
        // greedy placement, then again with the labels that found no free place going first,
        // keeping the attempt with fewest such labels. An order tried before would give the
        // same placement and lead to the same next orders (the search is deterministic), so the
        // attempts stop there: nothing they could find is new
        java.util.Set<java.util.List<Integer>> tried = new java.util.HashSet<>();
        for (int attempt = 0; attempt < ATTEMPTS && bestFailures > 0
                && tried.add(java.util.Arrays.stream(order).boxed().toList()); attempt++) {
            DataObstacles o = obstacles.copy();
            List<Placement> p = placeInOrder(x, y, widths, heights, markerRadius, gap, o, order);
            long failures = p.stream().filter(Placement::overlapping).count();
            double leaders = 0.0;
            for (int i = 0; i < n; i++) {
                Line2D l = leader(x[i], y[i], p.get(i).box());
                leaders += l.getP1().distance(l.getP2());
            }
            // fewest labels without a free place; of equals, the shortest leader lines
            if (failures < bestFailures || failures == bestFailures && leaders < bestLeaders) {
                bestFailures = failures;
                bestLeaders = leaders;
                best = p;
                bestObstacles = o;
            }
            int[] next = new int[n];
            int k = 0;
            for (int i : order) {
                if (p.get(i).overlapping()) {
                    next[k++] = i;
                }
            }
            for (int i : order) {
                if (!p.get(i).overlapping()) {
                    next[k++] = i;
                }
            }
            order = next;
        }
        if (bestObstacles != null) {
            obstacles.replaceWith(bestObstacles);
        }
        return new PlacementMemo.Outcome(best == null ? List.of() : best, obstacles);
    }

    /** Attempts at an order in which every label finds a free place. */
    static final int ATTEMPTS = 6;

    /** @return placements in input order, labels placed in the given order */
    private static List<Placement> placeInOrder(double[] x, double[] y, double[] widths, double[] heights,
            double markerRadius, double gap, DataObstacles obstacles, int[] order) {
        int n = x.length;
        List<Rectangle2D> markers = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Rectangle2D marker = new Rectangle2D.Double(x[i] - markerRadius, y[i] - markerRadius, 2 * markerRadius,
                    2 * markerRadius);
            markers.add(marker);
            obstacles.addBox(marker);
        }
        Placement[] placed = new Placement[n];
        for (int i : order) {
            Rectangle2D best = null;
            double bestOverlap = Double.MAX_VALUE;
            int bestRing = 0;
            boolean free = false;
            Rectangle2D crossed = null;
            int crossedRing = 0;
            search:
            for (int ring = 0; ring < RINGS; ring++) {
                double d = markerRadius + gap + ring * 0.5 * heights[i];
                for (Rectangle2D c : candidates(x[i], y[i], widths[i], heights[i], d)) {
                    // a box scoring at least the best so far can neither be free (the best
                    // is not, or the search would have ended) nor better: its score need not
                    // be finished
                    double overlap = obstacles.cost(c, bestOverlap);
                    if (ring > 0 && overlap < FREE) {
                        // a moved label's leader line should not run through other labels,
                        // markers or leaders; failing that, the first free box whose leader does
                        if (crossed == null) {
                            crossed = c;
                            crossedRing = ring;
                        }
                        overlap += obstacles.crossing(leader(x[i], y[i], c), markers.get(i));
                    }
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
            if (!free && crossed != null) {
                best = crossed;
                bestRing = crossedRing;
                free = true;
            }
            obstacles.addBox(best);
            if (bestRing > 0) {
                obstacles.addLeader(leader(x[i], y[i], best));
            }
            placed[i] = new Placement(best, bestRing > 0, !free);
        }
        return List.of(placed);
    }

    /** @return the line from a marker's centre to the nearest point of a label's box */
    static Line2D leader(double px, double py, Rectangle2D box) {
        double cx = Math.max(box.getMinX(), Math.min(px, box.getMaxX()));
        double cy = Math.max(box.getMinY(), Math.min(py, box.getMaxY()));
        return new Line2D.Double(px, py, cx, cy);
    }

    /**
     * Candidate boxes at distance d from the marker in sixteen directions, right first, then
     * alternating above and below outwards to the left: each box touches the circle of radius d
     * with its nearest edge or corner.
     */
    private static List<Rectangle2D> candidates(double px, double py, double w, double h, double d) {
        List<Rectangle2D> boxes = new ArrayList<>();
        // far out, sixteen directions leave gaps wider than a label: halve the step (and again)
        // until neighbouring candidates lie at most a label height and a half apart
        List<Double> angles = new ArrayList<>();
        for (double a : ANGLES) {
            angles.add(a);
        }
        for (double step = 22.5; 2 * Math.PI * d * step / 360 > 1.5 * h && step > 1; step /= 2) {
            for (double a : ANGLES) {
                angles.add(a + Math.copySign(step / 2, a == 0 ? 1 : a));
            }
        }
        for (double degrees : angles) {
            double c = Math.cos(Math.toRadians(degrees));
            double s = -Math.sin(Math.toRadians(degrees));
            double cx = px + c * d + (Math.abs(c) < 1e-9 ? 0.0 : Math.signum(c) * w / 2);
            double cy = py + s * d + (Math.abs(s) < 1e-9 ? 0.0 : Math.signum(s) * h / 2);
            boxes.add(new Rectangle2D.Double(cx - w / 2, cy - h / 2, w, h));
        }
        return boxes;
    }
}
