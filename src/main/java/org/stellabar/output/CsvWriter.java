package org.stellabar.output;

import java.io.IOException;
import java.io.OutputStream;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import com.fasterxml.jackson.core.io.NumberOutput;
import org.stellabar.table.Column;
import org.stellabar.table.Field;
import org.stellabar.table.Input;
import org.stellabar.table.IntegerListField;
import org.stellabar.table.NestedField;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.NumberField;
import org.stellabar.table.Summary;
import org.stellabar.table.SummaryListField;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;
import org.stellabar.table.TextField;

/**
 * Comma-separated values: optional {@code #} comment lines with the metadata and each column's
 * unit (in its written spelling, {@link FitsUnits#written}) and meaning, then one header row {@code name [unit]}, then the rows. Numbers are written
 * as the shortest decimal that reads back to the same double. Text cells are quoted when
 * they hold a comma, quote or line break (RFC 4180).
 */
public final class CsvWriter {

    /** Rows per block of a long table. */
    private static final int BLOCK_ROWS = 4096;
    /** The fewest rows per block: below, handing out blocks would cost more than it spreads. */
    private static final int MIN_BLOCK_ROWS = 256;

    /**
     * Rows per block: {@link #BLOCK_ROWS} for a long table; a shorter one is cut into about four
     * blocks per core, so that the cores share it evenly (a 10^4-row sequence was three blocks of
     * 4096 on two cores: one core formatted two thirds while the other waited). The text is the same
     * for any block size.
     */
    static int blockRows(int rows) {
        int perCore = 4 * Runtime.getRuntime().availableProcessors();
        return Math.max(MIN_BLOCK_ROWS, Math.min(BLOCK_ROWS, (rows + perCore - 1) / perCore));
    }

    private final boolean comments;

    private CsvWriter(boolean comments) {
        this.comments = comments;
    }

    /** @return a writer that starts with {@code #} metadata lines (for files) */
    public static CsvWriter withComments() {
        return new CsvWriter(true);
    }

    /** @return a writer of the header row and data rows only (for a terminal or a pipe) */
    public static CsvWriter plain() {
        return new CsvWriter(false);
    }

