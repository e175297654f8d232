package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.CellTable;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

class CsvTableReaderTest {

    private final CsvTableReader reader = new CsvTableReader();

    @Test
    void commentsAndBlankLinesAreNotCountedAsRows() {
        CellTable t = reader.parse("f.csv", List.of("\uFEFF# made by hand", "a,b", "", "1,2", "# note", "3,4"));
        assertEquals(List.of("a", "b"), t.header());
        assertEquals(2, t.rows().size());
        assertEquals(1, t.rows().get(0).number());
        assertEquals(4, t.rows().get(0).line());
        assertEquals(2, t.rows().get(1).number());
        assertEquals(6, t.rows().get(1).line());
        assertEquals(List.of("3", "4"), t.rows().get(1).cells());
    }

    @Test
    void quotedCellsFollowRfc4180() {
        CellTable t = reader.parse("f.csv", List.of("name,\"note, long\"", " \"a \"\"b\"\"\" , c ,"));
        assertEquals(List.of("name", "note, long"), t.header());
        assertEquals(List.of("a \"b\"", "c", ""), t.rows().get(0).cells());
    }

    @Test
    void raggedRowsAreKeptAsTheyAre() {
        CellTable t = reader.parse("f.csv", List.of("a,b,c", "1,2", "1,2,3,4"));
        assertEquals(2, t.rows().get(0).cells().size());
        assertEquals(4, t.rows().get(1).cells().size());
    }

    @Test
    void emptyOrCommentOnlyFileHasNoHeader() {
        assertThrows(BadInputException.class, () -> reader.parse("f.csv", List.of()));
        assertThrows(BadInputException.class, () -> reader.parse("f.csv", List.of("# only", "   ")));
    }

    @Test
    void unterminatedQuoteNamesTheLine() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> reader.parse("f.csv", List.of("a,b", "\"1,2")));
        assertTrue(e.getMessage().contains("line 2"), e.getMessage());
    }

    @Test
    void missingFileIsBadInput(@TempDir Path dir) {
        BadInputException e = assertThrows(BadInputException.class, () -> reader.read(dir.resolve("nope.csv")));
        assertTrue(e.getMessage().contains("nope.csv"));
    }

    @Test
    void readsBackWhatCsvWriterWrites(@TempDir Path dir) throws Exception {
        Table table = new Table.Builder("t", Metadata.of("a test table", org.stellabar.table.Inputs.builder().text("k", "v").build(), List.of("n")))
                .number("rho", "g/cm3", "density", new double[] {1.5, 0.1 + 0.2})
                .text("label", "text, with a comma", List.of("x, y", "say \"hi\"")).build();
        StringWriter w = new StringWriter();
        CsvWriter.withComments().write(table, w);
        Path file = dir.resolve("t.csv");
        Files.writeString(file, w.toString());
        CellTable back = reader.read(file);
        assertEquals(new ColumnHeading("rho", "g/cm3"), ColumnHeading.parse(back.header().get(0)));
        assertEquals(new ColumnHeading("label", null), ColumnHeading.parse(back.header().get(1)));
        assertEquals(0.1 + 0.2, Double.parseDouble(back.rows().get(1).cells().get(0)), 0.0);
        assertEquals("say \"hi\"", back.rows().get(1).cells().get(1));
    }

    @Test
    void headingSplitsNameAndUnit() {
        assertEquals(new ColumnHeading("P", "dyn/cm2"), ColumnHeading.parse(" P [dyn/cm2] "));
        assertEquals(new ColumnHeading("beta", ""), ColumnHeading.parse("beta []"));
        ColumnHeading plain = ColumnHeading.parse("log_T");
        assertEquals("log_T", plain.name());
        assertNull(plain.unit());
        assertEquals("[x]", ColumnHeading.parse("[x]").name());
    }
}
