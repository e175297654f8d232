package org.stellabar.output;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.IOException;
import java.io.Writer;
import org.stellabar.table.Column;
import org.stellabar.table.Field;
import org.stellabar.table.FlagField;
import org.stellabar.table.Input;
import org.stellabar.table.IntegerField;
import org.stellabar.table.IntegerInput;
import org.stellabar.table.IntegerListField;
import org.stellabar.table.Metadata;
import org.stellabar.table.NestedField;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.NumberField;
import org.stellabar.table.NumberInput;
import org.stellabar.table.Summary;
import org.stellabar.table.SummaryListField;
import org.stellabar.table.Table;
import org.stellabar.table.TableField;
import org.stellabar.table.TextColumn;
import org.stellabar.table.TextField;
import org.stellabar.table.TextInput;

/**
 * JSON through Jackson's streaming generator. A {@link Summary} becomes one object whose keys are
 * its field names, followed by {@code units} (field → unit) and {@code metadata}. A {@link Table}
 * becomes {@code {"name", "columns": [{"name", "unit", "description", "values"}...]}}.
 */
public final class JsonWriter {

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(com.fasterxml.jackson.core.StreamWriteFeature.USE_FAST_DOUBLE_WRITER).build();

    /**
     * @param summary the summary
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Summary summary, Writer out) throws IOException {
        try (JsonGenerator g = generator(out)) {
            writeSummary(g, summary, true);
        }
        out.write("\n");
    }

    /**
     * @param table the table
     * @param out destination
     * @throws IOException on write failure
     */
    public void write(Table table, Writer out) throws IOException {
        try (JsonGenerator g = generator(out)) {
            writeTable(g, table, true);
        }
        out.write("\n");
    }

    private static JsonGenerator generator(Writer out) throws IOException {
        JsonGenerator g = FACTORY.createGenerator(out);
        g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        DefaultPrettyPrinter pp = new DefaultPrettyPrinter();
        pp.indentArraysWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE.withLinefeed("\n"));
        pp.indentObjectsWith(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE.withLinefeed("\n"));
        g.setPrettyPrinter(pp);
        return g;
    }

    private static void writeSummary(JsonGenerator g, Summary summary, boolean top) throws IOException {
        g.writeStartObject();
        for (Field f : summary.fields()) {
            g.writeFieldName(f.name());
            writeValue(g, f);
        }
        if (top) {
            g.writeObjectFieldStart("units");
            for (Field f : summary.fields()) {
                if (!f.unit().isEmpty()) {
                    g.writeStringField(f.name(), FitsUnits.written(f.unit()));
                }
            }
            g.writeEndObject();
            writeMetadata(g, summary.metadata());
        }
        g.writeEndObject();
    }

    private static void writeValue(JsonGenerator g, Field f) throws IOException {
        if (f instanceof NumberField n) {
            g.writeNumber(n.value());
        } else if (f instanceof IntegerField i) {
            g.writeNumber(i.value());
        } else if (f instanceof TextField t) {
            g.writeString(t.value());
        } else if (f instanceof FlagField b) {
            g.writeBoolean(b.value());
        } else if (f instanceof NestedField s) {
            writeSummary(g, s.value(), false);
        } else if (f instanceof TableField t) {
            writeTable(g, t.value(), false);
        } else if (f instanceof SummaryListField list) {
            g.writeStartArray();
            for (Summary s : list.value()) {
                writeSummary(g, s, false);
            }
            g.writeEndArray();
        } else if (f instanceof IntegerListField list) {
            g.writeStartArray();
            for (long l : list.value()) {
                g.writeNumber(l);
            }
            g.writeEndArray();
        }
    }

    private static void writeTable(JsonGenerator g, Table t, boolean top) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", t.name());
        g.writeNumberField("rows", t.rowCount());
        g.writeArrayFieldStart("columns");
        for (Column c : t.columns()) {
            g.writeStartObject();
            g.writeStringField("name", c.name());
            g.writeStringField("unit", FitsUnits.written(c.unit()));
            g.writeStringField("description", c.description());
            g.writeArrayFieldStart("values");
            if (c instanceof NumberColumn n) {
                for (int i = 0; i < n.size(); i++) {
                    if (n.integer()) {
                        g.writeNumber(n.getLong(i));
                    } else {
                        g.writeNumber(n.get(i));
                    }
                }
            } else {
                for (String s : ((TextColumn) c).values()) {
                    g.writeString(s);
                }
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        if (top) {
            writeMetadata(g, t.metadata());
        }
        g.writeEndObject();
    }

    private static void writeMetadata(JsonGenerator g, Metadata m) throws IOException {
        g.writeObjectFieldStart("metadata");
        g.writeStringField("title", m.title());
        g.writeStringField("stellabar_version", m.toolVersion());
        g.writeStringField("constants", m.constants());
        g.writeObjectFieldStart("inputs");
        for (Input input : m.inputs()) {
            if (input instanceof NumberInput n) {
                g.writeNumberField(n.name(), n.value());
            } else if (input instanceof IntegerInput i) {
                g.writeNumberField(i.name(), i.value());
            } else if (input instanceof TextInput t) {
                g.writeStringField(t.name(), t.text());
            }
        }
        g.writeEndObject();
        // the units of the number inputs, as "units" gives those of a summary's fields
        g.writeObjectFieldStart("input_units");
        for (Input input : m.inputs()) {
            if (input instanceof NumberInput n && !n.unit().isEmpty()) {
                g.writeStringField(n.name(), FitsUnits.written(n.unit()));
            }
        }
        g.writeEndObject();
        g.writeArrayFieldStart("notes");
        for (String n : m.notes()) {
            g.writeString(n);
        }
        g.writeEndArray();
        g.writeEndObject();
    }
}
