package org.stellabar.output;

import java.util.Arrays;

/**
 * A growable byte array that rows of text are written into, a block at a time: numbers straight
 * from the formatter ({@link ShortestDecimal}), ASCII text without an encoder, the rest as bytes
 * already encoded. The table writers hand {@link #bytes} (its first {@link #size} bytes) to the
 * output stream, so a row's text is never a string.
 */
final class RowBytes {
    /** The text so far is bytes 0 to {@link #size} (exclusive). */
    byte[] bytes;
    int size;

    /** @param capacity bytes to start with (it grows as needed) */
    RowBytes(int capacity) {
        bytes = new byte[Math.max(16, capacity)];
    }

    /** @param bytes an array to fill from its start (its content is overwritten; it grows as needed) */
    RowBytes(byte[] bytes) {
        this.bytes = bytes;
    }

    void append(byte b) {
        ensure(1);
        bytes[size++] = b;
    }

    void append(byte[] more) {
        ensure(more.length);
        System.arraycopy(more, 0, bytes, size, more.length);
        size += more.length;
    }

    /** Appends a copy of {@code length} bytes already here, from {@code from}. */
    void appendOwn(int from, int length) {
        ensure(length);
        System.arraycopy(bytes, from, bytes, size, length);
        size += length;
    }

    /**
     * Appends text known to be ASCII (a formatted number), one byte per character. The
     * deprecated {@code String.getBytes(int, int, byte[], int)} keeps the low byte of each
     * character, which for ASCII is the character: a single array copy for a Latin-1 string,
     * where a loop over {@code charAt} checked every index (a fifth of a grid's CSV time on
     * the first JIT tier); no encoder and no new array, unlike {@code getBytes(charset)}.
     */
    @SuppressWarnings("deprecation")
    void appendAscii(String text) {
        int n = text.length();
        ensure(n);
        text.getBytes(0, n, bytes, size);
        size += n;
    }

    /** Appends the shortest round-trip text of a finite number. */
    void appendNumber(double value, ShortestDecimal decimal) {
        ensure(ShortestDecimal.MAX_LENGTH);
        size = decimal.write(value, bytes, size);
    }

    private void ensure(int more) {
        if (size + more > bytes.length) {
            bytes = Arrays.copyOf(bytes, Math.max(2 * bytes.length, size + more));
        }
    }
}
