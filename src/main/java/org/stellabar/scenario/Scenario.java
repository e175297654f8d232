package org.stellabar.scenario;

import java.util.Set;
import org.stellabar.output.TableFormat;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.stellabar.physics.BadInputException;

/**
 * A set of stars to build and write in one run, as read from a scenario file.
 *
 * @param name the scenario's name, usable as a directory name ({@link Names#RULE})
 * @param description free text, may be empty
 * @param source where the scenario came from, as named in messages (a path as given, or a label
 *     such as "built-in demo-cluster.toml")
 * @param path the file it was read from, empty for text or a built-in resource
 * @param stars the stars, at least one, names unique ignoring case
 * @param options settings of the run as a whole
 */
public record Scenario(String name, String description, String source, Optional<Path> path, List<ScenarioStar> stars,
        ScenarioOptions options) {

    /**
     * Canonical constructor: checks ranges and consistency; copies collections in; fills defaults for absent parts.
     *
     * @param name the scenario's name, usable as a directory name ({@link Names#RULE})
     * @param description free text, may be empty
     * @param source where the scenario came from, as named in messages (a path as given, or a label
     *        such as "built-in demo-cluster.toml")
     * @param path the file it was read from, empty for text or a built-in resource
     * @param stars the stars, at least one, names unique ignoring case
     * @param options settings of the run as a whole
     */
    public Scenario {
        Names.problem(name).ifPresent(p -> {
            throw new BadInputException("scenario name '" + name + "': " + p);
        });
        description = description == null ? "" : description;
        source = source == null ? "" : source;
        path = path == null ? Optional.empty() : path;
        options = options == null ? ScenarioOptions.DEFAULTS : options;
        if (stars == null || stars.isEmpty()) {
            throw new BadInputException("scenario " + name + " has no stars; give at least one");
        }
        stars = List.copyOf(stars);
        Map<String, String> seen = new HashMap<>();
        for (ScenarioStar star : stars) {
            String previous = seen.put(star.name().toLowerCase(Locale.ROOT), star.name());
            if (previous != null) {
                throw new BadInputException("scenario " + name + ": star name '" + star.name()
                        + "' is used twice (also as '" + previous + "'); names must differ, ignoring case");
            }
        }
    }

    /**
     * A scenario of one star, as the command line makes from options: it writes what any
     * scenario writes, in the same layout.
     *
     * @param star the star
     * @param source how the star was given, for messages and metadata (e.g. "command-line options")
     * @return the scenario, named after the star
     */
    public static Scenario ofOne(ScenarioStar star, String source) {
        return new Scenario(star.name(), "", source, Optional.empty(), List.of(star), ScenarioOptions.DEFAULTS);
    }

    /**
     * The same scenario with every table in these formats: the run's own tables and every star's
     * profile (as {@code --table-formats} asks on the command line, over the file's choices).
     *
     * @param formats the formats
     * @return the scenario
     */
    public Scenario withTableFormats(Set<TableFormat> formats) {
        return new Scenario(name, description, source, path, stars.stream().map(s -> s.withOutputs(formats)).toList(),
                options.withTableFormats(formats));
    }

    /**
     * @param starName a star's name, compared ignoring case
     * @return the star of that name, if any
     */
    public Optional<ScenarioStar> star(String starName) {
        return stars.stream().filter(s -> s.name().equalsIgnoreCase(starName)).findFirst();
    }
}
