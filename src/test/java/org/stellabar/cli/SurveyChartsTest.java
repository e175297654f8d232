package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The polytrope and sequence commands draw their charts beside their tables under --out. */
class SurveyChartsTest {

    @Test
    void polytropeWritesItsProfileChart(@TempDir Path dir) {
        CliRun r = CliRun.of("polytrope", "--index", "3", "--points", "51", "--chart-formats", "png,svg", "--out",
                dir.toString());
        assertEquals(0, r.exitCode(), r.err());
        for (String f : new String[] {"polytrope-n3-1col.png", "polytrope-n3-2col.svg", "polytrope-n3-profile.csv"}) {
            assertTrue(Files.exists(dir.resolve(f)), f);
        }
        assertFalse(Files.exists(dir.resolve("polytrope-n3-1col.pdf")), "only the formats asked for");
    }

    @Test
    void sequenceWritesSupportAndStabilityCharts(@TempDir Path dir) {
        CliRun r = CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "40", "--chart-formats", "pdf",
                "--out", dir.toString());
        assertEquals(0, r.exitCode(), r.err());
        for (String f : new String[] {"sequence-support-1col.pdf", "sequence-stability-2col.pdf", "sequence.csv"}) {
            assertTrue(Files.exists(dir.resolve(f)), f);
        }
    }

    @Test
    void anUnknownChartFormatIsBadInputAndWritesNothing(@TempDir Path dir) {
        Path out = dir.resolve("x");
        CliRun r = CliRun.of("polytrope", "--index", "1", "--chart-formats", "tiff", "--out", out.toString());
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("--chart-formats"), r.err());
        assertFalse(Files.exists(out), "nothing written for bad input");
    }
}
