package org.stellabar.scenario;

import java.util.List;
import java.util.stream.Collectors;
import org.stellabar.physics.BadInputException;

/**
 * Every problem of one scenario file at once. The message has one line per problem, each
 * naming file, line, column, key, value and what is allowed, so a user fixes them all in one go.
 */
public final class ScenarioException extends BadInputException {

    private static final long serialVersionUID = 1L;

    private final transient List<ScenarioError> errors;

    /** @param errors the problems, at least one, in the order they are printed */
    public ScenarioException(List<ScenarioError> errors) {
        super(errors.stream().map(ScenarioError::toString).collect(Collectors.joining("\n")));
        if (errors.isEmpty()) {
            throw new IllegalArgumentException("a scenario exception needs at least one error");
        }
        this.errors = List.copyOf(errors);
    }

    /** @return the problems, one per message line */
    public List<ScenarioError> errors() {
        return errors;
    }

    /**
     * Each line already names its file, line and key, so a subject adds nothing; the exception is
     * returned as it is, keeping its list of errors.
     *
     * @param subject ignored
     * @return this exception
     */
    @Override
    public BadInputException about(String subject) {
        return this;
    }
}
