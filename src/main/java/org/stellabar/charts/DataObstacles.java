package org.stellabar.charts;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * What text on the plot must not cover, in drawing space (points, y downwards): the markers and
 * line segments of the data, and the boxes of text already placed. A candidate box is scored by
 * how much it covers: the area it shares with markers and placed boxes, plus the length of data
 * line inside it, plus the area it sticks out of the data area. A score below {@link #FREE} is
 * a box that covers nothing. Pure geometry, deterministic.
 *
 * <p>Speed: a label search scores thousands of candidate boxes against thousands of line
 * segments, so every box and segment is also filed in a uniform grid of cells over the data
 * area (things outside it in the edge cells). A query visits only the cells its box touches,
 * then applies exactly the tests of a scan over everything, in the order things were added, so
 * the score is the same number, bit for bit, as the scan's ({@code DataObstaclesTest} checks it
 * on random scenes).
 */
final class DataObstacles {

    /** Score below which a box covers nothing (rounding leaves ~1e-13 on a box that fits). */
    static final double FREE = 1e-6;

    /** Side of a grid cell [pt]: about a line of label text. */
    private static final double CELL = 16.0;
    /** Most cells along one side, so that a huge area does not make a huge index. */
    private static final int MAX_CELLS = 64;

    private final Rectangle2D area;
    private final List<Rectangle2D> boxes = new ArrayList<>();
    private final List<Line2D> segments = new ArrayList<>();
    /**
     * Each segment's end points and bounds as numbers, the bounds as Line2D's bounding box gives
     * them (it builds a new rectangle per call, and this is the inner loop of a label search).
     */
    private double[] segmentGeometry = new double[8 * 16];
    private final List<Line2D> leaders = new ArrayList<>();
    /** Space kept between text and the data, in points. */
    private final double clearance;

    private final double gridX;
    private final double gridY;
    private final int columns;
    private final int rows;
    private final int[][] boxCells;
    private final int[] boxCellSizes;
    private final int[][] segmentCells;
    private final int[] segmentCellSizes;
    /** Per item, the number of the last query that found it (to take each once, in order). */
    private int[] boxVisit = new int[16];
    private int[] segmentVisit = new int[16];
    private int query;
    private int[] found = new int[64];

    /**
     * @param area the data area text must stay inside
     * @param clearance space kept between text and data [pt]
     */
    DataObstacles(Rectangle2D area, double clearance) {
        this.area = area;
        this.clearance = clearance;
        this.gridX = area.getMinX();
        this.gridY = area.getMinY();
        this.columns = cellsAlong(area.getWidth());
        this.rows = cellsAlong(area.getHeight());
        this.boxCells = new int[columns * rows][];
        this.boxCellSizes = new int[columns * rows];
        this.segmentCells = new int[columns * rows][];
        this.segmentCellSizes = new int[columns * rows];
    }

    private static int cellsAlong(double length) {
        if (!(length > 0)) {
            return 1;
        }
        return (int) Math.max(1, Math.min(MAX_CELLS, Math.ceil(length / CELL)));
    }

    /** @return a copy to which more can be added without changing this one */
    DataObstacles copy() {
        DataObstacles c = new DataObstacles(area, clearance);
        c.addAllOf(this);
        return c;
    }

    /** Replaces everything here by everything of another (a copy of this one, added to). */
    void replaceWith(DataObstacles other) {
        boxes.clear();
        segments.clear();
        leaders.clear();
        Arrays.fill(boxCellSizes, 0);
        Arrays.fill(segmentCellSizes, 0);
        addAllOf(other);
    }

    private void addAllOf(DataObstacles other) {
        for (Rectangle2D b : other.boxes) {
            addBox(b);
        }
        for (int i = 0; i < other.segments.size(); i++) {
            fileSegment(other.segments.get(i), other.segmentGeometry, 8 * i);
        }
        leaders.addAll(other.leaders);
    }

    /**
     * @return everything here as numbers, in a fixed order with counts: the area, the clearance,
     *     each box, each segment and each leader (for {@link PlacementMemo}'s keys)
     */
    double[] fingerprint() {
        double[] f = new double[8 + 4 * (boxes.size() + segments.size() + leaders.size())];
        int k = 0;
        f[k++] = area.getX();
        f[k++] = area.getY();
        f[k++] = area.getWidth();
        f[k++] = area.getHeight();
        f[k++] = clearance;
        f[k++] = boxes.size();
        f[k++] = segments.size();
        f[k++] = leaders.size();
        for (Rectangle2D b : boxes) {
            f[k++] = b.getX();
            f[k++] = b.getY();
            f[k++] = b.getWidth();
            f[k++] = b.getHeight();
        }
        for (List<Line2D> lines : List.of(segments, leaders)) {
            for (Line2D s : lines) {
                f[k++] = s.getX1();
                f[k++] = s.getY1();
                f[k++] = s.getX2();
                f[k++] = s.getY2();
            }
        }
        return f;
    }

