package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.FileOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;
import nom.tam.util.FitsOutputStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * astropy, an independent FITS reader, reads what {@link FitsWriter} writes: column names, every
 * value bit for bit, units that mean the same as ours, header keywords with numbers as numbers,
 * all with Python warnings turned into errors. One Python run per class (see
 * read_fits_with_astropy.py), including a control file that astropy must reject, which shows
 * that the check can fail.
 */
class FitsAstropyCheckTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;

    private static Table profile;
    private static Table alpha;
    private static Table beta;
    private static JsonNode report;

    @BeforeAll
    static void writeFilesAndReadThemWithAstropy() throws IOException, FitsException {
        PythonChecks.requireModules("astropy", "numpy");
        profile = FitsSamples.table("profile", 2024);
        alpha = FitsSamples.table("alpha", 1);
        beta = FitsSamples.table("beta", 2);
        FitsWriter writer = new FitsWriter();
        writer.write(profile, dir.resolve("profile.fits"));
        writer.write(List.of(alpha, beta), dir.resolve("two.fits"));
        writer.write(FitsSamples.summary(), dir.resolve("summary.fits"));
        writeControlWithRawUnit(dir.resolve("control.fits"));

        ObjectNode request = JSON.createObjectNode();
        request.put("write_foreign", dir.resolve("foreign.fits").toString());
        ArrayNode files = request.putArray("files");
        addFile(files, "profile.fits", profile);
        addFile(files, "two.fits", alpha, beta);
        addFile(files, "summary.fits", FitsSamples.table("profile", 11));
        files.addObject().put("path", dir.resolve("control.fits").toString()).putArray("hdus").addObject()
                .put("name", "control");
        Path requestFile = dir.resolve("request.json");
        JSON.writeValue(requestFile.toFile(), request);

        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(120), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("read_fits_with_astropy.py").toString(), requestFile.toString());
        assertEquals(0, o.exitCode(), o.describe());
        report = JSON.readTree(o.stdout());
    }

    private static void addFile(ArrayNode files, String name, Table... tables) {
        ObjectNode file = files.addObject().put("path", dir.resolve(name).toString());
        ArrayNode hdus = file.putArray("hdus");
        for (Table t : tables) {
            ObjectNode units = hdus.addObject().put("name", t.name()).putObject("units");
            for (Column c : t.columns()) {
                if (c instanceof NumberColumn) {
                    units.put(c.name(), c.unit());
                }
            }
        }
    }

    /** What a careless writer would do: our unit string "Msun" straight into TUNIT1. */
    private static void writeControlWithRawUnit(Path file) throws IOException, FitsException {
        Fits fits = new Fits();
        fits.addHDU(new nom.tam.fits.NullDataHDU());
        BinaryTable t = new BinaryTable();
        t.addColumn(new double[] {1, 2});
        BinaryTableHDU hdu = t.toHDU();
        hdu.setColumnName(0, "M", null);
        hdu.getHeader().addValue("TUNIT1", "Msun", null);
        hdu.getHeader().addValue("EXTNAME", "control", null);
        fits.addHDU(hdu);
        try (FitsOutputStream out = new FitsOutputStream(new FileOutputStream(file.toFile()))) {
            fits.write(out);
        }
    }

    private static JsonNode file(String name) {
        for (JsonNode f : report.get("files")) {
            if (f.get("path").asText().endsWith(name)) {
                assertFalse(f.has("error") && !name.equals("control.fits"), () -> name + ": " + f.get("error"));
                return f;
            }
        }
        throw new AssertionError("no report for " + name);
    }

    private static JsonNode hdu(String fileName, String hduName) {
        for (JsonNode h : file(fileName).get("hdus")) {
            if (h.get("name").asText().equals(hduName)) {
                return h;
            }
        }
        throw new AssertionError("no report for " + fileName + "[" + hduName + "]");
    }

    @Test
    void astropyReadsNamesValuesAndUnitsAsWritten() {
        assertSameTable(profile, hdu("profile.fits", "profile"));
    }

    @Test
    void astropyReadsEveryExtensionByName() {
        assertEquals(List.of("PRIMARY", "alpha", "beta"), texts(file("two.fits").get("hdu_names")));
        assertSameTable(alpha, hdu("two.fits", "alpha"));
        assertSameTable(beta, hdu("two.fits", "beta"));
    }

    @Test
    void astropySeesMetadataWithNumbersAsNumbers() {
        JsonNode meta = hdu("profile.fits", "profile").get("meta");
        assertEquals("profile", meta.get("EXTNAME").asText());
        assertEquals("stellabar " + profile.metadata().toolVersion(), meta.get("CREATOR").asText());
        assertTrue(meta.get("STELLABAR INPUT MASS").isDouble(), meta.toString());
        assertEquals(40.0, meta.get("STELLABAR INPUT MASS").asDouble());
        assertEquals(0.7, meta.get("STELLABAR INPUT X").asDouble());
        assertTrue(meta.get("STELLABAR INPUT INDEX").isInt());
        assertEquals(3, meta.get("STELLABAR INPUT INDEX").asInt());
        assertEquals("standard", meta.get("STELLABAR INPUT KIND").asText());
        assertEquals("15 MK", meta.get("STELLABAR INPUT CENTRAL_T").asText());
        assertTrue(meta.get("STELLABAR INPUT POINTS").isInt(), meta.toString());
        assertEquals(org.stellabar.physics.Constants.RELEASE, meta.get("STELLABAR CONSTANTS").asText());
        String comments = String.join(" ", texts(hdu("profile.fits", "profile").get("comments")));
        assertTrue(comments.contains("note: made-up numbers for a transport test, not a star"), comments);
    }

    @Test
    void astropyReadsTheMassInputAsANumberWithItsUnit() {
        JsonNode h = hdu("profile.fits", "profile");
        assertTrue(h.get("meta").get("STELLABAR INPUT M").isDouble(), h.get("meta").toString());
        assertEquals(7.953639482792202e34, h.get("meta").get("STELLABAR INPUT M").asDouble());
        assertEquals("g", h.get("card_units").get("STELLABAR INPUT M").asText(), h.get("card_units").toString());
        assertEquals(40.0, h.get("meta").get("STELLABAR INPUT M_MSUN").asDouble());
        assertEquals("solMass", h.get("card_units").get("STELLABAR INPUT M_MSUN").asText());
        assertEquals("solRad", h.get("card_units").get("STELLABAR INPUT RADIUS").asText());
        assertFalse(h.get("card_units").has("STELLABAR INPUT X"), "no unit, no brackets");
    }

    @Test
    void astropyReadsTheSummaryInThePrimaryHeader() {
        JsonNode primary = file("summary.fits").get("primary");
        assertEquals(40.0, primary.get("STELLABAR MASS").asDouble());
        assertEquals(1.234567890123e17, primary.get("STELLABAR P_C").asDouble());
        assertEquals(7, primary.get("STELLABAR SHELLS").asInt());
        assertTrue(primary.get("STELLABAR STABLE").asBoolean());
        assertEquals(0.6153846153846154, primary.get("STELLABAR COMPOSITION MU").asDouble());
        assertEquals("radiation_dominated: radiation pressure exceeds gas pressure",
                primary.get("STELLABAR WARNINGS 1").asText());
        assertSameTable(FitsSamples.table("profile", 11), hdu("summary.fits", "profile"));
    }

    @Test
    void theCheckRejectsAUnitAstropyDoesNotKnow() {
        JsonNode control = file("control.fits");
        assertTrue(control.has("error"), "astropy must refuse TUNIT 'Msun' when warnings are errors: " + control);
        assertTrue(control.get("error").asText().contains("UnitsWarning"), control.get("error").asText());
    }

    /**
     * The reader against a file astropy wrote the way another program might. Expected values are
     * those written by write_foreign in read_fits_with_astropy.py.
     */
    @Test
    void readerMapsAProfileWrittenByAstropy() throws IOException {
        FitsTable t = FitsTableReader.read(dir.resolve("foreign.fits"));
        assertEquals("STRUCTURE", t.extensionName());
        assertEquals(2, t.hduIndex(), "the image HDU before it is passed over");
        assertEquals(3, t.rowCount());
        assertEquals(List.of("radius", "density", "pressure", "temperature", "counts", "shell", "si_density"),
                t.columns().stream().map(FitsColumn::name).toList());
        assertEquals("Rsun", t.column("radius").orElseThrow().unit());
        assertEquals("g/cm3", t.column("density").orElseThrow().unit());
        assertEquals("dyn/cm2", t.column("pressure").orElseThrow().unit());
        assertEquals("K", t.column("temperature").orElseThrow().unit());
        FitsColumn si = t.column("si_density").orElseThrow();
        assertEquals("kg m-3", si.unit(), "a unit we do not map is kept as written");
        assertFalse(si.unitKnown());
        // float32 values come back as the nearest float, widened exactly to double
        assertArrayEquals(new double[] {0.1f, 0.5f, 1.0f}, t.values("radius"));
        assertArrayEquals(new double[] {150.0, 1.5, 1e-7}, t.values("density"));
        assertArrayEquals(new double[] {0, 40000, 65535}, t.values("counts"), "TZERO applied");
        double[] shell = t.values("shell");
        assertEquals(5, shell[0]);
        assertTrue(Double.isNaN(shell[1]), "TNULL entry reads as NaN");
        assertEquals(7, shell[2]);
        assertEquals(List.of("core", "envelope", ""), t.textColumns().get("zone"));
        assertEquals(Map.of("converged", "logical values", "abundances", "array of 3 values per row"),
                t.skipped());
        assertEquals("20.0", t.keywords().get("MASS"));
    }

    private static void assertSameTable(Table expected, JsonNode read) {
        List<String> names = new ArrayList<>();
        for (JsonNode c : read.get("columns")) {
            names.add(c.get("name").asText());
        }
        assertEquals(expected.columns().stream().map(Column::name).toList(), names);
        for (JsonNode c : read.get("columns")) {
            Column col = expected.column(c.get("name").asText()).orElseThrow();
            if (col instanceof NumberColumn n) {
                assertTrue(c.get("same_unit").asBoolean(), () -> "astropy's unit " + c.get("unit")
                        + " is not our " + n.unit() + " for " + n.name());
                if (n.unit().isEmpty()) {
                    assertNull(c.get("unit").textValue(), n.name());
                }
                double[] values = n.values();
                JsonNode v = c.get("values");
                assertEquals(values.length, v.size());
                for (int i = 0; i < values.length; i++) {
                    // JSON carries Python's repr, the shortest decimal that reads back exactly.
                    assertEquals(Double.doubleToRawLongBits(values[i]),
                            Double.doubleToRawLongBits(v.get(i).asDouble()), n.name() + " row " + i);
                }
            } else {
                // astropy masks empty strings when reading FITS (reported as null)
                List<String> ascii = ((TextColumn) col).values().stream().map(FitsText::ascii)
                        .map(s -> s.isEmpty() ? null : s).toList();
                assertEquals(ascii, texts(c.get("values")), col.name());
            }
        }
    }

    private static List<String> texts(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(n -> out.add(n.isNull() ? null : n.asText()));
        return out;
    }
}
