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

    /** Problems the message lists at most; the rest are counted. */
    public static final int LISTED = 50;

    /** @param errors the problems, at least one, in the order they are printed (the first {@link #LISTED}) */
    public ScenarioException(List<ScenarioError> errors) {
        super(message(errors));
        if (errors.isEmpty()) {
            throw new IllegalArgumentException("a scenario exception needs at least one error");
        }
        this.errors = List.copyOf(errors);
    }

    private static String message(List<ScenarioError> errors) {
        String listed = errors.stream().limit(LISTED).map(ScenarioError::toString).collect(Collectors.joining("\n"));
        return errors.size() <= LISTED ? listed
                : listed + "\n... and " + (errors.size() - LISTED) + " more problems (" + errors.size() + " in all)";
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
