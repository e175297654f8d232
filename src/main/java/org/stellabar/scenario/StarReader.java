package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;

/** Reads one {@code [[star]]} table, reporting every problem it finds. */
final class StarReader {

    static final String NAME = "name";
    static final String NOTE = "note";
    static final String KIND = "kind";
    static final String MASS = "mass";
    static final String RADIUS = "radius";
    static final String CENTRAL_TEMPERATURE = "central_temperature";
    static final String ENTROPY = "entropy_per_baryon";
    static final String INDEX = "index";
    static final List<String> KEYS = List.of(NAME, NOTE, KIND, MASS, RADIUS, CENTRAL_TEMPERATURE, ENTROPY, INDEX,
            StarDefaults.COMPOSITION, StarDefaults.POINTS, StarDefaults.OUTPUTS, StarDefaults.CHARTS);

    /** The keys that fix an isentropic star's scale besides its mass; exactly one is given. */
    private static final List<String> ISENTROPIC_ANCHORS = List.of(RADIUS, CENTRAL_TEMPERATURE, ENTROPY);

    private StarReader() {
    }

    /**
     * @param section the star's table
     * @param defaults what the star takes when it does not say
     * @param errors the collector, to tell whether this star added problems
     * @return the star, or empty if it has any problem (every problem reported)
     */
    static Optional<StarSpec> read(TomlSection section, StarDefaults defaults, ErrorCollector errors) {
        int before = errors.count();
        section.rejectUnknownKeys(KEYS, "a star");

        Optional<String> name = section.string(NAME, "a name such as \"Vesper\"");
        if (!section.has(NAME)) {
            section.missing(NAME, "every star needs a name, e.g. name = \"Vesper\" (" + Names.RULE + ")");
        }
        name.flatMap(Names::problem).ifPresent(p -> section.error(NAME, ScenarioError.Kind.BAD_VALUE, p));
        String note = section.string(NOTE, "a string").orElse("");

        Optional<StarKind> kind = section.has(KIND)
                ? section.choice(KIND, StarKind.class)
                : Optional.of(StarKind.STANDARD);

        OptionalDouble mass = positive(section, MASS, Dimension.MASS);
        if (!section.has(MASS)) {
            section.missing(MASS, "every star needs a mass, e.g. mass = \"40 Msun\" (units: "
                    + Dimension.MASS.acceptedUnits() + ")");
        }
        OptionalDouble radius = positive(section, RADIUS, Dimension.LENGTH);
        OptionalDouble centralTemperature = positive(section, CENTRAL_TEMPERATURE, Dimension.TEMPERATURE);
        OptionalDouble entropy = section.number(ENTROPY, "an entropy per baryon in units of k_B: a positive number");
        if (entropy.isPresent() && !(entropy.getAsDouble() > 0.0)) {
            section.error(ENTROPY, ScenarioError.Kind.OUT_OF_RANGE,
                    "an entropy per baryon (in units of k_B) must be positive");
            entropy = OptionalDouble.empty();
        }
        OptionalDouble index = section.number(INDEX, "a polytropic index: a number in [0, 5)");
        if (index.isPresent() && !(index.getAsDouble() >= 0.0 && index.getAsDouble() < StarSpec.INDEX_LIMIT)) {
            section.error(INDEX, ScenarioError.Kind.OUT_OF_RANGE, index.getAsDouble() >= StarSpec.INDEX_LIMIT
                    ? "a polytrope of index n >= 5 has no finite radius; the index lies in [0, 5)"
                    : "the index lies in [0, 5)");
            index = OptionalDouble.empty();
        }
        kind.ifPresent(k -> checkKind(section, k));

        Composition composition = section.has(StarDefaults.COMPOSITION)
                ? section.table(StarDefaults.COMPOSITION, "a composition table such as { X = 0.70, Z = 0.02 }")
                        .flatMap(CompositionReader::read).orElse(null)
                : defaults.composition();
        int points = section.has(StarDefaults.POINTS)
                ? StarDefaults.readPoints(section).orElse(defaults.points())
                : defaults.points();
        Set<TableFormat> outputs = section.choices(StarDefaults.OUTPUTS, TableFormat.class, TableFormat::extension)
                .map(list -> StarSpec.enumSet(TableFormat.class, list))
                .orElse(defaults.outputs());
        Set<ChartGroup> charts = section.choices(StarDefaults.CHARTS, ChartGroup.class)
                .map(list -> StarSpec.enumSet(ChartGroup.class, list))
                .orElse(defaults.charts());

        if (errors.count() > before) {
            return Optional.empty();
        }
        try {
            return Optional.of(new StarSpec(name.orElseThrow(), note, kind.orElseThrow(), mass.getAsDouble(), radius,
                    centralTemperature, entropy, index, composition, points, outputs, charts));
        } catch (BadInputException e) {
            // every rule of StarSpec is checked above with its position; this is a safety net
            section.errorAtTable(ScenarioError.Kind.BAD_VALUE, e.getMessage());
            return Optional.empty();
        }
    }

