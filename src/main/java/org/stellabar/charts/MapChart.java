package org.stellabar.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Paint;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.DefaultXYZDataset;
import org.stellabar.output.AtomicFiles;

/**
 * Draws a {@link MapSpec}: one block per grid node, coloured by value, a colour bar on the right,
 * the contour in black. Colours: a diverging scale from blue (negative) through near-white (zero)
 * to red (positive) for margins, so the sign reads at a glance and survives greyscale as dark
 * against light; a sequential dark-to-light scale otherwise. Nodes without a value are mid grey.
 */
public final class MapChart {

    /** Colour of a node without a value (a failed model). */
    static final Color NO_VALUE = new Color(0x9A9A9A);
    private static final Color[] DIVERGING = {new Color(0x2B4C9B), new Color(0x8FB3DE), new Color(0xF4F1EC),
        new Color(0xE9A27C), new Color(0xA3262A)};
    private static final Color[] SEQUENTIAL = {new Color(0x1F1B4D), new Color(0x3D5D93), new Color(0x3F9A8E),
        new Color(0xA6CF6A), new Color(0xF3EC9E)};

    private final FigureSize size;
    private final ChartStyle style;

    /** @param size the printed size */
    public MapChart(FigureSize size) {
        this.size = size;
        this.style = new ChartStyle(size);
    }

    /**
     * Writes one file.
     *
     * @param spec the map
     * @param format the image format
     * @param target the file
     * @throws IOException when it cannot be written
     */
    public void write(MapSpec spec, ChartFormat format, Path target) throws IOException {
        JFreeChart chart = render(spec);
        AtomicFiles.write(target, out -> format.writer().write(chart, size, "", out));
    }

    /**
     * @param spec the map
     * @return the chart
     */
    public JFreeChart render(MapSpec spec) {
        int nx = spec.x().length;
        int ny = spec.y().length;
        double[] xs = new double[nx * ny];
        double[] ys = new double[nx * ny];
        double[] zs = new double[nx * ny];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        int k = 0;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                xs[k] = spec.x()[i];
                ys[k] = spec.y()[j];
                zs[k] = spec.values()[i][j];
                if (!Double.isNaN(zs[k])) {
                    lo = Math.min(lo, zs[k]);
                    hi = Math.max(hi, zs[k]);
                }
                k++;
            }
        }
        if (lo > hi) {
            lo = 0.0;
            hi = 1.0;
        }
        if (spec.diverging()) {
            double m = Math.max(Math.abs(lo), Math.abs(hi));
            lo = m == 0.0 ? -1.0 : -m;
            hi = m == 0.0 ? 1.0 : m;
        } else if (lo == hi) {
            double pad = lo == 0.0 ? 1.0 : Math.abs(lo) * 0.01;
            lo -= pad;
            hi += pad;
        }
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries("map", new double[][] {xs, ys, zs});

        XYBlockRenderer blocks = new XYBlockRenderer();
        blocks.setBlockWidth(step(spec.x()));
        blocks.setBlockHeight(step(spec.y()));
        Scale scale = new Scale(lo, hi, spec.diverging() ? DIVERGING : SEQUENTIAL);
        blocks.setPaintScale(scale);

        NumberAxis xAxis = axis(spec.xLabel(), spec.x());
        NumberAxis yAxis = axis(spec.yLabel(), spec.y());
        XYPlot plot = new XYPlot(data, xAxis, yAxis, blocks);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlineVisible(true);
        plot.setOutlinePaint(ChartStyle.INK);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        BasicStroke contour = new BasicStroke(style.lineWidth() * 1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        for (double[] s : spec.contour()) {
            blocks.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], contour, Color.BLACK));
        }

        JFreeChart chart = new JFreeChart(null, style.titleFont(), plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(3, 3, 3, 3));
        chart.setTextAntiAlias(true);
        chart.setAntiAlias(true);
        NumberAxis scaleAxis = new NumberAxis(spec.scaleLabel());
        scaleAxis.setRange(lo, hi);
        scaleAxis.setLabelFont(style.axisTitleFont());
        scaleAxis.setTickLabelFont(style.tickFont());
        PaintScaleLegend legend = new PaintScaleLegend(scale, scaleAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setStripWidth(size.fontPoints());
        legend.setAxisOffset(2.0);
        legend.setMargin(new RectangleInsets(4, 6, 4, 0));
        legend.setBackgroundPaint(Color.WHITE);
        chart.addSubtitle(legend);
        return chart;
    }

    private NumberAxis axis(String label, double[] nodes) {
        NumberAxis axis = new NumberAxis(label);
        double min = Math.min(nodes[0], nodes[nodes.length - 1]);
        double max = Math.max(nodes[0], nodes[nodes.length - 1]);
        double half = step(nodes) / 2.0;
        axis.setRange(min - half, max + half);
        axis.setAutoRangeIncludesZero(false);
        axis.setLabelFont(style.axisTitleFont());
        axis.setTickLabelFont(style.tickFont());
        axis.setLabelPaint(ChartStyle.INK);
        axis.setTickLabelPaint(ChartStyle.INK);
        return axis;
    }

    /** The distance between neighbouring nodes as plotted; 1 for a single node. */
    private static double step(double[] nodes) {
        return nodes.length < 2 ? 1.0 : Math.abs(nodes[nodes.length - 1] - nodes[0]) / (nodes.length - 1);
    }

    /** Piecewise-linear interpolation between a few anchor colours. */
    private static final class Scale implements PaintScale {
        private final double lower;
        private final double upper;
        private final Color[] anchors;

        Scale(double lower, double upper, Color[] anchors) {
            this.lower = lower;
            this.upper = upper;
            this.anchors = anchors.clone();
        }

        @Override
        public double getLowerBound() {
            return lower;
        }

        @Override
        public double getUpperBound() {
            return upper;
        }

        @Override
        public Paint getPaint(double value) {
            if (Double.isNaN(value)) {
                return NO_VALUE;
            }
            double f = Math.max(0.0, Math.min(1.0, (value - lower) / (upper - lower)));
            double position = f * (anchors.length - 1);
            int a = Math.min((int) Math.floor(position), anchors.length - 2);
            double t = position - a;
            Color c0 = anchors[a];
            Color c1 = anchors[a + 1];
            return new Color(mix(c0.getRed(), c1.getRed(), t), mix(c0.getGreen(), c1.getGreen(), t),
                    mix(c0.getBlue(), c1.getBlue(), t));
        }

        private static int mix(int a, int b, double t) {
            return (int) Math.round(a + (b - a) * t);
        }

        @Override
        public String toString() {
            return String.format(Locale.US, "Scale[%s, %s]", lower, upper);
        }
    }
}
