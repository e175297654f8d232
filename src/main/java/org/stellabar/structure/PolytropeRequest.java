package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;

/**
 * A Lane-Emden polytrope of index n scaled to a mass and a radius, with T and β from the
 * equation of state at every point.
 *
 * @param name label for titles and file names
 * @param mass total mass M [g], positive
 * @param radius radius R [cm], outside Buchdahl's bound
 * @param index polytropic index n, 0 ≤ n &lt; 5
 * @param composition the mixture
 * @param points profile rows
 * @param electrons which equation of state gives T and β at every point
 */
public record PolytropeRequest(String name, double mass, double radius, double index, Composition composition,
        int points, Electrons electrons) implements StarRequest {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name label for titles and file names
     * @param mass total mass M [g], positive
     * @param radius radius R [cm], outside Buchdahl's bound
     * @param index polytropic index n, 0 ≤ n &lt; 5
     * @param composition the mixture
     * @param points profile rows
     * @param electrons which equation of state treats the electrons
     */
    public PolytropeRequest {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(electrons, "electrons");
        Objects.requireNonNull(composition, "composition");
        StarRequestRules.check().mass(mass).radius(radius, mass).index(index).points(points).throwIfAny();
        index += 0.0; // −0 is 0
    }

    /**
     * A polytrope on the classical mixture.
     *
     * @param name label
     * @param mass M [g]
     * @param radius R [cm]
     * @param index n
     * @param composition the mixture
     * @param points profile rows
     */
    public PolytropeRequest(String name, double mass, double radius, double index, Composition composition,
            int points) {
        this(name, mass, radius, index, composition, points, Electrons.classical);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @param index n, 0 ≤ n &lt; 5
     * @return the request with the default name and points
     */
    public static PolytropeRequest of(double mass, double radius, Composition composition, double index) {
        return new PolytropeRequest(DEFAULT_NAME, mass, radius, index, composition, DEFAULT_POINTS);
    }

    @Override
    public ScaleAnchor anchor() {
        return new ScaleAnchor.Radius(radius);
    }

    @Override
    public StarKind kind() {
        return StarKind.polytrope;
    }

    @Override
    public PolytropeRequest withPoints(int profilePoints) {
        return new PolytropeRequest(name, mass, radius, index, composition, profilePoints, electrons);
    }
}
