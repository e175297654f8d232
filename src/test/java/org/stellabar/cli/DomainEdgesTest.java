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
        assertEquals(2, p.exitValue(), text);
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
            assertEquals(List.of("grid-1-of-1.csv", "grid-1-of-1.ecsv", "grid-1-of-1.part.json"),
                    files.map(p -> p.getFileName().toString()).sorted().toList());
        }
        try (var files = Files.list(sequence)) {
            assertEquals(List.of("sequence-1-of-1.csv", "sequence-1-of-1.ecsv", "sequence-1-of-1.json",
                    "sequence-1-of-1.part.json"),
                    files.map(p -> p.getFileName().toString()).sorted().toList());
        }
    }

    /** A reference row our code refuses is named by file and line; nothing is written. */
    @Test
    void aBadReferenceRowIsNamedByFileAndLine(@TempDir Path dir) throws Exception {
        Path refs = dir.resolve("refs");
        Files.createDirectories(refs);
        try (var files = Files.list(Path.of("validation"))) {
            for (Path f : files.filter(f -> f.toString().endsWith(".csv")).toList()) {
                Files.copy(f, refs.resolve(f.getFileName()));
            }
        }
        Path table = refs.resolve("lane-emden-published.csv");
        List<String> lines = new java.util.ArrayList<>(Files.readAllLines(table));
        int row = -1;
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith("xi1,n=0,")) {
                lines.set(i, lines.get(i).replace("xi1,n=0,", "xi1,n=7,"));
                row = i + 1;
                break;
            }
        }
        assertTrue(row > 0, "the n = 0 row of " + table);
        Files.write(table, lines);
        CliRun run = CliRun.of("validate", "--references", refs.toString(), "--out", dir.resolve("out").toString());
        refusedNaming(run, "lane-emden-published.csv line " + row, "n = 7");
        assertFalse(Files.exists(dir.resolve("out")), "nothing written");
    }

    @Test
    void errorLinesNeverPrintInfinity() {
        refusedNaming(CliRun.of("eos", "--pressure", "1e300", "--temp", "1e100"), "--pressure", "over 1.8e308");
    }

    @Test
    void controlCharactersInANameAreEscaped(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("nul.toml");
        Files.writeString(scenario, "[[star]]\nname = \"Zed\\u0000nul\"\nmass = \"40 Msun\"\nradius = \"12 Rsun\"\n");
        CliRun run = CliRun.of("model", scenario.toString(), "--out", dir.resolve("out").toString());
        refusedNaming(run, "nul.toml:2:8", "Zed\\u0000nul");
        assertTrue(run.err().chars().noneMatch(c -> c < 0x20 && c != '\n'), "no raw control characters");
    }

    @Test
    void manyScenarioErrorsListTheFirstFiftyThenACount(@TempDir Path dir) throws Exception {
        StringBuilder toml = new StringBuilder();
        for (int i = 0; i < 300; i++) {
            toml.append("[[star]]\nname = \"S").append(i).append("\"\nmass = -1\nradius = 1e11\n");
        }
        Path scenario = dir.resolve("many.toml");
        Files.writeString(scenario, toml);
        CliRun run = CliRun.of("model", scenario.toString(), "--out", dir.resolve("out").toString());
        refusedNaming(run, "many.toml:3:8", "... and 250 more problems (300 in all)");
        assertTrue(run.err().length() < 20_000, run.err().length() + " characters");
    }

    @Test
    void aBadUnitInAHeaderNamesTheFile(@TempDir Path dir) throws Exception {
        Path profile = dir.resolve("badunit.csv");
        Files.writeString(profile, "r [cm],m [g],rho [furlong],T [K],P [dyn/cm2]\n0,0,1,1e7,1e15\n"
                + "1e10,1e30,0.5,8e6,5e14\n2e10,2e30,0,0,0\n");
        refusedNaming(CliRun.of("audit", profile.toString()), "badunit.csv: column 'rho'", "unit 'furlong' is unknown");
    }

    /**
     * Our own profiles record their composition; auditing one finds it (CSV, FITS, ECSV, VOTable), including
     * a μ given alone and metal ions of a mass number, and then the pressures agree to rounding.
     */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--mu|0.6|model.csv|mu = 0.6",
        "--mu|0.6|model.fits|mu = 0.6",
        "--mu|0.6|model.ecsv|mu = 0.6",
        "--mu|0.6|model.vot|mu = 0.6",
        "--Z|1|model.csv|metal ions of A = 16",
        "--Z|1|model.vot|metal ions of A = 16",
        "--Z|1|model.ecsv|metal ions of A = 16"})
    void auditReadsTheCompositionOurProfileRecords(String option, String value, String file, String expected,
            @TempDir Path dir) throws Exception {
        List<String> args = new java.util.ArrayList<>(List.of("model", "--kind", "polytrope", "--index", "3",
                "--mass", "80 Msun", "--radius", "2 Rsun", "--out", dir.toString(), "--quiet", option, value,
                "--table-formats", "csv,ecsv,fits,votable"));
        if (option.equals("--Z")) {
            args.addAll(List.of("--X", "0", "--Y", "0", "--metal-mass-number", "16"));
        }
        assertEquals(0, CliRun.of(args.toArray(new String[0])).exitCode());
        CliRun audit = CliRun.of("audit", dir.resolve("stars").resolve(file).toString(), "--format", "json");
        assertEquals(0, audit.exitCode(), audit.err());
        JsonNode j = JSON.readTree(audit.out());
        assertTrue(j.toString().contains("recorded in the profile's metadata") && j.toString().contains(expected),
                j.toString().substring(0, 600));
        // the same equation of state both ways: P agrees to rounding (1e-12 leaves room)
        assertTrue(j.get("max_pressure_mismatch").asDouble() < 1e-12, j.get("max_pressure_mismatch").asText());
    }
}
