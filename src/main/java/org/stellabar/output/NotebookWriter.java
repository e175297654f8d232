package org.stellabar.output;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.stellabar.table.Input;
import org.stellabar.table.Metadata;

/**
 * Jupyter notebooks (nbformat 4.5: JSON, cells with ids; see the nbformat documentation, "The
 * Notebook file format") that reload a run's CSV files and draw them with NumPy and Matplotlib.
 *
 * <p>Cells: a Markdown cell (title, run description, the data files it needs); a code cell that
 * reads every CSV file next to the notebook (with pandas when it is installed, else with the
 * standard csv module and NumPy), skipping the {@code #} comment lines and taking the
 * {@code name [unit]} header apart, and prints what it loaded; then one code cell per plot. No
 * outputs are stored: the notebook is meant to be run.
 *
 * <p>The file is the same byte for byte for the same content: cell ids are derived from each
 * cell's position and text, and nothing depends on the clock.
 */
public final class NotebookWriter {

    private static final JsonFactory FACTORY = new JsonFactory();

    /**
     * The loading cell after its {@code FILES = [...]} line: Python kept as a resource beside this
     * class ({@code notebook-load.py}) so that it reads, and can be checked, as Python; loaded once.
     * Its series colours are the token {@value #COLOURS_TOKEN}, replaced by the writer's colours.
     */
    private static final String LOAD_CELL = resource("notebook-load.py");

    private static final String COLOURS_TOKEN = "__SERIES_COLOURS__";

    private static final Pattern HEX_COLOUR = Pattern.compile("#[0-9A-Fa-f]{6}");

    /** The loading cell with this writer's colours. */
    private final String loadCell;

