package org.stellabar.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class LargeArraysTest {

    /** Either way in (one thread below the threshold, all cores above it): distinct zeroed arrays of the length asked. */
    @ParameterizedTest
    @CsvSource({"0, 10", "1, 100000", "3, 0", "3, 65535", "2, 65536", "11, 200001"})
    void distinctZeroedArraysOfTheLengthAsked(int count, int length) {
        double[][] arrays = LargeArrays.doubles(count, length);
        assertEquals(count, arrays.length);
        for (int i = 0; i < count; i++) {
            assertEquals(length, arrays[i].length);
            for (double v : arrays[i]) {
                assertEquals(0.0, v);
            }
            for (int j = 0; j < i; j++) {
                assertNotSame(arrays[i], arrays[j]);
            }
        }
    }

    @ParameterizedTest
    @CsvSource({"-1, 10", "2, -1"})
    void negativeSizesAreRefused(int count, int length) {
        assertThrows(IllegalArgumentException.class, () -> LargeArrays.doubles(count, length));
    }
}
