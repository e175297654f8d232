package org.stellabar.audit;

import org.stellabar.eos.ValidityWarning;

/**
 * The audit of every shell, centre first (the order of {@link Profile}). Arrays of quantities the
 * profile does not allow (no pressure column, no radius and mass) are null. All arrays are copied
 * in and out.
 */
public final class ShellAudit {

    private final ShellStates ours;
    private final Comparison comparison;
    private final EquilibriumResiduals residuals;
    private final double[] radius;
    private final double[] mass;
    private final double totalMass;
    private final double totalRadius;

    /** The internal records' arrays are never changed; each accessor below hands out a copy. */
    ShellAudit(ShellStates ours, Comparison comparison, EquilibriumResiduals residuals, double[] radius,
            double[] mass, double totalMass, double totalRadius) {
        this.ours = ours;
        this.comparison = comparison;
        this.residuals = residuals;
        this.radius = copy(radius);
        this.mass = copy(mass);
        this.totalMass = totalMass;
        this.totalRadius = totalRadius;
    }

    private static double[] copy(double[] a) {
        return a == null ? null : a.clone();
    }

    /** @return the number of shells */
    public int size() {
        return ours.P().length;
    }

    /** @return our total pressure P_gas + P_rad at the profile's (ρ, T) [dyn/cm2] */
    public double[] P() {
        return ours.P().clone();
    }

    /** @return ρkT/(μ m_u) [dyn/cm2] */
    public double[] Pgas() {
        return ours.Pgas().clone();
    }

    /** @return aT⁴/3 [dyn/cm2] */
    public double[] Prad() {
        return ours.Prad().clone();
    }

    /** @return P_gas/P */
    public double[] beta() {
        return ours.beta().clone();
    }

    /** @return P_rad/P */
    public double[] oneMinusBeta() {
        return ours.oneMinusBeta().clone();
    }

    /** @return our Γ1 */
    public double[] gamma1() {
        return ours.gamma1().clone();
    }

    /** @return our ∇_ad */
    public double[] nablaAd() {
        return ours.nablaAd().clone();
    }

    /** @return our adiabatic sound speed [cm/s] */
    public double[] soundSpeed() {
        return ours.soundSpeed().clone();
    }

    /** @return validity warning masks ({@link ValidityWarning.Regime#bit()}) */
    public int[] warnings() {
        return ours.warnings().clone();
    }

    /** @return P_profile/P_ours − 1, or null without a pressure column */
    public double[] pressureMismatch() {
        return copy(comparison.pressureMismatch());
    }

    /** @return Γ1_profile − Γ1_ours, or null without a Γ1 column */
    public double[] gamma1Difference() {
        return copy(comparison.gamma1Difference());
    }

    /** @return (dP/dr + Gmρ/r²)/(Gmρ/r²), or null unless the profile gives r and m */
    public double[] hydrostaticResidual() {
        return copy(residuals.hydrostatic());
    }

    /** @return (dm/dr)/(4πr²ρ) − 1, or null unless the profile gives r and m */
    public double[] massContinuityResidual() {
        return copy(residuals.continuity());
    }

    /** @return radius [cm], given or derived from m, or null */
    public double[] radius() {
        return copy(radius);
    }

    /** @return enclosed mass [g], given or derived from r, or null */
    public double[] mass() {
        return copy(mass);
    }

    /** @return m/M with M the star's mass (the surface row's, if the profile has one), or null */
    public double[] massFraction() {
        return mass == null ? null : divide(mass, totalMass);
    }

    /** @return r/R with R the star's radius (the surface row's, if the profile has one), or null */
    public double[] radiusFraction() {
        return radius == null || Double.isNaN(totalRadius) ? null : divide(radius, totalRadius);
    }

    private static double[] divide(double[] a, double by) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] / by;
        }
        return out;
    }
}
