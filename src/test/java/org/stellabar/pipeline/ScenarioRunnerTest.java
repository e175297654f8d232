package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.cli.StellabarCommand;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.scenario.Scenario;
import org.stellabar.scenario.ScenarioReader;
import picocli.CommandLine;

class ScenarioRunnerTest {

    private static final String TWO_STARS = """
            name = "pair"
            chart_formats = ["png"]
            notebook = false
            [[star]]
            name = "Alpha One"
            mass = "20 Msun"
            radius = "7 Rsun"
            points = 50
            charts = ["support"]
            [[star]]
            name = "Beta"
            kind = "polytrope"
            index = 1.5
            mass = "10 Msun"
            radius = "5 Rsun"
            points = 50
            charts = ["exponents"]
            """;

    @Test
    void writesEachStarAndTheSummaryWithOneRowPerStar(@TempDir Path dir) throws Exception {
        Scenario s = ScenarioReader.read("pair.toml", TWO_STARS);
        RunResult r = new ScenarioRunner().run(s, RunLayout.of(s.name(), dir), line -> { });
        assertEquals(2, r.summary().rowCount());
        // the summary carries each model's own numbers, in solar units where the header says so
        assertEquals(20.0, r.summary().numbers("M").get(0), 1e-12);
        assertEquals(r.models().get(1).headline().centre().T(), r.summary().numbers("T_c").get(1), 0.0);
        assertEquals(r.models().get(0).headline().radius() / Constants.SOLAR_RADIUS, r.summary().numbers("R").get(0),
                1e-12);
        for (String f : new String[] {"stars/alpha-one.csv", "stars/alpha-one.fits", "stars/beta.csv",
            "charts/alpha-one-support-1col.png", "charts/beta-exponents-2col.png", "summary.csv", "summary.json",
            "summary.fits", "charts/rho-T-plane-1col.png"}) {
            assertTrue(Files.exists(dir.resolve(f)), f);
            assertTrue(r.files().contains(dir.resolve(f)), f);
        }
        assertFalse(Files.exists(dir.resolve("charts/alpha-one-exponents-1col.png")), "only the charts asked for");
        assertFalse(Files.exists(dir.resolve("pair.ipynb")), "notebook = false");
    }

    @Test
    void aStarThatCannotBeBuiltStopsTheRunBeforeAnythingIsWritten(@TempDir Path dir) {
        // the second star passes every rule of a request but has no solution: a 1 Msun isentropic
        // star with T_c = 1e13 K would need a centre outside the range of the EOS inversions
        String text = TWO_STARS.replace("kind = \"polytrope\"\nindex = 1.5\nmass = \"10 Msun\"\nradius = \"5 Rsun\"",
                "kind = \"isentropic\"\nmass = \"1 Msun\"\ncentral_temperature = \"1e13 K\"");
        Scenario s = ScenarioReader.read("bad.toml", text);
        Path out = dir.resolve("out");
        BadInputException e = assertThrows(BadInputException.class,
                () -> new ScenarioRunner().run(s, RunLayout.of(s.name(), out), line -> { }));
        assertTrue(e.getMessage().contains("Beta"), e.getMessage());
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    void scenarioErrorsExitTwoWithFileAndLineAndWriteNothing(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("broken.toml");
        Files.writeString(file, TWO_STARS.replace("mass = \"20 Msun\"", "mass = \"20 Msol\"")
                .replace("index = 1.5", "index = 5"));
        CommandLine cl = StellabarCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(err));
        Path out = dir.resolve("out");
        int code = cl.execute("model", file.toString(), "--out", out.toString());
        assertEquals(2, code, err.toString());
        assertTrue(err.toString().contains("broken.toml:6:"), err.toString());
        assertTrue(err.toString().contains("broken.toml:13:"), err.toString());
        assertFalse(err.toString().contains("at org."), err.toString());
        assertFalse(Files.exists(out));
    }

    @Test
    void scenarioFileAndSingleStarOptionsDoNotMix(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("pair.toml");
        Files.writeString(file, TWO_STARS);
        CommandLine cl = StellabarCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        assertEquals(2, cl.execute("model", file.toString(), "--mass", "10 Msun", "--radius", "5 Rsun"));
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
    }

    @Test
    void slugsAreFileNameSafe() {
        assertEquals("aurelith-deep", FileNames.slug("Aurelith Deep"));
        assertEquals("a_b.c+d-e", FileNames.slug("A_B.C+D-E"));
        assertEquals("unnamed", FileNames.slug("???"));
    }
}
