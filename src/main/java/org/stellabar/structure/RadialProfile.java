package org.stellabar.structure;

import org.stellabar.physics.BadInputException;

/**
 * The radial structure of a spherical star as the stability estimate needs it, from the centre
 * (or the innermost shell given) to the surface. CGS.
 *
 * @param r radius [cm], strictly increasing, r[0] ≥ 0
 * @param m enclosed mass [g], positive at the surface and non-decreasing up to
 *        {@link #MASS_NOISE} of the total (tabulated or interpolated profiles carry rounding)
 * @param rho density [g/cm3], ≥ 0
 * @param P total pressure [dyn/cm2], ≥ 0, positive somewhere
 * @param gamma1 first adiabatic exponent Γ1 = (∂ln P/∂ln ρ)_s, positive
 */
public record RadialProfile(double[] r, double[] m, double[] rho, double[] P, double[] gamma1) {

    /** Fewest shells accepted. */
    public static final int MIN_POINTS = 3;
    /** Largest decrease of m between shells tolerated, relative to the total mass. */
    public static final double MASS_NOISE = 1e-8;

    /**
     * Canonical constructor: checks ranges and consistency; copies arrays in.
     *
     * @param r radius [cm], strictly increasing, r[0] ≥ 0
     * @param m enclosed mass [g], positive at the surface and non-decreasing up to
     *        {@link #MASS_NOISE} of the total (tabulated or interpolated profiles carry rounding)
     * @param rho density [g/cm3], ≥ 0
     * @param P total pressure [dyn/cm2], ≥ 0, positive somewhere
     * @param gamma1 first adiabatic exponent Γ1 = (∂ln P/∂ln ρ)_s, positive
     */
    public RadialProfile {
        r = r.clone();
        m = m.clone();
        rho = rho.clone();
        P = P.clone();
        gamma1 = gamma1.clone();
        int k = r.length;
        if (m.length != k || rho.length != k || P.length != k || gamma1.length != k) {
            throw new BadInputException("radial profile columns differ in length: r " + k + ", m " + m.length
                    + ", rho " + rho.length + ", P " + P.length + ", Gamma1 " + gamma1.length);
        }
        if (k < MIN_POINTS) {
            throw new BadInputException("radial profile has " + k + " shells; at least " + MIN_POINTS + " are needed");
        }
        double pMax = 0.0;
        double noise = MASS_NOISE * Math.abs(m[k - 1]);
        for (int i = 0; i < k; i++) {
            require(Double.isFinite(r[i]) && r[i] >= 0.0 && (i == 0 || r[i] > r[i - 1]), "r", i, r[i],
                    "finite, >= 0 and strictly increasing");
            require(Double.isFinite(m[i]) && m[i] >= 0.0 && (i == 0 || m[i] >= m[i - 1] - noise), "m", i, m[i],
                    "finite, >= 0 and non-decreasing");
            require(Double.isFinite(rho[i]) && rho[i] >= 0.0, "rho", i, rho[i], "finite and >= 0");
            require(Double.isFinite(P[i]) && P[i] >= 0.0, "P", i, P[i], "finite and >= 0");
            require(Double.isFinite(gamma1[i]) && gamma1[i] > 0.0, "Gamma1", i, gamma1[i], "finite and > 0");
            pMax = Math.max(pMax, P[i]);
        }
        require(m[k - 1] > 0.0, "m", k - 1, m[k - 1], "positive at the surface");
        require(pMax > 0.0, "P", 0, pMax, "positive somewhere");
    }

    /** @return a copy of the {@code r} component, so that this record stays unchanged */
    @Override
    public double[] r() {
        return r.clone();
    }

    /** @return a copy of the {@code m} component, so that this record stays unchanged */
    @Override
    public double[] m() {
        return m.clone();
    }

    /** @return a copy of the {@code rho} component, so that this record stays unchanged */
    @Override
    public double[] rho() {
        return rho.clone();
    }

    /** @return a copy of the {@code P} component, so that this record stays unchanged */
    @Override
    public double[] P() {
        return P.clone();
    }

    /** @return a copy of the {@code gamma1} component, so that this record stays unchanged */
    @Override
    public double[] gamma1() {
        return gamma1.clone();
    }

    /** @return the number of shells */
    public int size() {
        return r.length;
    }

    /** @return the outer radius R [cm] */
    public double radius() {
        return r[r.length - 1];
    }

    /** @return the total mass M = m(R) [g] */
    public double mass() {
        return m[m.length - 1];
    }

    /** @return the density of the innermost shell [g/cm3] (the central density when r[0] = 0) */
    public double centralDensity() {
        return rho[0];
    }

    private static void require(boolean ok, String column, int row, double value, String rule) {
        if (!ok) {
            throw new BadInputException("radial profile column " + column + " row " + (row + 1) + " = " + value
                    + ": must be " + rule);
        }
    }
}
