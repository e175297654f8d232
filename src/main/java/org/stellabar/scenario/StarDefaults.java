package org.stellabar.scenario;

import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.output.TableFormat;

/**
 * What a star takes when it does not say: the file's {@code [defaults]} table, else the built-in
 * values of {@link StarSpec}.
 *
 * @param composition the mixture
 * @param points profile points
 * @param outputs profile formats
 * @param charts chart groups
 */
record StarDefaults(Composition composition, int points, Set<TableFormat> outputs, Set<ChartGroup> charts) {

    static final String COMPOSITION = "composition";
    static final String POINTS = "points";
    static final String OUTPUTS = "outputs";
    static final String CHARTS = "charts";
    static final List<String> KEYS = List.of(COMPOSITION, POINTS, OUTPUTS, CHARTS);

    /** The values used when the file has no {@code [defaults]} table. */
    static final StarDefaults BUILT_IN = new StarDefaults(StarSpec.DEFAULT_COMPOSITION, StarSpec.DEFAULT_POINTS,
            StarSpec.DEFAULT_OUTPUTS, StarSpec.DEFAULT_CHARTS);

    /**
     * Reads a {@code [defaults]} table; a key with a problem is reported and falls back to the
     * built-in value so that the stars can still be checked.
     *
     * @param section the table
     * @return the defaults
     */
    static StarDefaults read(TomlSection section) {
        section.rejectUnknownKeys(KEYS, "the defaults");
        Composition composition = section.table(COMPOSITION, "a composition table such as { X = 0.70, Z = 0.02 }")
                .flatMap(CompositionReader::read)
                .orElse(BUILT_IN.composition());
        int points = readPoints(section).orElse(BUILT_IN.points());
        Set<TableFormat> outputs = section.choices(OUTPUTS, TableFormat.class, TableFormat::extension)
                .map(list -> StarSpec.enumSet(TableFormat.class, list))
                .orElse(BUILT_IN.outputs());
        Set<ChartGroup> charts = section.choices(CHARTS, ChartGroup.class)
                .map(list -> StarSpec.enumSet(ChartGroup.class, list))
                .orElse(BUILT_IN.charts());
        return new StarDefaults(composition, points, outputs, charts);
    }

    /**
     * Reads the number of profile points, an integer in [{@value StarSpec#MIN_POINTS},
     * {@value StarSpec#MAX_POINTS}].
     *
     * @param section a star or the defaults
     * @return the points, or empty if absent or wrong (reported)
     */
    static Optional<Integer> readPoints(TomlSection section) {
        String allowed = "an integer in [" + StarSpec.MIN_POINTS + ", " + StarSpec.MAX_POINTS + "]";
        OptionalLong points = section.integer(POINTS, allowed + " such as " + StarSpec.DEFAULT_POINTS);
        if (points.isEmpty()) {
            return Optional.empty();
        }
        long p = points.getAsLong();
        if (p < StarSpec.MIN_POINTS || p > StarSpec.MAX_POINTS) {
            section.error(POINTS, ScenarioError.Kind.OUT_OF_RANGE, "the number of profile points is " + allowed
                    + (p > StarSpec.MAX_POINTS ? " (more is far beyond what a smooth profile needs)" : ""));
            return Optional.empty();
        }
        return Optional.of((int) p);
    }
}
