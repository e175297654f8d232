package org.stellabar.audit;

import java.util.Map;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;

/**
 * Turns a column's unit text into a factor to CGS. Our own spellings go through
 * {@link Units}; the spellings of the FITS standard (Pence et al. 2010, A&amp;A 524, A42, §4.3,
 * and the IAU-recognised solar units solMass, solRad) that astropy writes are mapped onto ours
 * first. A dimensionless quantity accepts no unit, "" or "1".
 */
final class UnitSpelling {

    /** FITS-standard spellings → ours. */
    private static final Map<String, String> FITS_ALIASES = Map.ofEntries(
            Map.entry("solMass", "Msun"), Map.entry("solRad", "Rsun"), Map.entry("Ba", "dyn/cm2"),
            Map.entry("g.cm-3", "g/cm3"), Map.entry("g.cm**-3", "g/cm3"), Map.entry("g cm**-3", "g/cm3"),
            Map.entry("kg.m-3", "kg/m3"), Map.entry("kg m**-3", "kg/m3"), Map.entry("dyn.cm-2", "dyn/cm2"),
            Map.entry("dyn cm**-2", "dyn/cm2"), Map.entry("erg.cm-3", "erg/cm3"), Map.entry("erg cm-3", "erg/cm3"),
            Map.entry("J.m-3", "Pa"), Map.entry("J m-3", "Pa"), Map.entry("N m-2", "Pa"), Map.entry("AU", "au"));

    private UnitSpelling() {
    }

    /**
     * @param quantity the quantity the column holds
     * @param unit the unit text
     * @param subject what to name in an error, e.g. "--units rho" or "column 'density' (header)"
     * @return the factor that turns the column's numbers into CGS
     * @throws BadInputException for an unknown unit or one of another dimension
     */
    static double factor(ProfileQuantity quantity, String unit, String subject) {
        String u = unit.strip();
        Dimension d = quantity.dimension();
        if (d == null) {
            if (u.isEmpty() || u.equals("1")) {
                return 1.0;
            }
            throw new BadInputException(subject + ": unit '" + u + "' given for " + quantity.key() + " ("
                    + quantity.label() + "), which is dimensionless; leave its unit empty");
        }
        if (u.isEmpty()) {
            return 1.0;
        }
        String ours = FITS_ALIASES.getOrDefault(u, u);
        try {
            return Units.parse(null, "1 " + ours, d);
        } catch (BadInputException e) {
            // Units quotes the whole quantity ('1 furlong'); here only the unit was typed
            throw new BadInputException(subject + ": " + e.getMessage().replace(" in '1 " + ours + "'", ""));
        }
    }

    /**
     * @param quantity a quantity
     * @param unit a unit text already accepted by {@link #factor}
     * @return the unit in our spelling ("" for CGS given as no unit: the CGS unit itself)
     */
    static String ourSpelling(ProfileQuantity quantity, String unit) {
        String u = unit.strip();
        if (quantity.dimension() == null) {
            return "";
        }
        if (u.isEmpty()) {
            return quantity.dimension().cgsUnit();
        }
        return FITS_ALIASES.getOrDefault(u, u);
    }
}
