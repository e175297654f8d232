package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;
import java.util.function.Function;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;
import org.tomlj.TomlArray;
import org.tomlj.TomlKeyValue;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;
import org.tomlj.TomlValue;

/**
 * One TOML table of a scenario file seen through typed accessors that report every problem to
 * the collector, with the full dotted key and the position of the offending value, and return
 * empty instead of throwing. The caller reads everything, and the collector decides at the end.
 */
final class TomlSection {

    private final TomlTable table;
    private final String path;
    private final TomlPosition position;
    private final ErrorCollector errors;

    /**
     * @param table the parsed table
     * @param path its dotted key ({@code star[2].composition}), empty for the file's root
     * @param position where the table begins (header or inline brace), for missing keys
     * @param errors where problems go
     */
    TomlSection(TomlTable table, String path, TomlPosition position, ErrorCollector errors) {
        this.table = table;
        this.path = path;
        this.position = position;
        this.errors = errors;
    }

    /** @return the dotted key of this table */
    String path() {
        return path;
    }

    /** @return where this table begins */
    TomlPosition position() {
        return position;
    }

    /** @return the full dotted key of one of this table's keys */
    String keyPath(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** @return true if the key is present (whatever its value) */
    boolean has(String key) {
        return table.keySet().contains(key);
    }

    /** @return true if the table has no keys at all */
    boolean isEmpty() {
        return table.isEmpty();
    }

    /** @return where the key itself is written */
    TomlPosition keyPosition(String key) {
        TomlPosition p = table.inputPositionOf(List.of(key));
        return p == null ? position : p;
    }

    /** @return where the key's value begins (the key's position if the parser has none) */
    TomlPosition valuePosition(String key) {
        TomlKeyValue entry = table.entry(List.of(key));
        if (entry != null) {
            TomlValue value = entry.value();
            if (value != null && value.position() != null) {
                return value.position();
            }
        }
        return keyPosition(key);
    }

    /** @return the raw parsed value of a key, or null */
    Object raw(String key) {
        return table.get(List.of(key));
    }

    /**
     * Reports every key not in {@code allowed}, with a suggestion when one is close.
     *
     * @param allowed the keys this table may have
     * @param owner what the table is, for the message ("a star", "the composition")
     */
    void rejectUnknownKeys(Collection<String> allowed, String owner) {
        for (String key : table.keySet()) {
            if (!allowed.contains(key)) {
                String hint = Suggestions.closest(key, allowed)
                        .map(s -> "did you mean '" + s + "'? ")
                        .orElse("");
                errors.add(keyPosition(key), ScenarioError.Kind.UNKNOWN_KEY, keyPath(key), "",
                        "unknown key; " + hint + "the keys of " + owner + " are " + String.join(", ", allowed));
            }
        }
    }

    /** Reports a problem with a key's value, at the value. */
    void error(String key, ScenarioError.Kind kind, String problem) {
        errors.add(valuePosition(key), kind, keyPath(key), TomlText.of(raw(key)), problem);
    }

    /** Reports a problem with a key as such (it should not be there), at the key. */
    void errorAtKey(String key, ScenarioError.Kind kind, String problem) {
        errors.add(keyPosition(key), kind, keyPath(key), "", problem);
    }

    /** Reports a problem with this table as a whole, at its start, showing its contents. */
    void errorAtTable(ScenarioError.Kind kind, String problem) {
        errors.add(position, kind, path, TomlText.of(table), problem);
    }

    /** Reports a required key that is absent, at the start of this table. */
    void missing(String key, String problem) {
        errors.add(position, ScenarioError.Kind.MISSING, keyPath(key), "", problem);
    }

    /**
     * @param key the key
     * @param expected what a good value looks like, for the message
     * @return the string, or empty if absent or of another type (reported)
     */
    Optional<String> string(String key, String expected) {
        Object value = raw(key);
        if (value == null) {
            return Optional.empty();
        }
        if (value instanceof String s) {
            return Optional.of(s);
        }
        wrongType(key, value, expected);
        return Optional.empty();
    }

    /**
     * @param key the key
     * @param expected what a good value looks like
     * @return the boolean, or empty if absent or of another type (reported)
     */
    Optional<Boolean> bool(String key, String expected) {
        Object value = raw(key);
        if (value == null) {
            return Optional.empty();
        }
        if (value instanceof Boolean b) {
            return Optional.of(b);
        }
        wrongType(key, value, expected);
        return Optional.empty();
    }

    /**
     * A plain number: a TOML integer or float. NaN and infinities are refused.
     *
     * @param key the key
     * @param expected what a good value looks like
     * @return the number, or empty if absent, of another type or not finite (reported)
     */
    OptionalDouble number(String key, String expected) {
        Object value = raw(key);
        if (value == null) {
            return OptionalDouble.empty();
        }
        if (value instanceof Long l) {
            return OptionalDouble.of(l.doubleValue());
        }
        if (value instanceof Double d) {
            if (!Double.isFinite(d)) {
                error(key, ScenarioError.Kind.OUT_OF_RANGE, "not a finite number; expected " + expected);
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(d);
        }
        wrongType(key, value, expected);
        return OptionalDouble.empty();
    }

    /**
     * @param key the key
     * @param expected what a good value looks like
     * @return the integer, or empty if absent or not a TOML integer (reported)
     */
    OptionalLong integer(String key, String expected) {
        Object value = raw(key);
        if (value == null) {
            return OptionalLong.empty();
        }
        if (value instanceof Long l) {
            return OptionalLong.of(l);
        }
        wrongType(key, value, expected);
        return OptionalLong.empty();
    }

    /**
     * A physical quantity: a TOML number (taken as CGS) or a string with a unit ("40 Msun"),
     * converted to CGS by {@link Units#parse}.
     *
     * @param key the key
     * @param dimension what it measures
     * @return the value in CGS, or empty if absent or malformed (reported)
     */
    OptionalDouble quantity(String key, Dimension dimension) {
        Object value = raw(key);
        if (value == null) {
            return OptionalDouble.empty();
        }
        String expected = "a " + dimension.label() + ": a number in " + dimension.cgsUnit()
                + ", or a string with one of the units " + dimension.acceptedUnits() + ", e.g. \""
                + example(dimension) + "\"";
        if (value instanceof String text) {
            try {
                return OptionalDouble.of(Units.parse(null, text, dimension));
            } catch (BadInputException e) {
                String message = e.getMessage().replace(" in '" + text.strip() + "'", "");
                error(key, ScenarioError.Kind.BAD_UNIT, message);
                return OptionalDouble.empty();
            }
        }
        return number(key, expected);
    }

    /**
     * A nested table.
     *
     * @param key the key
     * @param expected what a good value looks like
     * @return the table as a section, or empty if absent or of another type (reported)
     */
    Optional<TomlSection> table(String key, String expected) {
        Object value = raw(key);
        if (value == null) {
            return Optional.empty();
        }
        if (value instanceof TomlTable t) {
            return Optional.of(new TomlSection(t, keyPath(key), valuePosition(key), errors));
        }
        wrongType(key, value, expected);
        return Optional.empty();
    }

    /**
     * One word out of an enum's words.
     *
     * @param key the key
     * @param type the enum
     * @param <E> its type
     * @return the constant, or empty if absent or not one of the words (reported)
     */
    <E extends Enum<E> & Keyword> Optional<E> choice(String key, Class<E> type) {
        return choice(key, type, Keyword::word);
    }

    /**
     * One word out of an enum's words, for an enum of another package.
     *
     * @param key the key
     * @param type the enum
     * @param wordOf the word of each constant
     * @param <E> its type
     * @return the constant, or empty if absent or not one of the words (reported)
     */
    <E extends Enum<E>> Optional<E> choice(String key, Class<E> type, Function<? super E, String> wordOf) {
        List<String> words = Keyword.words(type, wordOf);
        Optional<String> word = string(key, "one of the words " + quoted(words));
        if (word.isEmpty()) {
            return Optional.empty();
        }
        Optional<E> found = Keyword.lookup(type, wordOf, word.get());
        if (found.isEmpty()) {
            error(key, ScenarioError.Kind.UNKNOWN_CHOICE, unknownWord(word.get(), words));
        }
        return found;
    }

    /**
     * An array of words out of an enum's words, each at most once.
     *
     * @param key the key
     * @param type the enum
     * @param <E> its type
     * @return the constants, or empty if absent or malformed (reported)
     */
    <E extends Enum<E> & Keyword> Optional<List<E>> choices(String key, Class<E> type) {
        return choices(key, type, Keyword::word);
    }

    /**
     * An array of words out of an enum's words, each at most once, for an enum of another package.
     *
     * @param key the key
     * @param type the enum
     * @param wordOf the word of each constant
     * @param <E> its type
     * @return the constants, or empty if absent or malformed (reported)
     */
    <E extends Enum<E>> Optional<List<E>> choices(String key, Class<E> type, Function<? super E, String> wordOf) {
        List<String> words = Keyword.words(type, wordOf);
        Object value = raw(key);
        if (value == null) {
            return Optional.empty();
        }
        if (!(value instanceof TomlArray array)) {
            wrongType(key, value, "an array of words out of " + quoted(words) + ", e.g. [\"" + words.get(0)
                    + "\"], or [] for none");
            return Optional.empty();
        }
        List<E> chosen = new ArrayList<>();
        EnumSet<E> seen = EnumSet.noneOf(type);
        boolean ok = true;
        for (int i = 0; i < array.size(); i++) {
            Object element = array.get(i);
            String elementKey = keyPath(key) + "[" + (i + 1) + "]";
            TomlPosition at = array.inputPositionOf(i);
            if (!(element instanceof String word)) {
                errors.add(at, ScenarioError.Kind.WRONG_TYPE, elementKey, TomlText.of(element),
                        TomlText.typeOf(element) + " is not accepted here; expected one of the words "
                                + quoted(words));
                ok = false;
                continue;
            }
            Optional<E> found = Keyword.lookup(type, wordOf, word);
            if (found.isEmpty()) {
                errors.add(at, ScenarioError.Kind.UNKNOWN_CHOICE, elementKey, TomlText.of(element),
                        unknownWord(word, words));
                ok = false;
            } else if (!seen.add(found.get())) {
                errors.add(at, ScenarioError.Kind.BAD_VALUE, elementKey, TomlText.of(element),
                        "listed twice; give each of " + quoted(words) + " at most once");
                ok = false;
            } else {
                chosen.add(found.get());
            }
        }
        return ok ? Optional.of(chosen) : Optional.empty();
    }

    private void wrongType(String key, Object value, String expected) {
        error(key, ScenarioError.Kind.WRONG_TYPE, TomlText.typeOf(value) + " is not accepted here; expected "
                + expected);
    }

    private static String unknownWord(String word, List<String> words) {
        String hint = Suggestions.closest(word, words).map(s -> "did you mean '" + s + "'? ").orElse("");
        return "not one of the choices; " + hint + "choose from " + quoted(words);
    }

    static String quoted(List<String> words) {
        List<String> q = new ArrayList<>();
        for (String w : words) {
            q.add("\"" + w + "\"");
        }
        return String.join(", ", q);
    }

    private static String example(Dimension dimension) {
        switch (dimension) {
            case MASS:
                return "40 Msun";
            case LENGTH:
                return "12 Rsun";
            case TEMPERATURE:
                return "3.5e7 K";
            default:
                return "1 " + dimension.cgsUnit();
        }
    }
}
