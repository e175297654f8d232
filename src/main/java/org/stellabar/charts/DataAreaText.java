package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.RectangleConstraint;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.Title;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.Size2D;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYDataset;

/**
 * Everything written inside the data area, placed by one rule: the legend, the labels of
 * reference lines and the point labels go, in that order, to the first candidate place that
 * covers no data (no marker, no stretch of a data line) and no text placed before; candidates
 * come from the data as drawn ({@link DataObstacles}).
 *
 * <ul>
 *   <li>The legend tries the four corners (a requested one first), then the middles of the top
 *       and bottom edges, of the left and right edges, and the centre. If none is free it is not drawn inside and {@link #legendFitted()}
 *       says so: the renderer then puts it below the plot.</li>
 *   <li>A reference line's label sits on its line, above or below it, at the right end, the
 *       left end, or a quarter, half or three quarters along (for a vertical line: at the top,
 *       bottom or middle, on either side).</li>
 *   <li>Point labels go through {@link LabelPlacer}: rings of candidates round each marker, a
 *       thin leader line for a label moved off the first ring.</li>
 * </ul>
 * Where nothing is free, the candidate that covers least is taken and the renderer is told
 * ({@link #crowded()}, {@link #unplacedLines()}): it then moves a reference line's label into the
 * legend, and the legend below the plot, and draws again.
 */
final class DataAreaText extends AbstractXYAnnotation {

    private static final long serialVersionUID = 1L;

    /** A reference line's label: the line (the index-th of the chart's), and its text. */
    record LineLabel(int index, ReferenceLine line, ScriptedText text) {
    }

    /** One labelled point in data coordinates, measured on the given vertical axis. */
    record PointLabel(double x, double y, YAxisSide side, ScriptedText text) {
    }

    /** The order in which legend places are tried. */
    private enum Place {
        TOP_RIGHT, TOP_LEFT, BOTTOM_RIGHT, BOTTOM_LEFT, TOP_MIDDLE, BOTTOM_MIDDLE, MIDDLE_RIGHT, MIDDLE_LEFT, CENTRE
    }

    /** Where along its line a label is tried, as a fraction of the free length: the far end first. */
    private static final double[] ALONG = {1.0, 0.0, 0.875, 0.125, 0.75, 0.25, 0.625, 0.375, 0.5};

    private final transient Title legend;
    private final transient LegendPosition legendWish;
    private final transient List<LineLabel> lineLabels;
    private final transient List<PointLabel> pointLabels;
    private final Font font;
    private final transient Paint labelPaint;
    private final transient Paint linePaint;
    private final transient Stroke leader;
    private final double markerRadius;
    private final double markerHalf;
    private transient boolean legendFitted = true;
    private transient int crowded;
    private transient java.util.Set<Integer> unplacedLines = new java.util.TreeSet<>();

    /**
     * @param legend the legend to place inside, or null for none
     * @param legendWish the corner asked for (tried first), or AUTO
     * @param lineLabels labels of reference lines
     * @param pointLabels labels of points
     * @param font the font of labels
     * @param labelPaint colour of point labels
     * @param linePaint colour of reference-line labels
     * @param leader stroke of leader lines
     * @param markerSize the drawn size of a marker [pt]
     */
    DataAreaText(Title legend, LegendPosition legendWish, List<LineLabel> lineLabels, List<PointLabel> pointLabels,
            Font font, Paint labelPaint, Paint linePaint, Stroke leader, double markerSize) {
        this.legend = legend;
        this.legendWish = legendWish;
        this.lineLabels = List.copyOf(lineLabels);
        this.pointLabels = List.copyOf(pointLabels);
        this.font = font;
        this.labelPaint = labelPaint;
        this.linePaint = linePaint;
        this.leader = leader;
        this.markerRadius = markerSize / 2;
        this.markerHalf = 0.65 * markerSize;
    }

    /**
     * @return the indices of the reference lines whose labels found no free place, in increasing
     *     order (they become legend entries in this order; an unordered copy would iterate in an
     *     order that changes from one JVM to the next, and so would the files)
     */
    java.util.SortedSet<Integer> unplacedLines() {
        return java.util.Collections.unmodifiableSortedSet(new java.util.TreeSet<>(unplacedLines));
    }

    /** @return how many labels the last drawing found no free place for */
    int crowded() {
        return crowded;
    }

    /** @return false if the last drawing found no free place for the legend inside the plot */
    boolean legendFitted() {
        return legendFitted;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
            int rendererIndex, PlotRenderingInfo info) {
        if (plot.getOrientation() != PlotOrientation.VERTICAL) {
            throw new IllegalStateException("chart labels support vertical plots only");
        }
        crowded = 0;
        unplacedLines = new java.util.TreeSet<>();
        if (legend == null && lineLabels.isEmpty() && pointLabels.isEmpty()) {
            return; // nothing to place, so no obstacles to gather
        }
        DataObstacles obstacles = obstacles(plot, dataArea);
        if (legend != null) {
            placeLegend(g2, dataArea, obstacles);
        }
        for (LineLabel l : lineLabels) {
            placeLineLabel(g2, plot, dataArea, obstacles, l);
        }
        placePoints(g2, plot, dataArea, obstacles);
    }

