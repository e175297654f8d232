package org.stellabar.observed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Percentiles by selection ({@link Percentiles#of}) against the same percentiles of the sorted
 * sample ({@link Percentiles#ofSorted}, Hyndman &amp; Fan's definition 7): equal bit for bit for
 * every sample size from 1 to 60 and the Monte Carlo size, with ties, signed zeros, sorted,
 * reversed and constant samples.
 */
class PercentilesTest {

    private static void sameAsSorted(double[] sample) {
        double[] sorted = sample.clone();
        Arrays.sort(sorted);
        Percentiles expected = Percentiles.ofSorted(sorted);
        Percentiles selected = Percentiles.of(sample.clone());
        assertEquals(Double.doubleToRawLongBits(expected.p16()), Double.doubleToRawLongBits(selected.p16()),
                () -> "p16 of " + Arrays.toString(sample));
        assertEquals(Double.doubleToRawLongBits(expected.median()), Double.doubleToRawLongBits(selected.median()),
                () -> "median of " + Arrays.toString(sample));
        assertEquals(Double.doubleToRawLongBits(expected.p84()), Double.doubleToRawLongBits(selected.p84()),
                () -> "p84 of " + Arrays.toString(sample));
    }

    @Test
    void selectionGivesTheSortedSamplesPercentiles() {
        SplittableRandom random = new SplittableRandom(3);
        for (int n : new int[] {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 17, 25, 26, 50, 51, 60, 999, 4000}) {
            for (int trial = 0; trial < 40; trial++) {
                double[] sample = new double[n];
                for (int i = 0; i < n; i++) {
                    sample[i] = switch (trial % 4) {
                        case 0 -> random.nextGaussian();
                        case 1 -> random.nextInt(5) - 2.0; // many ties
                        case 2 -> random.nextBoolean() ? 0.0 : -0.0; // signed zeros only
                        default -> Math.exp(3 * random.nextGaussian());
                    };
                }
                sameAsSorted(sample);
                double[] ascending = sample.clone();
                Arrays.sort(ascending);
                sameAsSorted(ascending);
                double[] descending = new double[n];
                for (int i = 0; i < n; i++) {
                    descending[i] = ascending[n - 1 - i];
                }
                sameAsSorted(descending);
            }
            double[] constant = new double[n];
            Arrays.fill(constant, 1.5);
            sameAsSorted(constant);
        }
    }

    @Test
    void selectPutsTheKthSmallestInPlaceWithSmallerBeforeAndLargerAfter() {
        SplittableRandom random = new SplittableRandom(5);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + random.nextInt(300);
            double[] a = random.doubles(n).map(x -> Math.floor(x * 20)).toArray();
            int k = random.nextInt(n);
            double[] sorted = a.clone();
            Arrays.sort(sorted);
            OrderStatistics.select(a, 0, n - 1, k);
            assertEquals(sorted[k], a[k]);
            for (int i = 0; i < n; i++) {
                if (i < k && a[i] > a[k] || i > k && a[i] < a[k]) {
                    throw new AssertionError("a[" + i + "] = " + a[i] + " on the wrong side of a[" + k + "] = " + a[k]);
                }
            }
        }
    }
}
