package org.stellabar.charts;

import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * The figure check: what a referee's eye would catch, read back from the files a chart writes.
 *
 * <ul>
 *   <li>From the PDF, through {@code pdftotext -bbox} (poppler-utils; the check fails, it does
 *       not skip, when the tool is missing): every word lies on the page, no two words overlap,
 *       and no word inside the plot covers a data point.</li>
 *   <li>From the SVG: each legend entry is one label, its pieces exactly the runs of its markup
 *       (no stray sub- or superscript fragment), base pieces on one baseline in one size, scripts
 *       smaller and raised or lowered.</li>
 * </ul>
 * Each method returns the problems found, one line each; an empty list is a pass.
 */
public final class FigureCheck {

    /**
     * Overlap below this, in points on each side, is two boxes touching: a script run starts
     * where its base run ends, and rounding of the word boxes leaves a few hundredths.
     */
    static final double TOUCH = 0.1;

    private static final Pattern PAGE = Pattern.compile("<page width=\"([\\d.]+)\" height=\"([\\d.]+)\"");
    private static final Pattern WORD = Pattern.compile(
            "<word xMin=\"([-\\d.]+)\" yMin=\"([-\\d.]+)\" xMax=\"([-\\d.]+)\" yMax=\"([-\\d.]+)\">([^<]*)</word>");

    private FigureCheck() {
    }

    /** One word as pdftotext lays it out. */
    public record Word(String text, Rectangle2D box) {
    }

    /** The page and its words. */
    public record Page(double width, double height, List<Word> words) {
    }

