package org.stellabar.table;

import java.util.Objects;

/**
 * The declaration of a numeric column or summary field: its name, unit and one-line meaning,
 * written once as a constant beside the code that computes the quantity and used by every table,
 * summary, writer and chart that shows it. A declaration holds no values.
 *
 * <p>Declare and use:
 *
 * <pre>{@code
 * public static final Quantity RHO = new Quantity("rho", "g/cm3", "density");
 * public static final Quantity BETA = Quantity.dimensionless("beta", "gas pressure fraction P_gas/P");
 *
 * new Table.Builder("profile", metadata).number(RHO, rho).number(BETA, beta).build();
 * new Summary.Builder("state", metadata).number(RHO, state.rho()).build();
 * double[] beta = table.numbers(BETA).values();
 * }</pre>
 *
 * <p>Where one table needs the same quantity under a different name or with a sharper meaning
 * (the central density of a star, a mass fraction implied by μ), derive it with
 * {@link #withName} or {@link #withDescription} rather than repeating the unit.
 *
 * @param name ASCII identifier, the column name and JSON key, e.g. "rho", "one_minus_beta"
 * @param unit unit string in the table spelling (see the package documentation), "" if
 *     dimensionless
 * @param description one line saying what the quantity is
 * @param integer whether the values are whole numbers (a bit mask, a flag, a row number): every
 *     format then writes them as integers (CSV "32", ECSV int64, FITS J or K), never as "32.0"
 */
public record Quantity(String name, String unit, String description, boolean integer) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name ASCII identifier, the column name and JSON key, e.g. "rho", "one_minus_beta"
     * @param unit unit string in the table spelling (see the package documentation), "" if
     *        dimensionless
     * @param description one line saying what the quantity is
     * @param integer whether its values are whole numbers, written as integers
     */
    public Quantity {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit of " + name);
        Objects.requireNonNull(description, "description of " + name);
        if (name.isBlank()) {
            throw new IllegalArgumentException("a quantity needs a name");
        }
    }

    /**
     * A quantity of real values.
     *
     * @param name ASCII identifier
     * @param unit unit string, "" if dimensionless
     * @param description one line
     */
    public Quantity(String name, String unit, String description) {
        this(name, unit, description, false);
    }

    /**
     * @param name ASCII identifier
     * @param description one line
     * @return a dimensionless quantity whose values are whole numbers (a count, a bit mask, a
     *     0/1 flag, a row number)
     */
    public static Quantity integer(String name, String description) {
        return new Quantity(name, "", description, true);
    }

    /**
     * @param name ASCII identifier
     * @param description one line
     * @return a quantity without a unit
     */
    public static Quantity dimensionless(String name, String description) {
        return new Quantity(name, "", description);
    }

    /**
     * @param newName the column or field name
     * @return the same quantity under another name, e.g. "rho_c" for the central density
     */
    public Quantity withName(String newName) {
        return new Quantity(newName, unit, description, integer);
    }

    /**
     * @param newDescription one line: what the values mean
     * @return the same quantity with another one-line meaning
     */
    public Quantity withDescription(String newDescription) {
        return new Quantity(name, unit, newDescription, integer);
    }

    /**
     * @param value a finite value in this quantity's unit
     * @return the summary field
     */
    public NumberField field(double value) {
        return new NumberField(name, value, unit, description);
    }

    /**
     * @param values finite values in this quantity's unit, copied; whole numbers if the quantity
     *     is {@link #integer()}
     * @return the column
     */
    public NumberColumn column(double[] values) {
        return new NumberColumn(name, unit, description, values, integer);
    }
}
