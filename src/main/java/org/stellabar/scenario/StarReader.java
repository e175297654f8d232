package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.stellabar.output.TableFormat;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.physics.Dimension;
import org.stellabar.structure.StarDraft;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.StarRequestException;
import org.stellabar.structure.StarRequestException.Component;
import org.stellabar.structure.StarRequestException.Violation;

/**
 * Reads one {@code [[star]]} table, reporting every problem it finds. This class only parses
 * (TOML types, quantities with units, which keys are written); the star's rules live in one
 * place, {@link StarDraft#toRequest()}, and every violation it reports is mapped back to the
 * key's {@code file:line:column}.
 */
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
            StarDefaults.COMPOSITION, StarDefaults.POINTS, StarDefaults.OUTPUTS, StarDefaults.CHARTS,
            StarDefaults.ELECTRONS);

    /** The key of each request input. */
    private static final Map<Component, String> KEY_OF = keys();

    private StarReader() {
    }

    /**
     * @param section the star's table
     * @param defaults what the star takes when it does not say
     * @param errors the collector, to tell whether this star added problems
     * @return the star, or empty if it has any problem (every problem reported)
     */
    static Optional<ScenarioStar> read(TomlSection section, StarDefaults defaults, ErrorCollector errors) {
        int before = errors.count();
        section.rejectUnknownKeys(KEYS, "a star");

        Optional<String> name = section.string(NAME, "a name such as \"Vesper\"");
        if (!section.has(NAME)) {
            section.missing(NAME, "every star needs a name, e.g. name = \"Vesper\" (" + Names.RULE + ")");
        }
        name.flatMap(Names::problem).ifPresent(p -> section.error(NAME, ScenarioError.Kind.BAD_VALUE, p));
        String note = section.string(NOTE, "a string").orElse("");

        Optional<StarKind> kind = section.has(KIND)
                ? section.choice(KIND, StarKind.class, StarKind::word)
                : Optional.of(StarKind.standard);

        OptionalDouble mass = section.quantity(MASS, Dimension.MASS);
        if (!section.has(MASS)) {
            section.missing(MASS, "every star needs a mass, e.g. mass = \"40 Msun\" (units: "
                    + Dimension.MASS.acceptedUnits() + ")");
        }
        OptionalDouble radius = section.quantity(RADIUS, Dimension.LENGTH);
        OptionalDouble centralTemperature = section.quantity(CENTRAL_TEMPERATURE, Dimension.TEMPERATURE);
        OptionalDouble entropy = section.number(ENTROPY, "an entropy per baryon in units of k_B: a positive number");
        OptionalDouble index = section.number(INDEX, "a polytropic index: a number in [0, 5)");

        Optional<Composition> composition = section.has(StarDefaults.COMPOSITION)
                ? section.table(StarDefaults.COMPOSITION, "a composition table such as { X = 0.70, Z = 0.02 }")
                        .flatMap(CompositionReader::read)
                : Optional.of(defaults.composition());
        int points = section.has(StarDefaults.POINTS)
                ? StarDefaults.readPoints(section).orElse(defaults.points())
                : defaults.points();
        Optional<Electrons> electrons = section.has(StarDefaults.ELECTRONS) ? StarDefaults.readElectrons(section)
                : Optional.of(defaults.electrons());
        Set<TableFormat> outputs = section.choices(StarDefaults.OUTPUTS, TableFormat.class, TableFormat::word)
                .map(list -> ScenarioStar.enumSet(TableFormat.class, list))
                .orElse(defaults.outputs());
        Set<ChartGroup> charts = section.choices(StarDefaults.CHARTS, ChartGroup.class)
                .map(list -> ScenarioStar.enumSet(ChartGroup.class, list))
                .orElse(defaults.charts());

        // keys written but not understood are reported already; their rules would only repeat that
        Set<Component> unreadable = new HashSet<>();
        unreadableIf(section, MASS, mass, Component.mass, unreadable);
        unreadableIf(section, RADIUS, radius, Component.radius, unreadable);
        unreadableIf(section, CENTRAL_TEMPERATURE, centralTemperature, Component.centralTemperature, unreadable);
        unreadableIf(section, ENTROPY, entropy, Component.entropy, unreadable);
        unreadableIf(section, INDEX, index, Component.index, unreadable);
        if (!section.has(MASS)) {
            unreadable.add(Component.mass);
        }
        if (electrons.isEmpty()) {
            unreadable.add(Component.electrons);
        }
        Optional<StarRequest> request = kind.flatMap(k -> request(section, new StarDraft(name.orElse("star"), k,
                mass.orElse(Double.NaN), radius, index, centralTemperature, entropy, anchorOrder(section),
                composition.orElse(Composition.DEFAULT), points, electrons.orElse(Electrons.classical)), unreadable));

        if (errors.count() > before || request.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ScenarioStar(request.get(), note, outputs, charts));
    }

    /** Validates the draft, reporting each violation at its key. */
    private static Optional<StarRequest> request(TomlSection section, StarDraft draft, Set<Component> unreadable) {
        try {
            return Optional.of(draft.toRequest());
        } catch (StarRequestException e) {
            boolean anchorUnreadable = StarDraft.ANCHORS.stream().anyMatch(unreadable::contains);
            for (Violation v : e.violations()) {
                // an anchor written but not understood still counts as written: no "missing" for it
                boolean missingAnchor = v.problem() == StarRequestException.Problem.MISSING
                        && v.component() == Component.radius && anchorUnreadable;
                if (!unreadable.contains(v.component()) && !missingAnchor) {
                    report(section, v);
                }
            }
            return Optional.empty();
        }
    }

    private static void report(TomlSection section, Violation v) {
        String key = KEY_OF.get(v.component());
        switch (v.problem()) {
            case MISSING -> section.missing(key, v.message());
            case NOT_APPLICABLE -> section.errorAtKey(key, ScenarioError.Kind.NOT_APPLICABLE, v.message());
            case CONFLICT -> section.errorAtKey(key, ScenarioError.Kind.CONFLICT, v.message());
            case OUT_OF_RANGE -> {
                if (section.has(key)) {
                    section.error(key, ScenarioError.Kind.OUT_OF_RANGE, v.message());
                } else {
                    // a value taken from [defaults] or from the built-in defaults
                    section.errorAtTable(ScenarioError.Kind.OUT_OF_RANGE, key + ": " + v.message());
                }
            }
            default -> throw new IllegalStateException("unknown problem " + v.problem());
        }
    }

    /** @return the isentropic anchors in the order written in the file (the first one counts) */
    private static List<Component> anchorOrder(TomlSection section) {
        List<Component> order = new ArrayList<>(StarDraft.ANCHORS);
        order.sort(Comparator.comparingInt((Component c) -> position(section, KEY_OF.get(c))));
        return order;
    }

    private static int position(TomlSection section, String key) {
        if (!section.has(key)) {
            return Integer.MAX_VALUE;
        }
        var p = section.keyPosition(key);
        return p.line() * 10_000 + p.column();
    }

    private static void unreadableIf(TomlSection section, String key, OptionalDouble value, Component component,
            Set<Component> unreadable) {
        if (section.has(key) && value.isEmpty()) {
            unreadable.add(component);
        }
    }

    private static Map<Component, String> keys() {
        Map<Component, String> map = new EnumMap<>(Component.class);
        map.put(Component.mass, MASS);
        map.put(Component.radius, RADIUS);
        map.put(Component.index, INDEX);
        map.put(Component.centralTemperature, CENTRAL_TEMPERATURE);
        map.put(Component.entropy, ENTROPY);
        map.put(Component.points, StarDefaults.POINTS);
        map.put(Component.kind, KIND);
        map.put(Component.electrons, StarDefaults.ELECTRONS);
        return map;
    }
}
