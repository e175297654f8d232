package org.stellabar.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;
import org.stellabar.charts.ChartFormat;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.StarRequestException;
import org.stellabar.structure.StarRequestRules;
import org.stellabar.survey.AxisQuantity;
import org.stellabar.survey.AxisSpacing;
import org.stellabar.survey.SurveyAxis;
import org.stellabar.survey.SurveyPlan;
import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;

/**
 * Reads survey files (TOML; the format is in the README's "Surveys and clusters" section and in
 * {@code package-info.java}). As with scenario files, every problem is reported at once, each with
 * {@code file:line:column}, the key, the value and what is allowed.
 *
 * <p>Rules checked here, so that a survey never starts only to fail at every point: the kind
 * takes the fixed and swept inputs (a standard model needs a radius, an isentropic star exactly one
 * anchor ...), every swept value obeys its own rule (masses 10⁻³ to 10¹² M☉, positive
 * temperatures ...), and swept mass fractions leave a non-negative Y. What depends on the
 * combination of two values (a radius inside the Buchdahl limit of a mass) is decided per point
 * and reported in that point's row.
 */
public final class SurveyReader {

    static final String SURVEY = "survey";
    static final String NAME = "name";
    static final String DESCRIPTION = "description";
    static final String KIND = "kind";
    static final String POINTS = "points";
    static final String INDEX = "index";
    static final String TABLE_FORMATS = "table_formats";
    static final String CHART_FORMATS = "chart_formats";
    static final String AXES = "axes";
    static final String ELECTRONS = "electrons";
    static final String FROM = "from";
    static final String TO = "to";
    static final String COUNT = "count";
    static final String SCALE = "scale";
    static final List<String> AXIS_KEYS = List.of(FROM, TO, COUNT, SCALE);

    /** Table formats when none are asked for. */
    public static final List<TableFormat> DEFAULT_TABLE_FORMATS = List.of(TableFormat.CSV, TableFormat.ECSV,
            TableFormat.FITS, TableFormat.JSON);

    private static final List<String> KEYS = keys();

    private SurveyReader() {
    }

    /**
     * @param path the survey file (UTF-8)
     * @return the survey
     * @throws ScenarioException listing every problem
     */
    public static SurveyFile read(Path path) {
        String source = path.toString();
        ErrorCollector errors = new ErrorCollector(source);
        String text = ScenarioReader.readText(path, "survey", errors);
        errors.throwIfAny();
        Path name = path.getFileName();
        return read(source, name == null ? "survey.toml" : name.toString(), text);
    }

    /**
     * @param source how to name the text in messages (a path)
     * @param fileName the file's name without folders (recorded in parts)
     * @param text the TOML text
     * @return the survey
     * @throws ScenarioException listing every problem
     */
    public static SurveyFile read(String source, String fileName, String text) {
        ErrorCollector errors = new ErrorCollector(source);
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        TomlParseResult toml = Toml.parse(body);
        for (TomlParseError e : toml.errors()) {
            errors.add(e.position(), ScenarioError.Kind.SYNTAX, "", "", "TOML syntax: " + e.getMessage());
        }
        errors.throwIfAny();
        TomlSection root = new TomlSection(toml, "", TomlPosition.positionAt(1, 1), errors);
        root.rejectUnknownKeys(List.of(SURVEY), "a survey file");
        Optional<TomlSection> table = root.table(SURVEY, "a [survey] table");
        if (table.isEmpty()) {
            if (!root.has(SURVEY)) {
                errors.add(TomlPosition.positionAt(1, 1), ScenarioError.Kind.MISSING, SURVEY, "",
                        "no [survey] table; a survey file has one, with a kind and [survey.axes.*] tables");
            }
            errors.throwIfAny();
        }
        TomlSection s = table.get();
        s.rejectUnknownKeys(KEYS, "a survey");

        String name = s.string(NAME, "a name such as \"gr-edge\"").orElse(Names.fromStem(stem(fileName)));
        Names.problem(name).ifPresent(p -> s.error(NAME, ScenarioError.Kind.BAD_VALUE, p));
        s.string(DESCRIPTION, "a string");
        Optional<StarKind> kind = s.has(KIND) ? s.choice(KIND, StarKind.class, StarKind::word)
                : Optional.of(StarKind.standard);

        Map<AxisQuantity, Double> fixed = new EnumMap<>(AxisQuantity.class);
        for (AxisQuantity q : AxisQuantity.values()) {
            if (q == AxisQuantity.X || q == AxisQuantity.Z) {
                continue; // read with the composition
            }
            OptionalDouble v = q.dimension().isPresent() ? s.quantity(q.word(), q.dimension().get())
                    : s.number(q.word(), "an entropy per baryon in units of k_B: a positive number");
            v.ifPresent(x -> fixed.put(q, x));
        }
        OptionalDouble index = s.number(INDEX, "a polytropic index: a number in [0, 5)");
        boolean hasComposition = CompositionReader.KEYS.stream().anyMatch(s::has);
        Optional<Composition> composition = hasComposition ? CompositionReader.readKeys(s)
                : Optional.of(Composition.DEFAULT);
        int points = s.has(POINTS) ? StarDefaults.readPoints(s).orElse(StarRequest.DEFAULT_POINTS)
                : StarRequest.DEFAULT_POINTS;
        List<TableFormat> tableFormats = s.choices(TABLE_FORMATS, TableFormat.class, TableFormat::word)
                .orElse(DEFAULT_TABLE_FORMATS);
        List<ChartFormat> chartFormats = s.choices(CHART_FORMATS, ChartFormat.class, ChartFormat::extension)
                .orElse(List.copyOf(ScenarioOptions.DEFAULT_CHART_FORMATS));

        Optional<Electrons> electrons = s.has(ELECTRONS) ? s.choice(ELECTRONS, Electrons.class, Electrons::name)
                : Optional.of(Electrons.classical);
        List<SurveyAxis> axes = readAxes(s, composition, fixed, errors);
        errors.throwIfAny();
        SurveyPlan plan;
        try {
            plan = new SurveyPlan(name, kind.get(), fixed, index, composition.get(), points, axes, electrons.get());
        } catch (BadInputException e) {
            s.errorAtTable(ScenarioError.Kind.BAD_VALUE, e.getMessage());
            errors.throwIfAny();
            throw e;
        }
        checkKind(s, plan, errors);
        errors.throwIfAny();
        return new SurveyFile(plan, fileName, text, tableFormats, chartFormats);
    }

