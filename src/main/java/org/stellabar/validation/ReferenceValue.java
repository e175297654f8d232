package org.stellabar.validation;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Collectors;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;

/**
 * One row of a reference table: one quantity at one set of parameters, with its tolerance and
 * where it comes from.
 *
 * @param file the table's file name
 * @param line the 1-based line number in the file
 * @param quantity what is compared, e.g. "xi1", "Gamma1"
 * @param parameters the parameters as written ("n" → "3", "M" → "1e8 Msun"), in file order
 * @param printed the reference value exactly as printed in the table
 * @param value the reference value
 * @param unit the unit of the value, "" if dimensionless
 * @param tolerance how far our value may deviate
 * @param provenance where the value comes from
 * @param source the short citation of the row
 */
public record ReferenceValue(String file, int line, String quantity, Map<String, String> parameters, String printed,
        double value, String unit, Tolerance tolerance, Provenance provenance, String source) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param file the table's file name
     * @param line the 1-based line number in the file
     * @param quantity what is compared, e.g. "xi1", "Gamma1"
     * @param parameters the parameters as written ("n" → "3", "M" → "1e8 Msun"), in file order
     * @param printed the reference value exactly as printed in the table
     * @param value the reference value
     * @param unit the unit of the value, "" if dimensionless
     * @param tolerance how far our value may deviate
     * @param provenance where the value comes from
     * @param source the short citation of the row
     */
    public ReferenceValue {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(quantity, "quantity");
        parameters = Collections.unmodifiableMap(new LinkedHashMap<>(parameters));
        Objects.requireNonNull(printed, "printed");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(tolerance, "tolerance");
        Objects.requireNonNull(provenance, "provenance");
        Objects.requireNonNull(source, "source");
    }

    /** @return "file.csv line N", for messages */
    public String where() {
        return file + " line " + line;
    }

    /** @return the parameters as written in the table, "n=3;xi=2", or "" */
    public String parameterText() {
        return parameters.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue())
                .collect(Collectors.joining(";"));
    }

    /**
     * @param name a parameter name
     * @return its value as a plain number
     * @throws BadInputException if the row lacks it or it is not a number
     */
    public double number(String name) {
        return Units.parseNumber(where() + ": parameter " + name, text(name));
    }

    /**
     * @param name a parameter name
     * @param dimension what it measures
     * @return its value converted to CGS ("1e8 Msun" → grams)
     * @throws BadInputException if the row lacks it or it does not parse
     */
    public double quantityParameter(String name, Dimension dimension) {
        return Units.parse(where() + ": parameter " + name, text(name), dimension);
    }

    /**
     * @param name the parameter's name
     * @return true if the row has the parameter
     */
    public boolean has(String name) {
        return parameters.containsKey(name);
    }

    private String text(String name) {
        String text = parameters.get(name);
        if (text == null) {
            throw new BadInputException(where() + ": quantity " + quantity + " needs the parameter " + name
                    + " (parameters given: \"" + parameterText() + "\")");
        }
        return text;
    }
}
