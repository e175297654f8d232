package org.stellabar.output;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import org.stellabar.table.Column;
import org.stellabar.table.Input;
import org.stellabar.table.IntegerInput;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.NumberInput;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;
import org.stellabar.table.TextInput;

/**
 * The IVOA VOTable (version 1.3, IVOA Recommendation 2013-09-20), one TABLE in one RESOURCE,
 * the rows as TABLEDATA: each FIELD carries its unit, a UCD where a standard one fits
 * ({@link Ucds}) and its description; the metadata are PARAMs (the typed inputs: a number with
 * its unit, an integer, text) and INFOs (software, constants, notes). {@code Table.read(file)}
 * in astropy gives columns with units and descriptions.
 *
 * <p>Why 1.3 and not 1.4: from 1.4 on, readers parse units as VOUnit (astropy does), where erg is
 * deprecated and the dyne absent, so every CGS energy, pressure and luminosity would be read with
 * a warning; up to 1.3 units follow the CDS standard, which knows them. The unit strings are the
 * one written spelling of every format ({@link FitsUnits#written}), which the CDS parser reads.
 *
 * <p>Numbers are the shortest decimal that reads back to the same double (as in CSV), integer
 * columns are {@code long}, text columns {@code char} (or {@code unicodeChar} when a value is
 * not ASCII) of variable length. XML special characters are escaped; characters XML 1.0 cannot
 * hold (controls other than tab and line breaks) become U+FFFD. Readers strip a cell's surrounding
 * blanks (astropy does), so text with leading or trailing blanks does not come back exactly.
 */
public final class VotableWriter {

    private static final String NAMESPACE = "http://www.ivoa.net/xml/VOTable/v1.3";
    private static final int BLOCK_ROWS = 4096;
    private static final byte[] ROW_START = "     <TR>".getBytes(StandardCharsets.US_ASCII);
    private static final byte[] ROW_END = "</TR>\n".getBytes(StandardCharsets.US_ASCII);
    private static final byte[] CELL_START = "<TD>".getBytes(StandardCharsets.US_ASCII);
    private static final byte[] CELL_END = "</TD>".getBytes(StandardCharsets.US_ASCII);

    /**
     * @param table the table
     * @param out destination (not closed)
     * @throws IOException on write failure
     */
    public void write(Table table, OutputStream out) throws IOException {
        StringBuilder head = new StringBuilder(4096);
        Metadata m = table.metadata();
        head.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
                .append("<VOTABLE version=\"1.3\" xmlns=\"").append(NAMESPACE)
                .append("\" xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\" xsi:schemaLocation=\"")
                .append(NAMESPACE).append(' ').append(NAMESPACE).append("\">\n");
        head.append(" <RESOURCE type=\"results\">\n");
        head.append("  <TABLE name=\"").append(escape(table.name())).append("\" nrows=\"").append(table.rowCount())
                .append("\">\n");
        head.append("   <DESCRIPTION>").append(escape(m.title())).append("</DESCRIPTION>\n");
        info(head, "software", "stellabar " + m.toolVersion());
        info(head, "constants", m.constants());
        for (String note : m.notes()) {
            info(head, "note", note);
        }
        for (Input input : m.inputs()) {
            param(head, input);
        }
        for (Column c : table.columns()) {
            head.append("   <FIELD name=\"").append(escape(c.name())).append("\" ");
            if (c instanceof NumberColumn n) {
                head.append("datatype=\"").append(n.integer() ? "long" : "double").append('"');
                String unit = FitsUnits.written(c.unit());
                if (!unit.isEmpty()) {
                    head.append(" unit=\"").append(escape(unit)).append('"');
                }
            } else {
                head.append("datatype=\"").append(ascii((TextColumn) c) ? "char" : "unicodeChar")
                        .append("\" arraysize=\"*\"");
            }
            Ucds.of(c).ifPresent(ucd -> head.append(" ucd=\"").append(ucd).append('"'));
            head.append(">\n    <DESCRIPTION>").append(escape(c.description())).append("</DESCRIPTION>\n   </FIELD>\n");
        }
        head.append("   <DATA>\n    <TABLEDATA>\n");
        out.write(head.toString().getBytes(StandardCharsets.UTF_8));
        // the rows as bytes, numbers straight from the formatter: a string per number and per
        // block of rows made a 10^6-point grid's VOTable ~1.5x slower (src/bench/README.md)
        RowBytes rows = new RowBytes(64 * table.columns().size() * Math.min(BLOCK_ROWS, table.rowCount()));
        ShortestDecimal decimal = new ShortestDecimal();
        for (int r = 0; r < table.rowCount(); r++) {
            writeRow(table, r, decimal, rows);
            if ((r + 1) % BLOCK_ROWS == 0) {
                out.write(rows.bytes, 0, rows.size);
                rows.size = 0;
            }
        }
        rows.appendAscii("    </TABLEDATA>\n   </DATA>\n  </TABLE>\n </RESOURCE>\n</VOTABLE>\n");
        out.write(rows.bytes, 0, rows.size);
    }

