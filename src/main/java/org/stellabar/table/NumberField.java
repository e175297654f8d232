package org.stellabar.table;

import java.util.Objects;

/**
 * A finite number with its unit. Non-finite values are refused here, so that no writer ever has
 * to decide how to print NaN or Infinity.
 *
 * @param name ASCII identifier
 * @param value the value, finite
 * @param unit unit string (see the package documentation), "" if dimensionless
 * @param description one line
 */
public record NumberField(String name, double value, String unit, String description) implements Field {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name ASCII identifier
     * @param value the value, finite
     * @param unit unit string (see the package documentation), "" if dimensionless
     * @param description one line
     */
    public NumberField {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit of " + name);
        Objects.requireNonNull(description, "description of " + name);
        if (!Double.isFinite(value)) {
            throw new IllegalStateException("field " + name + " is " + value + "; a summary holds finite numbers only");
        }
    }

    /** @return the field's name, unit and description as a declaration */
    public Quantity quantity() {
        return new Quantity(name, unit, description);
    }

    @Override
    public boolean scalar() {
        return true;
    }
}
