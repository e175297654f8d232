package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class DataObstaclesTest {

    private static final Rectangle2D BOX = new Rectangle2D.Double(0, 0, 10, 10);

    // Closed forms: the diagonal of a 10 x 10 box is 10√2 long inside it; half a segment that
    // starts at the centre and leaves to the right lies inside; a segment beside the box, none.
    @Test
    void clippedLengthMatchesClosedForms() {
        assertEquals(10 * Math.sqrt(2), DataObstacles.clippedLength(new Line2D.Double(-5, -5, 15, 15), BOX), 1e-12);
        assertEquals(5, DataObstacles.clippedLength(new Line2D.Double(5, 5, 15, 5), BOX), 1e-12);
        assertEquals(0, DataObstacles.clippedLength(new Line2D.Double(11, 0, 11, 10), BOX), 0);
    }

    // A box clear of the data (by more than the clearance) costs nothing; one across a line, the
    // line's length inside it (with the clearance); one sticking out of the area, the area outside.
    @Test
    void costCountsLinesMarkersAndOverhang() {
        DataObstacles o = new DataObstacles(new Rectangle2D.Double(0, 0, 100, 100), 1.0);
        o.addSegment(new Line2D.Double(0, 50, 100, 50));
        o.addBox(new Rectangle2D.Double(80, 80, 4, 4));
        assertTrue(o.cost(new Rectangle2D.Double(10, 10, 20, 10)) < DataObstacles.FREE);
        assertEquals(22, o.cost(new Rectangle2D.Double(10, 45, 20, 10)), 1e-9);
        assertTrue(o.cost(new Rectangle2D.Double(78, 78, 4, 4)) > 1);
        assertEquals(50, o.cost(new Rectangle2D.Double(95, 10, 10, 10)), 1e-9);
    }

    // The grid index only chooses what to look at: on random scenes (lines across the plot and
    // beyond it, horizontal and vertical ones, markers, boxes far outside) every score equals,
    // bit for bit, a scan over all boxes and segments in the order added (the definition in the
    // class comment) with the clipping written as first, with arrays.
    @Test
    void indexedScoresEqualAFullScanBitForBit() {
        SplittableRandom random = new SplittableRandom(20261204L);
        for (int scene = 0; scene < 20; scene++) {
            Rectangle2D area = new Rectangle2D.Double(30 + random.nextDouble(20), 10, 200 + random.nextDouble(300),
                    150 + random.nextDouble(200));
            double clearance = scene % 2 == 0 ? 1.0 : 0.0;
            DataObstacles o = new DataObstacles(area, clearance);
            List<Rectangle2D> boxes = new ArrayList<>();
            List<Line2D> segments = new ArrayList<>();
            double x = area.getMinX() - 20;
            double y = area.getCenterY();
            for (int i = 0; i < 400; i++) {
                double nx = i % 11 == 0 ? x : x + random.nextDouble(-5, 15);
                double ny = i % 13 == 0 ? y : y + random.nextDouble(-25, 25);
                Line2D s = new Line2D.Double(x, y, nx, ny);
                segments.add(s);
                o.addSegment(s);
                x = nx;
                y = ny;
                if (i % 7 == 0) {
                    Rectangle2D b = new Rectangle2D.Double(nx - 2, ny - 2, 4, 4);
                    boxes.add(b);
                    o.addBox(b);
                }
                if (i % 50 == 0) {
                    Line2D leader = new Line2D.Double(nx, ny, nx + random.nextDouble(-60, 60),
                            ny + random.nextDouble(-60, 60));
                    segments.add(leader);
                    o.addLeader(leader);
                }
            }
            DataObstacles copy = o.copy();
            for (int q = 0; q < 300; q++) {
                Rectangle2D c = new Rectangle2D.Double(area.getMinX() + random.nextDouble(-80, area.getWidth() + 40),
                        area.getMinY() + random.nextDouble(-80, area.getHeight() + 40), 5 + random.nextDouble(80),
                        5 + random.nextDouble(20));
                double expected = scanCost(area, clearance, boxes, segments, c);
                assertEquals(expected, o.cost(c), 0.0);
                assertEquals(expected, copy.cost(c), 0.0);
                // with a score to beat: exact below it, at or above it otherwise
                double limit = random.nextDouble(0, 2 * expected + 1);
                double limited = o.cost(c, limit);
                if (expected < limit) {
                    assertEquals(expected, limited, 0.0);
                } else {
                    assertTrue(limited >= limit, limited + " < " + limit);
                }
            }
        }
    }

    /** The score by a scan over everything, as the class comment defines it. */
    private static double scanCost(Rectangle2D area, double clearance, List<Rectangle2D> boxes, List<Line2D> segments,
            Rectangle2D candidate) {
        Rectangle2D c = new Rectangle2D.Double(candidate.getX() - clearance, candidate.getY() - clearance,
                candidate.getWidth() + 2 * clearance, candidate.getHeight() + 2 * clearance);
        Rectangle2D inside = candidate.createIntersection(area);
        double kept = inside.getWidth() > 0 && inside.getHeight() > 0 ? inside.getWidth() * inside.getHeight() : 0.0;
        double sum = candidate.getWidth() * candidate.getHeight() - kept;
        for (Rectangle2D o : boxes) {
            if (o.intersects(c)) {
                Rectangle2D i = c.createIntersection(o);
                sum += Math.max(i.getWidth() * i.getHeight(), DataObstacles.FREE);
            }
        }
        for (Line2D s : segments) {
            Rectangle2D b = s.getBounds2D();
            if (b.getMaxX() < c.getMinX() || b.getMinX() > c.getMaxX() || b.getMaxY() < c.getMinY()
                    || b.getMinY() > c.getMaxY()) {
                continue;
            }
            sum += scanLength(s, c);
        }
        return sum;
    }

    /** Liang–Barsky clipping as first written, with arrays: the reference for the unrolled one. */
    private static double scanLength(Line2D s, Rectangle2D box) {
        double x0 = s.getX1();
        double y0 = s.getY1();
        double dx = s.getX2() - x0;
        double dy = s.getY2() - y0;
        double t0 = 0.0;
        double t1 = 1.0;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x0 - box.getMinX(), box.getMaxX() - x0, y0 - box.getMinY(), box.getMaxY() - y0};
        for (int k = 0; k < 4; k++) {
            if (p[k] == 0) {
                if (q[k] < 0) {
                    return 0.0;
                }
            } else {
                double t = q[k] / p[k];
                if (p[k] < 0) {
                    t0 = Math.max(t0, t);
                } else {
                    t1 = Math.min(t1, t);
                }
            }
        }
        if (t0 > t1) {
            return 0.0;
        }
        return Math.max((t1 - t0) * Math.hypot(dx, dy), DataObstacles.FREE);
    }
}
