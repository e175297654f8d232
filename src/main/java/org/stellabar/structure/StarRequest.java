package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.Locale;
import java.util.Objects;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.structure.StarRequestException.Component;

/**
 * What star to build. Quantities not given are {@code NaN}. Validated here, so that a builder
 * never sees an impossible request:
 *
 * <ul>
 *   <li>every kind: M &gt; 0; if R is given, R &gt; (9/4)GM/c², Buchdahl's bound below which
 *       no static star exists in general relativity (Buchdahl 1959, Phys. Rev. 116, 1027);</li>
 *   <li>{@link StarKind#standard}: R given; n absent or 3;</li>
 *   <li>{@link StarKind#polytrope}: R given; 0 ≤ n &lt; 5 (no finite radius from n = 5 on);</li>
 *   <li>{@link StarKind#isentropic}: exactly one of R, T_c and the entropy per baryon; no n.</li>
 * </ul>
 *
 * @param name a short label for titles and file names, e.g. "model" or a star's name
 * @param kind the kind of model
 * @param mass total mass M [g]
 * @param radius radius R [cm], or NaN
 * @param composition the mixture
 * @param index polytropic index n (3 for the standard model), or NaN for an isentropic star
 * @param centralTemperature central temperature T_c [K] of an isentropic star, or NaN
 * @param entropyPerBaryon entropy per baryon s m_u/k_B of an isentropic star, or NaN
 * @param points number of profile rows, in [{@link #MIN_POINTS}, {@link #MAX_POINTS}]
 */
