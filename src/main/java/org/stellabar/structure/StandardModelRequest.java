package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.eos.Composition;

/**
 * Eddington's standard model (n = 3, β constant) scaled to a mass and a radius.
 *
 * @param name label for titles and file names
 * @param mass total mass M [g], positive
 * @param radius radius R [cm], outside Buchdahl's bound
 * @param composition the mixture
 * @param points profile rows
 */
public record StandardModelRequest(String name, double mass, double radius, Composition composition, int points)
        implements StarRequest {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param name label for titles and file names
     * @param mass total mass M [g], positive
     * @param radius radius R [cm], outside Buchdahl's bound
     * @param composition the mixture
     * @param points profile rows
     */
    public StandardModelRequest {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(composition, "composition");
        StarRequestRules.check().mass(mass).radius(radius, mass).points(points).throwIfAny();
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return the request with the default name and points
     */
    public static StandardModelRequest of(double mass, double radius, Composition composition) {
        return new StandardModelRequest(DEFAULT_NAME, mass, radius, composition, DEFAULT_POINTS);
    }

    @Override
    public ScaleAnchor anchor() {
        return new ScaleAnchor.Radius(radius);
    }

    @Override
    public StarKind kind() {
        return StarKind.standard;
    }

    @Override
    public StandardModelRequest withPoints(int profilePoints) {
        return new StandardModelRequest(name, mass, radius, composition, profilePoints);
    }
}
