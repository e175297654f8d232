package org.stellabar.observed;

import java.util.Arrays;

/**
 * The median and the 16th and 84th percentiles of a sample (for a normal distribution, the
 * median ± 1σ).
 *
 * @param median 50th percentile
 * @param p16 16th percentile
 * @param p84 84th percentile
 */
public record Percentiles(double median, double p16, double p84) {

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param median 50th percentile
     * @param p16 16th percentile
     * @param p84 84th percentile
     */
    public Percentiles {
        if (!(Double.isFinite(median) && Double.isFinite(p16) && Double.isFinite(p84))) {
            throw new IllegalArgumentException("percentiles must be finite: " + p16 + ", " + median + ", " + p84);
        }
    }

    /**
     * Percentiles by linear interpolation between order statistics at position p(n − 1)
     * (definition 7 of Hyndman &amp; Fan 1996, Am. Stat. 50, 361; numpy's default).
     *
     * @param sorted the sample in ascending order, at least one value
     * @return its percentiles
     */
    public static Percentiles ofSorted(double[] sorted) {
        if (sorted.length == 0) {
            throw new IllegalArgumentException("percentiles of an empty sample");
        }
        return new Percentiles(at(sorted, 0.5), at(sorted, 0.16), at(sorted, 0.84));
    }

    /**
     * The same percentiles as {@link #ofSorted} of the sorted sample, found by selection rather
     * than a whole sort: only the order statistics either side of the three positions are
     * needed (a Monte Carlo star's 4000 draws per quantity were sorted, a twentieth of the demo's
     * time). The sample is reordered. Values are ordered as {@link Arrays#sort(double[])} orders
     * them (−0.0 before 0.0), so the numbers are the sorted sample's, bit for bit.
     *
     * @param sample the values, finite, at least one; reordered in place
     * @return its percentiles
     */
    public static Percentiles of(double[] sample) {
        if (sample.length == 0) {
            throw new IllegalArgumentException("percentiles of an empty sample");
        }
        // ascending positions, so each selection works on what lies above the previous one
        double p16 = OrderStatistics.interpolated(sample, 0.16, 0);
        int from = (int) Math.floor(0.16 * (sample.length - 1)) + 1;
        double median = OrderStatistics.interpolated(sample, 0.5, from);
        from = (int) Math.floor(0.5 * (sample.length - 1)) + 1;
        double p84 = OrderStatistics.interpolated(sample, 0.84, from);
        return new Percentiles(median, p16, p84);
    }

    static double at(double[] sorted, double p) {
        double position = p * (sorted.length - 1);
        int below = (int) Math.floor(position);
        int above = Math.min(below + 1, sorted.length - 1);
        double fraction = position - below;
        return sorted[below] + fraction * (sorted[above] - sorted[below]);
    }
}
