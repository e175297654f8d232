package org.stellabar.physics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The physical dimensions a user may give on input, each with the unit spellings it accepts and
 * their factor to CGS. The first unit listed is the CGS unit that a bare number means.
 */
public enum Dimension {
    TEMPERATURE("temperature", units("K", 1.0, "MK", 1e6)),
    DENSITY("density", units("g/cm3", 1.0, "g/cm^3", 1.0, "g cm-3", 1.0, "kg/m3", 1e-3, "kg/m^3", 1e-3,
            "kg m-3", 1e-3)),
    PRESSURE("pressure", units("dyn/cm2", 1.0, "dyn/cm^2", 1.0, "dyn cm-2", 1.0, "erg/cm3", 1.0,
            "Pa", 10.0, "bar", 1e6)),
    LENGTH("length", units("cm", 1.0, "m", 100.0, "km", 1e5, "Rsun", Constants.SOLAR_RADIUS,
            "au", Constants.ASTRONOMICAL_UNIT)),
    MASS("mass", units("g", 1.0, "kg", 1000.0, "Msun", Constants.SOLAR_MASS)),
    ENERGY("energy", units("erg", 1.0, "J", 1e7)),
    SPECIFIC_ENERGY("specific energy", units("erg/g", 1.0, "J/kg", 1e4)),
    SPECIFIC_ENTROPY("specific entropy", units("erg/g/K", 1.0, "J/kg/K", 1e4)),
    TIME("time", units("s", 1.0, "yr", Constants.JULIAN_YEAR)),
    LUMINOSITY("luminosity", units("erg/s", 1.0, "W", 1e7, "Lsun", Constants.SOLAR_LUMINOSITY));

    private final String label;
    private final Map<String, Double> factors;

    Dimension(String label, Map<String, Double> factors) {
        this.label = label;
        this.factors = factors;
    }

    /** @return the human name of the dimension, e.g. "density" */
    public String label() {
        return label;
    }

    /** @return the CGS unit that a bare number means, e.g. "g/cm3" */
    public String cgsUnit() {
        return factors.keySet().iterator().next();
    }

    /** @return accepted unit spellings in a stable order, mapped to their factor to CGS */
    public Map<String, Double> factors() {
        return factors;
    }

    /** @return the accepted units as "K, MK" for error messages */
    public String acceptedUnits() {
        return String.join(", ", factors.keySet());
    }

    private static Map<String, Double> units(Object... pairs) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            map.put((String) pairs[i], (Double) pairs[i + 1]);
        }
        return Collections.unmodifiableMap(map);
    }
}
