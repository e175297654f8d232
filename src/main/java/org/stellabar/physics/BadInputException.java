package org.stellabar.physics;

import java.util.Objects;

/**
 * A request that cannot be answered because of what was asked, not because of a fault in the
 * program: an unknown unit, a negative mass, a pressure below the radiation pressure alone, a
 * polytropic index with no finite radius. The message is one line that names the offending
 * input, its value and what is allowed; the command line prints it and exits with status 2.
 *
 * <p>A message has two parts, kept apart so that nobody edits a message after the fact: the
 * subject (the input as the caller knows it: "mass range", later "--mass-range") and the detail
 * (what is wrong). {@link #about(String)} names the subject as the user wrote it and keeps the
 * detail. The detail comes from a small set of message formats:
 *
 * <ul>
 *   <li>{@link #notAllowed(String, double, String, String)}: "density = -1.0 g/cm3 is not allowed;
 *       it must be positive and finite"</li>
 *   <li>{@link #mustBePositive(String, double, String)}: the same with the usual allowance</li>
 *   <li>{@link #notAllowed(String, long, String)}: "profile points 2 is not allowed; give 3 to
 *       100000"</li>
 * </ul>
 */
public class BadInputException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /** What is allowed of a quantity that must be positive and finite. */
    public static final String POSITIVE_AND_FINITE = "it must be positive and finite";

    /** The input the problem is about, "" when the detail names it. */
    private final String subject;
    /** One line: the value and what is allowed. */
    private final String detail;

    /** @param message one line naming the input, its value and what is allowed */
    public BadInputException(String message) {
        this("", message);
    }

    /**
     * @param subject the input the problem is about, "" when the detail names it
     * @param detail one line: the value and what is allowed
     */
    public BadInputException(String subject, String detail) {
        super(subject.isEmpty() ? detail : subject + ": " + detail);
        this.subject = subject;
        this.detail = Objects.requireNonNull(detail, "detail");
    }

    /**
     * "{@code what} = {@code value} {@code unit} is not allowed; {@code allowed}".
     *
     * @param what the quantity, e.g. "density" or "mass M"
     * @param value the value given, in {@code unit}
     * @param unit its unit, "" for none
     * @param allowed what is allowed, e.g. "give 0 &lt;= X &lt;= 1"
     * @return the exception
     */
    public static BadInputException notAllowed(String what, double value, String unit, String allowed) {
        return new BadInputException(what + " = " + value + (unit.isEmpty() ? "" : " " + unit) + " is not allowed; "
                + allowed);
    }

    /**
     * "{@code what} {@code value} is not allowed; {@code allowed}", for a count.
     *
     * @param what the count, e.g. "profile points"
     * @param value the value given
     * @param allowed what is allowed, e.g. "give 3 to 100000"
     * @return the exception
     */
    public static BadInputException notAllowed(String what, long value, String allowed) {
        return new BadInputException(what + " " + value + " is not allowed; " + allowed);
    }

    /**
     * {@link #notAllowed(String, double, String, String)} with "it must be positive and finite".
     *
     * @param what the quantity
     * @param value the value given, in {@code unit}
     * @param unit its unit, "" for none
     * @return the exception
     */
    public static BadInputException mustBePositive(String what, double value, String unit) {
        return notAllowed(what, value, unit, POSITIVE_AND_FINITE);
    }

    /** @return the input the problem is about, "" when the detail names it */
    public String subject() {
        return subject;
    }

    /** @return the problem without the subject */
    public String detail() {
        return detail;
    }

    /**
     * The same problem reported under another name, e.g. when a library method's parameter
     * {@code temperature} is an option {@code --temp} on the command line. The new subject
     * replaces the old one; the detail is kept as it was built.
     *
     * @param newSubject name of the input as the user wrote it (option or scenario key)
     * @return a new exception whose message begins with the subject
     */
    public BadInputException about(String newSubject) {
        return new BadInputException(newSubject, detail);
    }
}
