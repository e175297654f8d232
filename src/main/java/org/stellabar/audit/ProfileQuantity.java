package org.stellabar.audit;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.stellabar.physics.Dimension;

/**
 * The quantities an audit reads from a profile, each under a short key used in {@code --columns}
 * and {@code --units}, with the column name that stellabar's own profiles use for it and its
 * dimension (null for a dimensionless quantity).
 */
public enum ProfileQuantity {
    /** Radius of the shell [cm]. */
    RADIUS("r", "radius", Dimension.LENGTH, false),
    /** Mass inside the shell [g]. */
    MASS("m", "enclosed mass", Dimension.MASS, false),
    /** Density [g/cm3]. Required. */
    DENSITY("rho", "density", Dimension.DENSITY, true),
    /** Temperature [K]. Required. */
    TEMPERATURE("T", "temperature", Dimension.TEMPERATURE, true),
    /** Total pressure [dyn/cm2], compared with ours. */
    PRESSURE("P", "pressure", Dimension.PRESSURE, false),
    /** Hydrogen mass fraction. */
    HYDROGEN("X", "hydrogen mass fraction", null, false),
    /** Helium mass fraction. */
    HELIUM("Y", "helium mass fraction", null, false),
    /** Metal mass fraction. */
    METALS("Z", "metal mass fraction", null, false),
    /** First adiabatic exponent, compared with ours. */
    GAMMA1("Gamma1", "first adiabatic exponent", null, false);

    private final String key;
    private final String label;
    private final Dimension dimension;
    private final boolean required;

    ProfileQuantity(String key, String label, Dimension dimension, boolean required) {
        this.key = key;
        this.label = label;
        this.dimension = dimension;
        this.required = required;
    }

    /** @return the key in {@code --columns} and {@code --units}, also the column name of our own profiles */
    public String key() {
        return key;
    }

    /** @return what the quantity is, for messages */
    public String label() {
        return label;
    }

    /** @return its dimension, or null for a dimensionless quantity */
    public Dimension dimension() {
        return dimension;
    }

    /** @return true if an audit cannot run without it */
    public boolean required() {
        return required;
    }

    /**
     * @param key a key as typed
     * @return the quantity, or null for an unknown key
     */
    public static ProfileQuantity ofKey(String key) {
        for (ProfileQuantity q : values()) {
            if (q.key.equals(key)) {
                return q;
            }
        }
        // forgiving about case only where it is unambiguous (t, p, x, y, z, gamma1)
        ProfileQuantity found = null;
        for (ProfileQuantity q : values()) {
            if (q.key.toLowerCase(Locale.ROOT).equals(key.toLowerCase(Locale.ROOT))) {
                if (found != null) {
                    return null;
                }
                found = q;
            }
        }
        return found;
    }

    /** @return "r, m, rho, T, P, X, Y, Z, Gamma1" for messages */
    public static String keys() {
        return Arrays.stream(values()).map(ProfileQuantity::key).collect(Collectors.joining(", "));
    }
}
