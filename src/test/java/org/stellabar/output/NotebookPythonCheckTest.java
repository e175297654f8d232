package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/**
 * The exported notebook passes nbformat's validation with warnings as errors (controls with a bad,
 * a duplicate and a missing cell id must fail it), and runs from top to bottom under
 * {@code jupyter nbconvert --execute}: the loading cell reports every column with the smallest
 * and largest value we wrote, and every plot cell renders a figure. One nbconvert run per class.
 */
class NotebookPythonCheckTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;

    private static JsonNode validation;
    private static JsonNode executed;

    @BeforeAll
    static void validateAndExecute() throws IOException {
        PythonChecks.requireModules("nbformat", "nbconvert", "nbclient", "ipykernel", "matplotlib", "numpy");
        Path notebook = NotebookSamples.writeAll(dir);

        ObjectNode original = (ObjectNode) JSON.readTree(notebook.toFile());
        Path badId = control("bad-id.ipynb", original, cells -> ((ObjectNode) cells.get(1)).put("id", "no spaces!"));
        Path duplicate = control("duplicate-id.ipynb", original,
                cells -> ((ObjectNode) cells.get(2)).put("id", cells.get(1).get("id").asText()));
        Path missing = control("missing-id.ipynb", original, cells -> ((ObjectNode) cells.get(0)).remove("id"));

        PythonChecks.Outcome v = PythonChecks.run(Duration.ofSeconds(60), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("validate_notebooks.py").toString(), notebook.toString(), badId.toString(),
                duplicate.toString(), missing.toString());
        assertEquals(0, v.exitCode(), v.describe());
        validation = JSON.readTree(v.stdout());

        // The inline back end renders each figure to PNG, so drawing errors (fonts, mathtext in
        // labels) surface; with Agg the figures would be built but never drawn.
        PythonChecks.Outcome run = PythonChecks.run(Duration.ofSeconds(300), dir,
                Map.of("MPLBACKEND", "module://matplotlib_inline.backend_inline",
                        "JUPYTER_RUNTIME_DIR", dir.resolve("runtime").toString(),
                        // quiets ipykernel's debugger note about frozen modules on stderr
                        "PYDEVD_DISABLE_FILE_VALIDATION", "1"),
                PythonChecks.PYTHON, "-m", "jupyter", "nbconvert", "--to", "notebook", "--execute",
                "--ExecutePreprocessor.timeout=240", "--output", "executed.ipynb", notebook.toString());
        assertEquals(0, run.exitCode(), run.describe());
        executed = JSON.readTree(dir.resolve("executed.ipynb").toFile());
    }

    private interface Change {
        void apply(ArrayNode cells);
    }

    private static Path control(String name, ObjectNode original, Change change) throws IOException {
        ObjectNode copy = original.deepCopy();
        change.apply((ArrayNode) copy.get("cells"));
        Path file = dir.resolve(name);
        JSON.writeValue(file.toFile(), copy);
        return file;
    }

    private static JsonNode validationOf(String fileName) {
        for (JsonNode f : validation.get("files")) {
            if (f.get("path").asText().endsWith(fileName)) {
                return f;
            }
        }
        throw new AssertionError("no validation report for " + fileName);
    }

    @Test
    void nbformatAcceptsTheNotebookWithWarningsAsErrors() {
        JsonNode ok = validationOf("test.ipynb");
        assertFalse(ok.has("error"), () -> ok.get("error").asText());
        assertEquals(4, ok.get("nbformat").asInt());
        assertEquals(5, ok.get("nbformat_minor").asInt());
    }

    @Test
    void theValidationRejectsBadDuplicateAndMissingCellIds() {
        for (String control : List.of("bad-id.ipynb", "duplicate-id.ipynb", "missing-id.ipynb")) {
            assertTrue(validationOf(control).has("error"), control + " must fail: " + validationOf(control));
        }
    }

    @Test
    void everyCellRanWithoutErrorsOrWarnings() {
        for (JsonNode cell : executed.get("cells")) {
            if (!cell.get("cell_type").asText().equals("code")) {
                continue;
            }
            assertTrue(cell.get("execution_count").isInt(), "cell " + cell.get("id") + " did not run");
            for (JsonNode output : cell.get("outputs")) {
                String type = output.get("output_type").asText();
                assertFalse(type.equals("error"), () -> "error in cell " + cell.get("id") + ": " + output);
                assertFalse(type.equals("stream") && output.get("name").asText().equals("stderr"),
                        () -> "cell " + cell.get("id") + " wrote to stderr: " + output.get("text"));
            }
        }
    }

    @Test
    void loadingCellReadsEveryColumnWithItsValues() {
        String printed = streamText(executed.get("cells").get(1));
        assertTrue(printed.contains("profile.csv: " + NotebookSamples.PROFILE_ROWS + " rows"), printed);
        assertTrue(printed.contains("data/sequence.csv: 5 rows"), printed);
        assertTrue(printed.contains("  zone: text"), printed);
        for (Table t : List.of(NotebookSamples.profile(), NotebookSamples.sequence())) {
            for (Column c : t.columns()) {
                if (c instanceof NumberColumn n) {
                    String label = n.unit().isEmpty() ? n.name() : n.name() + " [" + FitsUnits.written(n.unit()) + "]";
                    Matcher m = Pattern.compile("  " + Pattern.quote(label) + ": min (\\S+), max (\\S+)\n")
                            .matcher(printed);
                    assertTrue(m.find(), label + " not reported in:\n" + printed);
                    double[] v = n.values();
                    // Python's repr and Java's parser both round-trip doubles exactly.
                    assertEquals(java.util.Arrays.stream(v).min().orElseThrow(), Double.parseDouble(m.group(1)), label);
                    assertEquals(java.util.Arrays.stream(v).max().orElseThrow(), Double.parseDouble(m.group(2)), label);
                }
            }
        }
    }

    /**
     * Without pandas the loading cell falls back to the csv module and NumPy; both ways must
     * report the same columns and the same values.
     */
    @Test
    void loadingWithoutPandasGivesTheSameResult() throws IOException {
        StringBuilder source = new StringBuilder();
        executed.get("cells").get(1).get("source").forEach(line -> source.append(line.asText()));
        Path script = dir.resolve("load_without_pandas.py");
        Files.writeString(script, "import sys\nsys.modules['pandas'] = None  # makes 'import pandas' fail\n"
                + source + "\nassert pd is None\n");
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(60), dir, Map.of(), PythonChecks.PYTHON,
                script.toString());
        assertEquals(0, o.exitCode(), o.describe());
        assertEquals(streamText(executed.get("cells").get(1)), o.stdout());
    }

    @Test
    void everyPlotCellRendersOneFigure() {
        JsonNode cells = executed.get("cells");
        for (int i = 2; i < cells.size(); i++) {
            List<String> images = new ArrayList<>();
            for (JsonNode output : cells.get(i).get("outputs")) {
                if (output.has("data") && output.get("data").has("image/png")) {
                    images.add(output.get("data").get("image/png").asText());
                }
            }
            assertEquals(1, images.size(), "plot cell " + i + " outputs: " + cells.get(i).get("outputs"));
            assertTrue(images.get(0).length() > 1000, "a real PNG, not an empty one");
        }
    }

    private static String streamText(JsonNode cell) {
        StringBuilder b = new StringBuilder();
        for (JsonNode output : cell.get("outputs")) {
            if (output.get("output_type").asText().equals("stream")) {
                JsonNode text = output.get("text");
                if (text.isArray()) {
                    text.forEach(t -> b.append(t.asText()));
                } else {
                    b.append(text.asText());
                }
            }
        }
        return b.toString();
    }

}
