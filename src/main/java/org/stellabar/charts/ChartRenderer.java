package org.stellabar.charts;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntPredicate;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.block.BlockContainer;
import org.jfree.chart.block.FlowArrangement;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.CompositeTitle;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.ui.VerticalAlignment;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Turns a {@link ChartSpec} into a JFreeChart in the {@link ChartStyle} look, laid out for a
 * {@link FigureSize}. Each series gets its own dataset and renderer, so its colour, dash and
 * marker follow its style slot whatever axis it is on. Points a logarithmic axis cannot show are
 * left out (a line breaks there); ranges come from {@link AxisRanges}, never from JFreeChart's
 * autorange.
 */
public final class ChartRenderer {

    private final ChartStyle style;

    /** @param size the printed size the chart is laid out for */
    public ChartRenderer(FigureSize size) {
        this.style = new ChartStyle(size);
    }

    /**
     * @param spec what to show
     * @return a new chart, ready to draw at the figure size in points
     * @throws IllegalArgumentException if an axis of the spec has no series on it
     */
    public JFreeChart render(ChartSpec spec) {
        if (spec.series().isEmpty()) {
            throw new IllegalArgumentException("chart \"" + spec.title() + "\" (" + spec.yAxis().label() + " against "
                    + spec.xAxis().label() + ") has no series");
        }
        if (firstOn(spec, YAxisSide.PRIMARY) < 0) {
            throw new IllegalArgumentException("the y axis " + spec.yAxis().label() + " has no series on it");
        }
        if (spec.secondaryYAxis() != null && firstOn(spec, YAxisSide.SECONDARY) < 0) {
            throw new IllegalArgumentException("the secondary y axis " + spec.secondaryYAxis().label()
                    + " has no series on it");
        }
        AxisRanges ranges = new AxisRanges(spec);
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(AxisFactory.create(spec.xAxis(), ranges.x(), style, false));
        plot.setRangeAxis(0, AxisFactory.create(spec.yAxis(), ranges.y(YAxisSide.PRIMARY), style, false));
        if (spec.secondaryYAxis() != null) {
            plot.setRangeAxis(1, AxisFactory.create(spec.secondaryYAxis(), ranges.y(YAxisSide.SECONDARY), style, true));
        }
        stylePlot(plot);

        int[] slots = styleSlots(spec.series());
        List<ApartLabelsAnnotation.Point> apart = new ArrayList<>();
        for (int i = 0; i < spec.series().size(); i++) {
            Series s = spec.series().get(i);
            int sideIndex = s.axis() == YAxisSide.PRIMARY ? 0 : 1;
            plot.setDataset(i, dataset(spec, s, i));
            plot.setRenderer(i, renderer(s, slots[i]));
            if (s.kind() == SeriesKind.REGION) {
                tint(plot, spec, s, i, slots[i]);
            }
            plot.mapDatasetToRangeAxis(i, sideIndex);
            if (spec.labelLayout() == LabelLayout.APART && s.axis() == YAxisSide.PRIMARY) {
                collectLabels(spec, s, apart);
            } else {
                addPointLabels(plot, spec, s, i);
            }
        }
        if (!apart.isEmpty()) {
            plot.getRenderer(firstOn(spec, YAxisSide.PRIMARY)).addAnnotation(new ApartLabelsAnnotation(apart,
                    style.annotationFont(), ChartStyle.INK, style.referenceLine(), style.markerSize() / 2, 1.8),
                    Layer.FOREGROUND);
        }
        // a marker is drawn against the axes of the renderer it is given to, so each reference
        // line goes to the first series measured on its axis
        for (ReferenceLine r : spec.referenceLines()) {
            addReferenceLine(plot, spec, ranges, r, firstOn(spec, r.axis()));
        }

        JFreeChart chart = new JFreeChart(null, style.titleFont(), plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(3, 3, 3, 6));
        chart.setTextAntiAlias(true);
        chart.setAntiAlias(true);
        ScriptedText title = ScriptedText.parse(spec.title());
        if (!title.isEmpty()) {
            BlockContainer box = new BlockContainer(new FlowArrangement());
            box.add(new ScriptedLabelBlock(title, style.titleFont(), Color.BLACK));
            CompositeTitle t = new CompositeTitle(box);
            t.setPosition(RectangleEdge.TOP);
            t.setHorizontalAlignment(HorizontalAlignment.CENTER);
            t.setPadding(new RectangleInsets(0, 0, 4, 0));
            chart.addSubtitle(t);
        }
        addLegend(chart, plot, spec.legend());
        return chart;
    }