    /** Checks which keys the star's kind needs and which it does not take. */
    private static void checkKind(TomlSection section, StarKind kind) {
        if (kind.takesIndex() && !section.has(INDEX)) {
            section.missing(INDEX, "a polytrope needs an index n in [0, 5), e.g. index = 1.5");
        }
        if (!kind.takesIndex() && section.has(INDEX)) {
            section.errorAtKey(INDEX, ScenarioError.Kind.NOT_APPLICABLE, "an index applies to kind = \"polytrope\""
                    + " only; a " + kind.word() + " star has none"
                    + (kind == StarKind.STANDARD ? " (the standard model is n = 3 by construction)" : ""));
        }
        if (kind.needsRadius()) {
            if (!section.has(RADIUS)) {
                section.missing(RADIUS, "a " + kind.word() + " star needs a radius, e.g. radius = \"12 Rsun\" (units: "
                        + Dimension.LENGTH.acceptedUnits() + ")");
            }
            for (String key : List.of(CENTRAL_TEMPERATURE, ENTROPY)) {
                if (section.has(key)) {
                    section.errorAtKey(key, section.has(RADIUS) ? ScenarioError.Kind.CONFLICT
                            : ScenarioError.Kind.NOT_APPLICABLE, "a " + kind.word() + " star is fixed by its mass and"
                            + " radius" + (section.has(RADIUS) ? ", and the radius is already given" : "") + "; "
                            + key + " applies to kind = \"isentropic\" only");
                }
            }
            return;
        }
        List<String> given = new ArrayList<>();
        for (String key : ISENTROPIC_ANCHORS) {
            if (section.has(key)) {
                given.add(key);
            }
        }
        // the first one written counts; later ones are the conflicting ones
        given.sort(Comparator.comparingInt((String key) -> section.keyPosition(key).line())
                .thenComparingInt(key -> section.keyPosition(key).column()));
        if (given.isEmpty()) {
            section.missing(RADIUS, "an isentropic star needs exactly one of " + String.join(", ", ISENTROPIC_ANCHORS)
                    + " besides its mass");
        }
        for (int i = 1; i < given.size(); i++) {
            section.errorAtKey(given.get(i), ScenarioError.Kind.CONFLICT, "an isentropic star takes exactly one of "
                    + String.join(", ", ISENTROPIC_ANCHORS) + ", and " + given.get(0) + " is already given (line "
                    + section.keyPosition(given.get(0)).line() + ")");
        }
    }

    /** A positive quantity of the given dimension, or empty if absent or wrong (reported). */
    private static OptionalDouble positive(TomlSection section, String key, Dimension dimension) {
        OptionalDouble value = section.quantity(key, dimension);
        if (value.isPresent() && !(value.getAsDouble() > 0.0)) {
            section.error(key, ScenarioError.Kind.OUT_OF_RANGE, "a " + dimension.label() + " must be positive");
            return OptionalDouble.empty();
        }
        return value;
    }
}
