package org.stellabar.structure;

import org.stellabar.physics.BadInputException;

/**
 * A star model request that cannot be answered, tagged with the request component at fault so
 * that a command can name its own option ({@code --mass}) and a scenario file its own line.
 */
public final class StarRequestException extends BadInputException {

    private static final long serialVersionUID = 1L;

    /** The components of a {@link StarRequest} an error can be about. */
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
        kind
    }

    private final Component component;

    /**
     * @param component the request component at fault
     * @param message one line naming the value and what is allowed
     */
    public StarRequestException(Component component, String message) {
        super(message);
        this.component = component;
    }

    /** @return the request component at fault */
    public Component component() {
        return component;
    }
}
