package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/**
 * A {@link ScriptedText} written on the plot at a data point, shifted by a fixed distance in
 * points: labels of markers and of reference lines. A label that would run past the right edge
 * of the plot is moved to the other side of its point.
 */
final class ScriptedTextAnnotation extends AbstractXYAnnotation {

    private static final long serialVersionUID = 1L;

    private final double x;
    private final double y;
    private final transient ScriptedText text;
    private final Font font;
    private final transient Paint paint;
    private final transient TextAnchor anchor;
    private final double dx;
    private final double dy;

    /**
     * @param x data x
     * @param y data y
     * @param text the label
     * @param font its font
     * @param paint its colour
     * @param anchor which point of the label lies at the shifted position
     * @param dx shift right, in points
     * @param dy shift down, in points
     */
    ScriptedTextAnnotation(double x, double y, ScriptedText text, Font font, Paint paint, TextAnchor anchor,
            double dx, double dy) {
        this.x = x;
        this.y = y;
        this.text = text;
        this.font = font;
        this.paint = paint;
        this.anchor = anchor;
        this.dx = dx;
        this.dy = dy;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
            int rendererIndex, PlotRenderingInfo info) {
        if (plot.getOrientation() != PlotOrientation.VERTICAL) {
            throw new IllegalStateException("chart labels support vertical plots only");
        }
        RectangleEdge xEdge = plot.getDomainAxisEdge();
        RectangleEdge yEdge = plot.getRangeAxisEdge(Math.max(0, plot.getRangeAxisIndex(rangeAxis)));
        double px = domainAxis.valueToJava2D(x, dataArea, xEdge);
        double py = rangeAxis.valueToJava2D(y, dataArea, yEdge);
        if (!Double.isFinite(px) || !Double.isFinite(py)) {
            return;
        }
        TextAnchor use = anchor;
        double shift = dx;
        double width = text.bounds(g2, font).getWidth();
        if (anchor.isLeft() && px + dx + width > dataArea.getMaxX()) {
            use = mirror(anchor);
            shift = -dx;
        }
        double ax = px + shift;
        double ay = py + dy;
        Rectangle2D box = text.boxAt(g2, font, ax, ay, use);
        double pad = 0.7;
        g2.setPaint(ChartStyle.HALO);
        g2.fill(new Rectangle2D.Double(box.getX() - pad, box.getY() - pad / 2, box.getWidth() + 2 * pad,
                box.getHeight() + pad));
        g2.setPaint(paint);
        text.draw(g2, font, ax, ay, use);
    }

    private static TextAnchor mirror(TextAnchor a) {
        if (a == TextAnchor.HALF_ASCENT_LEFT) {
            return TextAnchor.HALF_ASCENT_RIGHT;
        } else if (a == TextAnchor.BOTTOM_LEFT) {
            return TextAnchor.BOTTOM_RIGHT;
        } else if (a == TextAnchor.TOP_LEFT) {
            return TextAnchor.TOP_RIGHT;
        } else if (a == TextAnchor.BASELINE_LEFT) {
            return TextAnchor.BASELINE_RIGHT;
        }
        return TextAnchor.CENTER_RIGHT;
    }
}
