package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class PolytropeCommandTest {

    // The JSON carries the design's field names; n = 1 has closed forms ξ₁ = ω₁ = π
    // (Chandrasekhar 1939, ch. IV), so the numbers are checked too (1e-12, the solver's accuracy).
    @Test
    void jsonFieldsAndValues() throws Exception {
        CliRun run = CliRun.of("polytrope", "--index", "1", "--points", "11", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = new ObjectMapper().readTree(run.out());
        for (String field : List.of("n", "xi1", "dtheta_xi1", "omega_n", "rho_c_over_mean", "W_n", "profile")) {
            assertTrue(root.has(field), field + " in " + run.out());
        }
        assertEquals(Math.PI, root.get("xi1").asDouble(), 1e-12 * Math.PI);
        assertEquals(Math.PI, root.get("omega_n").asDouble(), 1e-12 * Math.PI);
        assertEquals(-1.0 / Math.PI, root.get("dtheta_xi1").asDouble(), 1e-12);
        JsonNode columns = root.get("profile").get("columns");
        assertEquals("xi", columns.get(0).get("name").asText());
        assertEquals(11, columns.get(0).get("values").size());
    }

    @Test
    void textShowsConstantsAndProfile() {
        CliRun run = CliRun.of("polytrope", "--index", "3");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("xi1"));
        assertTrue(run.out().contains("6.896849"), run.out());
        assertTrue(run.out().contains("profile (101 rows)"), run.out());
    }

    @Test
    void csvIsTheProfile() {
        CliRun run = CliRun.of("polytrope", "--index", "1.5", "--points", "5", "--format", "csv");
        assertEquals(0, run.exitCode(), run.err());
        String[] lines = run.out().split("\n");
        assertEquals(6, lines.length);
        assertTrue(lines[0].startsWith("xi,r_over_R,theta,dtheta_dxi,rho_over_rho_c,P_over_P_c,m_over_M"), lines[0]);
    }

    @Test
    void outWritesCsvAndJson(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("n3");
        CliRun run = CliRun.of("polytrope", "--index", "3", "--points", "21", "--format", "json", "--out",
                target.toString());
        assertEquals(0, run.exitCode(), run.err());
        Path csv = target.resolve("polytrope-n3-profile.csv");
        Path json = target.resolve("polytrope-n3-summary.json");
        assertTrue(Files.exists(csv) && Files.exists(json));
        List<String> lines = Files.readAllLines(csv);
        assertTrue(lines.get(0).startsWith("# "), lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("# note: xi1 = 6.89684861937")), String.join("\n", lines));
        assertEquals(21, lines.stream().filter(l -> !l.startsWith("#")).count() - 1);
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        assertEquals(2.018235951, root.get("omega_n").asDouble(), 1e-9);
        try (var files = Files.list(target)) {
            // the profile (CSV, ECSV), the summary and the chart in two widths x three formats; no temporary files
            assertEquals(3 + 6, files.count(), "no temporary files left behind");
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"5", "5.5", "-1", "NaN", "Infinity", "abc"})
    void badIndex(String index) {
        CliRun run = CliRun.of("polytrope", "--index", index);
        assertEquals(2, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertTrue(run.err().contains("--index"), run.err());
        assertTrue(run.out().isEmpty());
    }

    @Test
    void indexFiveSaysWhy() {
        CliRun run = CliRun.of("polytrope", "--index", "5");
        assertTrue(run.err().contains("infinite radius"), run.err());
    }

    @ParameterizedTest
    @ValueSource(strings = {"1", "0", "-3", "2000000"})
    void badPoints(String points) {
        CliRun run = CliRun.of("polytrope", "--index", "3", "--points", points);
        assertEquals(2, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains("--points"), run.err());
    }

    // A refused request leaves nothing on disk.
    @Test
    void badInputWritesNothing(@TempDir Path dir) {
        Path target = dir.resolve("never");
        CliRun run = CliRun.of("polytrope", "--index", "7", "--out", target.toString());
        assertEquals(2, run.exitCode());
        assertFalse(Files.exists(target));
    }

    @Test
    void helpNamesUnitsAndDefaults() {
        CliRun run = CliRun.of("polytrope", "--help");
        assertEquals(0, run.exitCode());
        assertTrue(run.out().contains("dimensionless"), run.out());
        assertTrue(run.out().replaceAll("\\s+", " ").contains("(default: 101)"), run.out());
    }
}