    private static List<SurveyAxis> readAxes(TomlSection s, Optional<Composition> composition,
            Map<AxisQuantity, Double> fixed, ErrorCollector errors) {
        List<SurveyAxis> axes = new ArrayList<>();
        if (!s.has(AXES)) {
            s.missing(AXES, "a survey needs one or two axes, e.g. [survey.axes.mass] with from, to, count and scale");
            return axes;
        }
        Optional<TomlSection> table = s.table(AXES, "a table of axes such as [survey.axes.mass]");
        if (table.isEmpty()) {
            return axes;
        }
        TomlSection all = table.get();
        List<String> words = java.util.Arrays.stream(AxisQuantity.values()).map(AxisQuantity::word).toList();
        all.rejectUnknownKeys(words, "the axes");
        List<String> given = new ArrayList<>(words.stream().filter(all::has).toList());
        // the first axis written is the outer one
        given.sort(Comparator.comparingInt((String w) -> all.keyPosition(w).line() * 10_000
                + all.keyPosition(w).column()));
        if (given.isEmpty() && errors.count() == 0) {
            all.errorAtTable(ScenarioError.Kind.MISSING, "no axis; give one or two of " + String.join(", ", words));
        }
        if (given.size() > 2) {
            all.errorAtKey(given.get(2), ScenarioError.Kind.BAD_VALUE, "a survey has at most two axes; "
                    + given.get(0) + " and " + given.get(1) + " are already given");
            return axes;
        }
        for (String word : given) {
            AxisQuantity q = AxisQuantity.valueOf(word);
            if (fixed.containsKey(q)) {
                s.errorAtKey(word, ScenarioError.Kind.CONFLICT, "is also swept by [survey.axes." + word
                        + "]; give it as a fixed value or as an axis, not both");
                continue;
            }
            if ((q == AxisQuantity.X || q == AxisQuantity.Z) && s.has(q.word())) {
                s.errorAtKey(q.word(), ScenarioError.Kind.CONFLICT, "is also swept by [survey.axes." + word
                        + "]; give it as a fixed value or as an axis, not both");
                continue;
            }
            all.table(word, "a table with from, to, count and scale")
                    .flatMap(t -> readAxis(t, q, composition, fixed))
                    .ifPresent(axes::add);
        }
        return axes;
    }

