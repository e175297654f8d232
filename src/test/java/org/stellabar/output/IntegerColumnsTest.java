package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * An integer column (a bit mask, a flag, a row number) is written as integers in every format:
 * "32", never "32.0"; ECSV int64; FITS 1J, or 1K when a value needs 64 bits; JSON integral numbers.
 */
class IntegerColumnsTest {

    private static final Quantity MASK = Quantity.integer("mask", "bits");
    private static final Quantity BIG = Quantity.integer("big", "needs 64 bits");
    private static final Quantity REAL = new Quantity("x", "cm", "a length");

    /** 2^40 does not fit 32 bits; 2^53 is the largest magnitude exact as a double. */
    private static Table table() {
        return new Table.Builder("t", Fixtures.META).number(MASK, new double[] {0, 32, -7})
                .number(BIG, new double[] {Math.pow(2, 40), -Math.pow(2, 53), 1}).number(REAL, new double[] {1, 2.5, 3})
                .build();
    }

    @Test
    void csvWritesWholeNumbersWithoutAPoint() throws Exception {
        StringWriter out = new StringWriter();
        CsvWriter.plain().write(table(), out);
        assertEquals(List.of("mask,big,x [cm]", "0,1099511627776,1.0", "32,-9007199254740992,2.5", "-7,1,3.0"),
                out.toString().lines().toList());
    }

    @Test
    void ecsvDeclaresInt64() throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        new EcsvWriter().write(table(), out);
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("{\"name\":\"mask\",\"datatype\":\"int64\""), text);
        assertTrue(text.contains("{\"name\":\"big\",\"datatype\":\"int64\""), text);
        assertTrue(text.contains("\"datatype\":\"float64\""), text);
        assertTrue(text.contains("\n32,-9007199254740992,2.5\n"), text);
    }

    @Test
    void jsonWritesIntegralNumbers() throws Exception {
        StringWriter out = new StringWriter();
        new JsonWriter().write(table(), out);
        JsonNode columns = new ObjectMapper().readTree(out.toString()).get("columns");
        assertTrue(columns.get(0).get("values").get(1).isIntegralNumber());
        assertEquals(32, columns.get(0).get("values").get(1).asLong());
        assertEquals(-9007199254740992L, columns.get(1).get("values").get(1).asLong());
        assertTrue(columns.get(2).get("values").get(0).isFloatingPointNumber());
    }

    @Test
    void fitsUsesJAndKColumnsThatReadBack(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("t.fits");
        new FitsWriter().write(table(), file);
        try (Fits fits = new Fits(file.toFile())) {
            BinaryTableHDU hdu = (BinaryTableHDU) fits.getHDU(1);
            assertEquals("1J", hdu.getHeader().getStringValue("TFORM1"));
            assertEquals("1K", hdu.getHeader().getStringValue("TFORM2"));
            assertEquals("1D", hdu.getHeader().getStringValue("TFORM3"));
            assertEquals(32, ((int[]) hdu.getColumn(0))[1]);
            assertEquals(-9007199254740992L, ((long[]) hdu.getColumn(1))[1]);
        }
        FitsTable read = FitsTableReader.read(file);
        assertEquals(-7.0, read.column("mask").orElseThrow().get(2));
    }

    @Test
    void anIntegerColumnRefusesFractionsAndValuesBeyondExactDoubles() {
        assertThrows(IllegalStateException.class, () -> MASK.column(new double[] {1.5}));
        assertThrows(IllegalStateException.class, () -> MASK.column(new double[] {Math.pow(2, 54)}));
        NumberColumn ok = MASK.column(new double[] {3});
        assertTrue(ok.integer() && ok.quantity().integer());
        assertTrue(MASK.withName("m2").integer(), "a derived quantity stays integer");
    }
}
