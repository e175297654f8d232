package org.stellabar.eos;

/**
 * Preallocated output arrays for {@link GasRadiationEos#evaluate}: one array per quantity, in
 * CGS, indexed like the input points. Mutable on purpose: it is the buffer of an inner loop. The
 * {@link #warnings} entry of a point is a bit mask of {@link ValidityWarning.Regime#bit()}.
 */
public final class EosArrays {
    /** total pressure P [dyn/cm2] */
    public final double[] P;
    /** gas pressure P_gas [dyn/cm2] */
    public final double[] Pgas;
    /** radiation pressure P_rad [dyn/cm2] */
    public final double[] Prad;
    /** β = P_gas/P */
    public final double[] beta;
    /** 1 − β = P_rad/P, without cancellation */
    public final double[] oneMinusBeta;
    /** specific internal energy u [erg/g] */
    public final double[] u;
    /** specific entropy s [erg/g/K] */
    public final double[] s;
    /** Γ1 = (∂ln P/∂ln ρ)_s */
    public final double[] Gamma1;
    /** Γ3 = 1 + (∂ln T/∂ln ρ)_s */
    public final double[] Gamma3;
    /** ∇_ad = (∂ln T/∂ln P)_s */
    public final double[] nablaAd;
    /** adiabatic sound speed [cm/s] */
    public final double[] soundSpeed;
    /** validity warnings, a bit mask per point */
    public final int[] warnings;

    /** @param size number of points */
    public EosArrays(int size) {
        P = new double[size];
        Pgas = new double[size];
        Prad = new double[size];
        beta = new double[size];
        oneMinusBeta = new double[size];
        u = new double[size];
        s = new double[size];
        Gamma1 = new double[size];
        Gamma3 = new double[size];
        nablaAd = new double[size];
        soundSpeed = new double[size];
        warnings = new int[size];
    }

    /** @return the number of points */
    public int size() {
        return P.length;
    }
}
