package org.stellabar.physics;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads quantities written by people ("40 Msun", "1.5e7 K", "2 kg/m3", "1e17") into CGS.
 * A bare number is already CGS. This is the only place where units other than CGS are known.
 */
public final class Units {

    private static final Pattern QUANTITY =
            Pattern.compile("\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*");

    private Units() {
    }

    /**
     * Parses a quantity of the given dimension.
     *
     * @param subject the option or key the text came from, named in any error
     * @param text the user's text, a number optionally followed by a unit
     * @param dimension what the quantity must measure
     * @return the value in the CGS unit of {@code dimension}
     * @throws BadInputException for a malformed number, a non-finite value, an unknown unit, or a
     *     unit of another dimension
     */
    public static double parse(String subject, String text, Dimension dimension) {
        try {
            return parseQuantity(text, dimension);
        } catch (BadInputException e) {
            throw prefixed(subject, e);
        }
    }

    private static double parseQuantity(String text, Dimension dimension) {
        if (text == null || text.isBlank()) {
            throw new BadInputException("no value given; expected a " + dimension.label()
                    + " such as '1 " + dimension.cgsUnit() + "' (units: " + dimension.acceptedUnits() + ")");
        }
        Matcher m = QUANTITY.matcher(text);
        if (!m.matches()) {
            throw new BadInputException("'" + text.strip() + "' is not a number with an optional unit;"
                    + " expected e.g. '1 " + dimension.cgsUnit() + "' (units: " + dimension.acceptedUnits() + ")");
        }
        double number = Double.parseDouble(m.group(1));
        String unit = m.group(2);
        double factor = 1.0;
        if (!unit.isEmpty()) {
            Double f = dimension.factors().get(unit);
            if (f == null) {
                throw new BadInputException("unit '" + unit + "' in '" + text.strip() + "' is "
                        + describeUnknown(unit, dimension) + "; a " + dimension.label() + " accepts "
                        + dimension.acceptedUnits());
            }
            factor = f;
        }
        double value = number * factor;
        if (!Double.isFinite(value)) {
            throw new BadInputException("'" + text.strip() + "' overflows; give a finite "
                    + dimension.label());
        }
        return value;
    }

    /**
     * Parses a plain dimensionless number, refusing NaN and infinities.
     *
     * @param subject the option or key the text came from
     * @param text the text
     * @return the number
     */
    public static double parseNumber(String subject, String text) {
        Matcher m = text == null ? null : QUANTITY.matcher(text);
        if (m == null || !m.matches() || !m.group(2).isEmpty()) {
            throw prefixed(subject, new BadInputException("'" + (text == null ? "" : text.strip())
                    + "' is not a finite number"));
        }
        double value = Double.parseDouble(m.group(1));
        if (!Double.isFinite(value)) {
            throw prefixed(subject, new BadInputException("'" + text.strip() + "' is not a finite number"));
        }
        return value;
    }

    /**
     * Converts a CGS value into a named unit of its dimension.
     *
     * @param cgsValue the value in CGS
     * @param unit an accepted spelling of {@code dimension}
     * @param dimension the dimension
     * @return the value expressed in {@code unit}
     */
    public static double toUnit(double cgsValue, String unit, Dimension dimension) {
        Double f = dimension.factors().get(unit);
        if (f == null) {
            throw new BadInputException("unit '" + unit + "' is not a " + dimension.label() + " unit; accepted: "
                    + dimension.acceptedUnits());
        }
        return cgsValue / f;
    }

    /**
     * The error for a unit written alone (a file column's unit) that a quantity of
     * {@code dimension} cannot take: "unit 'furlong' is unknown; a length accepts cm, m, ...".
     *
     * @param subject what the unit was given for, e.g. "--units rho"
     * @param unit the unit as written, or in our spelling when it is a unit of another dimension
     * @param dimension what the quantity measures
     * @return the exception
     */
    public static BadInputException unknownUnit(String subject, String unit, Dimension dimension) {
        return new BadInputException(subject, "unit '" + unit + "' is " + describeUnknown(unit, dimension) + "; a "
                + dimension.label() + " accepts " + dimension.acceptedUnits());
    }

    private static BadInputException prefixed(String subject, BadInputException e) {
        return subject == null || subject.isEmpty() ? e : e.about(subject);
    }

    /** Finds the dimension a unit belongs to, or null. */
    static Dimension dimensionOf(String unit) {
        for (Dimension d : Dimension.values()) {
            if (d.factors().containsKey(unit)) {
                return d;
            }
        }
        return null;
    }

    private static String describeUnknown(String unit, Dimension wanted) {
        Dimension other = dimensionOf(unit);
        if (other != null) {
            return "a unit of " + other.label() + ", not of " + wanted.label();
        }
        for (Map.Entry<String, Double> e : wanted.factors().entrySet()) {
            if (e.getKey().equalsIgnoreCase(unit)) {
                return "unknown (did you mean '" + e.getKey() + "'?)";
            }
        }
        return "unknown";
    }
}