    /**
     * One TR with its line end, UTF-8. A method of its own, called once per row, so that the first
     * JIT tier compiles it after a couple of hundred rows (DEVELOPERS.md, start-up rules).
     */
    private static void writeRow(Table table, int r, ShortestDecimal decimal, RowBytes rows) {
        rows.append(ROW_START);
        for (Column c : table.columns()) {
            rows.append(CELL_START);
            if (c instanceof NumberColumn n) {
                if (n.integer()) {
                    rows.appendAscii(Long.toString(n.getLong(r)));
                } else {
                    rows.appendNumber(n.get(r), decimal);
                }
            } else {
                rows.append(escape(((TextColumn) c).values().get(r)).getBytes(StandardCharsets.UTF_8));
            }
            rows.append(CELL_END);
        }
        rows.append(ROW_END);
    }

    private static void info(StringBuilder xml, String name, String value) {
        xml.append("   <INFO name=\"").append(escape(name)).append("\" value=\"").append(escape(value)).append("\"/>\n");
    }

    /** An input as a PARAM: a number with its unit, an integer, or text. */
    private static void param(StringBuilder xml, Input input) {
        xml.append("   <PARAM name=\"").append(escape(input.name())).append("\" ");
        String description = "";
        if (input instanceof NumberInput n) {
            xml.append("datatype=\"double\" value=\"").append(CsvWriter.number(n.value())).append('"');
            String unit = FitsUnits.written(n.unit());
            if (!unit.isEmpty()) {
                xml.append(" unit=\"").append(escape(unit)).append('"');
            }
            description = n.description();
        } else if (input instanceof IntegerInput i) {
            xml.append("datatype=\"long\" value=\"").append(i.value()).append('"');
            description = i.description();
        } else if (input instanceof TextInput t) {
            xml.append("datatype=\"").append(isAscii(t.text()) ? "char" : "unicodeChar")
                    .append("\" arraysize=\"*\" value=\"").append(escape(t.text())).append('"');
        }
        if (description.isEmpty()) {
            xml.append("/>\n");
        } else {
            xml.append(">\n    <DESCRIPTION>").append(escape(description)).append("</DESCRIPTION>\n   </PARAM>\n");
        }
    }

    private static boolean ascii(TextColumn c) {
        return c.values().stream().allMatch(VotableWriter::isAscii);
    }

    private static boolean isAscii(String text) {
        return text.chars().allMatch(ch -> ch < 128);
    }

    /**
     * @param text any text
     * @return the text as XML character data or attribute value: the five special characters as
     *     entities, line breaks and tabs as character references (so attributes keep them),
     *     characters XML 1.0 forbids as U+FFFD
     */
    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&apos;");
                case '\n' -> out.append("&#10;");
                case '\r' -> out.append("&#13;");
                case '\t' -> out.append("&#9;");
                default -> {
                    boolean allowed = ch >= 0x20 && ch != 0xFFFE && ch != 0xFFFF;
                    out.append(allowed ? ch : '\uFFFD');
                }
            }
        }
        return out.toString();
    }
}
