package org.stellabar.charts;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;
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
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
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

        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        // a memory-cached stream: no temporary file, and closing it leaves the caller's stream open
        try (ImageOutputStream ios = new MemoryCacheImageOutputStream(out)) {
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata metadata = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image),
                    param);
            recordResolution(metadata, title);
            writer.setOutput(ios);
            writer.write(null, new IIOImage(image, null, metadata), param);
        } finally {
            writer.dispose();
        }
    }

    private static void recordResolution(IIOMetadata metadata, String title) throws IIOInvalidTreeException {
        String pixelsPerMetre = Long.toString(Math.round(DPI / METRES_PER_INCH));
        IIOMetadataNode phys = new IIOMetadataNode("pHYs");
        phys.setAttribute("pixelsPerUnitXAxis", pixelsPerMetre);
        phys.setAttribute("pixelsPerUnitYAxis", pixelsPerMetre);
        phys.setAttribute("unitSpecifier", "meter");
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
        root.appendChild(phys);
        if (!title.isEmpty()) {
            IIOMetadataNode entry = new IIOMetadataNode("iTXtEntry");
            entry.setAttribute("keyword", "Title");
            entry.setAttribute("compressionFlag", "FALSE");
            entry.setAttribute("compressionMethod", "0");
            entry.setAttribute("languageTag", "");
            entry.setAttribute("translatedKeyword", "");
            entry.setAttribute("text", title);
            IIOMetadataNode itxt = new IIOMetadataNode("iTXt");
            itxt.appendChild(entry);
            root.appendChild(itxt);
        }
        metadata.mergeTree("javax_imageio_png_1.0", root);
    }
}
