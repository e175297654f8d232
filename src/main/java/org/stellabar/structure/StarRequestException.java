package org.stellabar.structure;

import java.util.List;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.stellabar.physics.BadInputException;

/**
 * A star request that cannot be answered, with every problem found at once, each tagged with the
 * request input at fault so that a command can name its own option ({@code --mass}) and a
 * scenario file its own {@code file:line:column}.
 */
public final class StarRequestException extends BadInputException {

    private static final long serialVersionUID = 1L;

    /** The inputs of a star request a problem can be about. */
    public enum Component {
        /** the total mass */
        mass,
        /** the radius */
        radius,
        /** the polytropic index */
        index,
        /** the central temperature of an isentropic star */
        centralTemperature,
        /** the entropy per baryon of an isentropic star */
        entropy,
        /** the number of profile points */
        points,
        /** the kind, or a combination of inputs that does not fit the kind */
        kind,
        /** the treatment of the electrons (which equation of state) */
        electrons
    }

    /** What sort of problem a violation is. */
    public enum Problem {
        /** a value outside its allowed range */
        OUT_OF_RANGE,
        /** an input the kind needs was not given */
        MISSING,
        /** an input given that the kind does not take */
        NOT_APPLICABLE,
        /** an input that excludes another one already given */
        CONFLICT
    }

    /**
     * One rule a request breaks.
     *
     * @param component the input at fault
     * @param problem what sort of problem
     * @param message one line naming the value, its unit and what is allowed
     */
    public record Violation(Component component, Problem problem, String message) {
    }

    private final transient List<Violation> violations;

    /** @param violations every rule the request breaks, at least one */
    public StarRequestException(List<Violation> violations) {
        super(violations.stream().map(Violation::message).collect(Collectors.joining("; ")));
        this.violations = List.copyOf(violations);
    }

    /**
     * @param component the input at fault
     * @param problem what sort of problem
     * @param message one line naming the value and what is allowed
     */
    public StarRequestException(Component component, Problem problem, String message) {
        this(List.of(new Violation(component, problem, message)));
    }

    /** @return every rule the request breaks, in the order found */
    public List<Violation> violations() {
        return violations;
    }

    /** @return the input at fault in the first violation */
    public Component component() {
        return violations.get(0).component();
    }

    /**
     * The same problems, each prefixed with the name the user knows the input by.
     *
     * @param name e.g. a command-line option for each component
     * @return a plain bad-input exception with one message
     */
    public BadInputException named(Function<Component, String> name) {
        return new BadInputException(violations.stream().map(v -> name.apply(v.component()) + ": " + v.message())
                .collect(Collectors.joining("; ")));
    }
}
