package org.stellabar.pipeline;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.stellabar.physics.BadInputException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteFeature;

/**
 * The JSON factory of part files: numbers written as shortest round-trip decimals (Schubfach) and
 * read back with a correctly rounded fast parser (Lemire's algorithm, as Jackson's
 * {@code USE_FAST_DOUBLE_PARSER}), so that a part's doubles come back bit for bit and a 10⁶-row
 * merge spends its time on the rows, not on decimal conversion.
 */
final class PartJson {

    /** Thread-safe once built, as every Jackson factory. */
    static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .build();

    private PartJson() {
    }

    /**
     * Keeps a header field's value: text and whole numbers are kept by name, anything else skipped.
     *
     * @param p the parser, at the field's value
     * @param t the value's token
     * @param name the field's name
     * @param fields where the kept values go
     * @throws IOException when the file cannot be read
     */
    static void keep(JsonParser p, JsonToken t, String name, Map<String, Object> fields) throws IOException {
        if (t == JsonToken.VALUE_STRING) {
            fields.put(name, p.getText());
        } else if (t == JsonToken.VALUE_NUMBER_INT) {
            fields.put(name, p.getLongValue());
        } else {
            p.skipChildren();
        }
    }

    /**
     * @param file the part file
     * @param what what the file should have been ("survey part", "part")
     * @param e what went wrong while reading it
     * @return the one-line bad-input error naming the file
     */
    static BadInputException problem(Path file, String what, Exception e) {
        if (e instanceof JsonProcessingException j) {
            return new BadInputException(file + ": not a " + what + " (JSON: "
                    + j.getOriginalMessage().replaceAll("\\s+", " ") + ")");
        }
        if (e instanceof IOException) {
            return new BadInputException(file + ": cannot be read (" + e.getMessage() + ")");
        }
        return new BadInputException(file + ": not a whole " + what + ": " + e.getMessage());
    }

    /**
     * @param fields the header's fields
     * @param field a field's name
     * @return its text
     * @throws IllegalArgumentException when it is missing or not text
     */
    static String text(Map<String, Object> fields, String field) {
        if (!(fields.get(field) instanceof String s)) {
            throw new IllegalArgumentException("field \"" + field + "\" is missing or not text");
        }
        return s;
    }

    /**
     * @param fields the header's fields
     * @param field a field's name
     * @return its value, a non-negative int
     * @throws IllegalArgumentException when it is missing or not such a number
     */
    static int integer(Map<String, Object> fields, String field) {
        if (!(fields.get(field) instanceof Long l) || l < 0 || l > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("field \"" + field + "\" is missing or not an integer");
        }
        return (int) (long) l;
    }
}
