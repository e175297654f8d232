package org.stellabar.pipeline;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import org.stellabar.output.AtomicFiles;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * One part of a sharded {@code sequence} or {@code grid}, for {@code merge}:
 * {@code NAME-K-of-N.part.json}, written beside the part's table. It records the job, the
 * command-line arguments that define the whole job (without the part, the output folder and
 * the printing options), their SHA-256 as the content hash, K, N, the stellabar version, the
 * range of the outer axis the part covers, and the part's columns as plain values (shortest
 * round-trip decimals, read back to the same doubles). The merge rebuilds the whole job from
 * the arguments and writes the whole run's files from the joined columns.
 *
 * <p>Layout: header fields first, then {@code "columns"}, so that a set of parts is checked from
 * their headers before any column is read.
 */
public final class TablePart {

    /** What every table part says it is. */
    static final String FORMAT = "stellabar table part";
    static final int LAYOUT = 1;

    /**
     * A part's description.
     *
     * @param file the part file (null while writing)
     * @param job "sequence" or "grid"
     * @param arguments the whole job's defining arguments, canonical
     * @param contentHash SHA-256 of the job and its arguments
     * @param toolVersion the stellabar version
     * @param shard K and N
     * @param outerFrom first outer index of the part
     * @param outerTo one past its last outer index
     * @param outerTotal outer indices of the whole job
     * @param rows rows of the part's table
     * @param extras job-specific whole numbers a merge needs (a grid's points left out)
     */
    public record Header(Path file, String job, List<String> arguments, String contentHash, String toolVersion,
            Shard shard, int outerFrom, int outerTo, int outerTotal, int rows, Map<String, Long> extras)
            implements PartHeader {
        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param file the part file (null while writing)
         * @param job "sequence" or "grid"
         * @param arguments the whole job's defining arguments, canonical
         * @param contentHash SHA-256 of the job and its arguments
         * @param toolVersion the stellabar version
         * @param shard K and N
         * @param outerFrom first outer index of the part
         * @param outerTo one past its last outer index
         * @param outerTotal outer indices of the whole job
         * @param rows rows of the part's table
         * @param extras job-specific whole numbers a merge needs (a grid's points left out)
         */
        public Header {
            arguments = List.copyOf(arguments);
            extras = Map.copyOf(extras);
        }

        @Override
        public String runName() {
            return job;
        }

        @Override
        public int from() {
            return outerFrom;
        }

        @Override
        public int to() {
            return outerTo;
        }

        @Override
        public int total() {
            return outerTotal;
        }
    }

    private TablePart() {
    }

    /**
     * @param job the job's name
     * @param arguments its defining arguments, canonical
     * @return SHA-256 of the job and arguments, NUL-separated, as 64 hex digits
     */
    public static String contentHash(String job, List<String> arguments) {
        try {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            d.update(job.getBytes(StandardCharsets.UTF_8));
            for (String a : arguments) {
                d.update((byte) 0);
                d.update(a.getBytes(StandardCharsets.UTF_8));
            }
            return HexFormat.of().formatHex(d.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    /**
     * Writes a part file atomically.
     *
     * @param target the file
     * @param header the part's description ({@code file} and {@code rows} are taken from here and the table)
     * @param table the part's table
     * @throws IOException when it cannot be written
     */
    public static void write(Path target, Header header, Table table) throws IOException {
        AtomicFiles.write(target, out -> {
            try (JsonGenerator g = PartJson.FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
                g.writeStartObject();
                g.writeStringField("format", FORMAT);
                g.writeNumberField("layout", LAYOUT);
                g.writeStringField("job", header.job());
                g.writeArrayFieldStart("arguments");
                for (String a : header.arguments()) {
                    g.writeString(a);
                }
                g.writeEndArray();
                g.writeStringField("content_hash", header.contentHash());
                g.writeStringField("tool_version", header.toolVersion());
                g.writeNumberField("part", header.shard().part());
                g.writeNumberField("parts", header.shard().parts());
                g.writeNumberField("outer_from", header.outerFrom());
                g.writeNumberField("outer_to", header.outerTo());
                g.writeNumberField("outer_total", header.outerTotal());
                g.writeNumberField("rows", table.rowCount());
                g.writeObjectFieldStart("extras");
                for (Map.Entry<String, Long> e : new java.util.TreeMap<>(header.extras()).entrySet()) {
                    g.writeNumberField(e.getKey(), e.getValue());
                }
                g.writeEndObject();
                g.writeArrayFieldStart("columns");
                for (Column c : table.columns()) {
                    g.writeStartObject();
                    g.writeStringField("name", c.name());
                    g.writeArrayFieldStart("values");
                    if (c instanceof NumberColumn n) {
                        for (int i = 0; i < n.size(); i++) {
                            g.writeNumber(n.get(i));
                        }
                    } else {
                        for (String v : ((TextColumn) c).values()) {
                            g.writeString(v);
                        }
                    }
                    g.writeEndArray();
                    g.writeEndObject();
                    g.writeRaw('\n');
                }
                g.writeEndArray();
                g.writeEndObject();
            }
        });
    }

    /**
     * Reads a part's header, stopping where its columns begin.
     *
     * @param file the file
     * @return the header
     * @throws BadInputException naming the file when it is not a readable table part
     */
    public static Header readHeader(Path file) {
        return parse(file, null);
    }

    /**
     * Reads a part's columns into the joined columns of the whole job, at the part's first row.
     *
     * @param header the part's header
     * @param schema the whole job's table with its columns (names, kinds), any number of rows
     * @param numbers the joined number columns by name, sized for the whole job
     * @param texts the joined text columns by name, sized for the whole job
     * @param firstRow where this part's rows go
     * @throws BadInputException naming the file when its columns are not whole or not the job's
     */
    public static void readColumns(Header header, Table schema, Map<String, double[]> numbers,
            Map<String, String[]> texts, int firstRow) {
        parse(header.file(), new Columns(schema, numbers, texts, firstRow, header.rows()));
    }

    /** Where the columns of a part go. */
    private record Columns(Table schema, Map<String, double[]> numbers, Map<String, String[]> texts, int firstRow,
            int rows) {
    }

    private static Header parse(Path file, Columns into) {
        try (JsonParser p = PartJson.FACTORY.createParser(file.toFile())) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw new IllegalArgumentException("it is not a JSON object");
            }
            Map<String, Object> fields = new HashMap<>();
            List<String> arguments = new ArrayList<>();
            Map<String, Long> extras = new HashMap<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken t = p.nextToken();
                if (name.equals("columns")) {
                    if (t != JsonToken.START_ARRAY) {
                        throw new IllegalArgumentException("\"columns\" is not an array");
                    }
                    Header header = header(file, fields, arguments, extras);
                    if (into != null) {
                        columns(p, into);
                    }
                    return header;
                } else if (name.equals("arguments") && t == JsonToken.START_ARRAY) {
                    while (p.nextToken() == JsonToken.VALUE_STRING) {
                        arguments.add(p.getText());
                    }
                } else if (name.equals("extras") && t == JsonToken.START_OBJECT) {
                    while (p.nextToken() == JsonToken.FIELD_NAME) {
                        String key = p.currentName();
                        if (p.nextToken() != JsonToken.VALUE_NUMBER_INT) {
                            throw new IllegalArgumentException("extra \"" + key + "\" is not a whole number");
                        }
                        extras.put(key, p.getLongValue());
                    }
                } else {
                    PartJson.keep(p, t, name, fields);
                }
            }
            throw new IllegalArgumentException("no columns array");
        } catch (IOException | IllegalArgumentException e) {
            throw PartJson.problem(file, "part", e);
        }
    }

    private static void columns(JsonParser p, Columns into) throws IOException {
        int read = 0;
        while (p.nextToken() == JsonToken.START_OBJECT) {
            String name = null;
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                JsonToken t = p.nextToken();
                if (field.equals("name") && t == JsonToken.VALUE_STRING) {
                    name = p.getText();
                } else if (field.equals("values") && t == JsonToken.START_ARRAY) {
                    if (name == null) {
                        throw new IllegalArgumentException("a column's values come before its name");
                    }
                    values(p, name, into);
                    read++;
                } else {
                    p.skipChildren();
                }
            }
        }
        if (read != into.schema().columns().size()) {
            throw new IllegalArgumentException("it has " + read + " columns, the job has "
                    + into.schema().columns().size());
        }
    }