public record StarRequest(String name, StarKind kind, double mass, double radius, Composition composition,
        double index, double centralTemperature, double entropyPerBaryon, int points) {

    /** Label of a request that was not given one. */
    public static final String DEFAULT_NAME = "model";
    /** Profile rows when none are asked for. */
    public static final int DEFAULT_POINTS = 200;
    /** Fewest profile rows: centre, one interior point, surface. */
    public static final int MIN_POINTS = 3;
    /** Most profile rows (about 13 MB of doubles). */
    public static final int MAX_POINTS = 100_000;
    /** Largest polytropic index with a finite radius lies just below this. */
    public static final double INDEX_LIMIT = 5.0;

    public StarRequest {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(composition, "composition");
        if (!(mass > 0.0) || !Double.isFinite(mass)) {
            throw new StarRequestException(Component.mass, String.format(Locale.ROOT,
                    "mass M = %s g is not allowed; it must be positive and finite", mass));
        }
        if (!Double.isNaN(radius)) {
            if (!(radius > 0.0) || !Double.isFinite(radius)) {
                throw new StarRequestException(Component.radius, String.format(Locale.ROOT,
                        "radius R = %s cm is not allowed; it must be positive and finite", radius));
            }
            double buchdahl = buchdahlRadius(mass);
            if (radius <= buchdahl) {
                throw new StarRequestException(Component.radius, String.format(Locale.ROOT,
                        "radius R = %.6g cm (%.6g Rsun) is at or inside the Buchdahl bound 9GM/(4c^2) = %.6g cm"
                                + " for M = %.6g Msun; no static star is that compact", radius,
                        radius / SOLAR_RADIUS, buchdahl, mass / SOLAR_MASS));
            }
        }
        if (points < MIN_POINTS || points > MAX_POINTS) {
            throw new StarRequestException(Component.points, "profile points " + points + " is not allowed; give "
                    + MIN_POINTS + " to " + MAX_POINTS);
        }
        switch (kind) {
            case standard -> {
                requireRadius(kind, radius);
                if (!Double.isNaN(index) && index != 3.0) {
                    throw new StarRequestException(Component.index, "polytropic index n = " + index
                            + " does not fit the standard model, which is n = 3; use kind polytrope for other n");
                }
                index = 3.0;
                requireAbsent(kind, "central temperature", Component.centralTemperature, centralTemperature);
                requireAbsent(kind, "entropy per baryon", Component.entropy, entropyPerBaryon);
            }
            case polytrope -> {
                requireRadius(kind, radius);
                checkIndex(index);
                requireAbsent(kind, "central temperature", Component.centralTemperature, centralTemperature);
                requireAbsent(kind, "entropy per baryon", Component.entropy, entropyPerBaryon);
            }
            case isentropic -> {
                if (!Double.isNaN(index)) {
                    throw new StarRequestException(Component.index, "polytropic index n = " + index
                            + " does not apply to an isentropic star, whose structure follows from the EOS;"
                            + " leave it out");
                }
                int given = (Double.isNaN(radius) ? 0 : 1) + (Double.isNaN(centralTemperature) ? 0 : 1)
                        + (Double.isNaN(entropyPerBaryon) ? 0 : 1);
                if (given != 1) {
                    throw new StarRequestException(Component.kind, "an isentropic star needs exactly one of radius,"
                            + " central temperature and entropy per baryon besides the mass; " + given
                            + " were given");
                }
                if (!Double.isNaN(centralTemperature) && !(centralTemperature >= EosInversion.T_SEARCH_MIN
                        && centralTemperature <= EosInversion.T_SEARCH_MAX)) {
                    throw new StarRequestException(Component.centralTemperature, String.format(Locale.ROOT,
                            "central temperature T_c = %s K is outside [%.0e, %.0e] K, the range of the EOS"
                                    + " inversions", centralTemperature, EosInversion.T_SEARCH_MIN,
                            EosInversion.T_SEARCH_MAX));
                }
                if (!Double.isNaN(entropyPerBaryon) && !(entropyPerBaryon > 0.0 && Double.isFinite(entropyPerBaryon))) {
                    throw new StarRequestException(Component.entropy, "entropy per baryon " + entropyPerBaryon
                            + " k_B is not allowed; it must be positive and finite");
                }
            }
            default -> throw new IllegalStateException("unknown kind " + kind);
        }
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return a standard-model request with the default number of points
     */
    public static StarRequest standard(double mass, double radius, Composition composition) {
        return new StarRequest(DEFAULT_NAME, StarKind.standard, mass, radius, composition, 3.0, Double.NaN, Double.NaN,
                DEFAULT_POINTS);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @param index polytropic index n, 0 ≤ n &lt; 5
     * @return a scaled-polytrope request with the default number of points
     */
    public static StarRequest polytrope(double mass, double radius, Composition composition, double index) {
        return new StarRequest(DEFAULT_NAME, StarKind.polytrope, mass, radius, composition, index, Double.NaN, Double.NaN,
                DEFAULT_POINTS);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return an isentropic-star request fixed by mass and radius
     */
    public static StarRequest isentropicWithRadius(double mass, double radius, Composition composition) {
        return new StarRequest(DEFAULT_NAME, StarKind.isentropic, mass, radius, composition, Double.NaN, Double.NaN,
                Double.NaN, DEFAULT_POINTS);
    }

    /**
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @param composition the mixture
     * @return an isentropic-star request fixed by mass and central temperature
     */
    public static StarRequest isentropicWithCentralTemperature(double mass, double centralTemperature,
            Composition composition) {
        return new StarRequest(DEFAULT_NAME, StarKind.isentropic, mass, Double.NaN, composition, Double.NaN,
                centralTemperature, Double.NaN, DEFAULT_POINTS);
    }

    /**
     * @param mass M [g]
     * @param entropyPerBaryon s m_u/k_B
     * @param composition the mixture
     * @return an isentropic-star request fixed by mass and entropy
     */
    public static StarRequest isentropicWithEntropy(double mass, double entropyPerBaryon, Composition composition) {
        return new StarRequest(DEFAULT_NAME, StarKind.isentropic, mass, Double.NaN, composition, Double.NaN, Double.NaN,
                entropyPerBaryon, DEFAULT_POINTS);
    }

    /** @return a copy with this many profile rows */
    public StarRequest withPoints(int profilePoints) {
        return new StarRequest(name, kind, mass, radius, composition, index, centralTemperature, entropyPerBaryon,
                profilePoints);
    }

    /** @return a copy with this label */
    public StarRequest withName(String label) {
        return new StarRequest(label, kind, mass, radius, composition, index, centralTemperature, entropyPerBaryon,
                points);
    }

    /** @return true if the radius is given */
    public boolean hasRadius() {
        return !Double.isNaN(radius);
    }

    /** @return true if the central temperature is given */
    public boolean hasCentralTemperature() {
        return !Double.isNaN(centralTemperature);
    }

    /** @return true if the entropy per baryon is given */
    public boolean hasEntropy() {
        return !Double.isNaN(entropyPerBaryon);
    }

    /**
     * Buchdahl's bound: a static, spherical star in general relativity has R &gt; (9/4)GM/c²
     * (Buchdahl 1959, Phys. Rev. 116, 1027).
     *
     * @param mass M [g]
     * @return (9/4)GM/c² [cm]
     */
    public static double buchdahlRadius(double mass) {
        return 2.25 * GRAVITATION * mass / (SPEED_OF_LIGHT * SPEED_OF_LIGHT);
    }

    private static void requireRadius(StarKind kind, double radius) {
        if (Double.isNaN(radius)) {
            throw new StarRequestException(Component.radius, "a " + kind + " star needs its radius; none was given");
        }
    }

    private static void requireAbsent(StarKind kind, String what, Component component, double value) {
        if (!Double.isNaN(value)) {
            throw new StarRequestException(component, what + " " + value + " does not apply to kind " + kind
                    + " (its structure is fixed by M, R and n); it is for kind isentropic");
        }
    }

    private static void checkIndex(double n) {
        if (Double.isNaN(n)) {
            throw new StarRequestException(Component.index, "a polytrope needs its index n; none was given"
                    + " (allowed 0 <= n < 5)");
        }
        if (!(n >= 0.0 && n < INDEX_LIMIT)) {
            throw new StarRequestException(Component.index, "polytropic index n = " + n + " is not allowed;"
                    + (n >= INDEX_LIMIT ? " from n = 5 on theta never reaches zero and the radius is infinite;" : "")
                    + " allowed 0 <= n < 5");
        }
    }
}
