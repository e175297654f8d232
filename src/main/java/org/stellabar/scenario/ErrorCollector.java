package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.tomlj.TomlPosition;

/** Gathers the problems of one scenario file so that all of them are reported at once. */
final class ErrorCollector {

    private final String source;
    private final List<ScenarioError> errors = new ArrayList<>();

    /** @return the file as named by the user */
    String source() {
        return source;
    }

    /** @param source the file as named by the user, printed before every line */
    ErrorCollector(String source) {
        this.source = source;
    }

    /**
     * Records a problem at a position of the file.
     *
     * @param position where the problem is (1-based line and column)
     * @param kind what sort of problem
     * @param key full dotted key, or empty
     * @param value the offending value as TOML text, or empty
     * @param problem what is wrong and what is allowed
     */
    void add(TomlPosition position, ScenarioError.Kind kind, String key, String value, String problem) {
        int line = position == null ? 1 : position.line();
        int column = position == null ? 1 : position.column();
        errors.add(new ScenarioError(source, line, column, kind, key, value, problem));
    }

    /** Records a problem with the file as a whole (it cannot be read), which has no position. */
    void addFileProblem(ScenarioError.Kind kind, String problem) {
        errors.add(new ScenarioError(source, 0, 0, kind, "", "", problem));
    }

    /** @return how many problems have been recorded so far */
    int count() {
        return errors.size();
    }

    /** @throws ScenarioException with every problem, in file order, if there is any */
    void throwIfAny() {
        if (!errors.isEmpty()) {
            List<ScenarioError> sorted = new ArrayList<>(errors);
            sorted.sort(Comparator.comparingInt(ScenarioError::line).thenComparingInt(ScenarioError::column));
            throw new ScenarioException(sorted);
        }
    }
}
