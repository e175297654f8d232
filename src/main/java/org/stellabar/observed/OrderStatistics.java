package org.stellabar.observed;

import java.util.Arrays;

/**
 * The k-th smallest value of an array by selection (Hoare's quickselect with a median-of-three
 * pivot; Knuth, TAOCP vol. 3, §5.3.3), in the total order {@link Arrays#sort(double[])} uses for
 * finite values (−0.0 before 0.0). A range that fails to shrink fast enough — more rounds than
 * 2 log₂ n + 8 — is sorted instead, so the work is bounded whatever the data.
 */
final class OrderStatistics {

    private OrderStatistics() {
    }

    /**
     * The value at position p(n − 1) of the sorted array, interpolated linearly between the
     * order statistics either side ({@link Percentiles#at}), found by selection. Afterwards the
     * array holds, from {@code from} on, the same values as before, with the lower of the two
     * order statistics in its sorted place and everything above it to its right.
     *
     * @param values the values, finite; reordered from {@code from} on
     * @param p the position as a fraction, 0..1
     * @param from where the unsorted part begins: every value before it is at most every value
     *     from it on, and the wanted order statistics lie at or after it
     * @return the interpolated value
     */
    static double interpolated(double[] values, double p, int from) {
        int n = values.length;
        double position = p * (n - 1);
        int below = (int) Math.floor(position);
        double fraction = position - below;
        // a position below `from` is already in its sorted place (it can only be from − 1)
        select(values, Math.min(from, below), n - 1, below);
        double low = values[below];
        // the next order statistic is the least of what lies above the k-th (the k-th itself
        // at the last position, as in Percentiles.at, whose arithmetic this repeats)
        double high = below + 1 < n ? values[below + 1] : low;
        for (int i = below + 2; i < n; i++) {
            if (less(values[i], high)) {
                high = values[i];
            }
        }
        return low + fraction * (high - low);
    }

    /** Puts the k-th smallest of values[lo..hi] at k, smaller ones before it, larger after. */
    static void select(double[] a, int lo, int hi, int k) {
        int rounds = 2 * (32 - Integer.numberOfLeadingZeros(hi - lo + 1)) + 8;
        while (hi > lo) {
            if (rounds-- == 0) {
                Arrays.sort(a, lo, hi + 1);
                return;
            }
            int mid = (lo + hi) >>> 1;
            // median of three to a[lo]: sorted data do not degrade the partition
            if (less(a[mid], a[lo])) {
                swap(a, mid, lo);
            }
            if (less(a[hi], a[lo])) {
                swap(a, hi, lo);
            }
            if (less(a[hi], a[mid])) {
                swap(a, hi, mid);
            }
            swap(a, lo, mid);
            double pivot = a[lo];
            int i = lo;
            int j = hi + 1;
            while (true) {
                do {
                    i++;
                } while (i <= hi && less(a[i], pivot));
                do {
                    j--;
                } while (less(pivot, a[j]));
                if (i >= j) {
                    break;
                }
                swap(a, i, j);
            }
            swap(a, lo, j);
            if (j == k) {
                return;
            }
            if (j < k) {
                lo = j + 1;
            } else {
                hi = j - 1;
            }
        }
    }

    /** Arrays.sort's order for finite values: by value, −0.0 before 0.0. */
    private static boolean less(double x, double y) {
        return x < y || x == y && Double.doubleToRawLongBits(x) < Double.doubleToRawLongBits(y);
    }

    private static void swap(double[] a, int i, int j) {
        double t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
