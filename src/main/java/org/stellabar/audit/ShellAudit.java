package org.stellabar.audit;

import org.stellabar.eos.ValidityWarning;

/**
 * The audit of every shell, centre first (the order of {@link Profile}). Arrays of quantities the
 * profile does not allow (no pressure column, no radius and mass) are null. All arrays are copied
 * in and out.
 */
public final class ShellAudit {

    private final double[] P;
    private final double[] Pgas;
    private final double[] Prad;
    private final double[] beta;
    private final double[] oneMinusBeta;
    private final double[] gamma1;
    private final double[] nablaAd;
    private final double[] soundSpeed;
    private final int[] warnings;
    private final double[] pressureMismatch;
    private final double[] gamma1Difference;
    private final double[] hydrostaticResidual;
    private final double[] massContinuityResidual;
    private final double[] radius;
    private final double[] mass;
    private final double totalMass;
    private final double totalRadius;

    ShellAudit(double[] P, double[] Pgas, double[] Prad, double[] beta, double[] oneMinusBeta, double[] gamma1,
            double[] nablaAd, double[] soundSpeed, int[] warnings, double[] pressureMismatch,
            double[] gamma1Difference, double[] hydrostaticResidual, double[] massContinuityResidual,
            double[] radius, double[] mass, double totalMass, double totalRadius) {
        this.P = P.clone();
        this.Pgas = Pgas.clone();
        this.Prad = Prad.clone();
        this.beta = beta.clone();
        this.oneMinusBeta = oneMinusBeta.clone();
        this.gamma1 = gamma1.clone();
        this.nablaAd = nablaAd.clone();
        this.soundSpeed = soundSpeed.clone();
        this.warnings = warnings.clone();
        this.pressureMismatch = copy(pressureMismatch);
        this.gamma1Difference = copy(gamma1Difference);
        this.hydrostaticResidual = copy(hydrostaticResidual);
        this.massContinuityResidual = copy(massContinuityResidual);
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
        return P.length;
    }

    /** @return our total pressure P_gas + P_rad at the profile's (ρ, T) [dyn/cm2] */
    public double[] P() {
        return P.clone();
    }

    /** @return ρkT/(μ m_u) [dyn/cm2] */
    public double[] Pgas() {
        return Pgas.clone();
    }

    /** @return aT⁴/3 [dyn/cm2] */
    public double[] Prad() {
        return Prad.clone();
    }

    /** @return P_gas/P */
    public double[] beta() {
        return beta.clone();
    }

    /** @return P_rad/P */
    public double[] oneMinusBeta() {
        return oneMinusBeta.clone();
    }

    /** @return our Γ1 */
    public double[] gamma1() {
        return gamma1.clone();
    }

    /** @return our ∇_ad */
    public double[] nablaAd() {
        return nablaAd.clone();
    }

    /** @return our adiabatic sound speed [cm/s] */
    public double[] soundSpeed() {
        return soundSpeed.clone();
    }

    /** @return validity warning masks ({@link ValidityWarning.Regime#bit()}) */
    public int[] warnings() {
        return warnings.clone();
    }

    /** @return P_profile/P_ours − 1, or null without a pressure column */
    public double[] pressureMismatch() {
        return copy(pressureMismatch);
    }

    /** @return Γ1_profile − Γ1_ours, or null without a Γ1 column */
    public double[] gamma1Difference() {
        return copy(gamma1Difference);
    }

    /** @return (dP/dr + Gmρ/r²)/(Gmρ/r²), or null unless the profile gives r and m */
    public double[] hydrostaticResidual() {
        return copy(hydrostaticResidual);
    }

    /** @return (dm/dr)/(4πr²ρ) − 1, or null unless the profile gives r and m */
    public double[] massContinuityResidual() {
        return copy(massContinuityResidual);
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
