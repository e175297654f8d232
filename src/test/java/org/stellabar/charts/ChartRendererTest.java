package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

class ChartRendererTest {

    private final ChartRenderer renderer = new ChartRenderer(FigureSize.ONE_COLUMN);

    @Test
    void twoYQuantitiesGoToTwoAxes() {
        JFreeChart chart = renderer.render(ExampleCharts.twoAxisProfile());
        XYPlot plot = chart.getXYPlot();
        assertEquals(2, plot.getRangeAxisCount());
        assertEquals(0, plot.getRangeAxisIndex(plot.getRangeAxisForDataset(0)));
        assertEquals(1, plot.getRangeAxisIndex(plot.getRangeAxisForDataset(1)));
        assertEquals("Γ₁", plot.getRangeAxis(1).getLabel());
        // the 4/3 line lies on the secondary axis, inside its range
        assertTrue(plot.getRangeAxis(1).getRange().contains(4.0 / 3.0));
        assertEquals(1, plot.getRangeMarkers(1, org.jfree.chart.ui.Layer.BACKGROUND).size());
        assertEquals(2, plot.getLegendItems().getItemCount());
    }

    @Test
    void eachSeriesHasItsOwnLookAndEqualSlotsLookEqual() {
        double[] x = {1, 2, 3};
        ChartSpec spec = ChartSpec.of(Axis.linear("x", ""), Axis.linear("y", ""))
                .withSeries(Series.line("model", x, x))
                .withSeries(Series.line("other", x, new double[] {2, 3, 4}))
                .withSeries(Series.points("objects", x, x).withStyleSlot(0));
        XYPlot plot = renderer.render(spec).getXYPlot();
        XYItemRenderer a = plot.getRenderer(0);
        XYItemRenderer b = plot.getRenderer(1);
        XYItemRenderer c = plot.getRenderer(2);
        assertFalse(a.getSeriesPaint(0).equals(b.getSeriesPaint(0)));
        assertFalse(a.getSeriesStroke(0).equals(b.getSeriesStroke(0)), "dash patterns differ for greyscale");
        assertEquals(a.getSeriesPaint(0), c.getSeriesPaint(0));
        assertEquals(a.getSeriesShape(0), c.getSeriesShape(0));
    }

    @Test
    void logAxisDropsNonPositivePointsAndBreaksTheLine() {
        ChartSpec spec = ChartSpec.of(Axis.linear("r/R", ""), Axis.log("ρ", "g/cm3"))
                .withSeries(Series.line("ρ", new double[] {0, 0.5, 1}, new double[] {10, 1, 0}));
        XYPlot plot = renderer.render(spec).getXYPlot();
        XYDataset data = plot.getDataset(0);
        assertEquals(10, data.getYValue(0, 0));
        assertTrue(Double.isNaN(data.getYValue(0, 2)));
        LogAxis axis = (LogAxis) plot.getRangeAxis();
        assertTrue(axis.getLowerBound() > 0);
        assertFalse(axis.isAutoRange());
    }

    @Test
    void unlabelledSeriesStayOutOfTheLegendAndAxisTitlesAreTypesetFromMarkup() {
        double[] x = {0.1, 0.5, 0.9};
        ChartSpec spec = ChartSpec.of(Axis.linear("r/R", ""), Axis.linear("∇_{ad}", ""))
                .withSeries(Series.line("∇_{ad}", x, new double[] {0.3, 0.35, 0.4}))
                .withSeries(Series.line("", x, new double[] {0.25, 0.25, 0.25}));
        JFreeChart chart = renderer.render(spec);
        assertEquals(1, chart.getXYPlot().getLegendItems().getItemCount());
        // JFreeChart holds the plain name; the title is drawn from the markup with a subscript
        assertEquals("∇ad", chart.getXYPlot().getRangeAxis().getLabel());
        assertNull(chart.getXYPlot().getRangeAxis().getAttributedLabel());
        assertPaintsSomething(chart);
    }

    @Test
    void everyLegendPositionDraws() {
        for (LegendPosition p : LegendPosition.values()) {
            assertPaintsSomething(renderer.render(ExampleCharts.densityTemperaturePlane().withLegend(p)
                    .withTitle("ρ–T plane, ∇_{ad} test")));
        }
    }

    /** Draws the chart and checks that it is not blank: some dark pixels, a white corner. */
    static void assertPaintsSomething(JFreeChart chart) {
        BufferedImage image = new BufferedImage(252, 189, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        chart.draw(g2, new Rectangle2D.Double(0, 0, 252, 189));
        g2.dispose();
        int dark = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                Color c = new Color(image.getRGB(x, y));
                if (c.getRed() + c.getGreen() + c.getBlue() < 200) {
                    dark++;
                }
            }
        }
        assertTrue(dark > 200, "chart drew " + dark + " dark pixels");
        assertEquals(Color.WHITE.getRGB(), image.getRGB(251, 188));
    }
}