    private static Optional<SurveyAxis> readAxis(TomlSection t, AxisQuantity q, Optional<Composition> composition,
            Map<AxisQuantity, Double> fixed) {
        t.rejectUnknownKeys(AXIS_KEYS, "an axis");
        OptionalDouble from = end(t, FROM, q);
        OptionalDouble to = end(t, TO, q);
        for (String key : List.of(FROM, TO)) {
            if (!t.has(key)) {
                t.missing(key, "an axis needs from, to and count");
            }
        }
        OptionalLong count = t.integer(COUNT, "an integer in [1, " + SurveyAxis.MAX_COUNT + "]");
        if (!t.has(COUNT)) {
            t.missing(COUNT, "an axis needs from, to and count");
        } else if (count.isPresent() && (count.getAsLong() < 1 || count.getAsLong() > SurveyAxis.MAX_COUNT)) {
            t.error(COUNT, ScenarioError.Kind.OUT_OF_RANGE, "allowed: an integer in [1, " + SurveyAxis.MAX_COUNT + "]");
            count = OptionalLong.empty();
        }
        AxisSpacing defaultSpacing = q.dimension().isPresent() ? AxisSpacing.log : AxisSpacing.linear;
        Optional<AxisSpacing> spacing = t.has(SCALE) ? t.choice(SCALE, AxisSpacing.class, AxisSpacing::name)
                : Optional.of(defaultSpacing);
        if (from.isEmpty() || to.isEmpty() || count.isEmpty() || spacing.isEmpty()) {
            return Optional.empty();
        }
        SurveyAxis axis;
        try {
            axis = new SurveyAxis(q, from.getAsDouble(), to.getAsDouble(), (int) count.getAsLong(), spacing.get());
        } catch (BadInputException e) {
            t.errorAtTable(ScenarioError.Kind.BAD_VALUE, e.getMessage());
            return Optional.empty();
        }
        // every value obeys its own rule; the ends are the extremes of a monotonic axis
        for (String key : List.of(FROM, TO)) {
            double v = key.equals(FROM) ? axis.from() : axis.to();
            List<String> problems = switch (q) {
                case mass -> messages(StarRequestRules.check().mass(v));
                case central_temperature -> messages(StarRequestRules.check().centralTemperature(v));
                case entropy_per_baryon -> messages(StarRequestRules.check().entropy(v));
                case radius -> fixed.containsKey(AxisQuantity.mass)
                        ? messages(StarRequestRules.check().radius(v, fixed.get(AxisQuantity.mass)))
                        : v > 0 ? List.of() : messages(StarRequestRules.check().radius(v, 1.0));
                case X, Z -> fractionProblems(q, v, composition);
            };
            if (!problems.isEmpty()) {
                t.error(key, ScenarioError.Kind.OUT_OF_RANGE, problems.get(0));
                return Optional.empty();
            }
        }
        return Optional.of(axis);
    }

    private static List<String> messages(StarRequestRules rules) {
        return rules.violations().stream().map(StarRequestException.Violation::message).toList();
    }

    private static List<String> fractionProblems(AxisQuantity q, double v,
            Optional<Composition> composition) {
        String problem = null;
        if (v < 0.0 || v > 1.0) {
            problem = "a mass fraction lies in [0, 1]";
        } else if (composition.isPresent() && composition.get().fromMu()) {
            problem = "sweeping " + q.word() + " needs the composition as mass fractions (X, Z), not mu";
        } else if (composition.isPresent()) {
            double other = q == AxisQuantity.X ? composition.get().Z() : composition.get().X();
            if (v + other > 1.0 + Composition.SUM_TOLERANCE) {
                problem = (q == AxisQuantity.X ? "X + Z = " : "Z + X = ") + (v + other)
                        + " exceeds 1, so Y would be negative";
            }
        }
        return problem == null ? List.of() : List.of(problem);
    }

    /** The kind must take the fixed and swept inputs: checked on the first point's request. */
    private static void checkKind(TomlSection s, SurveyPlan plan, ErrorCollector errors) {
        try {
            plan.draft(0).toRequest();
        } catch (StarRequestException e) {
            for (StarRequestException.Violation v : e.violations()) {
                if (v.problem() != StarRequestException.Problem.OUT_OF_RANGE) {
                    s.errorAtTable(ScenarioError.Kind.NOT_APPLICABLE, v.message());
                }
            }
        } catch (BadInputException e) {
            s.errorAtTable(ScenarioError.Kind.BAD_VALUE, e.getMessage());
        }
    }

    private static OptionalDouble end(TomlSection t, String key, AxisQuantity q) {
        return q.dimension().isPresent() ? t.quantity(key, q.dimension().get())
                : t.number(key, q == AxisQuantity.entropy_per_baryon
                        ? "an entropy per baryon in units of k_B: a positive number" : "a mass fraction in [0, 1]");
    }

    private static String stem(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot > 0 ? fileName.substring(0, dot) : fileName;
    }

    private static List<String> keys() {
        List<String> keys = new ArrayList<>(List.of(NAME, DESCRIPTION, KIND));
        for (AxisQuantity q : AxisQuantity.values()) {
            if (q != AxisQuantity.X && q != AxisQuantity.Z) {
                keys.add(q.word());
            }
        }
        keys.add(INDEX);
        keys.addAll(CompositionReader.KEYS);
        keys.addAll(List.of(POINTS, ELECTRONS, TABLE_FORMATS, CHART_FORMATS, AXES));
        return List.copyOf(keys);
    }
}
