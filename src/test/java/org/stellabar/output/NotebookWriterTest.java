package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.charts.Palette;

/** The notebook's JSON structure and reproducibility, checked in Java (no Python needed). */
class NotebookWriterTest {

    @TempDir
    Path dir;

    @Test
    void notebookHasTheNbformat45StructureWithoutOutputs() throws IOException {
        Path file = NotebookSamples.writeAll(dir);
        JsonNode nb = new ObjectMapper().readTree(file.toFile());
        assertEquals(4, nb.get("nbformat").asInt());
        assertEquals(5, nb.get("nbformat_minor").asInt());
        assertEquals("python3", nb.get("metadata").get("kernelspec").get("name").asText());
        JsonNode cells = nb.get("cells");
        assertEquals(2 + NotebookSamples.content().plots().size(), cells.size());
        assertEquals("markdown", cells.get(0).get("cell_type").asText());
        Set<String> ids = new HashSet<>();
        for (JsonNode cell : cells) {
            String id = cell.get("id").asText();
            assertTrue(id.matches("[a-zA-Z0-9_-]{1,64}"), id);
            assertTrue(ids.add(id), "duplicate id " + id);
            if (cell.get("cell_type").asText().equals("code")) {
                assertEquals(0, cell.get("outputs").size());
                assertTrue(cell.get("execution_count").isNull());
            }
            JsonNode source = cell.get("source");
            for (int i = 0; i < source.size() - 1; i++) {
                assertTrue(source.get(i).asText().endsWith("\n"), "every line but the last ends in \\n");
            }
        }
        String markdown = join(cells.get(0).get("source"));
        assertTrue(markdown.startsWith("# Notebook test: β, ρ and T\n"), markdown);
        assertTrue(markdown.contains("| note\\|with pipe | a\\|b |"), markdown);
        assertTrue(markdown.contains("`profile.csv` and `data/sequence.csv`"), markdown);
        String load = join(cells.get(1).get("source"));
        assertTrue(load.startsWith("FILES = [\"profile.csv\", \"data/sequence.csv\"]\n"), load);
        String lastPlot = join(cells.get(4).get("source"));
        assertTrue(lastPlot.contains("mark(ax, \"horizontal\", 0.5, \"β = 1/2 \\\"quoted\\\" \\\\ back\", 0)"),
                lastPlot);
        assertTrue(lastPlot.contains("ax.set_xscale(\"log\")"), lastPlot);
    }

    @Test
    void sameContentGivesTheSameBytes() throws IOException {
        Path a = dir.resolve("a.ipynb");
        Path b = dir.resolve("b.ipynb");
        new NotebookWriter(Palette.hexCodes()).write(NotebookSamples.content(), a);
        new NotebookWriter(Palette.hexCodes()).write(NotebookSamples.content(), b);
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        assertTrue(Files.readString(a).endsWith("}\n"));
    }

    @Test
    void cellIdsFollowContent() throws IOException {
        Path a = dir.resolve("a.ipynb");
        Path b = dir.resolve("b.ipynb");
        NotebookContent one = NotebookSamples.content();
        NotebookContent other = new NotebookContent(one.title() + " (2)", one.description(), one.plots());
        new NotebookWriter(Palette.hexCodes()).write(one, a);
        new NotebookWriter(Palette.hexCodes()).write(other, b);
        JsonNode x = new ObjectMapper().readTree(a.toFile()).get("cells");
        JsonNode y = new ObjectMapper().readTree(b.toFile()).get("cells");
        assertTrue(!x.get(0).get("id").equals(y.get(0).get("id")), "changed markdown, new id");
        assertEquals(x.get(2).get("id"), y.get(2).get("id"), "unchanged plot cell, same id");
    }

    @Test
    void badPlotsAreRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> NotebookPlot.of("t", "/abs/file.csv", "x", List.of("y"), "x", "y"));
        assertThrows(IllegalArgumentException.class,
                () -> NotebookPlot.of("t", "f.csv", "x", List.of(), "x", "y"));
        assertThrows(IllegalArgumentException.class,
                () -> NotebookPlot.of("t", "f.csv", "x", List.of("y"), "x", "y").withLogY().withHorizontalLine(0, "0"));
        assertThrows(IllegalArgumentException.class,
                () -> NotebookPlot.of("t", "f.csv", "x", List.of("y"), "x", "y").withVerticalLine(Double.NaN, "n"));
        assertThrows(IllegalArgumentException.class, () -> new NotebookContent("t", "", List.of()));
    }

    // The loading cell carries the colours it is given, in their order, and no token of the resource.
    @Test
    void theLoadingCellCyclesThroughTheGivenColours() throws IOException {
        Path file = dir.resolve("c.ipynb");
        new NotebookWriter(List.of("#112233", "#ABCDEF")).write(NotebookSamples.content(), file);
        String load = join(new ObjectMapper().readTree(file.toFile()).get("cells").get(1).get("source"));
        assertTrue(load.contains("COLOURS = [\"#112233\", \"#ABCDEF\"]\n"), load);
        assertTrue(!load.contains("__"), load);
    }

    @Test
    void badColoursAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new NotebookWriter(List.of()));
        assertThrows(IllegalArgumentException.class, () -> new NotebookWriter(List.of("blue")));
        assertThrows(IllegalArgumentException.class, () -> new NotebookWriter(List.of("#12345")));
    }

    private static String join(JsonNode lines) {
        StringBuilder b = new StringBuilder();
        lines.forEach(l -> b.append(l.asText()));
        return b.toString();
    }
}
