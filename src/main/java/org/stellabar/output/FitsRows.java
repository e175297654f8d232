package org.stellabar.output;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * The data unit of a FITS binary table (FITS Standard 4.0, §7.3.3): row after row, a number
 * column as an IEEE double ({@code 1D}, big-endian), an integer column as a 32-bit ({@code 1J}) or,
 * when a value needs it, 64-bit ({@code 1K}) big-endian integer, a text column as its fixed-width ASCII field
 * ({@code nA}, the longest entry, shorter ones ended by NUL), then zeros up to a multiple of 2880
 * bytes. The widths are those {@link FitsWriter} declares in the header.
 */
final class FitsRows {

    /** FITS logical record length [bytes]. */
    static final int RECORD = 2880;
    private static final int BUFFER_BYTES = 1 << 20;

    private FitsRows() {
    }

    /** @return the field width of a text column: its longest ASCII entry, at least 1 */
    static int width(List<String> asciiValues) {
        int width = 1;
        for (String v : asciiValues) {
            width = Math.max(width, v.length());
        }
        return width;
    }

    /**
     * @param table the table whose header has just been written
     * @param out destination
     * @throws IOException on write failure
     */
    static void write(Table table, OutputStream out) throws IOException {
        List<Column> columns = table.columns();
        int count = columns.size();
        double[][] numbers = new double[count][];
        int[] integerBytes = new int[count];
        byte[][][] texts = new byte[count][][];
        int rowBytes = 0;
        for (int c = 0; c < count; c++) {
            if (columns.get(c) instanceof NumberColumn n) {
                numbers[c] = n.values();
                integerBytes[c] = !n.integer() ? 0 : n.fitsInt32() ? Integer.BYTES : Long.BYTES;
                rowBytes += n.integer() ? integerBytes[c] : Double.BYTES;
            } else {
                List<String> ascii = ((TextColumn) columns.get(c)).values().stream().map(FitsText::ascii).toList();
                int width = width(ascii);
                texts[c] = new byte[ascii.size()][];
                for (int r = 0; r < ascii.size(); r++) {
                    byte[] field = new byte[width];
                    byte[] value = ascii.get(r).getBytes(StandardCharsets.US_ASCII);
                    System.arraycopy(value, 0, field, 0, value.length);
                    texts[c][r] = field;
                }
                rowBytes += width;
            }
        }
        ByteBuffer buffer = ByteBuffer.allocate(Math.max(BUFFER_BYTES, rowBytes));
        long written = 0;
        for (int r = 0; r < table.rowCount(); r++) {
            if (buffer.remaining() < rowBytes) {
                written += drain(buffer, out);
            }
            for (int c = 0; c < count; c++) {
                if (integerBytes[c] == Integer.BYTES) {
                    buffer.putInt((int) numbers[c][r]);
                } else if (integerBytes[c] == Long.BYTES) {
                    buffer.putLong((long) numbers[c][r]);
                } else if (numbers[c] != null) {
                    buffer.putDouble(numbers[c][r]);
                } else {
                    buffer.put(texts[c][r]);
                }
            }
        }
        written += drain(buffer, out);
        int padding = (int) ((RECORD - written % RECORD) % RECORD);
        out.write(new byte[padding]);
    }

    private static int drain(ByteBuffer buffer, OutputStream out) throws IOException {
        int n = buffer.position();
        out.write(buffer.array(), 0, n);
        buffer.clear();
        return n;
    }
}
