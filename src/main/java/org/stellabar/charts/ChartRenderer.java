package org.stellabar.charts;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntPredicate;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.LegendItemSource;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
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
        Layout known = knownLayout(spec);
        if (known != null) {
            return build(spec, known.legendInside(), known.linesInLegend()).chart();
        }
        // The text inside the plot is placed at drawing time; a trial drawing tells whether
        // everything found a free place. A reference line whose label did not is named in the
        // legend instead; a legend that took room the labels needed goes below the plot.
        java.util.SortedSet<Integer> inLegend = java.util.Collections.emptySortedSet();
        boolean inside = true;
        Built built = build(spec, true, inLegend);
        trialDraw(built.chart());
        if (!built.text().unplacedLines().isEmpty()) {
            inLegend = built.text().unplacedLines();
            built = build(spec, true, inLegend);
            trialDraw(built.chart());
        }
        if (built.legendInside() && (!built.text().legendFitted() || built.text().crowded() > 0)) {
            Built below = build(spec, false, inLegend);
            trialDraw(below.chart());
            if (!built.text().legendFitted() || below.text().crowded() < built.text().crowded()) {
                built = below;
                inside = false;
            }
        }
        synchronized (LAYOUTS) {
            LAYOUTS.computeIfAbsent(spec, k -> new java.util.HashMap<>()).put(style.size(), new Layout(inside, inLegend));
        }
        return built.chart();
    }

    /**
     * The layouts the trial drawings chose for a chart, by size: a chart is written in several
     * formats, each through its own renderer, and the choice depends only on the spec and the
     * size (the trial drawings use the same scratch surface every time), so it is made once and
     * the same chart is built from it. A spec's series hold arrays, which records compare by
     * identity, so specs are equal only when they hold the same data; a spec no longer in use
     * drops out (weak keys).
     */
    private static final java.util.Map<ChartSpec, java.util.Map<FigureSize, Layout>> LAYOUTS =
            new java.util.WeakHashMap<>();

    /** The choice: legend inside the plot or below it, and the reference lines named in it. */
    private record Layout(boolean legendInside, java.util.SortedSet<Integer> linesInLegend) {
    }

    private Layout knownLayout(ChartSpec spec) {
        synchronized (LAYOUTS) {
            java.util.Map<FigureSize, Layout> bySize = LAYOUTS.get(spec);
            return bySize == null ? null : bySize.get(style.size());
        }
    }

    /**
     * Where the data of a chart land on the page: the drawn position of every point of every
     * series that falls inside the plot, in points from the top left corner of the figure (the
     * coordinates of a PDF text extractor such as pdftotext -bbox). For checks of the layout.
     *
     * @param spec the chart
     * @return the points, series by series
     */
    public List<java.awt.geom.Point2D> dataPointsOnPage(ChartSpec spec) {
        JFreeChart chart = render(spec);
        org.jfree.chart.ChartRenderingInfo info = new org.jfree.chart.ChartRenderingInfo();
        java.awt.image.BufferedImage scratch = new java.awt.image.BufferedImage(1, 1,
                java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g2 = scratch.createGraphics();
        try {
            g2.setRenderingHint(java.awt.RenderingHints.KEY_FRACTIONALMETRICS,
                    java.awt.RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            chart.draw(g2, new java.awt.geom.Rectangle2D.Double(0, 0, style.size().widthPoints(),
                    style.size().heightPoints()), info);
        } finally {
            g2.dispose();
        }
        java.awt.geom.Rectangle2D area = info.getPlotInfo().getDataArea();
        XYPlot plot = chart.getXYPlot();
        List<java.awt.geom.Point2D> points = new ArrayList<>();
        for (int d = 0; d < plot.getDatasetCount(); d++) {
            org.jfree.data.xy.XYDataset data = plot.getDataset(d);
            ValueAxis x = plot.getDomainAxisForDataset(d);
            ValueAxis y = plot.getRangeAxisForDataset(d);
            RectangleEdge yEdge = plot.getRangeAxisEdge(Math.max(0, plot.getRangeAxisIndex(y)));
            for (int s = 0; s < data.getSeriesCount(); s++) {
                for (int i = 0; i < data.getItemCount(s); i++) {
                    double px = x.valueToJava2D(data.getXValue(s, i), area, plot.getDomainAxisEdge());
                    double py = y.valueToJava2D(data.getYValue(s, i), area, yEdge);
                    if (Double.isFinite(px) && Double.isFinite(py) && area.contains(px, py)) {
                        points.add(new java.awt.geom.Point2D.Double(px, py));
                    }
                }
            }
        }
        return points;
    }

    private Built build(ChartSpec spec, boolean legendInside, java.util.Set<Integer> linesInLegend) {
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
        List<DataAreaText.PointLabel> pointLabels = new ArrayList<>();
        for (int i = 0; i < spec.series().size(); i++) {
            Series s = spec.series().get(i);
            int sideIndex = s.axis() == YAxisSide.PRIMARY ? 0 : 1;
            plot.setDataset(i, dataset(spec, s, i));
            plot.setRenderer(i, renderer(s, slots[i]));
            if (s.kind() == SeriesKind.REGION) {
                tint(plot, spec, s, i, slots[i]);
            }
            plot.mapDatasetToRangeAxis(i, sideIndex);
            collectLabels(spec, s, pointLabels);
        }
        // a marker is drawn against the axes of the renderer it is given to, so each reference
        // line goes to the first series measured on its axis
        List<DataAreaText.LineLabel> lineLabels = new ArrayList<>();
        for (int k = 0; k < spec.referenceLines().size(); k++) {
            ReferenceLine r = spec.referenceLines().get(k);
            addReferenceLine(plot, spec, k, firstOn(spec, r.axis()), linesInLegend.contains(k) ? null : lineLabels);
        }

        JFreeChart chart = new JFreeChart(null, style.titleFont(), plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(3, 3, 3, 6));
        chart.setTextAntiAlias(true);
        chart.setAntiAlias(true);
        // figures carry no title: a journal figure's title is its caption (the title still
        // names the file in its metadata)
        LegendItemCollection items = legendItems(spec, slots, linesInLegend);
        LegendPosition where = items.getItemCount() == 0 ? LegendPosition.NONE
                // a reference line named in the legend needs one, even where none was asked for
                : spec.legend() == LegendPosition.NONE && !linesInLegend.isEmpty() ? LegendPosition.AUTO
                : spec.legend();
        if (!legendInside && where != LegendPosition.NONE) {
            where = LegendPosition.BELOW;
        }
        LegendTitle legend = where == LegendPosition.NONE ? null : legend(() -> items, where);
        if (legend != null && (where == LegendPosition.BELOW || where == LegendPosition.RIGHT)) {
            chart.addSubtitle(legend);
            legend = null;
        }
        DataAreaText text = new DataAreaText(legend, where, lineLabels, pointLabels, style.annotationFont(),
                ChartStyle.INK, ChartStyle.REFERENCE_TEXT, style.leaderLine(), style.markerSize());
        plot.getRenderer(firstOn(spec, YAxisSide.PRIMARY)).addAnnotation(text, Layer.FOREGROUND);
        return new Built(chart, text, legend != null);
    }

    /** A chart and the text placed inside it. */
    private record Built(JFreeChart chart, DataAreaText text, boolean legendInside) {
    }

    /**
     * Draws the chart once at its size on a scratch surface, so that the text inside the plot
     * is placed with the same metrics as in the files.
     */
    private void trialDraw(JFreeChart chart) {
        java.awt.image.BufferedImage scratch = new java.awt.image.BufferedImage(1, 1,
                java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g2 = scratch.createGraphics();
        try {
            g2.setRenderingHint(java.awt.RenderingHints.KEY_FRACTIONALMETRICS,
                    java.awt.RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            chart.draw(g2, new java.awt.geom.Rectangle2D.Double(0, 0, style.size().widthPoints(),
                    style.size().heightPoints()));
        } finally {
            g2.dispose();
        }
    }

    /**
     * One legend entry per labelled series; a line's entry also shows the marker of an
     * unlabelled point series drawn in the same style slot (stars on their model's curve).
     */
    private LegendItemCollection legendItems(ChartSpec spec, int[] slots, java.util.Set<Integer> linesInLegend) {
        LegendItemCollection items = new LegendItemCollection();
        if (!spec.legendNote().isEmpty()) {
            items.add(new LegendItem(spec.legendNote(), null, null, null, false, new Line2D.Double(), false,
                    Color.WHITE, false, Color.WHITE, style.markerEdge(), false, new Line2D.Double(-9, 0, 9, 0),
                    style.markerEdge(), Color.WHITE));
        }
        for (int i = 0; i < spec.series().size(); i++) {
            Series s = spec.series().get(i);
            if (s.label().isEmpty()) {
                continue;
            }
            boolean marker = s.kind().hasMarkers();
            for (int j = 0; j < spec.series().size() && !marker; j++) {
                Series o = spec.series().get(j);
                marker = j != i && slots[j] == slots[i] && o.label().isEmpty() && o.kind().hasMarkers();
            }
            Color colour = style.colour(slots[i]);
            LegendItem item = new LegendItem(s.label(), null, null, null, marker, style.marker(slots[i]), true,
                    colour, true, Color.WHITE, style.markerEdge(), s.kind().hasLine(),
                    new Line2D.Double(-9, 0, 9, 0), style.line(slots[i]), colour);
            items.add(item);
        }
        for (int k : linesInLegend) {
            ReferenceLine r = spec.referenceLines().get(k);
            items.add(new LegendItem(label(spec, r), null, null, null, false, new Line2D.Double(), false,
                    Color.WHITE, false, Color.WHITE, style.markerEdge(), true, new Line2D.Double(-9, 0, 9, 0),
                    style.referenceLine(), ChartStyle.REFERENCE));
        }
        return items;
    }

    private LegendTitle legend(LegendItemSource source, LegendPosition position) {
        LegendTitle legend = new ScriptedLegendTitle(source);
        legend.setItemFont(style.legendFont());
        legend.setItemPaint(ChartStyle.INK);
        legend.setFrame(BlockBorder.NONE);
        legend.setItemLabelPadding(new RectangleInsets(0.6, 2.0, 0.6, 4));
        legend.setLegendItemGraphicPadding(new RectangleInsets(0.6, 1, 0.6, 0));
        if (position == LegendPosition.BELOW || position == LegendPosition.RIGHT) {
            legend.setBackgroundPaint(Color.WHITE);
            legend.setPosition(position == LegendPosition.BELOW ? RectangleEdge.BOTTOM : RectangleEdge.RIGHT);
            legend.setVerticalAlignment(VerticalAlignment.CENTER);
            legend.setMargin(new RectangleInsets(3, 3, 0, 0));
        } else {
            legend.setBackgroundPaint(ChartStyle.LEGEND_BACKGROUND);
            legend.setPosition(RectangleEdge.RIGHT);
            legend.setPadding(new RectangleInsets(1.5, 2.5, 1.5, 2.5));
        }
        return legend;
    }

    private void stylePlot(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlineVisible(false);
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        // room above the plot for half of the top tick label
        plot.setInsets(new RectangleInsets(5, 2, 2, 2));
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

    private static void collectLabels(ChartSpec spec, Series s, List<DataAreaText.PointLabel> into) {
        Axis yAxis = spec.yAxis(s.axis());
        for (int i = 0; i < s.pointLabels().size(); i++) {
            ScriptedText text = ScriptedText.parse(s.pointLabels().get(i));
            if (!text.isEmpty() && AxisRanges.showable(spec.xAxis(), s.xAt(i)) && AxisRanges.showable(yAxis, s.yAt(i))) {
                into.add(new DataAreaText.PointLabel(s.xAt(i), s.yAt(i), s.axis(), text));
            }
        }
    }

    /**
     * Draws a reference line and collects its label for placing, or (labels == null) leaves the
     * label to the legend.
     */
    private void addReferenceLine(XYPlot plot, ChartSpec spec, int index, int rendererIndex,
            List<DataAreaText.LineLabel> labels) {
        ReferenceLine r = spec.referenceLines().get(index);
        Axis axis = r.vertical() ? spec.xAxis() : spec.yAxis(r.axis());
        if (!AxisRanges.showable(axis, r.value())) {
            return;
        }
        ValueMarker marker = new ValueMarker(r.value(), ChartStyle.REFERENCE, style.referenceLine());
        if (r.vertical()) {
            plot.addDomainMarker(rendererIndex, marker, Layer.BACKGROUND);
        } else {
            plot.addRangeMarker(rendererIndex, marker, Layer.BACKGROUND);
        }
        if (!r.label().isEmpty() && labels != null) {
            labels.add(new DataAreaText.LineLabel(index, r, ScriptedText.parse(label(spec, r))));
        }
    }

    /** @return the label of a reference line; with two vertical axes it says which it is read on */
    private static String label(ChartSpec spec, ReferenceLine r) {
        if (!r.vertical() && spec.secondaryYAxis() != null) {
            return r.label() + (r.axis() == YAxisSide.SECONDARY ? " (right axis)" : " (left axis)");
        }
        return r.label();
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
