package org.stellabar.eos;

import org.stellabar.numerics.LargeArrays;

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

    /**
     * @param size number of points (the arrays of a large grid are made on all cores:
     *     {@link LargeArrays})
     */
    public EosArrays(int size) {
        double[][] columns = LargeArrays.doubles(11, size);
        P = columns[0];
        Pgas = columns[1];
        Prad = columns[2];
        beta = columns[3];
        oneMinusBeta = columns[4];
        u = columns[5];
        s = columns[6];
        Gamma1 = columns[7];
        Gamma3 = columns[8];
        nablaAd = columns[9];
        soundSpeed = columns[10];
        warnings = new int[size];
    }

    /** @return the number of points */
    public int size() {
        return P.length;
    }
}
