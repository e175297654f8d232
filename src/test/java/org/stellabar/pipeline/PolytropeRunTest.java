package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.charts.ChartFormat;
import org.stellabar.physics.BadInputException;

class PolytropeRunTest {

    // n = 1 has the closed form xi1 = pi (Chandrasekhar 1939, ch. IV); 1e-12 is the solver's accuracy.
    @Test
    void computeWritesNothingAndCarriesTheProfile() {
        PolytropeRun.Result r = PolytropeRun.compute(new PolytropeRun.Request(1.0, 11));
        assertTrue(r.files().isEmpty());
        assertEquals(11, r.profile().rowCount());
        assertEquals(Math.PI, r.summary().number("xi1"), 1e-12 * Math.PI);
    }

    @Test
    void runWritesProfileSummaryAndChartsInOrder(@TempDir Path dir) throws Exception {
        PolytropeRun.Result r = PolytropeRun.run(new PolytropeRun.Request(1.5, 21), dir, EnumSet.of(ChartFormat.SVG));
        assertEquals(List.of(dir.resolve("polytrope-n1.5-profile.csv"), dir.resolve("polytrope-n1.5-profile.ecsv"),
                dir.resolve("polytrope-n1.5-summary.json"),
                dir.resolve("polytrope-n1.5-1col.svg"), dir.resolve("polytrope-n1.5-2col.svg")), r.files());
        for (Path f : r.files()) {
            assertTrue(Files.size(f) > 0, f.toString());
        }
    }

    @Test
    void badRequestsAreRefusedBeforeAnyWork() {
        assertThrows(BadInputException.class, () -> new PolytropeRun.Request(5.0, 11));
        assertThrows(BadInputException.class, () -> new PolytropeRun.Request(Double.NaN, 11));
        assertThrows(BadInputException.class, () -> new PolytropeRun.Request(3.0, 1));
        assertThrows(BadInputException.class, () -> new PolytropeRun.Request(3.0, PolytropeRun.MAX_POINTS + 1));
    }

    @Test
    void wholeIndicesReadWithoutADecimalPoint() {
        assertEquals("3", PolytropeRun.indexLabel(3.0));
        assertEquals("1.5", PolytropeRun.indexLabel(1.5));
        assertFalse(PolytropeRun.indexLabel(0.0).contains("."));
    }
}
