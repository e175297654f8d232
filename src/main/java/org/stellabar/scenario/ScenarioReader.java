package org.stellabar.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;

/**
 * Reads scenario files (TOML, format in {@code package-info.java}). Every problem of a file is
 * collected and reported at once in one {@link ScenarioException}, one line per problem, each with
 * file, line, column, key, value and what is allowed. TOML syntax errors are reported alone: a
 * file the parser could not read whole would only add spurious follow-up errors.
 */
public final class ScenarioReader {

    /** Name of the built-in demo scenario, a resource beside this class. */
    public static final String DEMO_RESOURCE = "demo-cluster.toml";
    /** How the built-in demo is named in messages. */
    public static final String DEMO_SOURCE = "built-in " + DEMO_RESOURCE;

    static final String NAME = "name";
    static final String DESCRIPTION = "description";
    static final String CHART_FORMATS = "chart_formats";
    static final String NOTEBOOK = "notebook";
    static final String TABLE_FORMATS = "table_formats";
    static final String DEFAULTS = "defaults";
    static final String STAR = "star";
    static final List<String> KEYS = List.of(NAME, DESCRIPTION, CHART_FORMATS, NOTEBOOK, TABLE_FORMATS, DEFAULTS, STAR);

    private ScenarioReader() {
    }

    /**
     * Reads a scenario file (UTF-8).
     *
     * @param path the file; named in messages as given
     * @return the scenario
     * @throws ScenarioException listing every problem, including a file that cannot be read
     */
    public static Scenario read(Path path) {
        String source = path.toString();
        ErrorCollector errors = new ErrorCollector(source);
        String text = readText(path, "scenario", errors);
        errors.throwIfAny();
        Path fileName = path.getFileName();
        return parse(source, Optional.of(path), text, fileName == null ? "scenario" : stem(fileName.toString()));
    }

    /**
     * Reads a scenario from text.
     *
     * @param sourceName how to name the text in messages (e.g. a file name)
     * @param text the TOML text
     * @return the scenario
     * @throws ScenarioException listing every problem
     */
    public static Scenario read(String sourceName, String text) {
        return parse(sourceName, Optional.empty(), text, stem(sourceName));
    }

    /**
     * Reads the built-in demo: the file {@code profiles/demo-cluster.toml} of the source tree,
     * packaged beside this class.
     *
     * @return the demo scenario
     * @throws UncheckedIOException if the resource is missing from the build (a packaging fault)
     */
    public static Scenario builtInDemo() {
        return read(DEMO_SOURCE, demoText());
    }