    private static void values(JsonParser p, String name, Columns into) throws IOException {
        double[] numbers = into.numbers().get(name);
        String[] texts = into.texts().get(name);
        if (numbers == null && texts == null) {
            throw new IllegalArgumentException("column \"" + name + "\" is not a column of this job");
        }
        int i = 0;
        JsonToken t;
        while ((t = p.nextToken()) != JsonToken.END_ARRAY) {
            if (i >= into.rows()) {
                throw new IllegalArgumentException("column \"" + name + "\" has more than its " + into.rows() + " rows");
            }
            if (numbers != null && (t == JsonToken.VALUE_NUMBER_FLOAT || t == JsonToken.VALUE_NUMBER_INT)) {
                numbers[into.firstRow() + i] = p.getDoubleValue();
            } else if (texts != null && t == JsonToken.VALUE_STRING) {
                texts[into.firstRow() + i] = p.getText();
            } else {
                throw new IllegalArgumentException("column \"" + name + "\" row " + (i + 1) + " is not a "
                        + (numbers != null ? "number" : "string"));
            }
            i++;
        }
        if (i != into.rows()) {
            throw new IllegalArgumentException("column \"" + name + "\" has " + i + " of its " + into.rows()
                    + " rows: the file is cut short");
        }
    }

    private static Header header(Path file, Map<String, Object> fields, List<String> arguments,
            Map<String, Long> extras) {
        if (!FORMAT.equals(fields.get("format"))) {
            throw new IllegalArgumentException("it does not say \"format\": \"" + FORMAT + "\"");
        }
        if (PartJson.integer(fields, "layout") != LAYOUT) {
            throw new IllegalArgumentException("layout " + PartJson.integer(fields, "layout") + " is not " + LAYOUT);
        }
        return new Header(file, PartJson.text(fields, "job"), arguments, PartJson.text(fields, "content_hash"),
                PartJson.text(fields, "tool_version"), new Shard(PartJson.integer(fields, "part"), PartJson.integer(fields, "parts")),
                PartJson.integer(fields, "outer_from"), PartJson.integer(fields, "outer_to"), PartJson.integer(fields, "outer_total"),
                PartJson.integer(fields, "rows"), extras);
    }


}
