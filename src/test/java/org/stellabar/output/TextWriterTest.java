package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

class TextWriterTest {

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', value = {"1.3721620554405665E15|1.372162e+15", "0.9816208947519909|0.9816209",
        "1.0|1", "0.0|0", "-2.5|-2.5", "0.001|0.001", "9.9999e-4|9.999900e-04", "1234567.8|1234568",
        "1.0E7|1.000000e+07", "21.996961864735145|21.99696", "-1.619321997063641E16|-1.619322e+16"})
    void sevenSignificantDigits(double value, String text) {
        assertEquals(text, TextWriter.format(value));
    }

    @Test
    void summaryShowsNameValueUnitMeaning() throws Exception {
        StringWriter out = new StringWriter();
        new TextWriter().write(Fixtures.summary(), out);
        List<String> lines = out.toString().lines().toList();
        assertEquals(Fixtures.META.title(), lines.get(0));
        assertTrue(lines.contains("  input rho = 1 g/cm3"));
        assertTrue(lines.contains("  input M = 40.0 solMass"));
        assertTrue(lines.stream().anyMatch(l -> l.matches("P\\s+1\\.372162e\\+15\\s+erg/cm3\\s+pressure")), out.toString());
        assertTrue(lines.stream().anyMatch(l -> l.matches("\\s+mu\\s+0\\.617284\\s+mean weight")), out.toString());
        assertTrue(lines.contains("warnings:"));
        assertTrue(lines.contains("  pair_creation: pairs, \"many\""));
        assertTrue(lines.contains("profile (" + Fixtures.AWKWARD.length + " rows):"));
    }

    @Test
    void emptyListSaysNone() throws Exception {
        Summary s = new Summary.Builder("s", Fixtures.META).summaries("warnings", List.of(), "").build();
        StringWriter out = new StringWriter();
        new TextWriter().write(s, out);
        assertTrue(out.toString().contains("warnings: none\n"));
    }

    @Test
    void tableColumnsAreAlignedUnderHeadersWithUnits() throws Exception {
        Table t = new Table.Builder("t", Fixtures.META).number("rho", "g/cm3", "density", new double[] {1, 1e-12, 150})
                .number("beta", "", "fraction", new double[] {0.5, 1, 0.25}).build();
        StringWriter out = new StringWriter();
        new TextWriter().write(t, out);
        List<String> lines = out.toString().lines().toList();
        assertEquals(4, lines.size());
        assertTrue(lines.get(0).contains("rho [g/cm3]") && lines.get(0).endsWith("beta"));
        // right-aligned: every line ends at the same column
        for (String line : lines) {
            assertEquals(lines.get(0).length(), line.length(), line);
        }
        assertTrue(lines.get(2).contains("1.000000e-12"));
    }
}
