package org.stellabar.scenario;

import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.output.TableFormat;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.StarRequestException;
import org.stellabar.structure.StarRequestRules;

/**
 * What a star takes when it does not say: the file's {@code [defaults]} table, else the built-in
 * values (those of the command line too).
 *
 * @param composition the mixture
 * @param points profile points
 * @param outputs profile formats
 * @param charts chart groups
 * @param electrons which equation of state treats the electrons
 */
record StarDefaults(Composition composition, int points, Set<TableFormat> outputs, Set<ChartGroup> charts,
        Electrons electrons) {

    static final String COMPOSITION = "composition";
    static final String POINTS = "points";
    static final String OUTPUTS = "outputs";
    static final String CHARTS = "charts";
    static final String ELECTRONS = "electrons";
    static final List<String> KEYS = List.of(COMPOSITION, POINTS, OUTPUTS, CHARTS, ELECTRONS);

    /** The values used when the file has no {@code [defaults]} table. */
    static final StarDefaults BUILT_IN = new StarDefaults(Composition.DEFAULT, StarRequest.DEFAULT_POINTS,
            ScenarioStar.DEFAULT_OUTPUTS, ScenarioStar.DEFAULT_CHARTS, Electrons.classical);

    /**
     * Reads a {@code [defaults]} table; a key with a problem is reported and falls back to the
     * built-in value so that the stars can still be checked.
     *
     * @param section the table
     * @return the defaults
     */
    static StarDefaults read(TomlSection section) {
        return read(section, BUILT_IN);
    }

    /** @return the built-in defaults with the profiles in these formats (a file's {@code table_formats}) */
    static StarDefaults builtInWith(Set<TableFormat> outputs) {
        return new StarDefaults(BUILT_IN.composition(), BUILT_IN.points(), outputs, BUILT_IN.charts(),
                BUILT_IN.electrons());
    }

    /**
     * Reads a {@code [defaults]} table over a base.
     *
     * @param section the table
     * @param base the values of keys the table does not set
     * @return the defaults
     */
    static StarDefaults read(TomlSection section, StarDefaults base) {
        section.rejectUnknownKeys(KEYS, "the defaults");
        Composition composition = section.table(COMPOSITION, "a composition table such as { X = 0.70, Z = 0.02 }")
                .flatMap(CompositionReader::read)
                .orElse(base.composition());
        int points = readPoints(section).orElse(base.points());
        Set<TableFormat> outputs = section.choices(OUTPUTS, TableFormat.class, TableFormat::word)
                .map(list -> ScenarioStar.enumSet(TableFormat.class, list))
                .orElse(base.outputs());
        Set<ChartGroup> charts = section.choices(CHARTS, ChartGroup.class)
                .map(list -> ScenarioStar.enumSet(ChartGroup.class, list))
                .orElse(base.charts());
        Electrons electrons = readElectrons(section).orElse(base.electrons());
        return new StarDefaults(composition, points, outputs, charts, electrons);
    }

    /**
     * Reads {@code electrons = "classical"} or {@code "fermi"}.
     *
     * @param section a star or the defaults
     * @return the choice, or empty if absent or wrong (reported with the words allowed)
     */
    static Optional<Electrons> readElectrons(TomlSection section) {
        return section.choice(ELECTRONS, Electrons.class, Electrons::name);
    }

    /**
     * Reads the number of profile points, an integer checked by the star rules
     * ({@link StarRequestRules#points}).
     *
     * @param section a star or the defaults
     * @return the points, or empty if absent or wrong (reported)
     */
    static Optional<Integer> readPoints(TomlSection section) {
        String allowed = "an integer in [" + StarRequest.MIN_POINTS + ", " + StarRequest.MAX_POINTS + "]";
        OptionalLong points = section.integer(POINTS, allowed + " such as " + StarRequest.DEFAULT_POINTS);
        if (points.isEmpty()) {
            return Optional.empty();
        }
        long p = points.getAsLong();
        List<StarRequestException.Violation> problems = StarRequestRules.check().points(p).violations();
        if (!problems.isEmpty()) {
            section.error(POINTS, ScenarioError.Kind.OUT_OF_RANGE, problems.get(0).message());
            return Optional.empty();
        }
        return Optional.of((int) p);
    }
}
