package org.stellabar.charts;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import org.jfree.chart.JFreeChart;

/**
 * PNG at 300 dots per inch: the chart is laid out in points at its printed size and drawn scaled
 * by 300/72, and the resolution is stored in the pHYs chunk (PNG specification, 2nd edition,
 * W3C 2003, §11.3.5.3: pixels per metre), so that page-layout programs place it at its size.
 */
final class PngChartWriter implements ChartWriter {

    /** Dots per inch. */
    static final int DPI = 300;
    private static final double METRES_PER_INCH = 0.0254;

    @Override
    public void write(JFreeChart chart, FigureSize size, String title, OutputStream out) throws IOException {
        int width = (int) Math.round(size.widthInches() * DPI);
        int height = (int) Math.round(size.heightInches() * DPI);
        BufferedImage image = canvas(width, height);
        Graphics2D g2 = image.createGraphics();
        try {
            g2.setColor(Color.WHITE);
            g2.fillRect(0, 0, width, height);
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g2.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g2.scale(DPI / 72.0, DPI / 72.0);
            chart.draw(g2, new Rectangle2D.Double(0, 0, size.widthPoints(), size.heightPoints()));
        } finally {
            g2.dispose();
        }

        PngEncoder.write(image, Math.round(DPI / METRES_PER_INCH), title, out);
    }

    /**
     * The images this thread drew into, by size, kept for its next chart of that size: a chart
     * at 300 dpi is a 3-12 MB raster, and allocating one per file made the demo's garbage
     * collections copy them, with the other core idle for the pause (a quarter of a second in
     * all). Every pixel is painted white before each chart, so a kept image draws the same
     * pixels as a new one. Softly held: the memory goes back when the heap needs it.
     */
    private static final ThreadLocal<java.lang.ref.SoftReference<java.util.Map<Long, BufferedImage>>> CANVASES =
            new ThreadLocal<>();

    private static BufferedImage canvas(int width, int height) {
        java.lang.ref.SoftReference<java.util.Map<Long, BufferedImage>> held = CANVASES.get();
        java.util.Map<Long, BufferedImage> bySize = held == null ? null : held.get();
        if (bySize == null) {
            bySize = new java.util.HashMap<>();
            CANVASES.set(new java.lang.ref.SoftReference<>(bySize));
        }
        return bySize.computeIfAbsent(((long) width << 32) | height,
                k -> new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB));
    }
}
