package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;

/**
 * A star in hydrostatic equilibrium on one adiabat of the gas + radiation mixture, fixed by its
 * mass and one anchor (radius, central temperature or entropy per baryon).
 *
 * @param name label for titles and file names
 * @param mass total mass M [g], positive
 * @param anchor what fixes the scale besides M
 * @param composition the mixture
 * @param points profile rows
 * @param electrons which equation of state the adiabat belongs to
 */
public record IsentropicRequest(String name, double mass, ScaleAnchor anchor, Composition composition,
        int points, Electrons electrons) implements StarRequest {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name label for titles and file names
     * @param mass total mass M [g], positive
     * @param anchor what fixes the scale besides M
     * @param composition the mixture
     * @param points profile rows
     * @param electrons which equation of state treats the electrons
     */
    public IsentropicRequest {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(electrons, "electrons");
        Objects.requireNonNull(anchor, "anchor");
        Objects.requireNonNull(composition, "composition");
        StarRequestRules rules = StarRequestRules.check().mass(mass).points(points);
        anchor.check(rules, mass);
        rules.throwIfAny();
    }

    /**
     * An isentropic star of the classical mixture.
     *
     * @param name label
     * @param mass M [g]
     * @param anchor what fixes the scale
     * @param composition the mixture
     * @param points profile rows
     */
    public IsentropicRequest(String name, double mass, ScaleAnchor anchor, Composition composition, int points) {
        this(name, mass, anchor, composition, points, Electrons.classical);
    }

    /**
     * @param mass M [g]
     * @param anchor what fixes the scale
     * @param composition the mixture
     * @return the request with the default name and points
     */
    public static IsentropicRequest of(double mass, ScaleAnchor anchor, Composition composition) {
        return new IsentropicRequest(DEFAULT_NAME, mass, anchor, composition, DEFAULT_POINTS);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return an isentropic star fixed by mass and radius, with the default name and points
     */
    public static IsentropicRequest withRadius(double mass, double radius, Composition composition) {
        return of(mass, new ScaleAnchor.Radius(radius), composition);
    }

    /**
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @param composition the mixture
     * @return an isentropic star fixed by mass and central temperature
     */
    public static IsentropicRequest withCentralTemperature(double mass, double centralTemperature,
            Composition composition) {
        return of(mass, new ScaleAnchor.CentralTemperature(centralTemperature), composition);
    }

    /**
     * @param mass M [g]
     * @param entropyPerBaryon s m_u/k_B
     * @param composition the mixture
     * @return an isentropic star fixed by mass and entropy per baryon
     */
    public static IsentropicRequest withEntropy(double mass, double entropyPerBaryon, Composition composition) {
        return of(mass, new ScaleAnchor.Entropy(entropyPerBaryon), composition);
    }

    @Override
    public StarKind kind() {
        return StarKind.isentropic;
    }

    @Override
    public IsentropicRequest withPoints(int profilePoints) {
        return new IsentropicRequest(name, mass, anchor, composition, profilePoints, electrons);
    }
}
