package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class LineDecimationTest {

    @Test
    void aShortLineIsKeptWhole() {
        double[] x = new double[LineDecimation.LIMIT];
        Arrays.setAll(x, i -> i);
        int[] kept = LineDecimation.keep(x, x, i -> true);
        assertEquals(LineDecimation.LIMIT, kept.length);
        assertEquals(LineDecimation.LIMIT - 1, kept[kept.length - 1]);
    }

    /** A million-point oscillation keeps its ends, its extremes and order, in at most LIMIT points. */
    @Test
    void aLongLineKeepsItsEnvelope() {
        int n = 1_000_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i;
            y[i] = Math.sin(i * 1e-4) + (i == 777_777 ? 5.0 : 0.0) - (i == 123_457 ? 7.0 : 0.0);
        }
        int[] kept = LineDecimation.keep(x, y, i -> true);
        assertTrue(kept.length <= LineDecimation.LIMIT, kept.length + " points");
        assertEquals(0, kept[0]);
        assertEquals(n - 1, kept[kept.length - 1]);
        for (int i = 1; i < kept.length; i++) {
            assertTrue(kept[i] > kept[i - 1], "increasing");
        }
        assertTrue(Arrays.stream(kept).anyMatch(i -> i == 777_777), "the highest spike");
        assertTrue(Arrays.stream(kept).anyMatch(i -> i == 123_457), "the lowest spike");
    }

    @Test
    void aBreakInALongLineSurvives() {
        int n = 100_000;
        double[] x = new double[n];
        Arrays.setAll(x, i -> i);
        int[] kept = LineDecimation.keep(x, x, i -> i != 50_000);
        assertArrayEquals(new int[] {50_000}, Arrays.stream(kept).filter(i -> i == 50_000).toArray());
    }
}
