package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;

/**
 * Tick labels and axis titles drawn through {@link ScriptedText}, the one text path of the
 * charts: JFreeChart would draw a tick label as a plain string and an axis title with scripts
 * as outlines, so that "10⁻³" on an axis and "cm^{-3}" in its title would be set two different
 * ways. The space an axis reserves is measured the same way as it is drawn. Tick labels sit
 * beyond the outer end of their tick marks.
 */
final class TypesetAxisText {

    private TypesetAxisText() {
    }

    /** The text of a tick, parsed (a minor tick's is empty). */
    private static ScriptedText label(ValueTick tick) {
        return ScriptedText.parse(tick.getText() == null ? "" : tick.getText());
    }

    /**
     * Space taken across the axis by the tick marks and labels.
     *
     * @param across true for the widths (a vertical axis), false for the heights
     */
    static double tickSpace(ValueAxis axis, List<?> ticks, Graphics2D g2, boolean across) {
        Font font = axis.getTickLabelFont();
        RectangleInsets insets = axis.getTickLabelInsets();
        double max = 0.0;
        for (Object o : ticks) {
            ScriptedText text = label((ValueTick) o);
            if (text.isEmpty()) {
                continue;
            }
            Rectangle2D b = text.bounds(g2, font);
            max = Math.max(max, across ? b.getWidth() : b.getHeight());
        }
        double pad = across ? insets.getLeft() + insets.getRight() : insets.getTop() + insets.getBottom();
        return axis.getTickMarkOutsideLength() + pad + max;
    }

    /**
     * Draws the axis line, tick marks and tick labels.
     *
     * @return the state, its cursor moved past the tick labels
     */
    static AxisState drawTicks(ValueAxis axis, List<ValueTick> ticks, Graphics2D g2, double cursor,
            Rectangle2D dataArea, RectangleEdge edge) {
        AxisState state = new AxisState(cursor);
        state.setTicks(ticks);
        Object saved = g2.getRenderingHint(RenderingHints.KEY_STROKE_CONTROL);
        g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_NORMALIZE);
        RectangleInsets insets = axis.getTickLabelInsets();
        double outside = axis.getTickMarkOutsideLength();
        for (ValueTick tick : ticks) {
            double at = axis.valueToJava2D(tick.getValue(), dataArea, edge);
            boolean minor = tick.getTickType() == TickType.MINOR;
            double ol = minor ? axis.getMinorTickMarkOutsideLength() : outside;
            double il = minor ? axis.getMinorTickMarkInsideLength() : axis.getTickMarkInsideLength();
            Line2D mark;
            if (edge == RectangleEdge.LEFT) {
                mark = new Line2D.Double(cursor - ol, at, cursor + il, at);
            } else if (edge == RectangleEdge.RIGHT) {
                mark = new Line2D.Double(cursor + ol, at, cursor - il, at);
            } else if (edge == RectangleEdge.TOP) {
                mark = new Line2D.Double(at, cursor - ol, at, cursor + il);
            } else {
                mark = new Line2D.Double(at, cursor + ol, at, cursor - il);
            }
            g2.setStroke(axis.getTickMarkStroke());
            g2.setPaint(axis.getTickMarkPaint());
            g2.draw(mark);
            ScriptedText text = label(tick);
            if (text.isEmpty()) {
                continue;
            }
            g2.setPaint(axis.getTickLabelPaint());
            if (edge == RectangleEdge.LEFT) {
                text.draw(g2, axis.getTickLabelFont(), cursor - outside - insets.getRight(), at,
                        TextAnchor.CENTER_RIGHT);
            } else if (edge == RectangleEdge.RIGHT) {
                text.draw(g2, axis.getTickLabelFont(), cursor + outside + insets.getLeft(), at,
                        TextAnchor.CENTER_LEFT);
            } else if (edge == RectangleEdge.TOP) {
                text.draw(g2, axis.getTickLabelFont(), at, cursor - outside - insets.getBottom(),
                        TextAnchor.BOTTOM_CENTER);
            } else {
                text.draw(g2, axis.getTickLabelFont(), at, cursor + outside + insets.getTop(),
                        TextAnchor.TOP_CENTER);
            }
        }
        g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, saved);
        boolean vertical = RectangleEdge.isLeftOrRight(edge);
        double used = tickSpace(axis, ticks, g2, vertical);
        if (edge == RectangleEdge.LEFT) {
            state.cursorLeft(used);
        } else if (edge == RectangleEdge.RIGHT) {
            state.cursorRight(used);
        } else if (edge == RectangleEdge.TOP) {
            state.cursorUp(used);
        } else {
            state.cursorDown(used);
        }
        return state;
    }

    /** @return the box the axis title takes, with its insets, as JFreeChart reserves it */
    static Rectangle2D titleEnclosure(ValueAxis axis, ScriptedText title, Graphics2D g2, RectangleEdge edge) {
        if (title.isEmpty()) {
            return new Rectangle2D.Double();
        }
        Rectangle2D b = title.bounds(g2, axis.getLabelFont());
        RectangleInsets i = axis.getLabelInsets();
        if (RectangleEdge.isLeftOrRight(edge)) {
            return new Rectangle2D.Double(0, 0, b.getHeight() + i.getLeft() + i.getRight(),
                    b.getWidth() + i.getTop() + i.getBottom());
        }
        return new Rectangle2D.Double(0, 0, b.getWidth() + i.getLeft() + i.getRight(),
                b.getHeight() + i.getTop() + i.getBottom());
    }

    /**
     * Draws the axis title centred along the data area, reading upwards beside a vertical axis.
     *
     * @return the state, its cursor moved past the title
     */
    static AxisState drawTitle(ValueAxis axis, ScriptedText title, Graphics2D g2, Rectangle2D dataArea,
            RectangleEdge edge, AxisState state) {
        if (title.isEmpty()) {
            return state;
        }
        Font font = axis.getLabelFont();
        RectangleInsets i = axis.getLabelInsets();
        double thickness = title.bounds(g2, font).getHeight();
        double cursor = state.getCursor();
        g2.setPaint(axis.getLabelPaint());
        if (edge == RectangleEdge.LEFT) {
            double x = cursor - i.getRight() - thickness / 2;
            title.drawRotated(g2, font, x, dataArea.getCenterY(), TextAnchor.CENTER, -Math.PI / 2);
            state.cursorLeft(i.getLeft() + thickness + i.getRight());
        } else if (edge == RectangleEdge.RIGHT) {
            double x = cursor + i.getLeft() + thickness / 2;
            title.drawRotated(g2, font, x, dataArea.getCenterY(), TextAnchor.CENTER, -Math.PI / 2);
            state.cursorRight(i.getLeft() + thickness + i.getRight());
        } else if (edge == RectangleEdge.TOP) {
            title.draw(g2, font, dataArea.getCenterX(), cursor - i.getBottom(), TextAnchor.BOTTOM_CENTER);
            state.cursorUp(i.getTop() + thickness + i.getBottom());
        } else {
            title.draw(g2, font, dataArea.getCenterX(), cursor + i.getTop(), TextAnchor.TOP_CENTER);
            state.cursorDown(i.getTop() + thickness + i.getBottom());
        }
        return state;
    }
}
