package org.stellabar.scenario;

import java.util.Collection;
import java.util.Collections;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarRequest;

/**
 * One star of a scenario: the validated star request (the same value the command line builds
 * from options) and what to write for it.
 *
 * @param request what to build; its name is unique within the scenario and usable as a file name
 *     ({@link Names#RULE})
 * @param note free text shown with the star's results, may be empty
 * @param outputs profile file formats (may be empty: summary only)
 * @param charts chart groups (may be empty: no charts)
 */
public record ScenarioStar(StarRequest request, String note, Set<TableFormat> outputs, Set<ChartGroup> charts) {

    /** Profile formats when none are asked for. */
    public static final Set<TableFormat> DEFAULT_OUTPUTS =
            Collections.unmodifiableSet(EnumSet.of(TableFormat.CSV, TableFormat.ECSV, TableFormat.FITS));
    /** Chart groups when none are asked for: all of them. */
    public static final Set<ChartGroup> DEFAULT_CHARTS = Collections.unmodifiableSet(EnumSet.allOf(ChartGroup.class));

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in; fills defaults for absent parts.
     *
     * @param request what to build; its name is unique within the scenario and usable as a file name
     *        ({@link Names#RULE})
     * @param note free text shown with the star's results, may be empty
     * @param outputs profile file formats (may be empty: summary only)
     * @param charts chart groups (may be empty: no charts)
     */
    public ScenarioStar {
        Objects.requireNonNull(request, "request");
        Names.problem(request.name()).ifPresent(p -> {
            throw new BadInputException("star name '" + request.name() + "': " + p);
        });
        note = note == null ? "" : note;
        outputs = enumSet(TableFormat.class, outputs);
        charts = enumSet(ChartGroup.class, charts);
    }

    /**
     * @param formats the table formats
     * @return the same star written in these table formats
     */
    public ScenarioStar withOutputs(Set<TableFormat> formats) {
        return new ScenarioStar(request, note, formats, charts);
    }

    /**
     * A star with the default outputs and charts.
     *
     * @param request what to build
     * @return the star
     */
    public static ScenarioStar of(StarRequest request) {
        return new ScenarioStar(request, "", DEFAULT_OUTPUTS, DEFAULT_CHARTS);
    }

    /** @return the star's name */
    public String name() {
        return request.name();
    }

    static <E extends Enum<E>> Set<E> enumSet(Class<E> type, Collection<E> values) {
        if (values == null) {
            throw new BadInputException("no " + type.getSimpleName().toLowerCase(Locale.ROOT) + " list given");
        }
        EnumSet<E> set = EnumSet.noneOf(type);
        set.addAll(values);
        return Collections.unmodifiableSet(set);
    }
}
