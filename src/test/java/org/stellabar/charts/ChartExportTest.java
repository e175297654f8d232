package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The exported files, checked with independent readers: ImageIO for PNG, the JDK's XML parser for
 * SVG, poppler's pdfinfo/pdftotext/pdffonts for PDF (Debian package poppler-utils, installed by
 * .ci/run).
 */
class ChartExportTest {

    @TempDir
    Path dir;

    /** Greek in plain labels (axis titles, legend): these stay text in PDF and SVG. */
    private static ChartSpec greekChart() {
        double[] rho = {1e-3, 1e-1, 10, 1e3};
        return ChartSpec.of(Axis.log("ρ", "g/cm3"), Axis.linear("β", ""))
                .withSecondaryYAxis(Axis.linear("Γ_1", ""))
                .withSeries(Series.line("β", rho, new double[] {0.9, 0.8, 0.7, 0.6}))
                .withSeries(Series.line("Γ_1", rho, new double[] {1.55, 1.5, 1.45, 1.4}).onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "Γ_1 = 4/3").onSecondaryAxis());
    }

    static Stream<Arguments> sizes() {
        return Stream.of(Arguments.of(FigureSize.ONE_COLUMN, 1050, 788), Arguments.of(FigureSize.TWO_COLUMN, 2160, 1350));
    }

    @ParameterizedTest
    @MethodSource("sizes")
    void pngHasThePrintedSizeAt300DpiAndSaysSo(FigureSize size, int width, int height) throws IOException {
        Path png = dir.resolve("chart.png");
        new ChartExporter(size).write(greekChart(), ChartFormat.PNG, png);
        BufferedImage image = ImageIO.read(png.toFile());
        // width_in × 300 and height_in × 300, rounded to whole pixels
        assertEquals(width, image.getWidth());
        assertEquals(height, image.getHeight());
        try (ImageInputStream in = ImageIO.createImageInputStream(png.toFile())) {
            ImageReader reader = ImageIO.getImageReaders(in).next();
            reader.setInput(in);
            IIOMetadata meta = reader.getImageMetadata(0);
            Element root = (Element) meta.getAsTree("javax_imageio_png_1.0");
            Element phys = (Element) root.getElementsByTagName("pHYs").item(0);
            assertEquals("meter", phys.getAttribute("unitSpecifier"));
            double dpiX = Double.parseDouble(phys.getAttribute("pixelsPerUnitXAxis")) * 0.0254;
            double dpiY = Double.parseDouble(phys.getAttribute("pixelsPerUnitYAxis")) * 0.0254;
            // pHYs stores whole pixels per metre: 11811 px/m is 299.9994 dpi
            assertEquals(300, dpiX, 0.01);
            assertEquals(300, dpiY, 0.01);
            reader.dispose();
        }
    }

    @Test
    void svgIsWellFormedXmlAndByteIdenticalBetweenRuns() throws Exception {
        Path first = dir.resolve("a.svg");
        Path second = dir.resolve("b.svg");
        new ChartExporter(FigureSize.ONE_COLUMN).write(ExampleCharts.densityTemperaturePlane(), ChartFormat.SVG, first);
        new ChartExporter(FigureSize.ONE_COLUMN).write(ExampleCharts.densityTemperaturePlane(), ChartFormat.SVG, second);
        byte[] a = Files.readAllBytes(first);
        assertArrayEquals(a, Files.readAllBytes(second));

        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        // no DOCTYPE at all: nothing for a reader to fetch
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(a));
        Element svg = doc.getDocumentElement();
        assertEquals("svg", svg.getLocalName());
        assertEquals(SvgChartWriter.SVG_NS, svg.getNamespaceURI());
        assertEquals("3.5in", svg.getAttribute("width"));
        assertEquals("0 0 252 189", svg.getAttribute("viewBox"));
        NodeList texts = doc.getElementsByTagNameNS(SvgChartWriter.SVG_NS, "text");
        StringBuilder all = new StringBuilder();
        for (int i = 0; i < texts.getLength(); i++) {
            all.append(texts.item(i).getTextContent()).append('\n');
        }
        // scripts are set as separate runs of text in a smaller font: "ρ [g cm", "−3", "]"
        assertTrue(all.toString().contains("ρ [g cm\n\u22123\n]"), all.toString());
        assertTrue(all.toString().contains("β = 0.9"), all.toString());
        String text = new String(a, StandardCharsets.UTF_8);
        assertTrue(text.contains("id=\"" + SvgChartWriter.ID_PREFIX), "ids carry the fixed prefix");
    }

    @Test
    void pdfIsWellFormedWithEmbeddedFontAndGreekAsText() throws Exception {
        Path pdf = dir.resolve("chart.pdf");
        new ChartExporter(FigureSize.ONE_COLUMN).write(greekChart(), ChartFormat.PDF, pdf);
        String info = run("pdfinfo", pdf.toString());
        assertTrue(info.matches("(?s).*Pages:\\s+1\\R.*"), info);
        assertTrue(info.matches("(?s).*Page size:\\s+252 x 189 pts.*"), info);
        String fonts = run("pdffonts", pdf.toString());
        assertTrue(fonts.contains("DejaVuSans") && fonts.matches("(?s).*Identity-H\\s+yes\\s+yes\\s+yes.*"), fonts);
        String text = run("pdftotext", "-enc", "UTF-8", pdf.toString(), "-");
        for (String greek : List.of("ρ", "β", "Γ")) {
            assertTrue(text.contains(greek), greek + " missing from the PDF text:\n" + text);
        }
        // every script stays text: the exponent and the subscript are in the PDF's text
        assertTrue(text.contains("g cm") && text.contains("\u22123") && text.matches("(?s).*Γ\\s*1.*"), text);
        assertTrue(!text.contains("?"), "no replacement characters:\n" + text);
        Path again = dir.resolve("again.pdf");
        new ChartExporter(FigureSize.ONE_COLUMN).write(greekChart(), ChartFormat.PDF, again);
        assertArrayEquals(Files.readAllBytes(pdf), Files.readAllBytes(again), "equal charts give equal PDFs");
    }

    @Test
    void nonPositiveValuesOnLogAxesRenderInEveryFormat() throws IOException {
        ChartSpec spec = ChartSpec.of(Axis.log("r/R", ""), Axis.log("P", "dyn/cm2"))
                .withSeries(Series.line("P", new double[] {0, 0.25, 0.5, 0.75, 1}, new double[] {1e17, 5e16, 0, -3, 0}))
                .withSeries(Series.points("none showable", new double[] {-1, 0}, new double[] {1, 2}))
                .withReferenceLine(ReferenceLine.vertical(0, "centre"))
                .withReferenceLine(ReferenceLine.horizontal(-1, "below zero"));
        List<Path> files = new ChartExporter(FigureSize.ONE_COLUMN).write(spec, dir, "log", EnumSet.allOf(ChartFormat.class));
        assertEquals(3, files.size());
        for (Path p : files) {
            assertTrue(Files.size(p) > 500, p.toString());
        }
        run("pdfinfo", dir.resolve("log.pdf").toString());
    }

    @Test
    void failedExportLeavesTheOldFileAndNoPartialOne() throws IOException {
        Path target = dir.resolve("kept.png");
        Files.writeString(target, "old");
        ChartSpec broken = ChartSpec.of(Axis.linear("x", ""), Axis.linear("y", ""))
                .withSecondaryYAxis(Axis.linear("z", ""))
                .withSeries(Series.line("y", new double[] {1, 2}, new double[] {1, 2}));
        ChartExporter exporter = new ChartExporter(FigureSize.ONE_COLUMN);
        assertThrows(IllegalArgumentException.class, () -> exporter.write(broken, ChartFormat.PNG, target));
        assertEquals("old", Files.readString(target));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
        assertThrows(IllegalArgumentException.class,
                () -> exporter.write(greekChart(), dir, "../escape", EnumSet.of(ChartFormat.SVG)));
    }

    /** Runs a poppler tool; it must exist (CI installs poppler-utils) and succeed. */
    private static String run(String... command) throws IOException {
        Process p;
        try {
            p = new ProcessBuilder(command).redirectErrorStream(true).start();
        } catch (IOException e) {
            throw new AssertionError(command[0] + " not found: install the Debian package poppler-utils", e);
        }
        try {
            byte[] out = p.getInputStream().readAllBytes();
            if (!p.waitFor(60, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError(command[0] + " did not finish");
            }
            String text = new String(out, StandardCharsets.UTF_8);
            assertEquals(0, p.exitValue(), command[0] + " failed:\n" + text);
            return text;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError(e);
        }
    }
}
