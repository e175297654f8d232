package org.stellabar.charts;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import java.io.OutputStream;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.jfree.chart.JFreeChart;
import org.stellabar.table.Version;

/**
 * PDF through PDFBox and its Graphics2D bridge, one page of the printed size. The bundled chart
 * font is embedded as a subset (Type 0, Identity-H with a ToUnicode map), so Greek letters, ∇
 * and the minus sign show as themselves and can be searched and copied; text with sub- or
 * superscripts is drawn as outlines. No creation date is written, so equal charts give equal
 * files.
 */
final class PdfChartWriter implements ChartWriter {

    /**
     * The bundled font parsed once per thread, not once per file (parsing it was a sixth of a
     * chart's cost); a parsed font reads its tables lazily and is not safe to share between
     * threads. The embedded subset is the same either way.
     */
    private static final ThreadLocal<TrueTypeFont> FONT = ThreadLocal.withInitial(() -> {
        try (InputStream in = BundledFont.openStream()) {
            return new TTFParser().parse(new RandomAccessReadBuffer(in.readAllBytes()));
        } catch (IOException e) {
            throw new UncheckedIOException("chart font cannot be read", e);
        }
    });

    @Override
    public void write(JFreeChart chart, FigureSize size, String title, OutputStream out) throws IOException {
        float width = (float) size.widthPoints();
        float height = (float) size.heightPoints();
        try (PDDocument document = new PDDocument()) {
            PDPage page = new PDPage(new PDRectangle(width, height));
            document.addPage(page);
            PdfBoxGraphics2DFontTextDrawer fonts = new PdfBoxGraphics2DFontTextDrawer();
            PDFont embedded = PDType0Font.load(document, FONT.get(), true);
            fonts.registerFont(BundledFont.atSize(1).getFontName(), embedded);
            PdfBoxGraphics2D g2 = new PdfBoxGraphics2D(document, width, height);
            try {
                g2.setFontTextDrawer(fonts);
                chart.draw(g2, new Rectangle2D.Double(0, 0, width, height));
            } finally {
                g2.dispose();
            }
            PDFormXObject drawing = g2.getXFormObject();
            try (PDPageContentStream content = new PDPageContentStream(document, page)) {
                content.drawForm(drawing);
            }
            PDDocumentInformation info = document.getDocumentInformation();
            if (!title.isEmpty()) {
                info.setTitle(title);
            }
            info.setCreator("stellabar " + Version.current());
            // PDFBox seeds the trailer /ID from the clock unless given a seed; a seed from the
            // title and size makes equal charts give equal files
            document.setDocumentId((long) java.util.Objects.hash(title, size));
            document.save(out);
        }
    }
}
