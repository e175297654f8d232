package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class SequenceCommandTest {

    @Test
    void defaultRunHasHeadersWithUnits() {
        CliRun run = CliRun.of("sequence");
        assertEquals(0, run.exitCode(), run.err());
        String header = run.out().lines().findFirst().orElseThrow();
        for (String column : List.of("M [solMass]", "beta", "one_minus_beta", "L_over_L_Edd", "Gamma1_minus_4_3",
                "R_crit [solRad]", "rho_c_crit [g/cm3]", "T_c_crit [K]")) {
            assertTrue(header.contains(column), column + " in " + header);
        }
        assertEquals(62, run.out().lines().count());
    }

    // Identical output on every run (parallel rows, mass order), and bare numbers are solar masses.
    @Test
    void repeatableAndInMassOrder() {
        String[] args = {"sequence", "--mass-range", "0.1:1e8", "--steps", "300", "--format", "csv", "--mu", "0.6"};
        CliRun first = CliRun.of(args);
        CliRun second = CliRun.of(args);
        assertEquals(0, first.exitCode(), first.err());
        assertEquals(first.out(), second.out());
        List<String> rows = first.out().lines().skip(1).toList();
        assertEquals(300, rows.size());
        double previous = 0.0;
        for (String row : rows) {
            double mass = Double.parseDouble(row.split(",")[0]);
            assertTrue(mass > previous, row);
            previous = mass;
            assertFalse(row.contains("NaN") || row.contains("Infinity"), row);
        }
        assertEquals(0.1, Double.parseDouble(rows.get(0).split(",")[0]), 1e-15);
        assertEquals(1e8, Double.parseDouble(rows.get(299).split(",")[0]), 1e-7);
    }

    @Test
    void unitsInTheRange() {
        CliRun solar = CliRun.of("sequence", "--mass-range", "1 Msun:1e6 Msun", "--steps", "3", "--format", "csv");
        CliRun bare = CliRun.of("sequence", "--mass-range", "1:1e6", "--steps", "3", "--format", "csv");
        assertEquals(0, solar.exitCode(), solar.err());
        assertEquals(bare.out(), solar.out());
        CliRun grams = CliRun.of("sequence", "--mass-range", SOLAR_MASS + " g:" + 1e6 * SOLAR_MASS + " g", "--steps",
                "3", "--format", "csv");
        assertEquals(0, grams.exitCode(), grams.err());
        assertEquals(1.0, Double.parseDouble(grams.out().lines().skip(1).findFirst().orElseThrow().split(",")[0]),
                1e-15);
    }

    @Test
    void jsonAndOut(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("sequence", "--steps", "5", "--X", "0.7", "--Z", "0.02", "--format", "json", "--out",
                dir.toString());
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertEquals("sequence", root.get("name").asText());
        assertTrue(Files.readString(dir.resolve("sequence.csv")).startsWith("# "));
        new ObjectMapper().readTree(dir.resolve("sequence.json").toFile());
        assertTrue(run.err().contains("sequence.csv"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "--mass-range;10:1", "--mass-range;5:5", "--mass-range;0:10", "--mass-range;-1:10", "--mass-range;1:",
        "--mass-range;1-10", "--mass-range;1 K:10 K", "--mass-range;1:NaN", "--steps;1", "--steps;0"})
    void badInput(String option, String value) {
        CliRun run = CliRun.of("sequence", option, value);
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains(option), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertTrue(run.out().isEmpty());
    }

    @ParameterizedTest
    @ValueSource(strings = {"--mu=0.3", "--X=0.7"})
    void badComposition(String option) {
        CliRun run = CliRun.of("sequence", option);
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains(option.substring(0, option.indexOf('='))), run.err());
    }

    @Test
    void helpSaysBareNumbersAreSolarMasses() {
        CliRun run = CliRun.of("sequence", "--help");
        assertTrue(run.out().contains("SOLAR MASSES"), run.out());
        assertTrue(run.out().replaceAll("\\s+", " ").contains("(default: 61)"), run.out());
    }
}