    /** @return the data area */
    Rectangle2D area() {
        return area;
    }

    /** Adds a box (a marker or placed text). */
    void addBox(Rectangle2D box) {
        int index = boxes.size();
        boxes.add(box);
        if (boxVisit.length <= index) {
            boxVisit = Arrays.copyOf(boxVisit, 2 * index);
        }
        int c0 = column(box.getMinX());
        int c1 = column(box.getMaxX());
        int r0 = row(box.getMinY());
        int r1 = row(box.getMaxY());
        for (int r = r0; r <= r1; r++) {
            for (int c = c0; c <= c1; c++) {
                int cell = r * columns + c;
                boxCells[cell] = append(boxCells[cell], boxCellSizes[cell]++, index);
            }
        }
    }

    /** Adds a data line segment. */
    void addSegment(Line2D segment) {
        Rectangle2D bounds = segment.getBounds2D();
        double[] g = {segment.getX1(), segment.getY1(), segment.getX2(), segment.getY2(), bounds.getMinX(),
            bounds.getMinY(), bounds.getMaxX(), bounds.getMaxY()};
        fileSegment(segment, g, 0);
    }

    /** Files a segment whose end points and bounds are the eight numbers from {@code at}. */
    private void fileSegment(Line2D segment, double[] geometry, int at) {
        int index = segments.size();
        segments.add(segment);
        if (segmentGeometry.length < 8 * (index + 1)) {
            segmentGeometry = Arrays.copyOf(segmentGeometry, 16 * (index + 1));
        }
        System.arraycopy(geometry, at, segmentGeometry, 8 * index, 8);
        if (segmentVisit.length <= index) {
            segmentVisit = Arrays.copyOf(segmentVisit, 2 * index);
        }
        int c0 = column(geometry[at + 4]);
        int c1 = column(geometry[at + 6]);
        int r0 = row(geometry[at + 5]);
        int r1 = row(geometry[at + 7]);
        for (int r = r0; r <= r1; r++) {
            for (int c = c0; c <= c1; c++) {
                int cell = r * columns + c;
                segmentCells[cell] = append(segmentCells[cell], segmentCellSizes[cell]++, index);
            }
        }
    }

