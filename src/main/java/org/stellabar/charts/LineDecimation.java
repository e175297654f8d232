package org.stellabar.charts;

import java.util.Arrays;
import java.util.function.IntPredicate;

/**
 * Thins a long line to what a figure can show: a line of more than {@link #LIMIT} points (a
 * profile of 10⁶ rows, say) keeps, in order, its first and last point and, in each of
 * {@code LIMIT/2} consecutive runs of points, the lowest and the highest: the min–max envelope,
 * which draws the same line at any print resolution (a two-column figure is about 2200 pixels
 * wide at 300 dpi) with a thousandth of the points, file size and drawing time. A run holding
 * points that cannot be shown keeps one of them, so the line still breaks there.
 */
final class LineDecimation {

    /** Most points a line is drawn with. */
    static final int LIMIT = 4000;

    private LineDecimation() {
    }

    /**
     * @param x abscissae
     * @param y ordinates
     * @param showable whether point i can be drawn (on a log axis, a non-positive value cannot)
     * @return the indices of the points to draw, increasing; all of them if there are few
     */
    static int[] keep(double[] x, double[] y, IntPredicate showable) {
        int n = x.length;
        if (n <= LIMIT) {
            int[] all = new int[n];
            Arrays.setAll(all, i -> i);
            return all;
        }
        int runs = LIMIT / 2 - 1;
        int[] kept = new int[2 * runs + 4];
        int count = 0;
        kept[count++] = 0;
        for (int r = 0; r < runs; r++) {
            int from = Math.max(1, (int) ((long) n * r / runs));
            int to = Math.min(n - 1, (int) ((long) n * (r + 1) / runs));
            int low = -1;
            int high = -1;
            int hidden = -1;
            for (int i = from; i < to; i++) {
                if (!showable.test(i)) {
                    hidden = hidden < 0 ? i : hidden;
                } else {
                    if (low < 0 || y[i] < y[low]) {
                        low = i;
                    }
                    if (high < 0 || y[i] > y[high]) {
                        high = i;
                    }
                }
            }
            int[] run = {low, high, hidden};
            Arrays.sort(run);
            for (int i : run) {
                if (i >= 0 && i != kept[count - 1]) {
                    kept[count++] = i;
                }
            }
        }
        if (kept[count - 1] != n - 1) {
            kept[count++] = n - 1;
        }
        return Arrays.copyOf(kept, count);
    }
}
