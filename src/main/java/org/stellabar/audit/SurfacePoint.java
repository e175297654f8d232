package org.stellabar.audit;

/**
 * The vacuum surface row some profiles end with (ρ = 0 or T = 0, with P = 0): our equation of
 * state has nothing to say there, so it is not audited as a shell, but it closes the star for the
 * integrals (mass, virial ratio, ⟨Γ1⟩) and gives its radius and mass.
 *
 * @param row data-row number as in the file
 * @param where where it is, for messages
 * @param r radius [cm], or NaN if the profile gives none
 * @param m enclosed mass [g], or NaN if the profile gives none
 * @param rho density [g/cm3] (0, or the surface density of a model with T = 0 there)
 */
public record SurfacePoint(int row, String where, double r, double m, double rho) {
}
