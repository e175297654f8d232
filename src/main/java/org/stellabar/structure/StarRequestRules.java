package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.stellabar.eos.EosInversion;
import org.stellabar.structure.StarRequestException.Component;
import org.stellabar.structure.StarRequestException.Problem;
import org.stellabar.structure.StarRequestException.Violation;

/**
 * The value rules of a star request, written once: each method checks one input and records a
 * {@link Violation} instead of throwing, so that every broken rule of a request is reported at
 * once. Messages name the value, its unit and the allowed range.
 *
 * <ul>
 *   <li>M &gt; 0 and finite;</li>
 *   <li>R &gt; (9/4)GM/c², Buchdahl's bound below which no static star exists in general
 *       relativity (Buchdahl 1959, Phys. Rev. 116, 1027);</li>
 *   <li>0 ≤ n &lt; 5 (from n = 5 on the Lane-Emden θ never reaches zero);</li>
 *   <li>T_c inside the temperature range the EOS inversions search;</li>
 *   <li>entropy per baryon &gt; 0 and finite;</li>
 *   <li>profile points in [{@link StarRequest#MIN_POINTS}, {@link StarRequest#MAX_POINTS}].</li>
 * </ul>
 */
public final class StarRequestRules {

    /** Lowest mass of a star model [Msun] (the same bound as a standard-model sequence). */
    public static final double MIN_MASS_MSUN = 1e-3;
    /** Highest mass of a star model [Msun]. */
    public static final double MAX_MASS_MSUN = 1e12;
    /** Largest radius of a star model [Rsun]. */
    public static final double MAX_RADIUS_RSUN = 1e9;


    private final List<Violation> violations = new ArrayList<>();

    private StarRequestRules() {
    }

    /** @return an empty check */
    public static StarRequestRules check() {
        return new StarRequestRules();
    }

    /**
     * @param mass M [g]
     * @return this check
     */
    public StarRequestRules mass(double mass) {
        if (!(mass > 0.0 && Double.isFinite(mass))) {
            outOfRange(Component.mass, String.format(Locale.US,
                    "mass M = %s g is not allowed; it must be positive and finite", mass));
        } else if (mass < MIN_MASS_MSUN * SOLAR_MASS || mass > MAX_MASS_MSUN * SOLAR_MASS) {
            outOfRange(Component.mass, String.format(Locale.US,
                    "mass M = %.6g Msun is outside the supported %.0e..%.0e Msun: from well below the"
                    + " hydrogen-burning limit to beyond supermassive stars (outside it the structure"
                    + " solvers leave the range of double precision)", mass / SOLAR_MASS, MIN_MASS_MSUN,
                    MAX_MASS_MSUN));
        }
        return this;
    }

    /**
     * @param radius R [cm]
     * @param mass M [g], for Buchdahl's bound (skipped when M itself is not allowed)
     * @return this check
     */
    public StarRequestRules radius(double radius, double mass) {
        if (!(radius > 0.0 && Double.isFinite(radius))) {
            outOfRange(Component.radius, String.format(Locale.US,
                    "radius R = %s cm is not allowed; it must be positive and finite", radius));
        } else if (mass > 0.0 && Double.isFinite(mass) && radius <= buchdahlRadius(mass)) {
            outOfRange(Component.radius, String.format(Locale.US,
                    "radius R = %.6g cm (%.6g Rsun) is at or inside the Buchdahl bound 9GM/(4c^2) = %.6g cm"
                            + " for M = %.6g Msun; no static star is that compact", radius,
                    radius / SOLAR_RADIUS, buchdahlRadius(mass), mass / SOLAR_MASS));
        } else if (radius > MAX_RADIUS_RSUN * SOLAR_RADIUS) {
            outOfRange(Component.radius, String.format(Locale.US,
                    "radius R = %.6g Rsun is above the supported %.0e Rsun (tens of parsecs: no star is that large,"
                            + " and the densities of such a model leave the range of double precision)",
                    radius / SOLAR_RADIUS, MAX_RADIUS_RSUN));
        }
        return this;
    }

    /**
     * @param n polytropic index
     * @return this check
     */
    public StarRequestRules index(double n) {
        if (!(n >= 0.0 && n < StarRequest.INDEX_LIMIT)) {
            outOfRange(Component.index, "polytropic index n = " + n + " is not allowed;"
                    + (n >= StarRequest.INDEX_LIMIT ? " from n = 5 on theta never reaches zero and the radius is"
                            + " infinite;" : "") + " allowed 0 <= n < 5");
        }
        return this;
    }

    /**
     * @param centralTemperature T_c [K]
     * @return this check
     */
    public StarRequestRules centralTemperature(double centralTemperature) {
        if (!(centralTemperature >= EosInversion.T_SEARCH_MIN && centralTemperature <= EosInversion.T_SEARCH_MAX)) {
            outOfRange(Component.centralTemperature, String.format(Locale.US,
                    "central temperature T_c = %s K is outside [%.0e, %.0e] K, the range of the EOS inversions",
                    centralTemperature, EosInversion.T_SEARCH_MIN, EosInversion.T_SEARCH_MAX));
        }
        return this;
    }

    /**
     * @param entropyPerBaryon s m_u/k_B
     * @return this check
     */
    public StarRequestRules entropy(double entropyPerBaryon) {
        if (!(entropyPerBaryon > 0.0 && Double.isFinite(entropyPerBaryon))) {
            outOfRange(Component.entropy, "entropy per baryon " + entropyPerBaryon
                    + " k_B is not allowed; it must be positive and finite");
        }
        return this;
    }

    /**
     * @param points profile rows
     * @return this check
     */
    public StarRequestRules points(long points) {
        if (points < StarRequest.MIN_POINTS || points > StarRequest.MAX_POINTS) {
            outOfRange(Component.points, "profile points " + points + " is not allowed; give "
                    + StarRequest.MIN_POINTS + " to " + StarRequest.MAX_POINTS
                    + (points > StarRequest.MAX_POINTS ? " (more is far beyond what a smooth profile needs)"
                            : " (a centre, an interior point and a surface at least)"));
        }
        return this;
    }

    /**
     * Records a violation found elsewhere (which inputs a kind takes).
     *
     * @param violation the problem
     * @return this check
     */
    StarRequestRules add(Violation violation) {
        violations.add(violation);
        return this;
    }

    /** @return the violations found so far */
    public List<Violation> violations() {
        return List.copyOf(violations);
    }

    /** @throws StarRequestException with every violation, if there is any */
    public void throwIfAny() {
        if (!violations.isEmpty()) {
            throw new StarRequestException(violations);
        }
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

    private void outOfRange(Component component, String message) {
        violations.add(new Violation(component, Problem.OUT_OF_RANGE, message));
    }
}
