package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;

class ModelCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    /** Exit status, standard output and standard error of one run. */
    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int exit = cl.execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void textPrintsSummaryThenProfile() {
        Run r = run("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--kind", "standard", "--points", "21");
        assertEquals(0, r.exit(), r.err());
        int summary = r.out().indexOf("beta_c");
        int profile = r.out().indexOf("profile (21 rows):");
        assertTrue(summary > 0 && profile > summary, r.out());
        assertTrue(r.out().contains("rho [g/cm3]") && r.out().contains("c_s [cm/s]"));
        assertTrue(r.out().contains("verdict") && r.out().contains("stable"));
        assertFalse(r.out().contains("NaN") || r.out().contains("Infinity"));
    }

    @Test
    void jsonIsOneObjectWithSummaryAndProfile() throws IOException {
        Run r = run("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--kind", "polytrope", "--index", "1.5",
                "--X", "0.7", "--Z", "0.02", "--points", "11", "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonNode root = JSON.readTree(r.out());
        // units are parsed: "40 Msun" and "12 Rsun" are IAU 2015 nominal values; the summary gives
        // M and R in solar units and their CGS values beside them
        assertEquals(40.0, root.get("M").asDouble(), 1e-12);
        assertEquals("solMass", root.get("units").get("M").asText());
        assertEquals(40.0 * SOLAR_MASS, root.get("M_cgs").asDouble(), 1e-6 * SOLAR_MASS);
        assertEquals(12.0 * SOLAR_RADIUS, root.get("R_cgs").asDouble(), 1e-6 * SOLAR_RADIUS);
        for (String field : List.of("kind", "rho_c", "P_c", "T_c", "beta_c", "Gamma1_mean", "newtonian_margin",
                "gr_margin", "R_crit", "L_Edd", "L_over_L_Edd", "verdict", "profile")) {
            assertTrue(root.has(field), "missing " + field);
        }
        assertEquals("polytrope", root.get("kind").asText());
        assertEquals("1.5", root.get("index").asText());
        JsonNode columns = root.get("profile").get("columns");
        assertEquals(11, root.get("profile").get("rows").asInt());
        List<String> names = Stream.of("r", "r_over_R", "m", "m_over_M", "rho", "P", "P_gas", "P_rad", "T", "beta",
                "one_minus_beta", "Gamma1", "nabla_ad", "c_s", "warning_mask", "nabla_poly", "convective").toList();
        assertEquals(names.size(), columns.size());
        for (int i = 0; i < names.size(); i++) {
            assertEquals(names.get(i), columns.get(i).get("name").asText());
        }
        assertEquals("g/cm3", columns.get(4).get("unit").asText());
        assertEquals("erg/cm3", root.get("units").get("P_c").asText());
    }

    @Test
    void csvPrintsTheProfileWithUnitsInTheHeader() {
        Run r = run("model", "--mass", "1e6 Msun", "--central-temp", "1e8", "--kind", "isentropic", "--mu", "0.6",
                "--points", "7", "--format", "csv");
        assertEquals(0, r.exit(), r.err());
        String[] lines = r.out().strip().split("\n");
        assertEquals(8, lines.length);
        assertTrue(lines[0].startsWith("r [cm],r_over_R,m [g],m_over_M,rho [g/cm3],P [erg/cm3]"), lines[0]);
        assertFalse(lines[0].contains("nabla_poly"), "an isentropic star has no polytropic gradient");
        assertEquals(1e8, Double.parseDouble(lines[1].split(",")[8]), 1e-6);
    }

    @Test
    void outWritesWhatAOneStarScenarioWrites(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("m10");
        Run r = run("model", "--mass", "10 Msun", "--radius", "5 Rsun", "--kind", "polytrope", "--index", "3",
                "--points", "9", "--format", "json", "--out", out.toString());
        assertEquals(0, r.exit(), r.err());
        String csv = Files.readString(out.resolve("stars/model.csv"));
        assertTrue(csv.startsWith("# stellabar model: polytrope n = 3.0 star"), csv);
        assertTrue(csv.contains("# column T [K]"));
        assertEquals(9, csv.lines().filter(l -> !l.startsWith("#")).count() - 1);
        for (String f : List.of("stars/model.fits", "summary.csv", "summary.json", "summary.fits", "model.ipynb",
                "charts/model-support-1col.png", "charts/model-exponents-2col.svg", "charts/rho-T-plane-1col.svg")) {
            assertTrue(Files.exists(out.resolve(f)), f);
        }
        JsonNode summary = JSON.readTree(Files.readString(out.resolve("summary.json")));
        assertEquals(1, summary.get("rows").asInt());
        assertTrue(Files.readString(out.resolve("summary.csv")).contains("gr_margin"));
        assertTrue(r.err().contains("files written under"), r.err());
        try (Stream<Path> files = Files.walk(out)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary files");
        }
    }

    /**
     * One schema: the star printed by {@code model --format json} and the summary table a one-star
     * scenario writes carry the same field names, units and values (identity: both come from one
     * model through one declaration).
     */
    @Test
    void oneStarJsonAndScenarioSummaryShareTheirSchema(@TempDir Path dir) throws IOException {
        Run printed = run("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--format", "json");
        assertEquals(0, printed.exit(), printed.err());
        JsonNode star = JSON.readTree(printed.out());
        Path toml = dir.resolve("one.toml");
        Files.writeString(toml, "name = \"one\"\n[defaults]\npoints = 400\n[[star]]\nname = \"model\"\n"
                + "mass = \"40 Msun\"\nradius = \"12 Rsun\"\n");
        Run scenario = run("model", toml.toString(), "--out", dir.resolve("out").toString(), "--quiet");
        assertEquals(0, scenario.exit(), scenario.err());
        JsonNode table = JSON.readTree(Files.readString(dir.resolve("out/summary.json")));
        JsonNode columns = table.get("columns");
        assertTrue(columns.size() >= 30, "every headline field is a column");
        for (JsonNode column : columns) {
            String name = column.get("name").asText();
            assertTrue(star.has(name), "the printed star lacks " + name);
            assertEquals(column.get("unit").asText(), star.get("units").has(name)
                    ? star.get("units").get(name).asText() : "", name);
            JsonNode value = column.get("values").get(0);
            if (value.isNumber()) {
                // the same model through the same declaration: equal to the last bit
                assertEquals(value.asDouble(), star.get(name).asDouble(), 0.0, name);
            } else {
                assertEquals(value.asText(), star.get(name).asText(), name);
            }
        }
        for (String name : List.of("M", "R", "R_crit", "L_Edd", "M_cgs", "R_cgs", "R_crit_cgs", "L_Edd_cgs")) {
            assertTrue(star.has(name), name);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "--mass 0 --radius 1e11",
        "--mass -3Msun --radius 1e11",
        "--mass 1Msun --radius 0",
        "--mass 1Msun --radius -1e11",
        "--mass 1Msun --radius 1e11 --kind polytrope --index 5",
        "--mass 1Msun --radius 1e11 --kind polytrope --index -0.5",
        "--mass 1Msun --radius 1e11 --kind polytrope",
        "--mass 1Msun --kind polytrope --index 1.5",
        "--mass 1Msun --kind standard",
        "--mass 1Msun --radius 1e11 --index 2",
        "--mass 1Msun --radius 1e11 --kind standard --central-temp 1e7",
        "--mass 1Msun --kind isentropic",
        "--mass 1Msun --radius 1e11 --central-temp 1e7 --kind isentropic",
        "--mass 1Msun --central-temp 1e13 --kind isentropic",
        "--mass 1Msun --radius 4e5 --kind isentropic",
        "--mass 1Msun --radius 1e5",
        "--mass 1Msun --radius 1e11 --points 2",
        "--mass 1Msun --radius 1e11 --kind giant",
        "--mass 1Mearth --radius 1e11",
        "--radius 1e11"})
    void badInputIsOneLineAndExitTwo(String args, @TempDir Path dir) throws IOException {
        Path out = dir.resolve("never");
        String[] split = ("model " + args + " --out " + out).split(" ");
        Run r = run(split);
        assertEquals(2, r.exit(), r.err() + r.out());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().startsWith("stellabar model: "), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertEquals("", r.out());
        assertFalse(Files.exists(out), "nothing written on bad input");
    }

    @Test
    void badInputNamesTheOption() {
        assertTrue(run("model", "--mass", "1 Msun", "--radius", "1e11", "--kind", "polytrope", "--index", "7").err()
                .contains("--index"));
        assertTrue(run("model", "--mass", "1 Msun", "--kind", "isentropic", "--central-temp", "1e13").err()
                .contains("--central-temp"));
        assertTrue(run("model", "--mass", "-1 Msun", "--radius", "1e11").err().contains("--mass"));
    }
}
