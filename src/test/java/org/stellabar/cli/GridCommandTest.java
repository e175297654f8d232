package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GridCommandTest {

    @Test
    void writesTableWithUnitsInHeader(@TempDir Path dir) throws IOException {
        CliRun r = CliRun.of("grid", "--rho-range", "1e-4:1e4", "--temp-range", "1e4:1e8", "--points", "4x3", "--out",
                dir.toString());
        assertEquals(0, r.exitCode(), r.err());
        List<String> lines = Files.readAllLines(dir.resolve("grid.csv"));
        String header = lines.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        assertTrue(header.startsWith("rho [g/cm3],T [K],P [erg/cm3]"), header);
        assertEquals(12, lines.stream().filter(l -> !l.startsWith("#")).count() - 1);
    }

    @Test
    void writesFitsAndTheChartInBothWidths(@TempDir Path dir) {
        CliRun r = CliRun.of("grid", "--pressure-range", "1e10:1e18", "--temp-range", "1e4:1e8", "--points", "5x4",
                "--format", "fits", "--chart-formats", "png,svg", "--out", dir.toString());
        assertEquals(0, r.exitCode(), r.err());
        for (String f : new String[] {"grid.fits", "rho-T-plane-1col.png", "rho-T-plane-2col.svg"}) {
            assertTrue(Files.exists(dir.resolve(f)), f);
            assertTrue(r.err().contains("wrote " + dir.resolve(f)), r.err()); // the files written are listed on stderr
        }
        assertFalse(Files.exists(dir.resolve("grid.csv")));
    }

    @Test
    void badInputIsOneLineAndExitTwo(@TempDir Path dir) {
        String[][] cases = {
            {"grid", "--rho-range", "1e4:1e-4", "--temp-range", "1e4:1e8"},
            {"grid", "--rho-range", "1e-4", "--temp-range", "1e4:1e8"},
            {"grid", "--rho-range", "1e-4:1 kg", "--temp-range", "1e4:1e8"},
            {"grid", "--rho-range", "1e-4:1", "--temp-range", "1e4:1e8", "--points", "1x5"},
            {"grid", "--rho-range", "1e-4:1", "--temp-range", "1e4:1e8", "--points", "axb"},
            {"grid", "--temp-range", "1e4:1e8"},
            {"grid", "--rho-range", "1e-4:1", "--pressure-range", "1:2", "--temp-range", "1e4:1e8"},
            {"grid", "--rho-range", "1e-4:1", "--temp-range", "1e4:1e8", "--format", "xlsx"},
            {"grid", "--rho-range", "1e-4:1", "--temp-range", "1e4:1e8", "--chart-formats", "png,gif"},
        };
        for (String[] c : cases) {
            String[] args = java.util.Arrays.copyOf(c, c.length + 2);
            args[c.length] = "--out";
            args[c.length + 1] = dir.resolve("x").toString();
            CliRun r = CliRun.of(args);
            assertEquals(2, r.exitCode(), String.join(" ", c) + " -> " + r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertFalse(r.err().contains("at org."), r.err());
            assertFalse(Files.exists(dir.resolve("x")), "nothing written for bad input");
        }
    }
}
