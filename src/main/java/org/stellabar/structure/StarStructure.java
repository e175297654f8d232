package org.stellabar.structure;

import java.util.List;
import java.util.Objects;
import org.stellabar.eos.EosState;

/**
 * The structure of one physical star, whatever built it: total mass and radius, the central
 * state, the profile, and how well it satisfies the virial theorem.
 *
 * @param mass total mass M [g]
 * @param radius radius R where P = 0 [cm]
 * @param centre the equation-of-state state at the centre
 * @param profile the radial profile from the centre outwards
 * @param reachesSurface true if the profile's last row is the surface r = R (P = 0); false if
 *     it stops just inside it
 * @param virialCheck 3∫P dV/(−Ω) − 1 over the star (zero in hydrostatic equilibrium)
 * @param notes how the structure was computed, one line each, for metadata
 */
public record StarStructure(double mass, double radius, EosState centre, StarProfile profile,
        boolean reachesSurface, double virialCheck, List<String> notes) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param mass total mass M [g]
     * @param radius radius R where P = 0 [cm]
     * @param centre the equation-of-state state at the centre
     * @param profile the radial profile from the centre outwards
     * @param reachesSurface true if the profile's last row is the surface r = R (P = 0); false if
     *        it stops just inside it
     * @param virialCheck 3∫P dV/(−Ω) − 1 over the star (zero in hydrostatic equilibrium)
     * @param notes how the structure was computed, one line each, for metadata
     */
    public StarStructure {
        Objects.requireNonNull(centre, "centre");
        Objects.requireNonNull(profile, "profile");
        notes = List.copyOf(notes);
    }

    /**
     * The profile as the stability estimate needs it, out to the surface: when the profile stops
     * short of R, the surface row (R, M, ρ = 0, P = 0) is appended, so that the integrals run
     * over the whole star and the compactness uses M and R (Γ1 there carries no weight, as P = 0;
     * the last row's value is repeated).
     *
     * @return r, m, ρ, P, Γ1 out to R
     */
    public RadialProfile stabilityProfile() {
        RadialProfile radial = profile.radial();
        if (reachesSurface) {
            return radial;
        }
        int k = radial.size();
        double[] r = java.util.Arrays.copyOf(radial.r(), k + 1);
        double[] m = java.util.Arrays.copyOf(radial.m(), k + 1);
        double[] g1 = java.util.Arrays.copyOf(radial.gamma1(), k + 1);
        r[k] = radius;
        m[k] = mass;
        g1[k] = g1[k - 1];
        return new RadialProfile(r, m, java.util.Arrays.copyOf(radial.rho(), k + 1),
                java.util.Arrays.copyOf(radial.P(), k + 1), g1);
    }
}
