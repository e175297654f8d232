package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.cli.StellabarCommand;
import org.stellabar.output.PythonChecks;
import org.stellabar.scenario.ScenarioReader;
import org.stellabar.scenario.ScenarioStar;
import org.w3c.dom.Node;
import picocli.CommandLine;

/**
 * The main job end to end: {@code stellabar model} with no scenario runs the built-in demo twice
 * into two folders; every file must be there, identical between the runs, and readable by
 * independent tools (astropy for FITS, nbformat and nbconvert for the notebook, poppler for PDF).
 */
class DemoRunTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;

    private static Path first;
    private static Path second;

    @BeforeAll
    static void runTheDemoTwice() {
        first = dir.resolve("first");
        second = dir.resolve("second");
        for (Path out : List.of(first, second)) {
            CommandLine cl = StellabarCommand.commandLine();
            StringWriter o = new StringWriter();
            StringWriter e = new StringWriter();
            cl.setOut(new PrintWriter(o));
            cl.setErr(new PrintWriter(e));
            // every table format, so that every table of the demo is checked in each
            int code = cl.execute("model", "--out", out.toString(), "--table-formats", "csv,ecsv,fits,votable,json");
            assertEquals(0, code, e.toString());
            assertTrue(o.toString().contains("notebook"), o.toString());
            assertTrue(e.toString().contains("star 10/10"), "a progress line per star: " + e);
        }
    }

    /**
     * The two invented oxygen cores on the fermi equation of state: the hotter, heavier one is
     * pair-unstable (negative post-Newtonian margin, verdict unstable), the other stable; the
     * summary's metadata names the stars that used the fermi equation of state.
     */
    @Test
    void summaryShowsOnePairUnstableCoreAndOneStable() throws IOException {
        JsonNode summary = JSON.readTree(first.resolve("summary.json").toFile());
        java.util.Map<String, JsonNode> columns = new java.util.HashMap<>();
        for (JsonNode c : summary.get("columns")) {
            columns.put(c.get("name").asText(), c.get("values"));
        }
        java.util.List<String> names = new java.util.ArrayList<>();
        columns.get("name").forEach(n -> names.add(n.asText()));
        int hot = names.indexOf("Cinderhollow Core");
        int cool = names.indexOf("Emberwick Core");
        assertTrue(columns.get("gr_margin").get(hot).asDouble() < 0.0);
        assertEquals("unstable", columns.get("verdict").get(hot).asText());
        assertTrue(columns.get("gr_margin").get(cool).asDouble() > 0.0);
        assertEquals("stable", columns.get("verdict").get(cool).asText());
        assertTrue(Files.readString(first.resolve("summary.csv"))
                .contains("electrons = fermi for: Cinderhollow Core, Emberwick Core"));
    }

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            return s.filter(Files::isRegularFile).map(root::relativize).sorted().toList();
        }
    }

    private static List<Path> withExtension(String extension) throws IOException {
        return files(first).stream().filter(p -> p.toString().endsWith("." + extension)).map(first::resolve).toList();
    }

    @Test
    void everyStarHasItsProfilesAndChartsInEveryWidthAndFormat() {
        for (ScenarioStar star : ScenarioReader.builtInDemo().stars()) {
            String slug = FileNames.slug(star.name());
            assertTrue(Files.exists(first.resolve("stars").resolve(slug + ".csv")), slug);
            for (String ext : List.of("fits", "ecsv", "vot", "json")) {
                assertTrue(Files.exists(first.resolve("stars").resolve(slug + "." + ext)), slug + "." + ext);
            }
            for (String figure : List.of("structure", "support", "exponents", "gradients")) {
                for (String width : List.of("1col", "2col")) {
                    for (String ext : List.of("png", "svg", "pdf")) {
                        Path chart = first.resolve("charts").resolve(slug + "-" + figure + "-" + width + "." + ext);
                        assertTrue(Files.exists(chart), chart.toString());
                    }
                }
            }
        }
        // the invented catalogue of observed stars runs with the demo (profiles/demo-catalogue.csv)
        for (String chart : List.of("observed-hr", "observed-eddington")) {
            for (String width : List.of("1col", "2col")) {
                for (String ext : List.of("png", "svg", "pdf")) {
                    Path file = first.resolve("observed").resolve("charts").resolve(chart + "-" + width + "." + ext);
                    assertTrue(Files.exists(file), file.toString());
                }
            }
        }
        for (String name : List.of("observed/observed.csv", "observed/observed.json", "observed/observed.fits",
                "summary.csv", "summary.json", "summary.fits", "demo-cluster.ipynb",
                "charts/cluster-support-2col.pdf", "charts/cluster-stability-1col.png", "charts/rho-T-plane-2col.svg")) {
            assertTrue(Files.exists(first.resolve(name)), name);
        }
    }

    @Test
    void aSecondRunWritesByteIdenticalFiles() throws IOException {
        List<Path> a = files(first);
        assertEquals(a, files(second));
        assertTrue(a.size() > 150, "files: " + a.size());
        for (Path p : a) {
            assertArrayEquals(Files.readAllBytes(first.resolve(p)), Files.readAllBytes(second.resolve(p)), p.toString());
        }
        assertFalse(a.stream().anyMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary files left");
    }

    @Test
    void pngChartsHaveJournalWidthsAt300Dpi() throws IOException {
        for (Path png : withExtension("png")) {
            try (ImageInputStream in = ImageIO.createImageInputStream(png.toFile())) {
                Iterator<ImageReader> readers = ImageIO.getImageReaders(in);
                ImageReader reader = readers.next();
                reader.setInput(in);
                BufferedImage image = reader.read(0);
                // 3.5 in and 7.2 in at 300 dpi
                int expected = png.toString().contains("-1col") ? 1050 : 2160;
                assertEquals(expected, image.getWidth(), png.toString());
                IIOMetadata meta = reader.getImageMetadata(0);
                Node phys = find(meta.getAsTree("javax_imageio_png_1.0"), "pHYs");
                // 300 dots per inch = 11811 dots per metre (PNG records metres)
                assertEquals("11811", phys.getAttributes().getNamedItem("pixelsPerUnitXAxis").getNodeValue());
                assertEquals("meter", phys.getAttributes().getNamedItem("unitSpecifier").getNodeValue());
                reader.dispose();
            }
        }
    }

    private static Node find(Node node, String name) {
        if (node.getNodeName().equals(name)) {
            return node;
        }
        for (Node c = node.getFirstChild(); c != null; c = c.getNextSibling()) {
            Node found = find(c, name);
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    @Test
    void svgChartsParseAsXml() throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        for (Path svg : withExtension("svg")) {
            assertEquals("svg", f.newDocumentBuilder().parse(svg.toFile()).getDocumentElement().getNodeName());
        }
    }

    @Test
    void pdfChartsAreWellFormedAndCarryGreekLetters() throws IOException {
        for (Path pdf : withExtension("pdf")) {
            PythonChecks.Outcome info = PythonChecks.run(Duration.ofSeconds(60), dir, Map.of(), "/usr/bin/pdfinfo",
                    pdf.toString());
            assertEquals(0, info.exitCode(), pdf + ": " + info.describe());
            assertTrue(info.stdout().matches("(?s).*Pages:\\s+1\\s.*"), info.stdout());
        }
        Path plane = first.resolve("charts/rho-T-plane-1col.pdf");
        PythonChecks.Outcome text = PythonChecks.run(Duration.ofSeconds(60), dir, Map.of(), "/usr/bin/pdftotext",
                plane.toString(), "-");
        assertEquals(0, text.exitCode(), text.describe());
        assertTrue(text.stdout().contains("ρ") && text.stdout().contains("β"), text.stdout());
    }

    @Test
    void astropyReadsEveryFitsFileWithOurColumnsAndUnits() throws IOException {
        PythonChecks.requireModules("astropy", "numpy");
        ObjectNode request = JSON.createObjectNode();
        ArrayNode files = request.putArray("files");
        List<Path> fitsFiles = withExtension("fits");
        assertEquals(12, fitsFiles.size(), "ten star profiles, the summary and the observed catalogue");
        Map<Path, Map<String, String>> expected = new java.util.HashMap<>();
        for (Path fits : fitsFiles) {
            Path csv = fits.resolveSibling(fits.getFileName().toString().replace(".fits", ".csv"));
            Map<String, String> units = unitsFromCsvHeader(csv);
            expected.put(fits, units);
            String file = fits.getFileName().toString();
            String hdu = file.equals("summary.fits") ? "summary" : file.equals("observed.fits") ? "observed" : "profile";
            ObjectNode unitNode = files.addObject().put("path", fits.toString()).putArray("hdus").addObject()
                    .put("name", hdu).putObject("units");
            units.forEach(unitNode::put);
        }
        Path requestFile = dir.resolve("fits-request.json");
        JSON.writeValue(requestFile.toFile(), request);
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(180), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("read_fits_with_astropy.py").toString(), requestFile.toString());
        assertEquals(0, o.exitCode(), o.describe());
        for (JsonNode f : JSON.readTree(o.stdout()).get("files")) {
            assertFalse(f.has("error"), () -> f.get("path") + ": " + f.get("error"));
            Map<String, String> units = expected.get(Path.of(f.get("path").asText()));
            List<String> names = new ArrayList<>();
            for (JsonNode c : f.get("hdus").get(0).get("columns")) {
                names.add(c.get("name").asText());
                if (units.containsKey(c.get("name").asText())) {
                    assertTrue(c.get("same_unit").asBoolean(), f.get("path") + " " + c);
                }
            }
            assertEquals(new ArrayList<>(units.keySet()), names.stream().filter(units::containsKey).toList());
        }
    }

    /**
     * Every unit string of every table file the demo writes (CSV headers and column lines, ECSV,
     * FITS TUNITn and card units, VOTable, JSON) is one written spelling of our unit table, parses
     * without a warning with astropy's generic, FITS and CDS parsers to the factor our table gives
     * it, and a column has one unit across the formats of one table.
     */
    @Test
    void everyUnitTheDemoWritesIsOneAstropyReadsAsOurs() throws IOException {
        PythonChecks.requireModules("astropy");
        ObjectNode unitTable = JSON.createObjectNode();
        for (org.stellabar.physics.Unit u : org.stellabar.physics.Unit.values()) {
            String spelling = u.written().orElse("");
            if (!spelling.isEmpty()) {
                String base = u.dimension().map(d -> org.stellabar.physics.Unit.of(d.cgsUnit()).orElseThrow()
                        .written().orElseThrow()).orElse(spelling);
                unitTable.putArray(spelling).add(u.cgsFactor()).add(base);
            }
        }
        Path tableFile = dir.resolve("unit-table.json");
        JSON.writeValue(tableFile.toFile(), unitTable);
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(180), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("check_units_with_astropy.py").toString(), tableFile.toString(), first.toString());
        assertEquals(0, o.exitCode(), o.describe());
        JsonNode result = JSON.readTree(o.stdout());
        assertEquals(0, result.get("problems").size(), result.get("problems").toString());
        assertTrue(result.get("files").asInt() >= 20, result.toString());
        List<String> units = new ArrayList<>();
        result.get("units").forEach(n -> units.add(n.asText()));
        assertTrue(units.containsAll(List.of("g/cm3", "erg/cm3", "K", "solMass", "solRad", "cm/s")), units.toString());
    }

    /**
     * astropy reads every ECSV and VOTable file of the demo (warnings are errors) with the same
     * columns, units (astropy equality), values and integer types as the FITS file of the same
     * table, a description on every column and the title in the metadata; UCDs in the IVOA
     * vocabulary.
     */
    @Test
    void astropyReadsEveryEcsvAndVotableFileLikeItsFits() throws IOException {
        PythonChecks.requireModules("astropy", "numpy");
        List<String> args = new ArrayList<>(List.of(PythonChecks.PYTHON,
                PythonChecks.resource("read_tables_with_astropy.py").toString()));
        int count = 0;
        for (String ext : List.of("ecsv", "vot")) {
            List<Path> tables = withExtension(ext);
            assertEquals(12, tables.size(), "ten star profiles, the summary and the observed catalogue as " + ext);
            for (Path t : tables) {
                Path fits = t.resolveSibling(t.getFileName().toString().replaceFirst("\\.[a-z]+$", ".fits"));
                assertTrue(Files.exists(fits), fits.toString());
                args.add(t.toString());
                args.add(fits.toString());
                count++;
            }
        }
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(300), dir, Map.of(), args.toArray(String[]::new));
        assertEquals(0, o.exitCode(), o.describe());
        JsonNode files = JSON.readTree(o.stdout()).get("files");
        assertEquals(count, files.size());
        for (JsonNode f : files) {
            assertEquals(0, f.get("problems").size(), f.toString());
            assertTrue(f.get("columns").size() >= 10, f.get("path").asText());
        }
    }

    /** Numeric columns' units as the CSV header writes them: "rho [g/cm3]" → rho → g/cm3, "beta" → "". */
    private static Map<String, String> unitsFromCsvHeader(Path csv) throws IOException {
        Map<String, String> units = new java.util.LinkedHashMap<>();
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        String header = lines.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        String firstRow = lines.get(lines.indexOf(header) + 1);
        String[] cells = header.split(",");
        String[] values = firstRow.split(",");
        for (int i = 0; i < cells.length; i++) {
            boolean numeric = values[i].matches("[-+0-9.eE]+");
            String cell = cells[i].strip();
            int bracket = cell.indexOf(" [");
            String name = bracket < 0 ? cell : cell.substring(0, bracket);
            String unit = bracket < 0 ? "" : cell.substring(bracket + 2, cell.length() - 1);
            if (numeric) {
                units.put(name, unit);
            }
        }
        return units;
    }

    @Test
    void theNotebookValidatesStrictlyAndRunsToTheEnd() throws IOException {
        PythonChecks.requireModules("nbformat", "nbconvert", "nbclient", "ipykernel", "matplotlib", "numpy");
        Path notebook = first.resolve("demo-cluster.ipynb");
        PythonChecks.Outcome v = PythonChecks.run(Duration.ofSeconds(60), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("validate_notebooks.py").toString(), notebook.toString());
        assertEquals(0, v.exitCode(), v.describe());
        for (JsonNode r : JSON.readTree(v.stdout()).get("files")) {
            assertFalse(r.has("error"), r.toString());
            assertEquals(4, r.get("nbformat").asInt());
            assertEquals(5, r.get("nbformat_minor").asInt());
        }
        PythonChecks.Outcome run = PythonChecks.run(Duration.ofSeconds(400), first,
                // the inline back end renders each figure, so drawing errors surface (Agg would not draw)
                Map.of("MPLBACKEND", "module://matplotlib_inline.backend_inline",
                        "JUPYTER_RUNTIME_DIR", dir.resolve("runtime").toString(), "PYDEVD_DISABLE_FILE_VALIDATION", "1"),
                PythonChecks.PYTHON, "-m", "jupyter", "nbconvert", "--to", "notebook", "--execute",
                "--ExecutePreprocessor.timeout=300", "--output", dir.resolve("executed.ipynb").toString(),
                notebook.toString());
        assertEquals(0, run.exitCode(), run.describe());
        JsonNode executed = JSON.readTree(dir.resolve("executed.ipynb").toFile());
        int images = 0;
        for (JsonNode cell : executed.get("cells")) {
            for (JsonNode output : cell.path("outputs")) {
                assertFalse("error".equals(output.path("output_type").asText()), output.toString());
                if (output.path("data").has("image/png")) {
                    images++;
                }
            }
        }
        assertTrue(images >= 10, "plots drawn: " + images);
    }
}
