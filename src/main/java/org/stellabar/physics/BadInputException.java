package org.stellabar.physics;

/**
 * A request that cannot be answered because of what was asked, not because of a fault in the
 * program: an unknown unit, a negative mass, a pressure below the radiation pressure alone, a
 * polytropic index with no finite radius. The message is one line that names the offending
 * input, its value and what is allowed; the command line prints it and exits with status 2.
 */
public class BadInputException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /** @param message one line naming the input, its value and what is allowed */
    public BadInputException(String message) {
        super(message);
    }

    /**
     * The same problem reported under another name, e.g. when a library method's parameter
     * {@code temperature} is an option {@code --temp} on the command line.
     *
     * @param subject name of the input as the user wrote it (option or scenario key)
     * @return a new exception whose message begins with the subject
     */
    public BadInputException about(String subject) {
        return new BadInputException(subject + ": " + getMessage());
    }
}