    /** The data as drawn: a box round each marker, the segments of each line. */
    static DataObstacles obstacles(XYPlot plot, Rectangle2D dataArea) {
        DataObstacles o = new DataObstacles(dataArea, 1.0);
        for (int d = 0; d < plot.getDatasetCount(); d++) {
            XYDataset data = plot.getDataset(d);
            XYItemRenderer r = plot.getRenderer(d);
            if (data == null || !(r instanceof XYLineAndShapeRenderer lr)) {
                continue;
            }
            ValueAxis xAxis = plot.getDomainAxisForDataset(d);
            ValueAxis yAxis = plot.getRangeAxisForDataset(d);
            RectangleEdge xEdge = plot.getDomainAxisEdge();
            RectangleEdge yEdge = plot.getRangeAxisEdge(Math.max(0, plot.getRangeAxisIndex(yAxis)));
            boolean lines = lr.getDefaultLinesVisible();
            boolean shapes = lr.getDefaultShapesVisible();
            Shape shape = lr.getSeriesShape(0);
            for (int s = 0; s < data.getSeriesCount(); s++) {
                double lastX = Double.NaN;
                double lastY = Double.NaN;
                for (int i = 0; i < data.getItemCount(s); i++) {
                    double px = xAxis.valueToJava2D(data.getXValue(s, i), dataArea, xEdge);
                    double py = yAxis.valueToJava2D(data.getYValue(s, i), dataArea, yEdge);
                    if (!Double.isFinite(px) || !Double.isFinite(py)) {
                        lastX = Double.NaN;
                        continue;
                    }
                    if (shapes && dataArea.contains(px, py)) {
                        Rectangle2D b = shape.getBounds2D();
                        o.addBox(new Rectangle2D.Double(px + b.getX(), py + b.getY(), b.getWidth(), b.getHeight()));
                    }
                    if (lines && !Double.isNaN(lastX)) {
                        o.addSegment(new Line2D.Double(lastX, lastY, px, py));
                    }
                    lastX = px;
                    lastY = py;
                }
            }
        }
        return o;
    }

    private void placeLegend(Graphics2D g2, Rectangle2D area, DataObstacles obstacles) {
        double inset = 3.0;
        // the legend at its natural size: one that would have to be squeezed (and its entries
        // cut) into the plot goes below it instead
        Size2D size = legend.arrange(g2, RectangleConstraint.NONE);
        double w = size.getWidth();
        double h = size.getHeight();
        if (w > area.getWidth() - 2 * inset || h > area.getHeight() - 2 * inset) {
            legendFitted = false;
            return;
        }
        List<Place> order = new ArrayList<>();
        Place wished = switch (legendWish) {
            case INSIDE_TOP_LEFT -> Place.TOP_LEFT;
            case INSIDE_BOTTOM_LEFT -> Place.BOTTOM_LEFT;
            case INSIDE_BOTTOM_RIGHT -> Place.BOTTOM_RIGHT;
            default -> Place.TOP_RIGHT;
        };
        order.add(wished);
        for (Place p : Place.values()) {
            if (p != wished) {
                order.add(p);
            }
        }
        for (Place p : order) {
            double x = switch (p) {
                case TOP_LEFT, BOTTOM_LEFT -> area.getMinX() + inset;
                case TOP_MIDDLE, BOTTOM_MIDDLE, CENTRE -> area.getCenterX() - w / 2;
                case MIDDLE_LEFT -> area.getMinX() + inset;
                default -> area.getMaxX() - inset - w;
            };
            double y = switch (p) {
                case TOP_LEFT, TOP_RIGHT, TOP_MIDDLE -> area.getMinY() + inset;
                case MIDDLE_LEFT, MIDDLE_RIGHT, CENTRE -> area.getCenterY() - h / 2;
                default -> area.getMaxY() - inset - h;
            };
            Rectangle2D box = new Rectangle2D.Double(x, y, w, h);
            if (obstacles.cost(box) < DataObstacles.FREE) {
                legendFitted = true;
                legend.draw(g2, box);
                obstacles.addBox(box);
                return;
            }
        }
        legendFitted = false;
    }

