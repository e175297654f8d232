package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The edges of the domain: requests that work, and refusals that say why in one line (exit 2). */
class DomainEdgesTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    private static void refusedNaming(CliRun run, String option, String words) {
        assertEquals(2, run.exitCode(), run.out() + run.err());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().contains(option), run.err());
        assertTrue(run.err().contains(words), run.err());
        assertFalse(run.err().contains("Infinity") || run.err().contains("NaN"), run.err());
    }

    /**
     * Small n: the solution tends to the uniform sphere, ξ₁ → √6 and ρ_c/ρ̄ → 1 (closed form for
     * n = 0, Chandrasekhar 1939, ch. IV), both to first order in n; the slope 2.5 per unit n is
     * measured, 10 leaves room.
     */
    @ParameterizedTest
    @ValueSource(strings = {"1e-3", "0.003", "1e-9", "1e-300"})
    void smallIndexApproachesTheUniformSphere(String index) throws Exception {
        CliRun run = CliRun.of("polytrope", "--index", index, "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode j = JSON.readTree(run.out());
        double n = Double.parseDouble(index);
        assertEquals(Math.sqrt(6.0), j.get("xi1").asDouble(), 10 * n + 1e-11);
        assertEquals(1.0, j.get("rho_c_over_mean").asDouble(), 10 * n + 1e-11);
        if (j.has("N_n")) {
            assertTrue(Double.isFinite(j.get("N_n").asDouble()));
        }
    }

    @Test
    void minusZeroIsZero(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("polytrope", "--index", "-0", "--format", "json", "--out", dir.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("0.0", JSON.readTree(run.out()).get("n").asText());
        try (var files = Files.list(dir)) {
            assertTrue(files.map(p -> p.getFileName().toString()).noneMatch(f -> f.contains("-0")), "no minus sign");
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"1e-300:1e-299", "1e-100:1e100", "1:1e13"})
    void sequenceOutsideTheSupportedMassesIsRefused(String range) {
        refusedNaming(CliRun.of("sequence", "--mass-range", range, "--steps", "3"), "--mass-range",
                "outside the supported 1e-03..1e+12 Msun");
    }

    @Test
    void sequenceAtTheSupportedEndsIsFinite() {
        CliRun run = CliRun.of("sequence", "--mass-range", "1e-3:1e12", "--steps", "5", "--format", "csv");
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.out().contains("Infinity") || run.out().contains("NaN"), run.out());
    }

    @Test
    void gridLeavesOutAndCountsStatesBeyondDoublePrecision(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("grid", "--rho-range", "1e-320:1e300", "--temp-range", "1e-5:1e80", "--points", "12",
                "--out", dir.toString(), "--chart-formats", "svg");
        assertEquals(0, run.exitCode(), run.err());
        String csv = Files.readString(dir.resolve("grid.csv"));
        assertTrue(csv.contains("points are outside the range of double precision"), "counted in the metadata");
        assertFalse(csv.contains("Infinity") || csv.contains("NaN"));
        long rows = csv.lines().filter(l -> !l.startsWith("#")).count() - 1;
        assertTrue(rows > 0 && rows < 144, rows + " rows");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--mass|1e13 Msun|--central-temp|1e7",
        "--mass|8e12 Msun|--central-temp|1e7",
        "--mass|1e14 Msun|--entropy|1e5",
        "--mass|1e-30 Msun|--central-temp|1e7"})
    void isentropicMassesOutsideTheSupportedRangeAreRefused(String option, String mass, String other, String value) {
        refusedNaming(CliRun.of("model", "--kind", "isentropic", option, mass, other, value), "--mass",
                "outside the supported 1e-03..1e+12 Msun");
    }

    @Test
    void aRadiusBeyondAnyStarNamesRadius() {
        refusedNaming(CliRun.of("model", "--mass", "1 Msun", "--radius", "1e300"), "--radius",
                "above the supported 1e+09 Rsun");
    }

    /** A real JVM with a 32 MB heap: the message is one line, with no stack trace. */
    @Test
    void outOfMemoryIsOneLine(@TempDir Path dir) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Path err = dir.resolve("err.txt");
        Process p = new ProcessBuilder(List.of(java, "-Xmx32m", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "sequence", "--steps", "1000000", "--format", "csv"))
                .redirectOutput(new File("/dev/null")).redirectError(err.toFile()).start();
        assertTrue(p.waitFor(2, TimeUnit.MINUTES));
        String text = Files.readString(err);
        assertEquals(1, p.exitValue(), text);
        assertEquals(1, text.lines().count(), text);
        assertTrue(text.startsWith("stellabar: out of memory: ") && text.contains("-Xmx"), text);
    }

    /** One naming rule for parts: NAME-K-of-N, also for 1/1, for grid and sequence alike. */
    @Test
    void aShardOfOneIsNamedAsAPart(@TempDir Path dir) throws Exception {
        Path grid = dir.resolve("grid");
        Path sequence = dir.resolve("sequence");
        assertEquals(0, CliRun.of("grid", "--rho-range", "1e-6:1", "--temp-range", "1e4:1e6", "--points", "4",
                "--shard", "1/1", "--out", grid.toString()).exitCode());
        assertEquals(0, CliRun.of("sequence", "--steps", "4", "--shard", "1/1", "--out", sequence.toString())
                .exitCode());
        try (var files = Files.list(grid)) {
            assertEquals(List.of("grid-1-of-1.csv"), files.map(p -> p.getFileName().toString()).sorted().toList());
        }
        try (var files = Files.list(sequence)) {
            assertEquals(List.of("sequence-1-of-1.csv", "sequence-1-of-1.json"),
                    files.map(p -> p.getFileName().toString()).sorted().toList());
        }
    }
}