    /**
     * @param pdf a one-page PDF
     * @return its words with their boxes, in points from the top left corner
     * @throws AssertionError if pdftotext is missing or fails
     */
    public static Page read(Path pdf) throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder("pdftotext", "-bbox", pdf.toString(), "-").redirectErrorStream(true).start();
        } catch (IOException e) {
            throw new AssertionError("the figure check needs pdftotext (Debian package poppler-utils): " + e.getMessage(), e);
        }
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS) || p.exitValue() != 0) {
            throw new AssertionError("pdftotext failed on " + pdf + ":\n" + out);
        }
        Matcher page = PAGE.matcher(out);
        if (!page.find()) {
            throw new AssertionError("pdftotext gave no page for " + pdf + ":\n" + out);
        }
        List<Word> words = new ArrayList<>();
        Matcher w = WORD.matcher(out);
        while (w.find()) {
            double x0 = Double.parseDouble(w.group(1));
            double y0 = Double.parseDouble(w.group(2));
            words.add(new Word(unescape(w.group(5)), new Rectangle2D.Double(x0, y0,
                    Double.parseDouble(w.group(3)) - x0, Double.parseDouble(w.group(4)) - y0)));
        }
        return new Page(Double.parseDouble(page.group(1)), Double.parseDouble(page.group(2)), words);
    }

    private static String unescape(String s) {
        return s.replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&#39;", "'")
                .replace("&amp;", "&");
    }

    /** @return words that stick out of the page and pairs of words that overlap */
    public static List<String> layoutProblems(Page page) {
        List<String> problems = new ArrayList<>();
        Rectangle2D sheet = new Rectangle2D.Double(0, 0, page.width(), page.height());
        for (Word w : page.words()) {
            if (!sheet.contains(w.box())) {
                problems.add("word \"" + w.text() + "\" " + box(w.box()) + " lies outside the page");
            }
        }
        List<Word> words = page.words();
        for (int i = 0; i < words.size(); i++) {
            for (int j = i + 1; j < words.size(); j++) {
                Rectangle2D a = words.get(i).box();
                Rectangle2D b = words.get(j).box();
                double ox = Math.min(a.getMaxX(), b.getMaxX()) - Math.max(a.getMinX(), b.getMinX());
                double oy = Math.min(a.getMaxY(), b.getMaxY()) - Math.max(a.getMinY(), b.getMinY());
                if (ox > TOUCH && oy > TOUCH) {
                    problems.add(String.format(java.util.Locale.ROOT, "words \"%s\" and \"%s\" overlap by %.2f x %.2f pt",
                            words.get(i).text(), words.get(j).text(), ox, oy));
                }
            }
        }
        return problems;
    }

    /**
     * @param page the words
     * @param points the data points on the page ({@link ChartRenderer#dataPointsOnPage})
     * @return words that cover a data point (a point strictly inside the box, by more than
     *     {@link #TOUCH})
     */
    public static List<String> coverProblems(Page page, List<Point2D> points) {
        List<String> problems = new ArrayList<>();
        for (Word w : page.words()) {
            Rectangle2D inner = new Rectangle2D.Double(w.box().getX() + TOUCH, w.box().getY() + TOUCH,
                    w.box().getWidth() - 2 * TOUCH, w.box().getHeight() - 2 * TOUCH);
            for (Point2D p : points) {
                if (inner.contains(p)) {
                    problems.add(String.format(java.util.Locale.ROOT, "word \"%s\" %s covers the data point (%.1f, %.1f)",
                            w.text(), box(w.box()), p.getX(), p.getY()));
                    break;
                }
            }
        }
        return problems;
    }

    /** A text element of an SVG: its characters, baseline, x and font size. */
    private record SvgText(String text, double x, double y, double size) {
    }

    /**
     * @param svg the SVG file
     * @param legend the legend entries in markup
     * @return entries not found in the SVG as one label made of exactly their runs
     */
    public static List<String> legendProblems(Path svg, List<String> legend) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(Files.readAllBytes(svg)));
        NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<SvgText> texts = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            Element e = (Element) nodes.item(i);
            texts.add(new SvgText(e.getTextContent(), Double.parseDouble(e.getAttribute("x")),
                    Double.parseDouble(e.getAttribute("y")), fontSize(e)));
        }
        List<String> problems = new ArrayList<>();
        for (String entry : legend) {
            List<Map.Entry<String, Integer>> pieces = ScriptedText.parse(entry).pieces();
            boolean found = false;
            for (int start = 0; start + pieces.size() <= texts.size() && !found; start++) {
                found = matches(texts.subList(start, start + pieces.size()), pieces);
            }
            if (!found) {
                problems.add("legend entry \"" + entry + "\" is not one label of the pieces " + pieces);
            }
        }
        return problems;
    }

    private static boolean matches(List<SvgText> run, List<Map.Entry<String, Integer>> pieces) {
        double baseSize = Double.NaN;
        double baseline = Double.NaN;
        for (int k = 0; k < pieces.size(); k++) {
            if (!run.get(k).text().equals(pieces.get(k).getKey())) {
                return false;
            }
            if (pieces.get(k).getValue() == 0) {
                if (!Double.isNaN(baseSize) && (run.get(k).size() != baseSize || Math.abs(run.get(k).y() - baseline) > 1e-3)) {
                    return false;
                }
                baseSize = run.get(k).size();
                baseline = run.get(k).y();
            }
            if (k > 0 && run.get(k).x() <= run.get(k - 1).x()) {
                return false;
            }
        }
        for (int k = 0; k < pieces.size(); k++) {
            int level = pieces.get(k).getValue();
            if (level != 0 && !Double.isNaN(baseSize)) {
                boolean smaller = run.get(k).size() < baseSize;
                boolean placed = level > 0 ? run.get(k).y() < baseline : run.get(k).y() > baseline;
                if (!smaller || !placed) {
                    return false;
                }
            }
        }
        return true;
    }

    private static double fontSize(Element e) {
        for (Node n = e; n instanceof Element el; n = n.getParentNode()) {
            String s = el.getAttribute("font-size");
            if (!s.isEmpty()) {
                return Double.parseDouble(s.replace("px", ""));
            }
        }
        return Double.NaN;
    }

    /** @return the legend entries of a chart, as the renderer writes them */
    public static List<String> legendEntries(ChartSpec spec) {
        List<String> entries = new ArrayList<>();
        if (!spec.legendNote().isEmpty()) {
            entries.add(spec.legendNote());
        }
        if (spec.legend() != LegendPosition.NONE) {
            spec.series().stream().map(Series::label).filter(l -> !l.isEmpty()).forEach(entries::add);
        }
        return entries;
    }

    private static String box(Rectangle2D b) {
        return String.format(java.util.Locale.ROOT, "[%.1f, %.1f – %.1f, %.1f]", b.getMinX(), b.getMinY(), b.getMaxX(),
                b.getMaxY());
    }
}
