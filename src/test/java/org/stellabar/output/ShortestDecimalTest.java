package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.io.NumberOutput;
import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The reused formatter writes exactly the text of Jackson's public call, which is the
 * independent reference here, and round-trips through {@link Double#parseDouble}.
 */
class ShortestDecimalTest {

    /**
     * Fails when a Jackson upgrade removes or renames the formatter's members: the text would
     * still be right (through the public call), but the grid's CSV a tenth slower, unnoticed.
     */
    @Test
    void reusesJacksonsFormatter() {
        assertTrue(ShortestDecimal.reusesJacksonsFormatter(),
                "Jackson's DoubleToDecimal no longer has toDecimal(double), bytes and index: see ShortestDecimal");
    }

    @Test
    void edgeValuesGiveThePublicCallsText() {
        double[] edges = {0.0, -0.0, 1.0, -1.0, 0.1, 0.3, 2.0 / 3.0, 100.0, 1e7, 1e-3, 9.999999999999999e-4,
            1e-4, 123456789012345680.0, 1e21, 1e22, 1e23, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL,
            Math.nextDown(Double.MIN_NORMAL), Double.MAX_VALUE, -Double.MAX_VALUE, Math.PI, Math.E,
            5e-324, 2.2250738585072014E-308, -2.2250738585072014E-308, 4.9e-324, 1.7976931348623157e308};
        ShortestDecimal decimal = new ShortestDecimal();
        for (double v : edges) {
            assertSameText(decimal, v);
        }
    }

    /** The fallback for a Jackson whose members changed: the same texts, zeros included. */
    @Test
    void fallbackGivesThePublicCallsText() {
        ShortestDecimal fallback = ShortestDecimal.publicCallOnly();
        SplittableRandom random = new SplittableRandom(7);
        assertSameText(fallback, 0.0);
        assertSameText(fallback, -0.0);
        for (int i = 0; i < 10_000; i++) {
            assertSameText(fallback, Math.scalb(random.nextDouble(-1, 1), random.nextInt(-1074, 1024)));
        }
    }

    @Test
    void powersOfTenAndTheirNeighboursGiveThePublicCallsText() {
        ShortestDecimal decimal = new ShortestDecimal();
        for (int e = -323; e <= 308; e++) {
            double p = Double.parseDouble("1e" + e);
            assertSameText(decimal, p);
            assertSameText(decimal, Math.nextUp(p));
            assertSameText(decimal, Math.nextDown(p));
            assertSameText(decimal, -p);
        }
    }

    /**
     * Random bit patterns (every exponent and mantissa alike) and random numbers of the size a
     * grid holds; one instance for all, so that a number's text never carries digits of the one
     * before (a longer text followed by a shorter one is the case that would show it).
     */
    @Test
    void randomNumbersGiveThePublicCallsTextAndReadBack() {
        SplittableRandom random = new SplittableRandom(20261204L);
        ShortestDecimal decimal = new ShortestDecimal();
        for (int i = 0; i < 1_000_000; i++) {
            double v = Double.longBitsToDouble(random.nextLong());
            if (!Double.isFinite(v)) {
                continue;
            }
            assertSameText(decimal, v);
            double g = Math.exp(random.nextDouble(-40, 40));
            assertSameText(decimal, g);
            assertSameText(decimal, Math.rint(g));
        }
    }

    @Test
    void writesAtTheGivenPlaceAndLeavesTheRestOfTheBuffer() {
        ShortestDecimal decimal = new ShortestDecimal();
        byte[] buffer = new byte[64];
        java.util.Arrays.fill(buffer, (byte) '#');
        int end = decimal.write(-1.25e-300, buffer, 10);
        assertEquals("##########-1.25E-300##", new String(buffer, 0, end + 2, StandardCharsets.ISO_8859_1));
    }

    private static void assertSameText(ShortestDecimal decimal, double v) {
        byte[] buffer = new byte[3 + ShortestDecimal.MAX_LENGTH];
        int end = decimal.write(v, buffer, 3);
        String text = new String(buffer, 3, end - 3, StandardCharsets.ISO_8859_1);
        assertEquals(NumberOutput.toString(v, true), text, () -> "bits " + Long.toHexString(Double.doubleToRawLongBits(v)));
        assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(text)),
                () -> text + " does not read back");
    }
}
