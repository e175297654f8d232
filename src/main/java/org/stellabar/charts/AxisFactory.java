package org.stellabar.charts;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;

/**
 * Builds JFreeChart axes in the chart style, with a fixed range (see {@link AxisRanges}) and
 * ticks from {@link TickPlanner}: the densest tick set whose labels do not touch.
 */
final class AxisFactory {

    private AxisFactory() {
    }

    /**
     * @param axis what the axis shows
     * @param range the range to show
     * @param style the look
     * @param rightSide true for an axis on the right of the plot
     * @return a styled JFreeChart axis with automatic ranging switched off
     */
    static ValueAxis create(Axis axis, AxisRanges.Shown range, ChartStyle style, boolean rightSide) {
        ScriptedText title = ScriptedText.parse(axis.title());
        ValueAxis result = axis.isLog() ? new DecadeAxis(title) : new LinearAxis(title);
        result.setAutoRange(false);
        result.setRange(range.lower(), range.upper());
        result.setInverted(axis.reversed());
        result.setLabelFont(style.axisTitleFont());
        result.setLabelPaint(Color.BLACK);
        // the plain text names the axis for JFreeChart; the title is drawn from the markup
        result.setLabel(title.flat());
        result.setLabelInsets(new RectangleInsets(2, 2, 1, 2));
        result.setTickLabelFont(style.tickFont());
        result.setTickLabelPaint(ChartStyle.INK);
        result.setTickLabelInsets(new RectangleInsets(1.5, 1.5, 1.5, 1.5));
        result.setAxisLinePaint(ChartStyle.INK);
        result.setAxisLineStroke(style.axisLine());
        result.setTickMarkPaint(ChartStyle.INK);
        result.setTickMarkStroke(style.axisLine());
        result.setTickMarkInsideLength(0);
        result.setTickMarkOutsideLength(style.majorTick());
        result.setMinorTickMarksVisible(true);
        result.setMinorTickMarkInsideLength(0);
        result.setMinorTickMarkOutsideLength(style.minorTick());
        return result;
    }

    /**
     * Picks the first candidate tick set whose labels keep clear of each other.
     */
    static List<ValueTick> fit(ValueAxis axis, AxisScale scale, Graphics2D g2, Rectangle2D dataArea,
            RectangleEdge edge) {
        Font font = axis.getTickLabelFont();
        g2.setFont(font);
        FontRenderContext frc = g2.getFontRenderContext();
        boolean vertical = RectangleEdge.isLeftOrRight(edge);
        double lineHeight = font.getLineMetrics("0", frc).getHeight();
        // room between neighbouring labels: enough that the axis reads at a glance, not merely
        // that the labels do not touch
        double gap = vertical ? 1.6 * lineHeight : 1.2 * font.getSize2D();
        int maxLabels = vertical ? MAX_VERTICAL_LABELS : MAX_HORIZONTAL_LABELS;
        List<List<TickPlanner.Tick>> candidates = TickPlanner.candidates(scale, axis.getLowerBound(),
                axis.getUpperBound());
        List<TickPlanner.Tick> chosen = candidates.get(candidates.size() - 1);
        for (List<TickPlanner.Tick> c : candidates) {
            long labels = c.stream().filter(TickPlanner.Tick::major).count();
            if (labels <= maxLabels && fits(c, axis, font, g2, dataArea, edge, vertical, lineHeight, gap)) {
                chosen = c;
                break;
            }
        }
        TextAnchor anchor = TextAnchor.TOP_CENTER;
        if (edge == RectangleEdge.LEFT) {
            anchor = TextAnchor.CENTER_RIGHT;
        } else if (edge == RectangleEdge.RIGHT) {
            anchor = TextAnchor.CENTER_LEFT;
        } else if (edge == RectangleEdge.TOP) {
            anchor = TextAnchor.BOTTOM_CENTER;
        }
        boolean minorsFit = minorsFit(chosen, axis, dataArea, edge);
        List<ValueTick> ticks = new ArrayList<>();
        for (TickPlanner.Tick t : chosen) {
            if (!t.major() && !minorsFit) {
                continue;
            }
            // a minor tick gets "" rather than null: JFreeChart skips the mark of a tick whose
            // label is null, and draws no text for an empty one
            ticks.add(new NumberTick(t.major() ? TickType.MAJOR : TickType.MINOR, t.value(),
                    t.major() ? t.label() : "", anchor, TextAnchor.CENTER, 0.0));
        }
        return ticks;
    }

    /** At most this many labels on a vertical axis. */
    static final int MAX_VERTICAL_LABELS = 8;
    /** At most this many labels on a horizontal axis. */
    static final int MAX_HORIZONTAL_LABELS = 11;

    /** Minor marks closer than this (points) blur into a comb and are left out. */
    static final double MINOR_GAP = 4.5;

