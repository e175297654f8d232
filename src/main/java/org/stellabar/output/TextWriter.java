package org.stellabar.output;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.stellabar.table.Column;
import org.stellabar.table.Field;
import org.stellabar.table.Input;
import org.stellabar.table.IntegerListField;
import org.stellabar.table.NestedField;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.NumberField;
import org.stellabar.table.Summary;
import org.stellabar.table.SummaryListField;
import org.stellabar.table.Table;
import org.stellabar.table.TableField;
import org.stellabar.table.TextColumn;

/**
 * Aligned plain text for a terminal: a summary as rows of name, value, unit and meaning (nested
 * summaries as indented blocks, lists such as warnings last); a table as aligned columns under a
 * header with units. Numbers get seven significant digits.
 */
public final class TextWriter {

    /**
     * @param summary the summary
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Summary summary, Writer out) throws IOException {
        out.write(summary.metadata().title() + "\n");
        for (Input input : summary.metadata().inputs()) {
            out.write("  input " + input.name() + " = " + FieldText.input(input) + "\n");
        }
        out.write("\n");
        writeFields(summary, out, "");
        for (Field f : summary.fields()) {
            if (f instanceof IntegerListField list && !list.value().isEmpty()) {
                List<String> numbers = new ArrayList<>();
                for (long l : list.value()) {
                    numbers.add(Long.toString(l));
                }
                out.write("\n" + f.name() + ": " + String.join(", ", numbers) + "\n");
            } else if (f instanceof IntegerListField) {
                out.write("\n" + f.name() + ": none\n");
            } else if (f instanceof SummaryListField list) {
                out.write("\n" + f.name() + ":" + (list.value().isEmpty() ? " none\n" : "\n"));
                for (Summary s : list.value()) {
                    List<String> parts = new ArrayList<>();
                    for (Field x : s.fields()) {
                        parts.add(FieldText.plain(x));
                    }
                    out.write("  " + String.join(": ", parts) + "\n");
                }
            }
        }
        for (Field f : summary.fields()) {
            if (f instanceof TableField t) {
                out.write("\n" + f.name() + " (" + t.value().rowCount() + " rows):\n");
                write(t.value(), out);
            }
        }
    }

    private void writeFields(Summary summary, Writer out, String indent) throws IOException {
        int nameWidth = 0;
        int valueWidth = 0;
        int unitWidth = 0;
        for (Field f : summary.fields()) {
            if (f.scalar()) {
                nameWidth = Math.max(nameWidth, f.name().length());
                valueWidth = Math.max(valueWidth, scalarText(f).length());
                unitWidth = Math.max(unitWidth, FitsUnits.written(f.unit()).length());
            }
        }
        for (Field f : summary.fields()) {
            if (f.scalar()) {
                out.write(String.format(Locale.US, "%s%-" + nameWidth + "s  %" + valueWidth + "s  %-"
                        + Math.max(1, unitWidth) + "s  %s%n", indent, f.name(), scalarText(f), FitsUnits.written(f.unit()),
                        f.description()).stripTrailing() + "\n");
            } else if (f instanceof NestedField nested) {
                out.write(indent + f.name() + ":\n");
                writeFields(nested.value(), out, indent + "  ");
            }
        }
    }

    /**
     * @param table the table
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Table table, Writer out) throws IOException {
        // Two passes over the numbers, formatting each twice, so that memory does not grow with
        // the table: the first finds each column's width, the second writes the rows.
        int cols = table.columns().size();
        String[] header = new String[cols];
        int[] width = new int[cols];
        for (int c = 0; c < cols; c++) {
            Column col = table.columns().get(c);
            header[c] = col.unit().isEmpty() ? col.name() : col.name() + " [" + FitsUnits.written(col.unit()) + "]";
            width[c] = header[c].length();
            for (int r = 0; r < table.rowCount(); r++) {
                width[c] = Math.max(width[c], cell(col, r).length());
            }
        }
        StringBuilder line = new StringBuilder();
        writeLine(header, width, line, out);
        String[] row = new String[cols];
        for (int r = 0; r < table.rowCount(); r++) {
            for (int c = 0; c < cols; c++) {
                row[c] = cell(table.columns().get(c), r);
            }
            writeLine(row, width, line, out);
        }
    }

    private static String cell(Column col, int row) {
        if (col instanceof NumberColumn n) {
            return n.integer() ? Long.toString(n.getLong(row)) : format(n.get(row));
        }
        return ((TextColumn) col).values().get(row);
    }

    private static void writeLine(String[] cells, int[] width, StringBuilder line, Writer out) throws IOException {
        line.setLength(0);
        for (int c = 0; c < cells.length; c++) {
            if (c > 0) {
                line.append("  ");
            }
            line.append(" ".repeat(width[c] - cells[c].length())).append(cells[c]);
        }
        int end = line.length();
        while (end > 0 && line.charAt(end - 1) == ' ') {
            end--;
        }
        line.setLength(end);
        line.append('\n');
        out.append(line);
    }

    /** A scalar field's value: seven significant digits for a number, the value as text otherwise. */
    private static String scalarText(Field f) {
        return f instanceof NumberField n ? format(n.value()) : FieldText.plain(f);
    }

    /**
     * @param d a finite double
     * @return seven significant digits, fixed or scientific by magnitude
     */
    public static String format(double d) {
        double a = Math.abs(d);
        if (a != 0 && (a < 1e-3 || a >= 1e7)) {
            return String.format(Locale.US, "%.6e", d);
        }
        // %.7g, then trailing zeros and a bare point dropped (without a regular expression: this
        // runs for every cell of a text table)
        String text = String.format(Locale.US, "%.7g", d);
        if (text.indexOf('.') < 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        if (text.charAt(end - 1) == '.') {
            end--;
        }
        return text.substring(0, end);
    }
}
