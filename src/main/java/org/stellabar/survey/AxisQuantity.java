package org.stellabar.survey;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.Optional;
import org.stellabar.physics.Dimension;
import org.stellabar.table.Quantity;

/**
 * What a survey axis sweeps: one input of a star model. The word is the axis's key in a survey
 * file ({@code [survey.axes.mass]}); {@link #column} is how the swept value appears in the
 * survey table, in the unit astronomers quote it in (solar masses and radii, K, k_B, mass
 * fractions).
 */
public enum AxisQuantity {
    /** total mass M */
    mass(Optional.of(Dimension.MASS), SOLAR_MASS,
            new Quantity("input_M", "Msun", "swept total mass in nominal solar masses")),
    /** radius R (standard models and polytropes; an anchor of isentropic stars) */
    radius(Optional.of(Dimension.LENGTH), SOLAR_RADIUS,
            new Quantity("input_R", "Rsun", "swept radius in nominal solar radii")),
    /** central temperature T_c (an anchor of isentropic stars) */
    central_temperature(Optional.of(Dimension.TEMPERATURE), 1.0,
            new Quantity("input_T_c", "K", "swept central temperature")),
    /** entropy per baryon s m_u/k_B (an anchor of isentropic stars) */
    entropy_per_baryon(Optional.empty(), 1.0,
            new Quantity("input_s_per_baryon", "", "swept entropy per baryon in units of k_B")),
    /** hydrogen mass fraction X (Y follows from X + Y + Z = 1) */
    X(Optional.empty(), 1.0, new Quantity("input_X", "", "swept hydrogen mass fraction")),
    /** metal mass fraction Z (Y follows from X + Y + Z = 1) */
    Z(Optional.empty(), 1.0, new Quantity("input_Z", "", "swept metal mass fraction"));

    private final Optional<Dimension> dimension;
    private final double displayUnitInCgs;
    private final Quantity column;

    AxisQuantity(Optional<Dimension> dimension, double displayUnitInCgs, Quantity column) {
        this.dimension = dimension;
        this.displayUnitInCgs = displayUnitInCgs;
        this.column = column;
    }

    /** @return the word of the axis in a survey file */
    public String word() {
        return name();
    }

    /** @return the physical dimension of the values (units allowed), or empty for a pure number */
    public Optional<Dimension> dimension() {
        return dimension;
    }

    /** @return the column of the swept value in the survey table */
    public Quantity column() {
        return column;
    }

    /**
     * @param cgs a value in CGS (or a pure number)
     * @return the value in the column's unit
     */
    public double toDisplay(double cgs) {
        if (displayUnitInCgs == 1.0) {
            return cgs;
        }
        // "1e6 Msun" went to grams and back: 12 significant digits read 1000000.0, not 999999.9999999999
        return new java.math.BigDecimal(cgs / displayUnitInCgs).round(new java.math.MathContext(12)).doubleValue();
    }
}