    /** @return the text of the built-in demo scenario, e.g. to copy it out as a starting point */
    public static String demoText() {
        try (InputStream in = ScenarioReader.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in == null) {
                throw new UncheckedIOException(new IOException("resource " + DEMO_RESOURCE
                        + " is missing beside " + ScenarioReader.class.getName() + "; the build did not package it"));
            }
            return decode(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Scenario parse(String source, Optional<Path> path, String text, String defaultName) {
        ErrorCollector errors = new ErrorCollector(source);
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        TomlParseResult toml = Toml.parse(body);
        for (TomlParseError e : toml.errors()) {
            errors.add(e.position(), ScenarioError.Kind.SYNTAX, "", "", "TOML syntax: " + e.getMessage());
        }
        errors.throwIfAny();
        if (toml.isEmpty()) {
            errors.add(TomlPosition.positionAt(1, 1), ScenarioError.Kind.NO_STARS, "", "",
                    "the file is empty (or only comments); a scenario needs at least one [[star]] table with a name"
                            + " and a mass");
            errors.throwIfAny();
        }
        TomlSection root = new TomlSection(toml, "", TomlPosition.positionAt(1, 1), errors);
        root.rejectUnknownKeys(KEYS, "a scenario");

        String name = root.string(NAME, "a name such as \"my-cluster\"").orElse(Names.fromStem(defaultName));
        Names.problem(name).ifPresent(p -> root.error(NAME, ScenarioError.Kind.BAD_VALUE, p));
        String description = root.string(DESCRIPTION, "a string").orElse("");
        ScenarioOptions options = ScenarioOptions.DEFAULTS;
        Optional<List<ChartFormat>> formats = root.choices(CHART_FORMATS, ChartFormat.class, ChartFormat::extension);
        if (formats.isPresent()) {
            options = options.withChartFormats(formats.get());
        }
        Optional<Boolean> notebook = root.bool(NOTEBOOK, "true or false");
        if (notebook.isPresent()) {
            options = options.withNotebook(notebook.get());
        }
        // table_formats: the run's own tables, and every star's profile unless outputs says otherwise
        Optional<List<TableFormat>> tableFormats = root.choices(TABLE_FORMATS, TableFormat.class, TableFormat::word);
        StarDefaults base = StarDefaults.BUILT_IN;
        if (tableFormats.isPresent()) {
            options = options.withTableFormats(tableFormats.get());
            base = StarDefaults.builtInWith(ScenarioStar.enumSet(TableFormat.class, tableFormats.get()));
        }
        StarDefaults starBase = base;
        StarDefaults defaults = root.table(DEFAULTS, "a [defaults] table")
                .map(section -> StarDefaults.read(section, starBase))
                .orElse(starBase);

        List<ScenarioStar> stars = readStars(root, defaults, errors);
        errors.throwIfAny();
        try {
            return new Scenario(name, description, source, path, stars, options);
        } catch (BadInputException e) {
            // every rule of Scenario is checked above with its position; this is a safety net
            errors.add(TomlPosition.positionAt(1, 1), ScenarioError.Kind.BAD_VALUE, "", "", e.getMessage());
            errors.throwIfAny();
            throw e;
        }
    }

    private static List<ScenarioStar> readStars(TomlSection root, StarDefaults defaults, ErrorCollector errors) {
        List<ScenarioStar> stars = new ArrayList<>();
        Object value = root.raw(STAR);
        if (value == null) {
            errors.add(root.position(), ScenarioError.Kind.NO_STARS, STAR, "", "no [[star]] table; a scenario needs"
                    + " at least one, with a name and a mass");
            return stars;
        }
        if (!(value instanceof TomlArray array && allTables(array))) {
            root.error(STAR, ScenarioError.Kind.WRONG_TYPE, TomlText.typeOf(value) + " is not accepted here; write"
                    + " each star as a [[star]] table (double brackets)");
            return stars;
        }
        if (array.isEmpty()) {
            root.error(STAR, ScenarioError.Kind.NO_STARS, "no stars; a scenario needs at least one [[star]] table");
            return stars;
        }
        Map<String, String> positionOfStem = new HashMap<>();
        for (int i = 0; i < array.size(); i++) {
            TomlSection star = new TomlSection(array.getTable(i), STAR + "[" + (i + 1) + "]", array.inputPositionOf(i),
                    errors);
            StarReader.read(star, defaults, errors).ifPresent(stars::add);
            if (star.raw(StarReader.NAME) instanceof String starName) {
                // the name becomes file names: two names that make the same file stem (case, runs of
                // spaces, characters a file name drops) would overwrite each other's files
                String stem = Names.fileStem(starName);
                var position = star.valuePosition(StarReader.NAME);
                String where = errors.source() + ":" + position.line() + ":" + position.column();
                String previous = positionOfStem.putIfAbsent(stem, where);
                if (previous != null) {
                    star.error(StarReader.NAME, ScenarioError.Kind.DUPLICATE_NAME, "another star (" + previous
                            + ") has a name with the same file stem \"" + stem + "\"; names must differ beyond case,"
                            + " spacing and punctuation, because they name the output files");
                } else if (Names.RESERVED_STEMS.contains(stem)) {
                    star.error(StarReader.NAME, ScenarioError.Kind.DUPLICATE_NAME, "the file stem \"" + stem
                            + "\" would overwrite the cluster charts (" + stem + "-*); choose another name");
                }
            }
        }
        return stars;
    }

    private static boolean allTables(TomlArray array) {
        for (int i = 0; i < array.size(); i++) {
            if (!array.isTable(i)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Reads a TOML file as UTF-8 text, reporting a file that cannot be read as one problem.
     *
     * @param path the file
     * @param what "scenario" or "survey", for the messages
     * @param errors where the problem goes
     * @return the text, or null when it could not be read (the problem reported)
     */
    static String readText(Path path, String what, ErrorCollector errors) {
        if (Files.isDirectory(path)) {
            errors.addFileProblem(ScenarioError.Kind.UNREADABLE, "is a directory; give a " + what + " file (.toml)");
            return null;
        }
        try {
            return decode(Files.readAllBytes(path));
        } catch (NoSuchFileException e) {
            errors.addFileProblem(ScenarioError.Kind.UNREADABLE, "no such file");
        } catch (AccessDeniedException e) {
            errors.addFileProblem(ScenarioError.Kind.UNREADABLE, "cannot be read: permission denied");
        } catch (CharacterCodingException e) {
            errors.addFileProblem(ScenarioError.Kind.UNREADABLE, "is not UTF-8 text; save the " + what + " as UTF-8");
        } catch (IOException e) {
            errors.addFileProblem(ScenarioError.Kind.UNREADABLE, "cannot be read: " + e.getMessage());
        }
        return null;
    }

    private static String decode(byte[] bytes) throws CharacterCodingException {
        return StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT)
                .decode(ByteBuffer.wrap(bytes))
                .toString();
    }

    private static String stem(String fileName) {
        String base = fileName.replace('\\', '/');
        base = base.substring(base.lastIndexOf('/') + 1);
        int dot = base.lastIndexOf('.');
        return dot > 0 ? base.substring(0, dot) : base;
    }
}
