package org.stellabar.pipeline;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarSchema;
import org.stellabar.survey.SurveyOutcome;
import org.stellabar.survey.SurveyRows;

/**
 * One part of a sharded survey on disk: {@code NAME-K-of-N.part.json}, a JSON document holding
 * the survey's content hash, K and N, the tool version, the survey file itself (so that a merge
 * rebuilds exactly the same plan and metadata without the original file) and the outcomes of
 * the part's points as plain values. Numbers are written as shortest round-trip decimal text
 * and read back to the same doubles, so a merge writes the same bytes as the unsharded run.
 *
 * @param surveyName the survey's name
 * @param contentHash SHA-256 of the survey file's text
 * @param toolVersion the stellabar version that computed the part
 * @param shard K and N
 * @param firstPoint first point of the part (0-based)
 * @param totalPoints points of the whole survey
 * @param fileName the survey file's name
 * @param text the survey file's text
 * @param outcomes the part's outcomes, in point order
 */
public record SurveyPart(String surveyName, String contentHash, String toolVersion, Shard shard, int firstPoint,
        int totalPoints, String fileName, String text, List<SurveyOutcome> outcomes) {

    /** What every part file says it is, and the layout's version. */
    static final String FORMAT = "stellabar survey part";
    static final int LAYOUT = 1;
    /** File name ending of a part. */
    public static final String SUFFIX = PartSet.SUFFIX;

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param surveyName the survey's name
     * @param contentHash SHA-256 of the survey file's text
     * @param toolVersion the stellabar version that computed the part
     * @param shard K and N
     * @param firstPoint first point of the part (0-based)
     * @param totalPoints points of the whole survey
     * @param fileName the survey file's name
     * @param text the survey file's text
     * @param outcomes the part's outcomes, in point order
     */
    public SurveyPart {
        Objects.requireNonNull(shard, "shard");
        outcomes = List.copyOf(outcomes);
    }

    /**
     * Writes the part atomically.
     *
     * @param file the target
     * @throws IOException when it cannot be written
     */
    public void write(Path file) throws IOException {
        org.stellabar.output.AtomicFiles.write(file, out -> {
            try (JsonGenerator g = PartJson.FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
                g.useDefaultPrettyPrinter();
                g.writeStartObject();
                g.writeStringField("format", FORMAT);
                g.writeNumberField("layout", LAYOUT);
                g.writeStringField("survey", surveyName);
                g.writeStringField("content_hash", contentHash);
                g.writeStringField("tool_version", toolVersion);
                g.writeNumberField("part", shard.part());
                g.writeNumberField("parts", shard.parts());
                g.writeNumberField("first_point", firstPoint);
                g.writeNumberField("point_count", outcomes.size());
                g.writeNumberField("total_points", totalPoints);
                g.writeStringField("survey_file", fileName);
                g.writeStringField("survey_text", text);
                g.writeArrayFieldStart("outcomes");
                for (SurveyOutcome o : outcomes) {
                    g.writeStartObject();
                    g.writeNumberField("point", o.point());
                    g.writeStringField("failure", o.failure());
                    g.writeArrayFieldStart("texts");
                    for (String t : o.row().texts()) {
                        g.writeString(t);
                    }
                    g.writeEndArray();
                    g.writeArrayFieldStart("numbers");
                    for (double v : o.row().numbers()) {
                        g.writeNumber(v);
                    }
                    g.writeEndArray();
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeEndObject();
            }
        });
    }

    /**
     * What a part file says about itself: everything but its outcomes, read without them.
     *
     * @param file the part file
     * @param surveyName the survey's name
     * @param contentHash SHA-256 of the survey file's text
     * @param toolVersion the stellabar version that computed the part
     * @param shard K and N
     * @param firstPoint first point of the part (0-based)
     * @param pointCount points in the part
     * @param totalPoints points of the whole survey
     * @param fileName the survey file's name
     * @param text the survey file's text
     */
    public record Header(Path file, String surveyName, String contentHash, String toolVersion, Shard shard,
            int firstPoint, int pointCount, int totalPoints, String fileName, String text) implements PartHeader {

        @Override
        public String runName() {
            return surveyName;
        }

        @Override
        public int from() {
            return firstPoint;
        }

        @Override
        public int to() {
            return firstPoint + pointCount;
        }

        @Override
        public int total() {
            return totalPoints;
        }
    }

    /**
     * Reads a part file's header, stopping where its outcomes begin (they are written last).
     *
     * @param file the file
     * @return the header
     * @throws BadInputException naming the file when it is not a readable part
     */
    public static Header readHeader(Path file) {
        return parse(file, (p, fields) -> {
            return header(file, fields);
        }, null);
    }

    /**
     * Streams a part's outcomes into the survey's rows, checking that they are the points its
     * header announces, in order, all of them.
     *
     * @param header the part's header (from {@link #readHeader})
     * @param rows the whole survey's rows
     * @throws BadInputException naming the file when its outcomes are not whole
     */
    public static void readOutcomes(Header header, SurveyRows rows) {
        parse(header.file(), null, (p, fields) -> {
            int textCount = StarSchema.textNames().size();
            int numberCount = StarSchema.numberQuantities().size();
            int read = 0;
            while (p.nextToken() == JsonToken.START_OBJECT) {
                read++;
                SurveyOutcome o = outcome(p, read, textCount, numberCount);
                if (o.point() != header.firstPoint() + read - 1) {
                    throw new IllegalArgumentException("outcome " + read + " is point " + o.point() + ", expected "
                            + (header.firstPoint() + read - 1));
                }
                if (read > header.pointCount()) {
                    throw new IllegalArgumentException("it holds more than its " + header.pointCount() + " points");
                }
                rows.set(o);
            }
            if (read != header.pointCount()) {
                throw new IllegalArgumentException("it holds " + read + " of its " + header.pointCount()
                        + " points: the file is cut short");
            }
            return null;
        });
    }

    /** What to do with the parser at the outcomes array (or, for the header, with the fields before it). */
    private interface Step {
        Header apply(JsonParser parser, java.util.Map<String, Object> fields) throws IOException;
    }

    private static Header parse(Path file, Step atHeader, Step atOutcomes) {
        try (JsonParser p = PartJson.FACTORY.createParser(file.toFile())) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw new IllegalArgumentException("it is not a JSON object");
            }
            java.util.Map<String, Object> fields = new java.util.HashMap<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken t = p.nextToken();
                if (name.equals("outcomes")) {
                    if (t != JsonToken.START_ARRAY) {
                        throw new IllegalArgumentException("\"outcomes\" is not an array");
                    }
                    return atHeader != null ? atHeader.apply(p, fields) : atOutcomes.apply(p, fields);
                } else {
                    PartJson.keep(p, t, name, fields);
                }
            }
            throw new IllegalArgumentException("no outcomes array");
        } catch (IOException | IllegalArgumentException e) {
            throw PartJson.problem(file, "survey part", e);
        }
    }

    private static Header header(Path file, java.util.Map<String, Object> fields) {
        if (!FORMAT.equals(fields.get("format"))) {
            throw new IllegalArgumentException("it does not say \"format\": \"" + FORMAT + "\"");
        }
        if (PartJson.integer(fields, "layout") != LAYOUT) {
            throw new IllegalArgumentException("layout " + PartJson.integer(fields, "layout") + " is not " + LAYOUT);
        }
        return new Header(file, PartJson.text(fields, "survey"), PartJson.text(fields, "content_hash"), PartJson.text(fields, "tool_version"),
                new Shard(PartJson.integer(fields, "part"), PartJson.integer(fields, "parts")), PartJson.integer(fields, "first_point"),
                PartJson.integer(fields, "point_count"), PartJson.integer(fields, "total_points"), PartJson.text(fields, "survey_file"),
                PartJson.text(fields, "survey_text"));
    }

    private static SurveyOutcome outcome(JsonParser p, int number, int textCount, int numberCount) throws IOException {
        int point = -1;
        String failure = null;
        List<String> texts = new ArrayList<>(textCount);
        double[] numbers = new double[numberCount];
        int numbersRead = -1;
        while (p.nextToken() == JsonToken.FIELD_NAME) {
            String name = p.currentName();
            JsonToken t = p.nextToken();
            switch (name) {
                case "point" -> point = t == JsonToken.VALUE_NUMBER_INT ? p.getIntValue() : -1;
                case "failure" -> failure = t == JsonToken.VALUE_STRING ? p.getText() : null;
                case "texts" -> {
                    while (p.nextToken() == JsonToken.VALUE_STRING) {
                        texts.add(p.getText());
                    }
                }
                case "numbers" -> {
                    numbersRead = 0;
                    JsonToken v;
                    while ((v = p.nextToken()) == JsonToken.VALUE_NUMBER_FLOAT || v == JsonToken.VALUE_NUMBER_INT) {
                        if (numbersRead == numberCount) {
                            throw new IllegalArgumentException("outcome " + number + " has more than " + numberCount
                                    + " numbers");
                        }
                        numbers[numbersRead++] = p.getDoubleValue();
                    }
                    if (v != JsonToken.END_ARRAY) {
                        throw new IllegalArgumentException("outcome " + number + " has a number that is not a number");
                    }
                }
                default -> p.skipChildren();
            }
        }
        if (point < 0 || failure == null || texts.size() != textCount || numbersRead != numberCount) {
            throw new IllegalArgumentException("outcome " + number + " does not have a point, a failure, "
                    + textCount + " texts and " + numberCount + " numbers");
        }
        return new SurveyOutcome(point, failure, new StarSchema.Row(texts, numbers));
    }


}