    /**
     * Adds the line from a moved label to its marker: later text must not cover it, and later
     * leaders should not cross it.
     */
    void addLeader(Line2D leader) {
        addSegment(leader);
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
        // a box the line crosses overlaps the line's bounds, so only their cells need a look
        Rectangle2D reach = leader.getBounds2D();
        int n = nearby(reach.getMinX(), reach.getMinY(), reach.getMaxX(), reach.getMaxY(), boxCells, boxCellSizes,
                nextVisit(), boxVisit);
        for (int k = 0; k < n; k++) {
            Rectangle2D b = boxes.get(found[k]);
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
        return cost(candidate, Double.POSITIVE_INFINITY);
    }

    /**
     * The score of a box, formed only as far as it can matter to a search that has already
     * found a box scoring {@code limit}: every term is non-negative, so the running sum never
     * falls, and once it reaches the limit the box cannot win.
     *
     * @param candidate a box for some text
     * @param limit the score to beat
     * @return the score, exactly as {@link #cost(Rectangle2D)}, if it is below the limit;
     *     otherwise some number at or above the limit
     */
    double cost(Rectangle2D candidate, double limit) {
        Rectangle2D c = new Rectangle2D.Double(candidate.getX() - clearance, candidate.getY() - clearance,
                candidate.getWidth() + 2 * clearance, candidate.getHeight() + 2 * clearance);
        double sum = outside(candidate);
        if (sum >= limit) {
            return sum;
        }
        int n = nearby(c.getMinX(), c.getMinY(), c.getMaxX(), c.getMaxY(), boxCells, boxCellSizes, nextVisit(),
                boxVisit);
        for (int k = 0; k < n; k++) {
            Rectangle2D o = boxes.get(found[k]);
            if (o.intersects(c)) {
                Rectangle2D i = c.createIntersection(o);
                sum += Math.max(i.getWidth() * i.getHeight(), FREE);
            }
        }
        if (sum >= limit) {
            return sum;
        }
        double minX = c.getMinX();
        double minY = c.getMinY();
        double maxX = c.getMaxX();
        double maxY = c.getMaxY();
        n = nearby(minX, minY, maxX, maxY, segmentCells, segmentCellSizes, nextVisit(), segmentVisit);
        double[] g = segmentGeometry;
        for (int k = 0; k < n; k++) {
            int at = 8 * found[k];
            if (g[at + 6] < minX || g[at + 4] > maxX || g[at + 7] < minY || g[at + 5] > maxY) {
                continue;
            }
            sum += clippedLength(g[at], g[at + 1], g[at + 2], g[at + 3], minX, minY, maxX, maxY);
            if (sum >= limit) {
                return sum;
            }
        }
        return sum;
    }

    private int nextVisit() {
        return ++query;
    }

    /**
     * Gathers into {@code found} the items filed in the cells a box touches, each once, in the
     * order added. Cells are a monotone function of the coordinate, so an item whose bounds
     * overlap or touch the box shares at least one cell with it.
     *
     * @return how many
     */
    private int nearby(double minX, double minY, double maxX, double maxY, int[][] cells, int[] sizes, int visit,
            int[] visits) {
        int c0 = column(minX);
        int c1 = column(maxX);
        int r0 = row(minY);
        int r1 = row(maxY);
        int first = Integer.MAX_VALUE;
        int last = -1;
        int count = 0;
        for (int r = r0; r <= r1; r++) {
            for (int col = c0; col <= c1; col++) {
                int cell = r * columns + col;
                int[] items = cells[cell];
                for (int k = 0; k < sizes[cell]; k++) {
                    int item = items[k];
                    if (visits[item] != visit) {
                        visits[item] = visit;
                        first = Math.min(first, item);
                        last = Math.max(last, item);
                        if (count == found.length) {
                            found = Arrays.copyOf(found, 2 * count);
                        }
                        found[count++] = item;
                    }
                }
            }
        }
        // in the scan's order, so that the sum is formed in the same order: the marks between
        // the first and last item found read in turn, or, when few lie far apart, sorted
        // (rewriting found in place is safe: there are as many marks as items in it)
        int span = last - first + 1;
        if (span <= 0) {
            return 0;
        }
        if (span > 8 * count) {
            Arrays.sort(found, 0, count);
            return count;
        }
        int n = 0;
        for (int item = first; item <= last; item++) {
            if (visits[item] == visit) {
                found[n++] = item;
            }
        }
        return n;
    }

    private int column(double x) {
        return cell((x - gridX) / CELL, columns);
    }

    private int row(double y) {
        return cell((y - gridY) / CELL, rows);
    }

    /** Cell of a coordinate in cell units, things outside the grid in its edge cells. */
    private static int cell(double units, int count) {
        if (!(units > 0)) {
            return 0; // also NaN: the first cell, which every query of an edge box visits
        }
        return units >= count ? count - 1 : (int) units;
    }

    private static int[] append(int[] items, int size, int item) {
        int[] a = items == null ? new int[4] : items;
        if (size == a.length) {
            a = Arrays.copyOf(a, 2 * size);
        }
        a[size] = item;
        return a;
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
        return clippedLength(s.getX1(), s.getY1(), s.getX2(), s.getY2(), box.getMinX(), box.getMinY(), box.getMaxX(),
                box.getMaxY());
    }

    /**
     * The same, for a segment from (x0, y0) to (x1, y1) and a box given by its edges, slab by
     * slab: along each axis the parameters where the segment crosses the two edges, the smaller
     * the way in and the larger the way out. These are the quotients q/p of the four edges of
     * Liang &amp; Barsky ((x0 − minX)/(−dx) is (minX − x0)/dx exactly), and max and min do not
     * depend on the order they are taken in, so the length is the same number; written without
     * arrays so that the inner loop of a label search allocates nothing.
     */
    private static double clippedLength(double x0, double y0, double x1, double y1, double minX, double minY,
            double maxX, double maxY) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double t0 = 0.0;
        double t1 = 1.0;
        if (dx == 0) {
            if (x0 < minX || x0 > maxX) {
                return 0.0;
            }
        } else {
            double a = (minX - x0) / dx;
            double b = (maxX - x0) / dx;
            t0 = Math.max(t0, Math.min(a, b));
            t1 = Math.min(t1, Math.max(a, b));
        }
        if (dy == 0) {
            if (y0 < minY || y0 > maxY) {
                return 0.0;
            }
        } else {
            double a = (minY - y0) / dy;
            double b = (maxY - y0) / dy;
            t0 = Math.max(t0, Math.min(a, b));
            t1 = Math.min(t1, Math.max(a, b));
        }
        if (t0 > t1) {
            return 0.0;
        }
        // a segment that only touches the box still counts: a point has no length
        return Math.max((t1 - t0) * Math.hypot(dx, dy), FREE);
    }
}
