package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.output.PythonChecks;

class ObservedCommandTest {

    @TempDir
    Path dir;

    /** Invented stars (test data, not observations), in columns named as a catalogue might. */
    private static final String CATALOGUE = """
            # invented test stars
            name,logL,logTeff,Mass,X
            Aster-1,5.5,4.6,60,0.7
            Aster-2,4.2,4.35,12,0.7
            Aster-3,6.1,4.7,120,0.5
            Aster-4,3.0,4.1,5,0.72
            Aster-5,6.6,4.65,300,0.3
            """;

    private Path write(String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    // The done-when check: per-star Gamma_e, R and beta against an independent script
    // (observed_independent.py: mpmath at 30 digits, its own omega_3 and quartic solution) to 1e-9
    // relative; both use the same CODATA 2018 / IAU 2015 constants, and the remaining differences
    // are the double rounding of the Java side (~1e-13 measured).
    @Test
    void agreesWithAnIndependentScript() throws Exception {
        PythonChecks.requireModules("mpmath", "numpy");
        Path catalogue = write("stars.csv", CATALOGUE);
        CliRun run = CliRun.of("observed", catalogue.toString(), "--columns", "L=logL,Teff=logTeff,M=Mass",
                "--log", "L,Teff", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode stars = new ObjectMapper().readTree(run.out()).get("stars");
        for (String field : new String[] {"name", "L", "Teff", "M", "R", "log_g", "L_Edd", "Gamma_e", "beta_standard",
                "one_minus_beta_standard", "Gamma_e_over_one_minus_beta", "M_from_L", "rho_c", "T_c", "P_c",
                "Gamma1_mean", "newtonian_margin", "gr_margin", "row", "errors"}) {
            assertTrue(stars.get(0).has(field), field);
        }
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(120), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("observed_independent.py").toString(), catalogue.toString());
        assertEquals(0, o.exitCode(), o.describe());
        JsonNode expected = new ObjectMapper().readTree(o.stdout());
        assertEquals(5, expected.size());
        for (int i = 0; i < expected.size(); i++) {
            JsonNode e = expected.get(i);
            JsonNode ours = stars.get(i);
            assertEquals(e.get("name").asText(), ours.get("name").asText());
            for (String[] pair : new String[][] {{"Gamma_e", "Gamma_e"}, {"R", "R"}, {"beta", "beta_standard"}}) {
                double want = e.get(pair[0]).asDouble();
                assertEquals(want, ours.get(pair[1]).asDouble(), 1e-9 * want, e.get("name") + " " + pair[1]);
            }
        }
    }

    @Test
    void badRowsNamedAndCountedOthersEstimated() throws Exception {
        Path catalogue = write("mixed.csv", """
                id,lum,teff,mass
                ok-1,1e5,30000,30
                too-bright,1e7,40000,20
                no-teff,1e5,,30
                unreadable,1e5,abc,30
                negative,-1e5,30000,30
                ok-2,3e4,25000,
                """);
        Path out = dir.resolve("out");
        CliRun run = CliRun.of("observed", catalogue.toString(), "--columns", "name=id,L=lum,Teff=teff,M=mass",
                "--out", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("6 rows, 2 estimated, 4 bad"), run.out());
        assertTrue(run.out().contains("mixed.csv:3: row 2: above_eddington"), run.out());
        assertTrue(run.out().contains("mixed.csv:4: row 3: missing_value"), run.out());
        assertTrue(run.out().contains("mixed.csv:5: row 4: missing_value"), run.out());
        assertTrue(run.out().contains("mixed.csv:6: row 5: impossible_combination"), run.out());
        JsonNode summary = new ObjectMapper().readTree(out.resolve("observed.json").toFile());
        assertEquals(4, summary.get("bad_rows").asInt());
        assertEquals("above_eddington", summary.get("stars").get(1).get("errors").get(0).get("code").asText());
        assertEquals("standard_model_L", summary.get("stars").get(5).get("mass_source").asText());
        for (String f : new String[] {"observed.csv", "observed.json"}) {
            String text = Files.readString(out.resolve(f));
            assertFalse(text.contains("NaN") || text.contains("Infinity"), f);
        }
        assertTrue(Files.size(out.resolve("observed.fits")) > 0);
    }

    @Test
    void strictStopsAtABadRowNamingFileAndLine() throws Exception {
        Path catalogue = write("strict.csv", "# comment\nL,Teff,M\n1e5,30000,30\n1e7,40000,20\n");
        Path out = dir.resolve("strict-out");
        CliRun run = CliRun.of("observed", catalogue.toString(), "--strict", "--out", out.toString());
        assertEquals(2, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains("strict.csv:4: row 2: above_eddington"), run.err());
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    void badInputIsOneLine() throws Exception {
        Path catalogue = write("c.csv", CATALOGUE);
        String[][] cases = {
            {"--columns", "L=nope"},
            {"--columns", "Lum=logL"},
            {"--columns", "L=logL,Teff=logTeff,M=Mass", "--units", "M=parsec"},
            {"--log", "log_g"},
            {"--columns", "M=Mass"},
        };
        for (String[] c : cases) {
            String[] args = new String[c.length + 2];
            args[0] = "observed";
            args[1] = catalogue.toString();
            System.arraycopy(c, 0, args, 2, c.length);
            CliRun run = CliRun.of(args);
            assertEquals(2, run.exitCode(), String.join(" ", c) + ": " + run.err());
            assertEquals(1, run.err().strip().lines().count(), run.err());
        }
    }
}
