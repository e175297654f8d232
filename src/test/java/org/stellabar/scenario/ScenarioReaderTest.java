package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Optional;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarRequest;
import org.stellabar.eos.Composition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.Constants;

/** What a valid scenario file turns into: units, defaults, composition forms, kinds. */
class ScenarioReaderTest {

    private static ScenarioStar onlyStar(String body) {
        Scenario s = ScenarioReader.read("units.toml", "[[star]]\nname = \"A\"\n" + body + "\n");
        assertEquals(1, s.stars().size());
        return s.stars().get(0);
    }

    /**
     * Quantities with units are converted to CGS by the factors of physics.Units (IAU 2015 solar
     * values); a bare number is CGS, an integer arrives as a TOML integer. Relative tolerance 1e-15:
     * one multiplication by a factor, a few ulp at most.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "mass = \"45 Msun\"|45|MSUN",
        "mass = \"2e31 kg\"|2e34|G",
        "mass = 4e34|4e34|G",
        "mass = \"2e33 g\"|2e33|G"})
    void massUnits(String line, double number, String unit) {
        ScenarioStar s = onlyStar(line + "\nradius = 1e11");
        double expected = unit.equals("MSUN") ? number * Constants.SOLAR_MASS : number;
        assertEquals(expected, s.request().mass(), 1e-15 * expected);
    }

    /** A TOML integer is at most 9.2e18, in grams far below any star: refused where it stands. */
    @Test
    void integerGramsAreBelowTheSupportedMasses() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> onlyStar("mass = 9000000000000000000\nradius = 1e11"));
        assertTrue(e.getMessage().contains(":3:8:") && e.getMessage().contains("outside the supported"),
                e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "radius = \"12 Rsun\"|8.3484e11",      // 12 x 6.957e10 cm (IAU 2015 nominal solar radius)
        "radius = \"6e6 km\"|6e11",
        "radius = 700000000000|7e11",
        "radius = 7.5e11|7.5e11"})
    void radiusUnits(String line, double expectedCm) {
        assertEquals(expectedCm, ScenarioTestSupport.radius(onlyStar("mass = 1e34\n" + line)).getAsDouble(), 1e-15 * expectedCm);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "central_temperature = \"3.5e7 K\"|3.5e7",
        "central_temperature = \"35 MK\"|3.5e7",
        "central_temperature = 35000000|3.5e7"})
    void centralTemperatureUnits(String line, double expectedK) {
        ScenarioStar s = onlyStar("kind = \"isentropic\"\nmass = \"60 Msun\"\n" + line);
        assertEquals(expectedK, ScenarioTestSupport.centralTemperature(s).getAsDouble(), 1e-15 * expectedK);
        assertTrue(ScenarioTestSupport.radius(s).isEmpty());
        assertTrue(ScenarioTestSupport.entropyPerBaryon(s).isEmpty());
    }

    @Test
    void entropyPerBaryonIsAPlainNumber() {
        ScenarioStar s = onlyStar("kind = \"isentropic\"\nmass = \"60 Msun\"\nentropy_per_baryon = 25");
        assertEquals(25.0, ScenarioTestSupport.entropyPerBaryon(s).getAsDouble(), 0.0);
        assertEquals(StarKind.isentropic, s.request().kind());
    }

    @Test
    void builtInDefaultsApplyWhenTheFileSaysNothing() {
        ScenarioStar s = onlyStar("mass = 1e34\nradius = 1e11");
        assertEquals(StarKind.standard, s.request().kind());
        assertEquals(Composition.DEFAULT, s.request().composition());
        assertEquals(0.70, s.request().composition().X(), 0.0);
        assertEquals(0.02, s.request().composition().Z(), 0.0);
        assertEquals(StarRequest.DEFAULT_POINTS, s.request().points());
        assertEquals(EnumSet.of(TableFormat.CSV, TableFormat.ECSV, TableFormat.FITS), s.outputs(), "ECSV is a default");
        assertEquals(EnumSet.allOf(ChartGroup.class), s.charts());
        assertTrue(ScenarioTestSupport.index(s).isEmpty());
        assertEquals("", s.note());
    }

    @Test
    void defaultsTableAppliesAndAStarReplacesIt() {
        String toml = """
                name = "with-defaults"
                chart_formats = ["pdf"]
                notebook = false

                [defaults]
                composition = { X = 0.75, Y = 0.25 }
                points = 50
                outputs = ["fits", "json"]
                charts = ["support"]

                [[star]]
                name = "Plain"
                mass = 1e34
                radius = 1e11

                [[star]]
                name = "Own"
                mass = 1e34
                radius = 1e11
                points = 60
                outputs = []
                charts = ["structure", "gradients"]
                [star.composition]
                mu = 0.6
                """;
        Scenario s = ScenarioReader.read("d.toml", toml);
        assertEquals(EnumSet.of(ChartFormat.PDF), s.options().chartFormats());
        assertFalse(s.options().notebook());
        ScenarioStar plain = s.star("plain").orElseThrow();
        assertEquals(0.75, plain.request().composition().X(), 0.0);
        assertEquals(0.0, plain.request().composition().Z(), 0.0);
        assertEquals(50, plain.request().points());
        assertEquals(EnumSet.of(TableFormat.FITS, TableFormat.JSON), plain.outputs());
        assertEquals(EnumSet.of(ChartGroup.SUPPORT), plain.charts());
        ScenarioStar own = s.star("Own").orElseThrow();
        assertEquals(0.6, own.request().composition().mu(), 1e-15);
        assertTrue(own.request().composition().fromMu());
        assertEquals(60, own.request().points());
        assertTrue(own.outputs().isEmpty());
        assertEquals(EnumSet.of(ChartGroup.STRUCTURE, ChartGroup.GRADIENTS), own.charts());
    }

    @Test
    void tableFormatsChooseTheRunsTablesAndTheStarsUnlessOutputsSaysOtherwise() {
        String toml = """
                table_formats = ["votable", "csv"]

                [[star]]
                name = "Plain"
                mass = 1e34
                radius = 1e11

                [[star]]
                name = "Own"
                mass = 1e34
                radius = 1e11
                outputs = ["json"]
                """;
        Scenario s = ScenarioReader.read("t.toml", toml);
        assertEquals(java.util.Optional.of(EnumSet.of(TableFormat.CSV, TableFormat.VOTABLE)), s.options().tableFormats());
        assertEquals(EnumSet.of(TableFormat.CSV, TableFormat.VOTABLE), s.star("Plain").orElseThrow().outputs());
        assertEquals(EnumSet.of(TableFormat.JSON), s.star("Own").orElseThrow().outputs());
        Scenario all = s.withTableFormats(EnumSet.of(TableFormat.ECSV));
        assertEquals(EnumSet.of(TableFormat.ECSV), all.star("Own").orElseThrow().outputs(), "the command line wins");
        assertTrue(ScenarioReader.read("n.toml", "[[star]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n").options()
                .tableFormats().isEmpty());
    }

    /**
     * Composition forms reach eos.Composition unchanged: 1/μ = 2X + 3Y/4 + Z/2 (metal ions
     * neglected), and with A_Z counted 1/μ = 2X + 3Y/4 + Z/2 + Z/A_Z. Tolerance 1e-14: a few
     * floating-point operations.
     */
    @Test
    void compositionForms() {
        ScenarioStar derivedY = onlyStar("mass = 1e34\nradius = 1e11\ncomposition = { X = 0.76, Z = 1e-4 }");
        assertEquals(0.2399, derivedY.request().composition().Y(), 1e-14);
        ScenarioStar withMetals = onlyStar("mass = 1e34\nradius = 1e11\n"
                + "composition = { X = 0.70, Z = 0.02, metal_mass_number = 16 }");
        double inverseMu = 2 * 0.70 + 0.75 * 0.28 + 0.5 * 0.02 + 0.02 / 16;
        assertEquals(1.0 / inverseMu, withMetals.request().composition().mu(), 1e-14);
        ScenarioStar integers = onlyStar("mass = 1e34\nradius = 1e11\ncomposition = { X = 1, Z = 0 }");
        assertEquals(0.5, integers.request().composition().mu(), 1e-15);
    }

    @Test
    void scenarioNameDefaultsToTheFileStem(@TempDir Path dir) throws IOException {
        Path path = dir.resolve("my run #2.toml");
        Files.writeString(path, "[[star]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n");
        Scenario s = ScenarioReader.read(path);
        assertEquals("my run -2", s.name());
        assertEquals(Optional.of(path), s.path());
        assertEquals(path.toString(), s.source());
    }

    @Test
    void byteOrderMarkIsIgnored() {
        Scenario s = ScenarioReader.read("bom.toml", "\uFEFFname = \"b\"\n[[star]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n");
        assertEquals("b", s.name());
    }

    @Test
    void inlineArrayOfStarTablesIsTheSameAsDoubleBrackets() {
        Scenario inline = ScenarioReader.read("i.toml",
                "star = [ { name = \"A\", mass = 1e34, radius = 1e11 }, { name = \"B\", mass = 2e34, radius = 2e11 } ]\n");
        Scenario brackets = ScenarioReader.read("b.toml",
                "[[star]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n[[star]]\nname = \"B\"\nmass = 2e34\nradius = 2e11\n");
        assertEquals(brackets.stars(), inline.stars());
    }
}
