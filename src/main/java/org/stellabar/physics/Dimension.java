package org.stellabar.physics;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The physical dimensions a user may give on input, each with the unit spellings it accepts and
 * their factor to CGS, as the unit table {@link Unit} lists them. The first unit listed is the
 * CGS unit that a bare number means.
 */
public enum Dimension {
    /** A temperature. */
    TEMPERATURE("temperature"),
    /** A density. */
    DENSITY("density"),
    /** A pressure. */
    PRESSURE("pressure"),
    /** A length. */
    LENGTH("length"),
    /** A mass. */
    MASS("mass"),
    /** A energy. */
    ENERGY("energy"),
    /** A specific energy. */
    SPECIFIC_ENERGY("specific energy"),
    /** A specific entropy. */
    SPECIFIC_ENTROPY("specific entropy"),
    /** A time. */
    TIME("time"),
    /** A luminosity. */
    LUMINOSITY("luminosity");

    private final String label;

    Dimension(String label) {
        this.label = label;
    }

    /** @return the human name of the dimension, e.g. "density" */
    public String label() {
        return label;
    }

    /** @return the CGS unit that a bare number means, e.g. "g/cm3" */
    public String cgsUnit() {
        return factors().keySet().iterator().next();
    }

    /** @return accepted unit spellings in a stable order (the order of {@link Unit}), mapped to their factor to CGS */
    public Map<String, Double> factors() {
        return Spellings.BY_DIMENSION.get(this);
    }

    /** @return the accepted units as "K, MK" for error messages */
    public String acceptedUnits() {
        return String.join(", ", factors().keySet());
    }

    /**
     * The spellings read from {@link Unit} on first use: Unit's constants name a Dimension, so the
     * table is built after both enums exist.
     */
    private static final class Spellings {
        static final Map<Dimension, Map<String, Double>> BY_DIMENSION = build();

        private static Map<Dimension, Map<String, Double>> build() {
            Map<Dimension, Map<String, Double>> all = new EnumMap<>(Dimension.class);
            for (Dimension d : Dimension.values()) {
                Map<String, Double> map = new LinkedHashMap<>();
                for (Unit u : Unit.values()) {
                    if (u.dimension().orElse(null) == d) {
                        for (String spelling : u.inputSpellings()) {
                            map.put(spelling, u.cgsFactor());
                        }
                    }
                }
                all.put(d, Collections.unmodifiableMap(map));
            }
            return all;
        }
    }
}
