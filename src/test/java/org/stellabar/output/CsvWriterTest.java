package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;
import org.stellabar.table.Version;

class CsvWriterTest {

    /** A strict RFC 4180 reader: records of fields, quoted fields may hold commas, quotes, breaks. */
    static List<List<String>> parse(String text) {
        List<List<String>> records = new ArrayList<>();
        List<String> record = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        boolean quoted = false;
        boolean wasQuoted = false;
        while (i < text.length()) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"') {
                    if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                        field.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    field.append(ch);
                }
            } else if (ch == '"') {
                if (field.length() != 0 || wasQuoted) {
                    throw new IllegalArgumentException("quote inside an unquoted field at " + i);
                }
                quoted = true;
                wasQuoted = true;
            } else if (ch == ',') {
                record.add(field.toString());
                field.setLength(0);
                wasQuoted = false;
            } else if (ch == '\n') {
                record.add(field.toString());
                field.setLength(0);
                wasQuoted = false;
                records.add(record);
                record = new ArrayList<>();
            } else {
                if (wasQuoted) {
                    throw new IllegalArgumentException("text after a closing quote at " + i);
                }
                field.append(ch);
            }
            i++;
        }
        if (quoted) {
            throw new IllegalArgumentException("unterminated quote");
        }
        if (field.length() > 0 || !record.isEmpty()) {
            record.add(field.toString());
            records.add(record);
        }
        return records;
    }

    /**
     * However a table is cut into blocks (short tables into small blocks, one per core's share;
     * long ones into blocks of 4096 rows, in batches), both ways of writing give the text of a
     * plain row-by-row loop over the cells.
     */
    @ParameterizedTest
    @ValueSource(ints = {0, 1, 255, 256, 257, 2047, 2048, 2049, 10_000, 32_769, 4096 * 9 + 1})
    void blocksJoinToTheRowByRowText(int rows) throws Exception {
        double[] x = new double[rows];
        double[] k = new double[rows];
        java.util.Random random = new java.util.Random(rows);
        for (int i = 0; i < rows; i++) {
            x[i] = Math.scalb(random.nextDouble() - 0.3, random.nextInt(200) - 100);
            k[i] = i % 7;
        }
        Table t = new Table.Builder("t", Metadata.of("t", Inputs.none(), List.of()))
                .number("x", "K", "a number", x)
                .number(new org.stellabar.table.Quantity("k", "", "a count", true), k)
                .build();
        StringBuilder expected = new StringBuilder("x [K],k\n");
        for (int i = 0; i < rows; i++) {
            expected.append(CsvWriter.number(x[i])).append(',').append((long) k[i]).append('\n');
        }
        assertEquals(expected.toString(), write(CsvWriter.plain(), t));
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        CsvWriter.plain().write(t, bytes);
        assertEquals(expected.toString(), bytes.toString(java.nio.charset.StandardCharsets.UTF_8));
        int blockRows = CsvWriter.blockRows(rows);
        assertTrue(blockRows >= 256 && blockRows <= 4096, "block rows " + blockRows);
    }

    /**
     * A long table's blocks are formatted into buffers that earlier blocks were written from, and
     * a buffer grows when its block's text is longer: rows short at first and up to four times the
     * first blocks' estimate later, in a table of twelve batches of blocks, give exactly the text
     * of a row-by-row loop (no byte of an earlier, longer or shorter, block is left in the output).
     */
    @Test
    void reusedBlockBuffersLeaveNothingOfEarlierBlocks() throws Exception {
        int rows = 4096 * 4 * 12 + 17;
        double[] x = new double[rows];
        List<String> notes = new java.util.ArrayList<>();
        java.util.Random random = new java.util.Random(7);
        for (int i = 0; i < rows; i++) {
            int block = i / 4096;
            // blocks alternate between short cells ("0", "a") and long ones (a 17-digit number,
            // a note of 30-120 characters against the estimate of 32 bytes a cell)
            boolean wide = block % 3 == 2;
            x[i] = wide ? Math.scalb(random.nextDouble() + 0.1, random.nextInt(400) - 200) : 0.0;
            notes.add(wide ? "n".repeat(30 + random.nextInt(91)) : "a");
        }
        Table t = new Table.Builder("t", Metadata.of("t", Inputs.none(), List.of()))
                .number("x", "K", "a number", x)
                .text("note", "a note", notes)
                .build();
        StringBuilder expected = new StringBuilder("x [K],note\n");
        for (int i = 0; i < rows; i++) {
            expected.append(CsvWriter.number(x[i])).append(',').append(notes.get(i)).append('\n');
        }
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        CsvWriter.plain().write(t, bytes);
        assertEquals(expected.toString(), bytes.toString(java.nio.charset.StandardCharsets.UTF_8));
    }

    /**
     * The texts kept for numbers met again: values drawn again and again from a pool larger than
     * a block's cache (so that slots are taken over), of text lengths from 3 to 24 bytes, with
     * 0.0 (whose bits, all zero, are those of an unfilled slot) and −0.0 among them, give exactly
     * the text of the numbers formatted one by one.
     */
    @Test
    void numbersMetAgainGiveTheirOwnText() throws Exception {
        java.util.Random random = new java.util.Random(11);
        double[] pool = new double[3000];
        for (int i = 0; i < pool.length; i++) {
            pool[i] = switch (i % 5) {
                case 0 -> 0.0;
                case 1 -> -0.0;
                case 2 -> i / 4.0;
                case 3 -> -Math.scalb(random.nextDouble() + 0.5, random.nextInt(2000) - 1000);
                default -> Math.scalb(random.nextDouble(), random.nextInt(100) - 50);
            };
        }
        int rows = 4096 * 5 + 3;
        double[] x = new double[rows];
        for (int i = 0; i < rows; i++) {
            x[i] = pool[random.nextInt(pool.length)];
        }
        x[0] = 0.0;
        x[4096] = -0.0;
        Table t = new Table.Builder("t", Metadata.of("t", Inputs.none(), List.of()))
                .number("x", "K", "a number", x)
                .build();
        StringBuilder expected = new StringBuilder("x [K]\n");
        for (int i = 0; i < rows; i++) {
            expected.append(CsvWriter.number(x[i])).append('\n');
        }
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        CsvWriter.plain().write(t, bytes);
        assertEquals(expected.toString(), bytes.toString(java.nio.charset.StandardCharsets.UTF_8));
    }

    private static String write(CsvWriter writer, Table t) throws Exception {
        StringWriter out = new StringWriter();
        writer.write(t, out);
        return out.toString();
    }

    @Test
    void plainTableReadsBackExactly() throws Exception {
        String text = write(CsvWriter.plain(), Fixtures.table());
        assertFalse(text.startsWith("#"));
        List<List<String>> rows = parse(text);
        assertEquals(List.of("rho [g/cm3]", "index", "label"), rows.get(0), "units in the header, none for pure numbers");
        assertEquals(Fixtures.AWKWARD.length + 1, rows.size());
        for (int i = 0; i < Fixtures.AWKWARD.length; i++) {
            List<String> row = rows.get(i + 1);
            assertEquals(3, row.size());
            // Double.toString is the shortest text that reads back to the same double
            assertEquals(Fixtures.AWKWARD[i], Double.parseDouble(row.get(0)), 0.0);
            assertEquals(Fixtures.AWKWARD_TEXT.get(i % Fixtures.AWKWARD_TEXT.size()), row.get(2));
        }
    }

    @Test
    void quotingFollowsRfc4180() {
        assertEquals("plain", CsvWriter.quote("plain"));
        assertEquals("\"a,b\"", CsvWriter.quote("a,b"));
        assertEquals("\"say \"\"hi\"\"\"", CsvWriter.quote("say \"hi\""));
        assertEquals("\"two\nlines\"", CsvWriter.quote("two\nlines"));
        assertEquals("\"cr\rhere\"", CsvWriter.quote("cr\rhere"));
    }

    @Test
    void commentedFileCarriesMetadataAndColumnUnits() throws Exception {
        String text = write(CsvWriter.withComments(), Fixtures.table());
        List<String> comments = text.lines().takeWhile(l -> l.startsWith("#")).toList();
        assertEquals("# " + Fixtures.META.title(), comments.get(0));
        assertTrue(comments.get(1).contains("stellabar " + Version.current()) && comments.get(1).contains("CODATA 2018"));
        assertTrue(comments.contains("# input rho = 1 g/cm3"));
        assertTrue(comments.contains("# input M = 40.0 solMass"), comments.toString());
        assertTrue(comments.contains("# input points = 7"));
        assertTrue(comments.contains("# input tolerance = 1.0E-10"));
        assertTrue(comments.contains("# note: second note"));
        assertTrue(comments.contains("# column rho [g/cm3]: density"));
        assertTrue(comments.contains("# column index []: row number"));
        // the data after the comments is the same as the plain form
        String data = text.substring(text.indexOf("\nrho [g/cm3]") + 1);
        assertEquals(write(CsvWriter.plain(), Fixtures.table()), data);
    }

    @Test
    void summaryIsOneFlatRecord() throws Exception {
        StringWriter out = new StringWriter();
        CsvWriter.plain().write(Fixtures.summary(), out);
        List<List<String>> rows = parse(out.toString());
        assertEquals(2, rows.size());
        assertEquals(List.of("P [erg/cm3]", "beta", "count", "name", "ok", "composition.mu", "warnings"), rows.get(0));
        List<String> values = rows.get(1);
        assertEquals(1.3721620554405665E15, Double.parseDouble(values.get(0)), 0.0);
        assertEquals("42", values.get(2));
        assertEquals("a, b", values.get(3));
        assertEquals("true", values.get(4));
        assertEquals(0.6172839506172839, Double.parseDouble(values.get(5)), 0.0);
        assertEquals("pair_creation;coulomb_coupling", values.get(6));
    }
}
