package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link SvgCoordinates} against the format it stands in for: a plain {@link DecimalFormat} with
 * Batik's precision-4 pattern and US symbols. Identical texts are required for chart
 * coordinates (points on a page, 0.0001 to 10⁴), exact rounding ties (multiples of 1/32 land on
 * the fifth decimal) and their neighbours one ulp away, numbers that round to zero from either
 * side, and random numbers over twenty decades of either sign.
 */
class SvgCoordinatesTest {

    private final DecimalFormat reference = new DecimalFormat("#.####", DecimalFormatSymbols.getInstance(Locale.US));
    private final SvgCoordinates fast = new SvgCoordinates();

    private int same(double v) {
        assertEquals(reference.format(v), fast.format(v), () -> "v = " + v);
        return 1;
    }

    @Test
    void tiesAndTheirNeighboursAreWrittenAsDecimalFormatWritesThem() {
        int checked = 0;
        for (int j = -200_000; j <= 200_000; j++) {
            double tie = j / 32.0;
            checked += same(tie) + same(Math.nextUp(tie)) + same(Math.nextDown(tie));
            double fifth = j * 1e-5; // the decimal neighbours of the ties, inexact in binary
            checked += same(fifth) + same(j * 5e-5);
        }
        assertTrue(checked > 2_000_000);
    }

    @Test
    void chartCoordinatesAndRandomNumbersAreWrittenAsDecimalFormatWritesThem() {
        SplittableRandom random = new SplittableRandom(11);
        for (int n = 0; n < 300_000; n++) {
            same(random.nextDouble(0, 800)); // points across a page
            same(random.nextDouble(-1, 1) * Math.pow(10, random.nextInt(-8, 12)));
        }
        for (double v : new double[] {0.00004, -0.00004, 0.00005, -0.00005, 0.00006, -0.00006, 1e-300, -1e-300,
            0.1, 0.01, 0.001, 0.0001, 1.0001, 10.01, 123456.78906, -12.00004, 9999.99995, 1e15 + 0.5, 4.5e15}) {
            same(v);
        }
    }
}
