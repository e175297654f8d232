package org.stellabar.charts;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.RectangleConstraint;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.Title;
import org.jfree.chart.ui.Size2D;

/**
 * Draws a title (the legend) in a corner of the plot area, placed in drawing space rather than
 * in data coordinates: JFreeChart's own title annotation interpolates its relative position
 * linearly in data values, which misplaces it on a logarithmic axis.
 */
final class CornerTitleAnnotation extends AbstractXYAnnotation {

    private static final long serialVersionUID = 1L;

    private final transient Title title;
    private final boolean left;
    private final boolean top;
    private final double inset;

    /**
     * @param title the title to draw
     * @param left true for a left corner
     * @param top true for a top corner
     * @param inset distance from the plot edges, in points
     */
    CornerTitleAnnotation(Title title, boolean left, boolean top, double inset) {
        this.title = title;
        this.left = left;
        this.top = top;
        this.inset = inset;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
            int rendererIndex, PlotRenderingInfo info) {
        double maxWidth = 0.7 * dataArea.getWidth();
        double maxHeight = dataArea.getHeight() - 2 * inset;
        Size2D size = title.arrange(g2, new RectangleConstraint(
                new org.jfree.data.Range(0, maxWidth), new org.jfree.data.Range(0, maxHeight)));
        double w = Math.min(size.getWidth(), maxWidth);
        double h = Math.min(size.getHeight(), maxHeight);
        double x = left ? dataArea.getMinX() + inset : dataArea.getMaxX() - inset - w;
        double y = top ? dataArea.getMinY() + inset : dataArea.getMaxY() - inset - h;
        title.draw(g2, new Rectangle2D.Double(x, y, w, h));
    }
}
