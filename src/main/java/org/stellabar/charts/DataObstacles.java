package org.stellabar.charts;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * What text on the plot must not cover, in drawing space (points, y downwards): the markers and
 * line segments of the data, and the boxes of text already placed. A candidate box is scored by
 * how much it covers: the area it shares with markers and placed boxes, plus the length of data
 * line inside it, plus the area it sticks out of the data area. A score below {@link #FREE} is
 * a box that covers nothing. Pure geometry, deterministic.
 */
final class DataObstacles {

    /** Score below which a box covers nothing (rounding leaves ~1e-13 on a box that fits). */
    static final double FREE = 1e-6;

    private final Rectangle2D area;
    private final List<Rectangle2D> boxes = new ArrayList<>();
    private final List<Line2D> segments = new ArrayList<>();
    private final List<Line2D> leaders = new ArrayList<>();
    /** Space kept between text and the data, in points. */
    private final double clearance;

    /**
     * @param area the data area text must stay inside
     * @param clearance space kept between text and data [pt]
     */
    DataObstacles(Rectangle2D area, double clearance) {
        this.area = area;
        this.clearance = clearance;
    }

    /** @return a copy to which more can be added without changing this one */
    DataObstacles copy() {
        DataObstacles c = new DataObstacles(area, clearance);
        c.boxes.addAll(boxes);
        c.segments.addAll(segments);
        c.leaders.addAll(leaders);
        return c;
    }

    /** Adds everything of another (a copy of this one, added to). */
    void replaceWith(DataObstacles other) {
        boxes.clear();
        boxes.addAll(other.boxes);
        segments.clear();
        segments.addAll(other.segments);
        leaders.clear();
        leaders.addAll(other.leaders);
    }

    /** @return the data area */
    Rectangle2D area() {
        return area;
    }

    /** Adds a box (a marker or placed text). */
    void addBox(Rectangle2D box) {
        boxes.add(box);
    }

    /** Adds a data line segment. */
    void addSegment(Line2D segment) {
        segments.add(segment);
    }

    /**
     * Adds the line from a moved label to its marker: later text must not cover it, and later
     * leaders should not cross it.
     */
    void addLeader(Line2D leader) {
        segments.add(leader);
        leaders.add(leader);
    }

    /**
     * @param leader a would-be leader line
     * @param own the box of the marker it starts from (which it may cross)
     * @return how much it crosses: its length inside other markers and placed text, plus one
     *     point per leader it crosses
     */
    double crossing(Line2D leader, Rectangle2D own) {
        double sum = 0.0;
        for (Rectangle2D b : boxes) {
            if (b != own && b.intersectsLine(leader)) {
                sum += clippedLength(leader, b);
            }
        }
        for (Line2D other : leaders) {
            if (other.intersectsLine(leader)) {
                sum += 1.0;
            }
        }
        return sum;
    }

    /** @return the boxes, markers and placed text, in the order added */
    List<Rectangle2D> boxes() {
        return List.copyOf(boxes);
    }

    /** @return the data line segments */
    List<Line2D> segments() {
        return List.copyOf(segments);
    }

    /**
     * @param candidate a box for some text
     * @return how much it covers (0 for nothing); see the class comment
     */
    double cost(Rectangle2D candidate) {
        Rectangle2D c = new Rectangle2D.Double(candidate.getX() - clearance, candidate.getY() - clearance,
                candidate.getWidth() + 2 * clearance, candidate.getHeight() + 2 * clearance);
        double sum = outside(candidate);
        for (Rectangle2D o : boxes) {
            if (o.intersects(c)) {
                Rectangle2D i = c.createIntersection(o);
                sum += Math.max(i.getWidth() * i.getHeight(), FREE);
            }
        }
        for (Line2D s : segments) {
            if (s.getBounds2D().getMaxX() < c.getMinX() || s.getBounds2D().getMinX() > c.getMaxX()
                    || s.getBounds2D().getMaxY() < c.getMinY() || s.getBounds2D().getMinY() > c.getMaxY()) {
                continue;
            }
            sum += clippedLength(s, c);
        }
        return sum;
    }

    private double outside(Rectangle2D c) {
        Rectangle2D inside = c.createIntersection(area);
        double kept = inside.getWidth() > 0 && inside.getHeight() > 0 ? inside.getWidth() * inside.getHeight() : 0.0;
        return c.getWidth() * c.getHeight() - kept;
    }

    /**
     * Length of a segment inside a box, by Liang–Barsky clipping (Liang &amp; Barsky 1984, ACM
     * Trans. Graph. 3, 1).
     */
    static double clippedLength(Line2D s, Rectangle2D box) {
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
        // a segment that only touches the box still counts: a point has no length
        return Math.max((t1 - t0) * Math.hypot(dx, dy), FREE);
    }
}
