package org.stellabar.scenario;

/**
 * One problem found in a scenario file, with where it is and what is allowed. Printed as one
 * line: {@code demo.toml:14:8: star[3].mass = "45 Msol": unit 'Msol' is unknown; a mass accepts
 * g, kg, Msun}.
 *
 * @param source the file as named by the user
 * @param line 1-based line, or 0 when the problem concerns the whole file (it cannot be read)
 * @param column 1-based column, or 0 with line 0
 * @param kind what sort of problem, for programs and tests
 * @param key the full dotted key ({@code star[3].mass}; stars count from 1), empty for syntax and
 *     file problems
 * @param value the offending value as written in TOML ({@code "45 Msol"}), empty when there is none
 * @param problem what is wrong and what is allowed
 */
public record ScenarioError(String source, int line, int column, Kind kind, String key, String value,
        String problem) {

    /** What sort of problem an error is. */
    public enum Kind {
        /** the file cannot be read (missing, a directory, not UTF-8 text, no permission) */
        UNREADABLE,
        /** TOML syntax, as reported by the parser */
        SYNTAX,
        /** the file is empty or has no [[star]] table */
        NO_STARS,
        /** a key this format does not define */
        UNKNOWN_KEY,
        /** a value of the wrong TOML type (a string where a number is needed, ...) */
        WRONG_TYPE,
        /** a required key is absent */
        MISSING,
        /** a quantity string with an unknown unit, a unit of another dimension, or no number */
        BAD_UNIT,
        /** a number outside its allowed range */
        OUT_OF_RANGE,
        /** mass fractions that do not add up to 1, or that leave no ions */
        COMPOSITION_SUM,
        /** two keys that exclude each other are both given */
        CONFLICT,
        /** a key that does not apply to this kind of star */
        NOT_APPLICABLE,
        /** two stars with the same name */
        DUPLICATE_NAME,
        /** a word that is not one of the allowed choices */
        UNKNOWN_CHOICE,
        /** a value of the right type that is not allowed for another reason (a name, a repeated choice) */
        BAD_VALUE
    }

    /**
     * Canonical constructor: fills defaults for absent parts.
     *
     * @param source the file as named by the user
     * @param line 1-based line, or 0 when the problem concerns the whole file (it cannot be read)
     * @param column 1-based column, or 0 with line 0
     * @param kind what sort of problem, for programs and tests
     * @param key the full dotted key ({@code star[3].mass}; stars count from 1), empty for syntax and
     *        file problems
     * @param value the offending value as written in TOML ({@code "45 Msol"}), empty when there is none
     * @param problem what is wrong and what is allowed
     */
    public ScenarioError {
        key = key == null ? "" : key;
        value = value == null ? "" : value;
    }

    /** @return the part after the position: {@code key = value: problem} */
    public String message() {
        if (key.isEmpty()) {
            return problem;
        }
        return value.isEmpty() ? key + ": " + problem : key + " = " + value + ": " + problem;
    }

    /** @return the error as one line, {@code source:line:column: key = value: problem} */
    @Override
    public String toString() {
        return line > 0 ? source + ":" + line + ":" + column + ": " + message() : source + ": " + message();
    }
}
