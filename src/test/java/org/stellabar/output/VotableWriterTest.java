package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * The VOTable writer against astropy (warnings are errors): awkward doubles, text with quotes,
 * line breaks, markup characters and non-ASCII letters, an integer column, every unit of the
 * unit table; units equal to the FITS file's, values exactly equal, UCDs in the IVOA vocabulary,
 * inputs as PARAMs with their units.
 */
class VotableWriterTest {

    @Test
    void astropyReadsWhatWeWriteLikeOurFits(@TempDir Path dir) throws Exception {
        PythonChecks.requireModules("astropy", "numpy");
        List<String> text = new ArrayList<>(Fixtures.AWKWARD_TEXT);
        text.add("<b> & </b>");
        text.add("tab\there");
        while (text.size() < Fixtures.AWKWARD.length) {
            text.add("x");
        }
        text = text.subList(0, Fixtures.AWKWARD.length);
        double[] rows = new double[Fixtures.AWKWARD.length];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = i + 1;
        }
        Table.Builder b = new Table.Builder("awkward", Fixtures.META).number("rho", "g/cm3", "density", Fixtures.AWKWARD)
                .number(Quantity.integer("row", "row number"), rows).text("label", "free \"text\" <here>", text);
        int i = 0;
        for (org.stellabar.physics.Unit u : org.stellabar.physics.Unit.values()) {
            if (u.written().isPresent()) {
                b.number("u" + i++, u.spelling(), "a column in " + u.spelling(), Fixtures.AWKWARD);
            }
        }
        Table table = b.build();
        OutputFolder folder = new OutputFolder(dir);
        Path vot = folder.table("awkward", table, TableFormat.VOTABLE);
        Path fits = folder.table("awkward", table, TableFormat.FITS);
        assertTrue(vot.toString().endsWith(".vot"));

        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(120), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("read_tables_with_astropy.py").toString(), vot.toString(), fits.toString());
        assertEquals(0, o.exitCode(), o.describe());
        JsonNode f = new ObjectMapper().readTree(o.stdout()).get("files").get(0);
        assertEquals(0, f.get("problems").size(), f.toString());
        List<String> read = new ArrayList<>();
        f.get("text").get("label").forEach(n -> read.add(n.asText()));
        // astropy strips a TD's surrounding blanks ("  padded  "); everything else comes back as written
        assertEquals(((TextColumn) table.column("label").orElseThrow()).values().stream().map(String::strip).toList(),
                read);
        assertEquals("phys.density", f.get("ucds").get("rho").asText());
        assertEquals("meta.record", f.get("ucds").get("row").asText());
        assertEquals("40.0", f.get("params").get("M").get(0).asText());
        assertEquals("solMass", f.get("params").get("M").get(1).asText());
        assertEquals("7", f.get("params").get("points").get(0).asText());
        assertTrue(f.get("infos").toString().contains("note"), f.toString());
    }

    /**
     * The rows, written as bytes block by block, are the UTF-8 text of a plain row-by-row
     * concatenation of each cell's text (the shortest round-trip number, the integer, the
     * escaped text), over three blocks of rows and a part of one, with non-ASCII and markup text.
     */
    @Test
    void rowsAreTheRowByRowText() throws Exception {
        int rows = 4096 * 3 + 5;
        double[] x = new double[rows];
        double[] k = new double[rows];
        List<String> notes = new ArrayList<>();
        java.util.SplittableRandom random = new java.util.SplittableRandom(5);
        for (int i = 0; i < rows; i++) {
            x[i] = i % 9 == 0 ? 0.0 : Math.scalb(random.nextDouble(-1, 1), random.nextInt(-1000, 1000));
            k[i] = i - 7;
            notes.add(i % 5 == 0 ? "Γ1 < 4/3 & \"ρ\"" : "n" + i);
        }
        Table t = new Table.Builder("t", Fixtures.META).number("x", "K", "a number", x)
                .number(Quantity.integer("k", "a count"), k).text("note", "a note", notes).build();
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        new VotableWriter().write(t, out);
        String text = out.toString(java.nio.charset.StandardCharsets.UTF_8);
        StringBuilder expected = new StringBuilder();
        for (int i = 0; i < rows; i++) {
            expected.append("     <TR><TD>").append(CsvWriter.number(x[i])).append("</TD><TD>").append(i - 7)
                    .append("</TD><TD>").append(VotableWriter.escape(notes.get(i))).append("</TD></TR>\n");
        }
        int from = text.indexOf("<TABLEDATA>\n") + "<TABLEDATA>\n".length();
        int to = text.indexOf("    </TABLEDATA>");
        assertEquals(expected.toString(), text.substring(from, to));
        assertTrue(text.endsWith("    </TABLEDATA>\n   </DATA>\n  </TABLE>\n </RESOURCE>\n</VOTABLE>\n"));
    }
}