    private void placeLineLabel(Graphics2D g2, XYPlot plot, Rectangle2D area, DataObstacles obstacles, LineLabel l) {
        ReferenceLine line = l.line();
        Rectangle2D size = l.text().bounds(g2, font);
        double w = size.getWidth();
        double h = size.getHeight();
        double gap = 1.5;
        List<Rectangle2D> candidates = new ArrayList<>();
        if (line.vertical()) {
            double px = plot.getDomainAxis().valueToJava2D(line.value(), area, plot.getDomainAxisEdge());
            if (!(px >= area.getMinX() - 0.01 && px <= area.getMaxX() + 0.01)) {
                return;
            }
            for (double away : new double[] {gap, gap + h}) {
                for (double fy : ALONG) {
                    double y = area.getMinY() + gap + (1 - fy) * (area.getHeight() - h - 2 * gap);
                    candidates.add(new Rectangle2D.Double(px + away, y, w, h));
                    candidates.add(new Rectangle2D.Double(px - away - w, y, w, h));
                }
            }
        } else {
            int axisIndex = line.axis() == YAxisSide.PRIMARY ? 0 : 1;
            ValueAxis yAxis = plot.getRangeAxis(axisIndex);
            double py = yAxis.valueToJava2D(line.value(), area, plot.getRangeAxisEdge(axisIndex));
            if (!(py >= area.getMinY() - 0.01 && py <= area.getMaxY() + 0.01)) {
                // the line is out of view, and so is its label
                return;
            }
            for (double away : new double[] {gap, gap + h / 2}) {
                for (double fx : ALONG) {
                    double x = area.getMinX() + gap + fx * (area.getWidth() - w - 2 * gap);
                    candidates.add(new Rectangle2D.Double(x, py - away - h, w, h));
                    candidates.add(new Rectangle2D.Double(x, py + away, w, h));
                }
            }
        }
        Rectangle2D best = candidates.get(0);
        double bestCost = Double.MAX_VALUE;
        for (Rectangle2D c : candidates) {
            double cost = obstacles.cost(c);
            if (cost < bestCost) {
                bestCost = cost;
                best = c;
            }
            if (cost < DataObstacles.FREE) {
                break;
            }
        }
        if (bestCost >= DataObstacles.FREE) {
            crowded++;
            unplacedLines.add(l.index());
        }
        drawText(g2, l.text(), best, linePaint);
        obstacles.addBox(best);
    }

    private void placePoints(Graphics2D g2, XYPlot plot, Rectangle2D area, DataObstacles obstacles) {
        List<PointLabel> shown = new ArrayList<>();
        List<double[]> at = new ArrayList<>();
        for (PointLabel p : pointLabels) {
            int axisIndex = p.side() == YAxisSide.PRIMARY ? 0 : 1;
            double px = plot.getDomainAxis().valueToJava2D(p.x(), area, plot.getDomainAxisEdge());
            double py = plot.getRangeAxis(axisIndex).valueToJava2D(p.y(), area, plot.getRangeAxisEdge(axisIndex));
            if (Double.isFinite(px) && Double.isFinite(py) && area.contains(px, py)) {
                shown.add(p);
                at.add(new double[] {px, py});
            }
        }
        int n = shown.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] w = new double[n];
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = at.get(i)[0];
            y[i] = at.get(i)[1];
            Rectangle2D b = shown.get(i).text().bounds(g2, font);
            w[i] = b.getWidth();
            h[i] = b.getHeight();
        }
        List<LabelPlacer.Placement> placed = LabelPlacer.place(x, y, w, h, markerHalf, 1.8, obstacles);
        for (int i = 0; i < n; i++) {
            Rectangle2D box = placed.get(i).box();
            if (placed.get(i).overlapping()) {
                crowded++;
            }
            if (placed.get(i).detached()) {
                double cx = Math.max(box.getMinX(), Math.min(x[i], box.getMaxX()));
                double cy = Math.max(box.getMinY(), Math.min(y[i], box.getMaxY()));
                double len = Math.hypot(cx - x[i], cy - y[i]);
                if (len > markerRadius) {
                    // start the leader at the marker's edge, not its centre
                    double sx = x[i] + (cx - x[i]) * markerRadius / len;
                    double sy = y[i] + (cy - y[i]) * markerRadius / len;
                    g2.setPaint(ChartStyle.REFERENCE);
                    g2.setStroke(leader);
                    g2.draw(new Line2D.Double(sx, sy, cx, cy));
                }
            }
            drawText(g2, shown.get(i).text(), box, labelPaint);
        }
    }

    private void drawText(Graphics2D g2, ScriptedText text, Rectangle2D box, Paint paint) {
        double pad = 0.7;
        g2.setPaint(ChartStyle.HALO);
        g2.fill(new Rectangle2D.Double(box.getX() - pad, box.getY() - pad / 2, box.getWidth() + 2 * pad,
                box.getHeight() + pad));
        g2.setPaint(paint);
        text.draw(g2, font, box.getMinX(), box.getMinY(), TextAnchor.TOP_LEFT);
    }
}
