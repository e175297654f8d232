package org.stellabar.output;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.table.Column;
import org.stellabar.table.Input;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/**
 * astropy's Enhanced Character Separated Values (ECSV 1.0, astropy APE 6): a YAML header in
 * {@code #} lines that carries each column's name, unit, datatype and description and the run's
 * metadata, then the table as comma-separated values, so that {@code Table.read(file)} gives
 * columns with units and no hand work. Each YAML mapping is written in its JSON form (YAML is a
 * superset of JSON), which quotes every string safely. Units are written in their written
 * spelling ({@link FitsUnits#written}), which astropy parses. The data rows are the CSV writer's: the shortest decimal that reads back to the
 * same double.
 */
public final class EcsvWriter {

    private static final ObjectMapper JSON = new ObjectMapper();

    /**
     * @param table the table
     * @param out destination (not closed)
     * @throws IOException on write failure
     */
    public void write(Table table, OutputStream out) throws IOException {
        StringBuilder head = new StringBuilder();
        head.append("# %ECSV 1.0\n# ---\n# delimiter: ','\n# datatype:\n");
        for (Column c : table.columns()) {
            head.append("# - ").append(json(column(c))).append('\n');
        }
        head.append("# meta: ").append(json(meta(table.metadata()))).append('\n');
        head.append("# schema: astropy-2.0\n");
        List<String> names = new ArrayList<>();
        for (Column c : table.columns()) {
            names.add(CsvWriter.quote(c.name()));
        }
        head.append(String.join(",", names)).append('\n');
        out.write(head.toString().getBytes(StandardCharsets.UTF_8));
        CsvWriter.writeBlocks(table, out);
    }

    private static Map<String, Object> column(Column c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", c.name());
        String unit = FitsUnits.written(c.unit());
        if (!unit.isEmpty()) {
            m.put("unit", unit);
        }
        m.put("datatype", c instanceof NumberColumn n ? (n.integer() ? "int64" : "float64") : "string");
        m.put("description", c.description());
        return m;
    }

    private static Map<String, Object> meta(Metadata metadata) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("title", metadata.title());
        m.put("software", "stellabar " + metadata.toolVersion());
        m.put("constants", metadata.constants());
        Map<String, Object> inputs = new LinkedHashMap<>();
        for (Input input : metadata.inputs()) {
            inputs.put(input.name(), FieldText.input(input));
        }
        m.put("inputs", inputs);
        m.put("notes", metadata.notes());
        return m;
    }

    private static String json(Object value) {
        try {
            return JSON.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("metadata cannot be written as YAML", e);
        }
    }
}
