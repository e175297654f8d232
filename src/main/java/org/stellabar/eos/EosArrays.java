package org.stellabar.eos;

/**
 * Preallocated output arrays for {@link GasRadiationEos#evaluate}: one array per quantity, in
 * CGS, indexed like the input points. Mutable on purpose: it is the buffer of an inner loop. The
 * {@link #warnings} entry of a point is a bit mask of {@link ValidityWarning.Regime#bit()}.
 */
public final class EosArrays {
    public final double[] P;
    public final double[] Pgas;
    public final double[] Prad;
    public final double[] beta;
    public final double[] oneMinusBeta;
    public final double[] u;
    public final double[] s;
    public final double[] Gamma1;
    public final double[] Gamma3;
    public final double[] nablaAd;
    public final double[] soundSpeed;
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
