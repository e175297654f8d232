package org.stellabar.pipeline;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarSchema;
import org.stellabar.survey.SurveyOutcome;

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
    public static final String SUFFIX = ".part.json";

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
            try (JsonGenerator g = new JsonFactory().createGenerator(out, JsonEncoding.UTF8)) {
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
     * Reads a part file, checking its layout; the set of parts is checked by {@link PartSet}.
     *
     * @param file the file
     * @return the part
     * @throws BadInputException naming the file when it is not a whole, readable part
     */
    public static SurveyPart read(Path file) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(Files.readAllBytes(file));
        } catch (JsonProcessingException e) {
            throw new BadInputException(file + ": not a survey part (JSON: "
                    + e.getOriginalMessage().replaceAll("\\s+", " ") + ")");
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot be read (" + e.getMessage() + ")");
        }
        try {
            if (root == null || !FORMAT.equals(text(root, "format"))) {
                throw new IllegalArgumentException("it does not say \"format\": \"" + FORMAT + "\"");
            }
            if (integer(root, "layout") != LAYOUT) {
                throw new IllegalArgumentException("layout " + integer(root, "layout") + " is not " + LAYOUT);
            }
            int textCount = StarSchema.textNames().size();
            int numberCount = StarSchema.numberQuantities().size();
            List<SurveyOutcome> outcomes = new ArrayList<>();
            JsonNode list = root.get("outcomes");
            if (list == null || !list.isArray()) {
                throw new IllegalArgumentException("no outcomes array");
            }
            int first = integer(root, "first_point");
            for (JsonNode o : list) {
                JsonNode texts = o.get("texts");
                JsonNode numbers = o.get("numbers");
                if (texts == null || numbers == null || texts.size() != textCount || numbers.size() != numberCount) {
                    throw new IllegalArgumentException("outcome " + (outcomes.size() + 1) + " does not have "
                            + textCount + " texts and " + numberCount + " numbers");
                }
                List<String> t = new ArrayList<>();
                texts.forEach(n -> t.add(n.asText()));
                double[] v = new double[numberCount];
                for (int k = 0; k < numberCount; k++) {
                    if (!numbers.get(k).isNumber()) {
                        throw new IllegalArgumentException("outcome " + (outcomes.size() + 1) + " has a number that"
                                + " is not a number");
                    }
                    v[k] = numbers.get(k).doubleValue();
                }
                int point = integer(o, "point");
                if (point != first + outcomes.size()) {
                    throw new IllegalArgumentException("outcome " + (outcomes.size() + 1) + " is point " + point
                            + ", expected " + (first + outcomes.size()));
                }
                outcomes.add(new SurveyOutcome(point, text(o, "failure"), new StarSchema.Row(t, v)));
            }
            if (outcomes.size() != integer(root, "point_count")) {
                throw new IllegalArgumentException("it holds " + outcomes.size() + " of its "
                        + integer(root, "point_count") + " points: the file is cut short");
            }
            return new SurveyPart(text(root, "survey"), text(root, "content_hash"), text(root, "tool_version"),
                    new Shard(integer(root, "part"), integer(root, "parts")), first, integer(root, "total_points"),
                    text(root, "survey_file"), text(root, "survey_text"), outcomes);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(file + ": not a whole survey part: " + e.getMessage());
        }
    }

    private static String text(JsonNode node, String field) {
        JsonNode v = node.get(field);
        if (v == null || !v.isTextual()) {
            throw new IllegalArgumentException("field \"" + field + "\" is missing or not text");
        }
        return v.textValue();
    }

    private static int integer(JsonNode node, String field) {
        JsonNode v = node.get(field);
        if (v == null || !v.canConvertToInt() || !v.isIntegralNumber()) {
            throw new IllegalArgumentException("field \"" + field + "\" is missing or not an integer");
        }
        return v.intValue();
    }
}