    private static String resource(String name) {
        try (InputStream in = NotebookWriter.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException(name + " is missing beside " + NotebookWriter.class.getName()
                        + "; the build packages it from src/main/resources");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A writer of notebooks whose plots cycle through the given colours. The writer knows no
     * palette of its own: the caller passes the charts' one (see {@code charts.Palette}), so
     * that notebooks and charts share their colours.
     *
     * @param seriesColours colours as {@code #RRGGBB}, at least one, in the order series use them
     * @throws IllegalArgumentException when the list is empty or a colour is not {@code #RRGGBB}
     */
    public NotebookWriter(List<String> seriesColours) {
        if (seriesColours.isEmpty()) {
            throw new IllegalArgumentException("a notebook needs at least one series colour");
        }
        for (String c : seriesColours) {
            if (!HEX_COLOUR.matcher(c).matches()) {
                throw new IllegalArgumentException("series colour '" + c + "' is not #RRGGBB");
            }
        }
        int at = LOAD_CELL.indexOf(COLOURS_TOKEN);
        if (at < 0 || at != LOAD_CELL.lastIndexOf(COLOURS_TOKEN)) {
            throw new IllegalStateException("notebook-load.py must hold " + COLOURS_TOKEN + " exactly once");
        }
        this.loadCell = LOAD_CELL.replace(COLOURS_TOKEN, pythonList(seriesColours));
    }

    /**
     * Writes the notebook atomically.
     *
     * @param content what to show
     * @param target the .ipynb file; the CSV files must be (or be put) next to it
     * @throws IOException on write failure
     */
    public void write(NotebookContent content, Path target) throws IOException {
        AtomicFiles.writeText(target, out -> write(content, out));
    }

    /**
     * @param content what to show
     * @param out destination (UTF-8 text)
     * @throws IOException on write failure
     */
    public void write(NotebookContent content, Writer out) throws IOException {
        List<Cell> cells = new ArrayList<>();
        cells.add(new Cell("markdown", markdown(content)));
        cells.add(new Cell("code", "FILES = " + pythonList(content.csvFiles()) + "\n\n" + loadCell.stripTrailing()));
        for (NotebookPlot plot : content.plots()) {
            cells.add(new Cell("code", plotCode(plot)));
        }
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.setPrettyPrinter(prettyPrinter());
            g.writeStartObject();
            g.writeArrayFieldStart("cells");
            for (int i = 0; i < cells.size(); i++) {
                writeCell(g, cells.get(i), i);
            }
            g.writeEndArray();
            g.writeObjectFieldStart("metadata");
            g.writeObjectFieldStart("kernelspec");
            g.writeStringField("display_name", "Python 3");
            g.writeStringField("language", "python");
            g.writeStringField("name", "python3");
            g.writeEndObject();
            g.writeObjectFieldStart("language_info");
            g.writeStringField("name", "python");
            g.writeEndObject();
            g.writeEndObject();
            g.writeNumberField("nbformat", 4);
            g.writeNumberField("nbformat_minor", 5);
            g.writeEndObject();
        }
        out.write("\n");
    }

    /**
     * A Markdown description of a run: what, the inputs as a table, version and constants, notes.
     *
     * @param metadata a table's or summary's metadata
     * @return Markdown text
     */
    public static String describe(Metadata metadata) {
        StringBuilder md = new StringBuilder();
        md.append(metadata.title()).append("\n\n");
        if (!metadata.inputs().isEmpty()) {
            md.append("| input | value |\n| --- | --- |\n");
            for (Input input : metadata.inputs()) {
                md.append("| ").append(tableCell(input.name())).append(" | ").append(tableCell(input.text()))
                        .append(" |\n");
            }
            md.append('\n');
        }
        md.append("Computed by stellabar ").append(metadata.toolVersion()).append(" with the constants of ")
                .append(metadata.constants()).append(".\n");
        if (!metadata.notes().isEmpty()) {
            md.append('\n');
            for (String note : metadata.notes()) {
                md.append("- ").append(note).append('\n');
            }
        }
        return md.toString();
    }

    private static String tableCell(String text) {
        return text.replace("\\", "\\\\").replace("|", "\\|").replace("\n", " ");
    }

    private static String markdown(NotebookContent content) {
        StringBuilder md = new StringBuilder();
        md.append("# ").append(content.title().strip()).append("\n\n");
        if (!content.description().isBlank()) {
            md.append(content.description().strip()).append("\n\n");
        }
        md.append("Run the cells from the top. They read ");
        List<String> files = content.csvFiles();
        for (int i = 0; i < files.size(); i++) {
            md.append(i == 0 ? "" : i == files.size() - 1 ? " and " : ", ").append('`').append(files.get(i)).append('`');
        }
        md.append(", which must sit next to this notebook.");
        return md.toString();
    }

    private static String plotCode(NotebookPlot plot) {
        StringBuilder py = new StringBuilder();
        py.append("# ").append(plot.title().replace('\n', ' ').replace('\r', ' ')).append('\n');
        py.append("fig, ax = new_figure(").append(pythonString(plot.title())).append(")\n");
        py.append("draw(ax, ").append(pythonString(plot.csvFile())).append(", ").append(pythonString(plot.xColumn()))
                .append(", ").append(pythonList(plot.yColumns())).append(")\n");
        for (int k = 0; k < plot.referenceLines().size(); k++) {
            NotebookPlot.ReferenceLine line = plot.referenceLines().get(k);
            py.append("mark(ax, ")
                    .append(line.orientation() == NotebookPlot.Orientation.HORIZONTAL ? "\"horizontal\"" : "\"vertical\"")
                    .append(", ").append(pythonNumber(line.value())).append(", ").append(pythonString(line.label()))
                    .append(", ").append(k).append(")\n");
        }
        if (plot.logX()) {
            py.append("ax.set_xscale(\"log\")\n");
        }
        if (plot.logY()) {
            py.append("ax.set_yscale(\"log\")\n");
        }
        py.append("ax.set_xlabel(").append(pythonString(plot.xLabel())).append(")\n");
        py.append("ax.set_ylabel(").append(pythonString(plot.yLabel())).append(")");
        if (plot.yColumns().size() + plot.referenceLines().size() > 1) {
            py.append("\nax.legend(frameon=False, fontsize=9)");
        }
        return py.toString();
    }

    /** A Python string literal: JSON's string syntax is a subset of Python's. */
    static String pythonString(String text) {
        StringWriter w = new StringWriter();
        try (JsonGenerator g = FACTORY.createGenerator(w)) {
            g.writeString(text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }

    private static String pythonList(List<String> texts) {
        List<String> literals = new ArrayList<>();
        texts.forEach(t -> literals.add(pythonString(t)));
        return "[" + String.join(", ", literals) + "]";
    }

    /** Java's shortest round-trip decimal ("1.0E10") is also a Python float literal. */
    private static String pythonNumber(double value) {
        return Double.toString(value);
    }

    private record Cell(String type, String source) {
    }

    private static void writeCell(JsonGenerator g, Cell cell, int index) throws IOException {
        g.writeStartObject();
        g.writeStringField("cell_type", cell.type());
        if (cell.type().equals("code")) {
            g.writeNullField("execution_count");
        }
        g.writeStringField("id", cellId(cell, index));
        g.writeObjectFieldStart("metadata");
        g.writeEndObject();
        if (cell.type().equals("code")) {
            g.writeArrayFieldStart("outputs");
            g.writeEndArray();
        }
        // nbformat stores multi-line text as a list of lines, each but the last ending in "\n"
        g.writeArrayFieldStart("source");
        String[] lines = cell.source().split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            g.writeString(i < lines.length - 1 ? lines[i] + "\n" : lines[i]);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    /**
     * nbformat 4.5 cell ids: 1 to 64 characters of [a-zA-Z0-9-_], unique in the notebook. Ours
     * are the cell's position and the first 12 hex digits of the SHA-256 of its type and text:
     * unique by position, and the same whenever the same content is written.
     */
    private static String cellId(Cell cell, int index) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            byte[] hash = sha.digest((cell.type() + "\n" + cell.source()).getBytes(StandardCharsets.UTF_8));
            return "cell-" + index + "-" + HexFormat.of().formatHex(hash, 0, 6);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java platform", e);
        }
    }

    /** One-space indents, "key": value, line feeds only: the layout Jupyter itself saves. */
    private static DefaultPrettyPrinter prettyPrinter() {
        DefaultIndenter indenter = new DefaultIndenter(" ", "\n");
        DefaultPrettyPrinter pp = new DefaultPrettyPrinter(Separators.createDefaultInstance()
                .withObjectFieldValueSpacing(Separators.Spacing.AFTER)
                .withObjectEmptySeparator("")
                .withArrayEmptySeparator(""));
        pp.indentArraysWith(indenter);
        pp.indentObjectsWith(indenter);
        return pp;
    }
}