    private void stylePlot(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlineVisible(false);
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.setInsets(new RectangleInsets(2, 2, 2, 2));
        plot.setDomainGridlinesVisible(true);
        plot.setRangeGridlinesVisible(true);
        plot.setDomainGridlinePaint(ChartStyle.GRID);
        plot.setRangeGridlinePaint(ChartStyle.GRID);
        plot.setDomainGridlineStroke(style.gridLine());
        plot.setRangeGridlineStroke(style.gridLine());
        plot.setDomainMinorGridlinesVisible(false);
        plot.setRangeMinorGridlinesVisible(false);
        plot.setDomainZeroBaselineVisible(false);
        plot.setRangeZeroBaselineVisible(false);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
    }

    /**
     * Automatic slots count up over the automatic series in order; an explicit slot k gives the
     * look of the k-th automatic series (e.g. markers in the colour of the model curve).
     */
    private static int[] styleSlots(List<Series> series) {
        int[] slots = new int[series.size()];
        int next = 0;
        for (int i = 0; i < slots.length; i++) {
            int fixed = series.get(i).styleSlot();
            slots[i] = fixed >= 0 ? fixed : next++;
        }
        return slots;
    }

    private static XYSeriesCollection dataset(ChartSpec spec, Series s, int index) {
        String key = s.label().isEmpty() ? "\u0000series " + index : s.label();
        XYSeries data = new XYSeries(key, false, true);
        Axis yAxis = spec.yAxis(s.axis());
        IntPredicate showable = i -> AxisRanges.showable(spec.xAxis(), s.xAt(i)) && AxisRanges.showable(yAxis, s.yAt(i));
        int[] points = s.kind() == SeriesKind.LINE ? LineDecimation.keep(s.x(), s.y(), showable)
                : java.util.stream.IntStream.range(0, s.size()).toArray();
        for (int i : points) {
            if (showable.test(i)) {
                data.add(s.xAt(i), s.yAt(i), false);
            } else {
                // NaN in both coordinates: the renderer skips the point and breaks the line here
                data.add(Double.NaN, Double.NaN, false);
            }
        }
        return new XYSeriesCollection(data);
    }

