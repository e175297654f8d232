package org.stellabar.charts;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.batik.svggen.DefaultErrorHandler;
import org.apache.batik.svggen.DefaultExtensionHandler;
import org.apache.batik.svggen.DefaultStyleHandler;
import org.apache.batik.svggen.ImageHandlerBase64Encoder;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.apache.batik.svggen.SVGIDGenerator;
import org.jfree.chart.JFreeChart;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * SVG through Apache Batik's SVG generator. Output is byte-identical for identical charts: ids
 * come from per-document counters under a fixed prefix, and nothing time- or machine-dependent
 * is written. The drawing is in points; the root element states the printed size in inches.
 * Plain text stays text (font family "DejaVu Sans", falling back to any sans-serif font), text
 * with sub- or superscripts is drawn as outlines.
 */
final class SvgChartWriter implements ChartWriter {

    static final String SVG_NS = "http://www.w3.org/2000/svg";
    /** Prefix of every generated id, so that several charts can share one HTML page. */
    static final String ID_PREFIX = "stellabar-";
    /** DejaVu Sans first; Bitstream Vera Sans has the same Latin metrics, Verdana similar ones. */
    static final String FONT_STACK =
            "font-family=\"'DejaVu Sans', 'Bitstream Vera Sans', Verdana, sans-serif\"";

    @Override
    public void write(JFreeChart chart, FigureSize size, String title, OutputStream out) throws IOException {
        Document document = Dom.IMPLEMENTATION.createDocument(SVG_NS, "svg", null);
        SVGGraphics2D g2 = new SVGGraphics2D(new Context(document), false);
        chart.draw(g2, new java.awt.geom.Rectangle2D.Double(0, 0, size.widthPoints(), size.heightPoints()));

        Element root = g2.getRoot();
        root.setAttribute("width", inches(size.widthInches()));
        root.setAttribute("height", inches(size.heightInches()));
        root.setAttribute("viewBox", "0 0 " + number(size.widthPoints()) + " " + number(size.heightPoints()));
        if (!title.isEmpty()) {
            Element t = document.createElementNS(SVG_NS, "title");
            t.setTextContent(title);
            root.insertBefore(t, root.getFirstChild());
        }
        StringWriter text = new StringWriter();
        g2.stream(root, text, false, false);
        g2.dispose();
        Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        writer.write(finish(text.toString()));
        writer.flush();
    }

    /**
     * Drops the SVG 1.0 document type (SVG 1.1 and 2 need none, and a reader would try to fetch
     * its DTD from the network), states the encoding, and gives every font family a fallback list.
     */
    static String finish(String svg) {
        StringBuilder out = new StringBuilder(svg.length() + 4096);
        int at = 0;
        // the document type and the white space after it (as the pattern <!DOCTYPE[^>]*>\s*)
        int doctype = svg.indexOf("<!DOCTYPE");
        int doctypeEnd = doctype < 0 ? -1 : svg.indexOf('>', doctype);
        if (doctypeEnd >= 0) {
            int next = doctypeEnd + 1;
            while (next < svg.length() && isPatternSpace(svg.charAt(next))) {
                next++;
            }
            svg = svg.substring(0, doctype) + svg.substring(next);
        }
        String declaration = "<?xml version=\"1.0\"?>";
        if (svg.startsWith(declaration)) {
            out.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
            at = declaration.length();
        }
        // every font-family="…" attribute (as the pattern font-family="[^"]*"), in one pass: the
        // regular expressions over each whole file were a hundredth of the demo's time
        String attribute = "font-family=\"";
        for (int found = svg.indexOf(attribute, at); found >= 0; found = svg.indexOf(attribute, at)) {
            int close = svg.indexOf('"', found + attribute.length());
            if (close < 0) {
                break;
            }
            out.append(svg, at, found).append(FONT_STACK);
            at = close + 1;
        }
        return out.append(svg, at, svg.length()).toString();
    }

    /** The characters \s matches in a Java pattern: space, \t, \n, \u000B, \f, \r. */
    private static boolean isPatternSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    private static String inches(double v) {
        return number(v) + "in";
    }

    private static String number(double v) {
        return new java.math.BigDecimal(String.format(Locale.US, "%.4f", v)).stripTrailingZeros().toPlainString();
    }

    /**
     * The XML implementation documents are made with, looked up once: finding the factory (a
     * service lookup in the class path) and making a parser were a fiftieth of the demo's time
     * when done per file. A DOM implementation only makes new documents, each its own.
     */
    private static final class Dom {
        static final org.w3c.dom.DOMImplementation IMPLEMENTATION = lookUp();

        private static org.w3c.dom.DOMImplementation lookUp() {
            try {
                return DocumentBuilderFactory.newInstance().newDocumentBuilder().getDOMImplementation();
            } catch (ParserConfigurationException e) {
                throw new IllegalStateException("no XML document builder available", e);
            }
        }
    }

    /**
     * Batik's default generator context (as {@code SVGGeneratorContext.createDefault} makes it)
     * with our ids, no comment, no embedded fonts, and coordinates at precision 4 written by
     * {@link SvgCoordinates} instead of the {@code DecimalFormat} Batik shares between all
     * contexts (the same texts, faster, and no lock shared by the threads exporting charts).
     */
    private static final class Context extends SVGGeneratorContext {
        private static final SvgCoordinates COORDINATES = new SvgCoordinates();

        Context(Document document) {
            super(document);
            setIDGenerator(new PrefixedIds());
            setExtensionHandler(new DefaultExtensionHandler());
            setImageHandler(new ImageHandlerBase64Encoder());
            setStyleHandler(new DefaultStyleHandler());
            setErrorHandler(new DefaultErrorHandler());
            setComment(null);
            setEmbeddedFontsOn(false);
            setPrecision(4);
            // after setPrecision, which sets the shared format for precision 4
            decimalFormat = COORDINATES;
        }
    }

    /** Batik's counters, under our fixed prefix. */
    private static final class PrefixedIds extends SVGIDGenerator {
        @Override
        public String generateID(String prefix) {
            return super.generateID(ID_PREFIX + prefix);
        }
    }
}
