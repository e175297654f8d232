package org.stellabar.numerics;

import java.util.stream.IntStream;

/**
 * Several long arrays made at once, on all cores when they are large. Java zeroes a new array as it
 * makes it, and an array of megabytes is made in memory the process has not touched before, which
 * the kernel must first fault in and clear: on the virtual machines we run on that costs about a
 * millisecond per megabyte, in the thread that makes the array. A 10^6-point grid's dozen columns
 * made one after another kept one core busy with that for a tenth of a second while the other
 * waited; made side by side, each core clears its share (src/bench/README.md, "Sixth pass").
 * The arrays are the same either way: zeroed, of the length asked.
 */
public final class LargeArrays {

    /** Below this many elements an array is made on the calling thread: a fork would cost more. */
    private static final int PARALLEL_LENGTH = 1 << 16;

    private LargeArrays() {
    }

    /**
     * @param count how many arrays
     * @param length the length of each
     * @return {@code count} new zeroed arrays of {@code length} doubles
     */
    public static double[][] doubles(int count, int length) {
        if (count < 0 || length < 0) {
            throw new IllegalArgumentException("count " + count + " and length " + length + " must be non-negative");
        }
        if (count < 2 || length < PARALLEL_LENGTH) {
            return new double[count][length];
        }
        return IntStream.range(0, count).parallel().mapToObj(i -> new double[length]).toArray(double[][]::new);
    }
}