    private XYLineAndShapeRenderer renderer(Series s, int slot) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(s.kind().hasLine(), s.kind().hasMarkers());
        r.setSeriesPaint(0, style.colour(slot));
        r.setSeriesStroke(0, style.line(slot));
        r.setSeriesShape(0, style.marker(slot));
        r.setUseFillPaint(false);
        r.setDrawOutlines(true);
        r.setUseOutlinePaint(true);
        r.setSeriesOutlinePaint(0, Color.WHITE);
        r.setSeriesOutlineStroke(0, style.markerEdge());
        // one path per series, so that dash patterns run on along the whole curve
        r.setDrawSeriesLineAsPath(true);
        r.setLegendLine(new Line2D.Double(-9, 0, 9, 0));
        r.setSeriesVisibleInLegend(0, !s.label().isEmpty());
        return r;
    }

    /**
     * The inside of a region: a polygon through its showable points, filled with a light tint of
     * the outline's colour behind every line, so that the lines drawn over it stay legible.
     */
    private void tint(XYPlot plot, ChartSpec spec, Series s, int index, int slot) {
        Axis yAxis = spec.yAxis(s.axis());
        double[] corners = new double[2 * s.size()];
        int k = 0;
        for (int i = 0; i < s.size(); i++) {
            if (AxisRanges.showable(spec.xAxis(), s.xAt(i)) && AxisRanges.showable(yAxis, s.yAt(i))) {
                corners[k++] = s.xAt(i);
                corners[k++] = s.yAt(i);
            }
        }
        if (k < 6) {
            return;
        }
        Color c = style.colour(slot);
        Color tint = new Color(c.getRed(), c.getGreen(), c.getBlue(), 56);
        plot.getRenderer(index).addAnnotation(new org.jfree.chart.annotations.XYPolygonAnnotation(
                java.util.Arrays.copyOf(corners, k), null, null, tint), Layer.BACKGROUND);
    }

    private static void collectLabels(ChartSpec spec, Series s, List<ApartLabelsAnnotation.Point> into) {
        for (int i = 0; i < s.pointLabels().size(); i++) {
            ScriptedText text = ScriptedText.parse(s.pointLabels().get(i));
            if (!text.isEmpty() && AxisRanges.showable(spec.xAxis(), s.xAt(i)) && AxisRanges.showable(spec.yAxis(), s.yAt(i))) {
                into.add(new ApartLabelsAnnotation.Point(s.xAt(i), s.yAt(i), text));
            }
        }
    }

    private void addPointLabels(XYPlot plot, ChartSpec spec, Series s, int index) {
        if (s.pointLabels().isEmpty()) {
            return;
        }
        Axis yAxis = spec.yAxis(s.axis());
        double offset = style.markerSize() / 2 + 1.8;
        for (int i = 0; i < s.size(); i++) {
            ScriptedText text = ScriptedText.parse(s.pointLabels().get(i));
            if (text.isEmpty() || !AxisRanges.showable(spec.xAxis(), s.xAt(i)) || !AxisRanges.showable(yAxis, s.yAt(i))) {
                continue;
            }
            plot.getRenderer(index).addAnnotation(new ScriptedTextAnnotation(s.xAt(i), s.yAt(i), text,
                    style.annotationFont(), ChartStyle.INK, TextAnchor.HALF_ASCENT_LEFT, offset, 0), Layer.FOREGROUND);
        }
    }

    private void addReferenceLine(XYPlot plot, ChartSpec spec, AxisRanges ranges, ReferenceLine r, int rendererIndex) {
        Axis axis = r.vertical() ? spec.xAxis() : spec.yAxis(r.axis());
        if (!AxisRanges.showable(axis, r.value())) {
            return;
        }
        ValueMarker marker = new ValueMarker(r.value(), ChartStyle.REFERENCE, style.referenceLine());
        ScriptedText text = ScriptedText.parse(r.label());
        if (r.vertical()) {
            plot.addDomainMarker(rendererIndex, marker, Layer.BACKGROUND);
            if (!text.isEmpty()) {
                plot.getRenderer(rendererIndex).addAnnotation(new ScriptedTextAnnotation(r.value(),
                        ranges.y(YAxisSide.PRIMARY).upper(), text, style.annotationFont(), ChartStyle.REFERENCE_TEXT,
                        TextAnchor.TOP_LEFT, 2.0, 2.0), Layer.FOREGROUND);
            }
        } else {
            plot.addRangeMarker(rendererIndex, marker, Layer.BACKGROUND);
            if (!text.isEmpty()) {
                plot.getRenderer(rendererIndex).addAnnotation(new ScriptedTextAnnotation(ranges.x().upper(),
                        r.value(), text, style.annotationFont(), ChartStyle.REFERENCE_TEXT,
                        TextAnchor.BOTTOM_RIGHT, -2.0, -1.5), Layer.FOREGROUND);
            }
        }
    }

    private void addLegend(JFreeChart chart, XYPlot plot, LegendPosition position) {
        if (position == LegendPosition.NONE || plot.getLegendItems().getItemCount() == 0) {
            return;
        }
        LegendTitle legend = new ScriptedLegendTitle(plot);
        legend.setItemFont(style.legendFont());
        legend.setItemPaint(ChartStyle.INK);
        legend.setFrame(BlockBorder.NONE);
        legend.setItemLabelPadding(new RectangleInsets(0.6, 2.0, 0.6, 4));
        legend.setLegendItemGraphicPadding(new RectangleInsets(0.6, 1, 0.6, 0));
        switch (position) {
            case BELOW, RIGHT -> {
                legend.setBackgroundPaint(Color.WHITE);
                legend.setPosition(position == LegendPosition.BELOW ? RectangleEdge.BOTTOM : RectangleEdge.RIGHT);
                legend.setVerticalAlignment(VerticalAlignment.CENTER);
                legend.setMargin(new RectangleInsets(3, 3, 0, 0));
                chart.addSubtitle(legend);
            }
            default -> {
                legend.setBackgroundPaint(ChartStyle.LEGEND_BACKGROUND);
                legend.setPosition(RectangleEdge.RIGHT);
                legend.setPadding(new RectangleInsets(1.5, 2.5, 1.5, 2.5));
                boolean left = position == LegendPosition.INSIDE_TOP_LEFT
                        || position == LegendPosition.INSIDE_BOTTOM_LEFT;
                boolean top = position == LegendPosition.INSIDE_TOP_LEFT
                        || position == LegendPosition.INSIDE_TOP_RIGHT;
                CornerTitleAnnotation inside = new CornerTitleAnnotation(legend, left, top, 3.0);
                plot.addAnnotation(inside);
            }
        }
    }

    /** @return the index of the first series on that side, -1 if none */
    private static int firstOn(ChartSpec spec, YAxisSide side) {
        for (int i = 0; i < spec.series().size(); i++) {
            if (spec.series().get(i).axis() == side) {
                return i;
            }
        }
        return -1;
    }
}