    /**
     * @param table the table
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Table table, Writer out) throws IOException {
        out.write(head(table));
        for (Formatted block : (Iterable<Formatted>) blocks(table)::iterator) {
            out.write(new String(block.bytes(), 0, block.length(), StandardCharsets.UTF_8));
        }
    }

    /**
     * The same text as {@link #write(Table, Writer)}, UTF-8 encoded, straight to a byte stream:
     * the rows are formatted into bytes, never into an intermediate string.
     *
     * @param table the table
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Table table, OutputStream out) throws IOException {
        out.write(head(table).getBytes(StandardCharsets.UTF_8));
        writeBlocks(table, out);
    }

    /**
     * Writes the data rows of {@link #blocks(Table)} to a byte stream, each batch of blocks
     * written on a thread of its own while the next batch is formatted (before, the cores sat
     * idle while a batch was written); at most one batch is being written at a time, so at most
     * two are held. A written block's buffer is handed back for a later block: the text then
     * stays in a few long-lived buffers instead of megabytes of new arrays per block, which the
     * collector copied while they were in flight (src/bench/README.md, "Eighth pass"). The bytes
     * are the same, in the same order.
     *
     * @param table the table
     * @param out destination, used by the writing thread until this returns
     * @throws IOException on write failure
     */
    static void writeBlocks(Table table, OutputStream out) throws IOException {
        int rows = table.rowCount();
        int blockRows = blockRows(rows);
        int blocks = (rows + blockRows - 1) / blockRows;
        int batch = Math.max(1, 2 * Runtime.getRuntime().availableProcessors());
        java.util.concurrent.ExecutorService writer = java.util.concurrent.Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "table-writer");
            t.setDaemon(true);
            return t;
        });
        // buffers whose block has been written; the writer adds one only after writing it
        java.util.Queue<byte[]> spare = new java.util.concurrent.ConcurrentLinkedQueue<>();
        try {
            java.util.concurrent.Future<Void> writing = null;
            for (int first = 0; first < blocks; first += batch) {
                List<Formatted> formatted = formatBatch(table, blockRows, first, Math.min(blocks, first + batch),
                        spare);
                if (writing != null) {
                    finish(writing);
                }
                writing = writer.submit(() -> {
                    for (Formatted block : formatted) {
                        out.write(block.bytes(), 0, block.length());
                        spare.add(block.bytes());
                    }
                    return null;
                });
            }
            if (writing != null) {
                finish(writing);
            }
        } finally {
            writer.shutdownNow();
        }
    }

    /** Waits for a batch's writing, passing its failure on as it was. */
    private static void finish(java.util.concurrent.Future<Void> writing) throws IOException {
        try {
            writing.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("interrupted while writing a table");
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof IOException io) {
                throw io;
            }
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        }
    }

    /**
     * Blocks from (inclusive) to (exclusive) of {@code blockRows} rows each, formatted in parallel,
     * into buffers taken from {@code spare} while it has any (none taken if it is null).
     */
    private static List<Formatted> formatBatch(Table table, int blockRows, int from, int to,
            java.util.Queue<byte[]> spare) {
        int rows = table.rowCount();
        return IntStream.range(from, to).parallel()
                .mapToObj(b -> formatRows(table, b * blockRows, Math.min(rows, (b + 1) * blockRows),
                        spare == null ? null : spare.poll()))
                .toList();
    }

    /** A block's text: the first {@code length} bytes of {@code bytes}. */
    private record Formatted(byte[] bytes, int length) {
    }

    private String head(Table table) throws IOException {
        StringWriter text = new StringWriter();
        if (comments) {
            writeMetadata(table.metadata(), text);
            for (Column c : table.columns()) {
                text.write("# column " + c.name() + " [" + FitsUnits.written(c.unit()) + "]: " + c.description() + "\n");
            }
        }
        List<String> header = new ArrayList<>();
        for (Column c : table.columns()) {
            header.add(headerCell(c.name(), c.unit()));
        }
        text.write(String.join(",", header));
        text.write("\n");
        return text.toString();
    }

    /**
     * The data rows, UTF-8 encoded, in blocks of {@link #blockRows} rows. Formatting doubles
     * dominates the cost of large tables, so a bounded batch of blocks is formatted in parallel
     * and handed out in order (the output is identical to a sequential run).
     */
    private static java.util.stream.Stream<Formatted> blocks(Table table) {
        int rows = table.rowCount();
        int blockRows = blockRows(rows);
        int blocks = (rows + blockRows - 1) / blockRows;
        int batch = Math.max(1, 2 * Runtime.getRuntime().availableProcessors());
        return IntStream.iterate(0, first -> first < blocks, first -> first + batch).boxed()
                .flatMap(first -> formatBatch(table, blockRows, first, Math.min(blocks, first + batch), null)
                        .stream());
    }

    /** @param reused a buffer to format into (it grows as needed), or null for a new one */
    private static Formatted formatRows(Table table, int from, int to, byte[] reused) {
        int cols = table.columns().size();
        RowBytes line = reused != null ? new RowBytes(reused) : new RowBytes(32 * cols * (to - from));
        RecentNumbers[] recent = new RecentNumbers[cols];
        ShortestDecimal decimal = new ShortestDecimal();
        for (int row = from; row < to; row++) {
            formatRow(table, row, to - from, recent, decimal, line);
        }
        return new Formatted(line.bytes, line.size);
    }

    /**
     * One row, with its line end. A method of its own, called once per row, so that the first JIT
     * tier compiles it after a couple of hundred rows: the loop over a block's rows is compiled
     * on the stack only after ~60 000 iterations, and a 10^4-row table's blocks of ~1 250 rows were
     * mostly formatted by the interpreter (src/bench/README.md, "Eighth pass").
     */
    private static void formatRow(Table table, int row, int blockRows, RecentNumbers[] recent,
            ShortestDecimal decimal, RowBytes line) {
        List<Column> columns = table.columns();
        for (int col = 0; col < recent.length; col++) {
            if (col > 0) {
                line.append((byte) ',');
            }
            Column c = columns.get(col);
            if (c instanceof NumberColumn n) {
                if (n.integer()) {
                    line.appendAscii(Long.toString(n.getLong(row)));
                } else {
                    if (recent[col] == null) {
                        recent[col] = new RecentNumbers(blockRows);
                    }
                    recent[col].append(n.get(row), decimal, line);
                }
            } else {
                line.append(quote(((TextColumn) c).values().get(row)).getBytes(StandardCharsets.UTF_8));
            }
        }
        line.append((byte) '\n');
    }

    /**
     * The shortest round-trip texts of the numbers a column formatted last, by their bits: the
     * axes of a grid repeat (ρ over a thousand rows, T every thousand), and copying a text is far
     * cheaper than the digit search. Direct-mapped; a number met again gives the same text,
     * whichever way it is found. A text is kept where it was written, in the block's own buffer
     * (which only grows while the block is formatted, its content kept): a slot holds its place
     * and length, and a number never met again (most of a grid's) costs no copy.
     */
    private static final class RecentNumbers {
        /** Slots for a block of 4096 rows: a grid's axis (a thousand values) fits. */
        private static final int MOST_SLOTS = 1024;
        private final long[] bits;
        /** Each slot's text: where it starts in the block's buffer. */
        private final int[] starts;
        /** Each slot's text length; 0 for a slot not yet filled. */
        private final byte[] lengths;
        /** 64 − log2(slots): the hash's top bits pick the slot. */
        private final int shift;

        /**
         * @param rows the block's rows: a short block gets fewer slots (a cache of 1024 per column
         *     and block was 12 kB to clear for a block of 256 rows)
         */
        RecentNumbers(int rows) {
            int slots = Math.min(MOST_SLOTS, Integer.highestOneBit(Math.max(64, rows)));
            bits = new long[slots];
            starts = new int[slots];
            lengths = new byte[slots];
            shift = 64 - Integer.numberOfTrailingZeros(slots);
        }

        /**
         * Appends the text of a finite number, copied from where it was written before or
         * formatted (and then its place kept).
         *
         * @param line the block's buffer, the same for every call on this cache
         */
        void append(double value, ShortestDecimal decimal, RowBytes line) {
            long b = Double.doubleToRawLongBits(value);
            // Fibonacci hashing of the bits: a grid's neighbouring values differ in low and
            // high bits alike
            int slot = (int) ((b * 0x9E3779B97F4A7C15L) >>> shift);
            int length = lengths[slot];
            if (length != 0 && bits[slot] == b) {
                line.appendOwn(starts[slot], length);
                return;
            }
            int start = line.size;
            line.appendNumber(value, decimal);
            bits[slot] = b;
            starts[slot] = start;
            lengths[slot] = (byte) (line.size - start);
        }
    }

    /**
     * The shortest decimal that reads back to the same double (Schubfach algorithm, as in
     * Jackson's fast writer; R. Giulietti, "The Schubfach way to render doubles", 2020).
     *
     * @param value a finite double
     * @return its text
     */
    public static String number(double value) {
        return NumberOutput.toString(value, true);
    }

    /**
     * One header row and one data row of the summary's scalar fields; nested summaries are
     * flattened with a dotted prefix, lists of summaries joined by ';', tables left out.
     *
     * @param summary the summary
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Summary summary, Writer out) throws IOException {
        if (comments) {
            writeMetadata(summary.metadata(), out);
        }
        List<String> header = new ArrayList<>();
        List<String> row = new ArrayList<>();
        flatten("", summary, header, row);
        out.write(String.join(",", header));
        out.write("\n");
        out.write(String.join(",", row));
        out.write("\n");
    }

    private static void flatten(String prefix, Summary summary, List<String> header, List<String> row) {
        for (Field f : summary.fields()) {
            if (f instanceof NestedField nested) {
                flatten(prefix + f.name() + ".", nested.value(), header, row);
            } else if (f instanceof SummaryListField list) {
                header.add(headerCell(prefix + f.name(), ""));
                List<String> parts = new ArrayList<>();
                for (Summary s : list.value()) {
                    parts.add(FieldText.plain(s.fields().get(0)));
                }
                row.add(quote(String.join(";", parts)));
            } else if (f instanceof IntegerListField list) {
                header.add(headerCell(prefix + f.name(), ""));
                List<String> parts = new ArrayList<>();
                for (long l : list.value()) {
                    parts.add(Long.toString(l));
                }
                row.add(quote(String.join(";", parts)));
            } else if (f.scalar()) {
                header.add(headerCell(prefix + f.name(), f.unit()));
                row.add(f instanceof TextField t ? quote(t.value())
                        : f instanceof NumberField n ? number(n.value()) : FieldText.plain(f));
            }
        }
    }

    private static void writeMetadata(Metadata m, Writer out) throws IOException {
        out.write("# " + m.title() + "\n");
        out.write("# stellabar " + m.toolVersion() + "; constants: " + m.constants() + "\n");
        for (Input input : m.inputs()) {
            out.write("# input " + input.name() + " = " + FieldText.input(input) + "\n");
        }
        for (String note : m.notes()) {
            out.write("# note: " + note + "\n");
        }
    }

    /** The header cell "name [unit]", the unit in its written spelling; a bare name when dimensionless. */
    private static String headerCell(String name, String unit) {
        return quote(unit.isEmpty() ? name : name + " [" + FitsUnits.written(unit) + "]");
    }

    static String quote(String text) {
        if (text.indexOf(',') < 0 && text.indexOf('"') < 0 && text.indexOf('\n') < 0 && text.indexOf('\r') < 0) {
            return text;
        }
        return '"' + text.replace("\"", "\"\"") + '"';
    }
}