    private static boolean minorsFit(List<TickPlanner.Tick> ticks, ValueAxis axis, Rectangle2D dataArea,
            RectangleEdge edge) {
        double last = Double.NaN;
        for (TickPlanner.Tick t : ticks) {
            double pos = axis.valueToJava2D(t.value(), dataArea, edge);
            if (!Double.isNaN(last) && Math.abs(pos - last) < MINOR_GAP) {
                return false;
            }
            last = pos;
        }
        return true;
    }

    private static boolean fits(List<TickPlanner.Tick> ticks, ValueAxis axis, Font font, Graphics2D g2,
            Rectangle2D dataArea, RectangleEdge edge, boolean vertical, double lineHeight, double gap) {
        double lastPos = Double.NaN;
        double lastHalf = 0;
        for (TickPlanner.Tick t : ticks) {
            if (!t.major()) {
                continue;
            }
            double pos = axis.valueToJava2D(t.value(), dataArea, edge);
            double half = vertical ? lineHeight / 2 : ScriptedText.parse(t.label()).bounds(g2, font).getWidth() / 2;
            if (!Double.isNaN(lastPos) && Math.abs(pos - lastPos) < lastHalf + half + gap) {
                return false;
            }
            lastPos = pos;
            lastHalf = half;
        }
        return true;
    }

    /** A linear axis with planned ticks. */
    static final class LinearAxis extends NumberAxis {
        private static final long serialVersionUID = 1L;

        private final transient ScriptedText title;

        LinearAxis(ScriptedText title) {
            this.title = title;
        }

        @Override
        public List<ValueTick> refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea,
                RectangleEdge edge) {
            return fit(this, AxisScale.LINEAR, g2, dataArea, edge);
        }

        @Override
        protected AxisState drawTickMarksAndLabels(Graphics2D g2, double cursor, Rectangle2D plotArea,
                Rectangle2D dataArea, RectangleEdge edge) {
            if (isAxisLineVisible()) {
                drawAxisLine(g2, cursor, dataArea, edge);
            }
            return TypesetAxisText.drawTicks(this, refreshTicks(g2, new AxisState(cursor), dataArea, edge), g2,
                    cursor, dataArea, edge);
        }

        @Override
        @SuppressWarnings("rawtypes")
        protected double findMaximumTickLabelWidth(List ticks, Graphics2D g2, Rectangle2D drawArea,
                boolean vertical) {
            return TypesetAxisText.tickSpace(this, ticks, g2, true);
        }

        @Override
        @SuppressWarnings("rawtypes")
        protected double findMaximumTickLabelHeight(List ticks, Graphics2D g2, Rectangle2D drawArea,
                boolean vertical) {
            return TypesetAxisText.tickSpace(this, ticks, g2, false);
        }

        @Override
        protected Rectangle2D getLabelEnclosure(Graphics2D g2, RectangleEdge edge) {
            return TypesetAxisText.titleEnclosure(this, title, g2, edge);
        }

        @Override
        protected AxisState drawLabel(String label, Graphics2D g2, Rectangle2D plotArea, Rectangle2D dataArea,
                RectangleEdge edge, AxisState state) {
            return TypesetAxisText.drawTitle(this, title, g2, dataArea, edge, state);
        }
    }

    /** A logarithmic axis with planned ticks at powers of ten. */
    static final class DecadeAxis extends LogAxis {
        private static final long serialVersionUID = 1L;

        private final transient ScriptedText title;

        DecadeAxis(ScriptedText title) {
            this.title = title;
        }

        @Override
        public List<ValueTick> refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea,
                RectangleEdge edge) {
            return fit(this, AxisScale.LOG, g2, dataArea, edge);
        }

        @Override
        protected AxisState drawTickMarksAndLabels(Graphics2D g2, double cursor, Rectangle2D plotArea,
                Rectangle2D dataArea, RectangleEdge edge) {
            if (isAxisLineVisible()) {
                drawAxisLine(g2, cursor, dataArea, edge);
            }
            return TypesetAxisText.drawTicks(this, refreshTicks(g2, new AxisState(cursor), dataArea, edge), g2,
                    cursor, dataArea, edge);
        }

        @Override
        @SuppressWarnings("rawtypes")
        protected double findMaximumTickLabelWidth(List ticks, Graphics2D g2, Rectangle2D drawArea,
                boolean vertical) {
            return TypesetAxisText.tickSpace(this, ticks, g2, true);
        }

        @Override
        @SuppressWarnings("rawtypes")
        protected double findMaximumTickLabelHeight(List ticks, Graphics2D g2, Rectangle2D drawArea,
                boolean vertical) {
            return TypesetAxisText.tickSpace(this, ticks, g2, false);
        }

        @Override
        protected Rectangle2D getLabelEnclosure(Graphics2D g2, RectangleEdge edge) {
            return TypesetAxisText.titleEnclosure(this, title, g2, edge);
        }

        @Override
        protected AxisState drawLabel(String label, Graphics2D g2, Rectangle2D plotArea, Rectangle2D dataArea,
                RectangleEdge edge, AxisState state) {
            return TypesetAxisText.drawTitle(this, title, g2, dataArea, edge, state);
        }
    }
}
