package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/**
 * All point labels of a chart placed together by {@link LabelPlacer}, so that none overlaps
 * another or a marker; a label moved off its first ring is joined to its marker by a thin line.
 */
final class ApartLabelsAnnotation extends AbstractXYAnnotation {

    private static final long serialVersionUID = 1L;

    /** One labelled point in data coordinates. */
    record Point(double x, double y, ScriptedText text) {
    }

    private final transient List<Point> points;
    private final Font font;
    private final transient Paint paint;
    private final transient Stroke leader;
    private final double markerRadius;
    private final double gap;

    ApartLabelsAnnotation(List<Point> points, Font font, Paint paint, Stroke leader, double markerRadius, double gap) {
        this.points = List.copyOf(points);
        this.font = font;
        this.paint = paint;
        this.leader = leader;
        this.markerRadius = markerRadius;
        this.gap = gap;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
            int rendererIndex, PlotRenderingInfo info) {
        if (plot.getOrientation() != PlotOrientation.VERTICAL) {
            throw new IllegalStateException("chart labels support vertical plots only");
        }
        RectangleEdge xEdge = plot.getDomainAxisEdge();
        RectangleEdge yEdge = plot.getRangeAxisEdge(Math.max(0, plot.getRangeAxisIndex(rangeAxis)));
        List<Point> shown = new ArrayList<>();
        List<double[]> at = new ArrayList<>();
        for (Point p : points) {
            double px = domainAxis.valueToJava2D(p.x(), dataArea, xEdge);
            double py = rangeAxis.valueToJava2D(p.y(), dataArea, yEdge);
            if (Double.isFinite(px) && Double.isFinite(py) && dataArea.contains(px, py)) {
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
        List<LabelPlacer.Placement> placed = LabelPlacer.place(x, y, w, h, markerRadius, gap, dataArea);
        for (int i = 0; i < n; i++) {
            Rectangle2D box = placed.get(i).box();
            if (placed.get(i).detached()) {
                double cx = Math.max(box.getMinX(), Math.min(x[i], box.getMaxX()));
                double cy = Math.max(box.getMinY(), Math.min(y[i], box.getMaxY()));
                g2.setPaint(ChartStyle.REFERENCE);
                g2.setStroke(leader);
                g2.draw(new Line2D.Double(x[i], y[i], cx, cy));
            }
            double pad = 0.7;
            g2.setPaint(ChartStyle.HALO);
            g2.fill(new Rectangle2D.Double(box.getX() - pad, box.getY() - pad / 2, box.getWidth() + 2 * pad,
                    box.getHeight() + pad));
            g2.setPaint(paint);
            shown.get(i).text().draw(g2, font, box.getMinX(), box.getMinY(), TextAnchor.TOP_LEFT);
        }
    }
}
