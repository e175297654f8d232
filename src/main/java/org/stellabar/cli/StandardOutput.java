package org.stellabar.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/**
 * The process's standard output as a command's writer (UTF-8 always, whatever the locale says:
 * under LANG=C Java would print Γ1 as ?1), which also lets a large table go out as bytes: its
 * rows are formatted into UTF-8 bytes already, and writing them through the writer would turn
 * them into characters and back (a sixth of printing a 10⁴-row CSV table).
 */
final class StandardOutput extends PrintWriter {

    private final OutputStream bytes;

    /** @param bytes the buffered byte stream under the writer */
    StandardOutput(OutputStream bytes) {
        super(new BufferedWriter(new OutputStreamWriter(bytes, StandardCharsets.UTF_8), 1 << 16), false);
        this.bytes = bytes;
    }

    /**
     * Writes UTF-8 text straight to the byte stream, after what the writer holds. A failure to
     * write is kept as the writer keeps its own ({@link #checkError()}), not thrown: a closed pipe
     * ({@code stellabar ... | head}) ends the output quietly, as it does for everything else printed.
     *
     * @param writing what writes the bytes
     */
    void writeBytes(ByteWriting writing) {
        flush();
        try {
            writing.writeTo(bytes);
            bytes.flush();
        } catch (IOException e) {
            setError();
        }
    }

    /** Something that writes UTF-8 text to a byte stream. */
    interface ByteWriting {
        /**
         * @param out the byte stream
         * @throws IOException if writing fails
         */
        void writeTo(OutputStream out) throws IOException;
    }
}
