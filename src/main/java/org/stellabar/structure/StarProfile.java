package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.eos.EosArrays;
import org.stellabar.eos.EosState;
import org.stellabar.eos.EquationOfState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityWarning;

/**
 * The radial structure of a physical star at a set of radii from the centre outwards, with the
 * equation-of-state quantities at each point. All arrays have one length and are copied in and
 * out.
 *
 * <p>A row with P = 0 is the surface of a model that reaches it (a polytrope): there T = 0 and
 * c_s = 0 exactly, and β, 1 − β, Γ1 and ∇_ad hold their limits as P → 0, which the model supplies
 * (see {@link #of}).
 *
 * @param radial radius r [cm], mass inside r [g], density ρ [g/cm3], total pressure P [dyn/cm2]
 *     and first adiabatic exponent Γ1, as the stability estimate reads them
 * @param T temperature [K]
 * @param Pgas gas pressure [dyn/cm2]
 * @param Prad radiation pressure [dyn/cm2]
 * @param beta P_gas/P
 * @param oneMinusBeta P_rad/P
 * @param nablaAd adiabatic temperature gradient
 * @param soundSpeed adiabatic sound speed [cm/s]
 * @param warnings validity warnings per row as a bit mask of {@link ValidityWarning.Regime#bit()}
 *     (0 at a surface row)
 */
public record StarProfile(RadialProfile radial, double[] T, double[] Pgas, double[] Prad, double[] beta,
        double[] oneMinusBeta, double[] nablaAd, double[] soundSpeed, int[] warnings) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies arrays in.
     *
     * @param radial radius r [cm], mass inside r [g], density ρ [g/cm3], total pressure P [dyn/cm2]
     *        and first adiabatic exponent Γ1, as the stability estimate reads them
     * @param T temperature [K]
     * @param Pgas gas pressure [dyn/cm2]
     * @param Prad radiation pressure [dyn/cm2]
     * @param beta P_gas/P
     * @param oneMinusBeta P_rad/P
     * @param nablaAd adiabatic temperature gradient
     * @param soundSpeed adiabatic sound speed [cm/s]
     * @param warnings validity warnings per row as a bit mask of {@link ValidityWarning.Regime#bit()}
     *        (0 at a surface row)
     */
    public StarProfile {
        Objects.requireNonNull(radial, "radial");
        T = T.clone();
        Pgas = Pgas.clone();
        Prad = Prad.clone();
        beta = beta.clone();
        oneMinusBeta = oneMinusBeta.clone();
        nablaAd = nablaAd.clone();
        soundSpeed = soundSpeed.clone();
        warnings = warnings.clone();
        int n = radial.size();
        if (warnings.length != n) {
            throw new IllegalArgumentException("profile arrays differ in length: " + warnings.length + " vs " + n);
        }
        for (double[] a : new double[][] {T, Pgas, Prad, beta, oneMinusBeta, nablaAd, soundSpeed}) {
            if (a.length != n) {
                throw new IllegalArgumentException("profile arrays differ in length: " + a.length + " vs " + n);
            }
        }
    }

    /**
     * Completes a structure (r, m, ρ, P, T) with the equation of state: P_gas, P_rad, β, 1 − β,
     * Γ1, ∇_ad and c_s from {@link GasRadiationEos#evaluate} at (ρ, T) for every row with P &gt; 0;
     * a row with P = 0 (the surface) gets T = P_gas = P_rad = c_s = 0 and the limits of β and 1 − β
     * given here, with Γ1 and ∇_ad from the same formulas at that β.
     *
     * @param eos the equation of state
     * @param r radius [cm]
     * @param m enclosed mass [g]
     * @param rho density [g/cm3], positive where P &gt; 0
     * @param P total pressure [dyn/cm2], positive or exactly 0
     * @param T temperature [K], positive where P &gt; 0
     * @param surfaceBeta limit of β as P → 0, used for rows with P = 0 (NaN if there are none)
     * @param surfaceOneMinusBeta limit of 1 − β as P → 0
     * @return the profile
     */
    public static StarProfile of(EquationOfState eos, double[] r, double[] m, double[] rho, double[] P, double[] T,
            double surfaceBeta, double surfaceOneMinusBeta) {
        Objects.requireNonNull(eos, "eos");
        int n = r.length;
        EosArrays out = new EosArrays(n);
        double[] gasPressure = new double[n];
        double[] radiationPressure = new double[n];
        double[] beta = new double[n];
        double[] oneMinusBeta = new double[n];
        double[] gamma1 = new double[n];
        double[] nablaAd = new double[n];
        double[] soundSpeed = new double[n];
        int[] warnings = new int[n];
        double[] temperature = T.clone();
        int i = 0;
        while (i < n) {
            int j = i;
            while (j < n && P[j] > 0.0) {
                j++;
            }
            if (j > i) {
                evaluate(eos, rho, T, i, j, out);
                for (int k = i; k < j; k++) {
                    gasPressure[k] = out.Pgas[k];
                    radiationPressure[k] = out.Prad[k];
                    beta[k] = out.beta[k];
                    oneMinusBeta[k] = out.oneMinusBeta[k];
                    gamma1[k] = out.Gamma1[k];
                    nablaAd[k] = out.nablaAd[k];
                    soundSpeed[k] = out.soundSpeed[k];
                    warnings[k] = out.warnings[k];
                }
            }
            if (j < n) {
                if (P[j] != 0.0 || Double.isNaN(surfaceBeta) || Double.isNaN(surfaceOneMinusBeta)) {
                    throw new IllegalArgumentException("profile row " + j + ": P = " + P[j]
                            + " is neither positive nor a surface row with known limits");
                }
                temperature[j] = 0.0;
                beta[j] = surfaceBeta;
                oneMinusBeta[j] = surfaceOneMinusBeta;
                double gamma3m1 = GasRadiationEos.gamma3MinusOne(surfaceBeta, surfaceOneMinusBeta);
                gamma1[j] = GasRadiationEos.gamma1(surfaceBeta, surfaceOneMinusBeta, gamma3m1);
                nablaAd[j] = gamma3m1 / gamma1[j];
                j++;
            }
            i = j;
        }
        return new StarProfile(new RadialProfile(r, m, rho, P, gamma1), temperature, gasPressure, radiationPressure,
                beta, oneMinusBeta, nablaAd, soundSpeed, warnings);
    }

    /**
     * The classical mixture through its allocation-free array path (which the rerun tests fix byte
     * for byte); any other equation of state one state at a time.
     */
    private static void evaluate(EquationOfState eos, double[] rho, double[] T, int from, int to, EosArrays out) {
        if (eos instanceof GasRadiationEos classical) {
            classical.evaluate(rho, T, from, to, out);
            return;
        }
        for (int k = from; k < to; k++) {
            EosState s = eos.state(rho[k], T[k]);
            out.P[k] = s.P();
            out.Pgas[k] = s.Pgas();
            out.Prad[k] = s.Prad();
            out.beta[k] = s.beta();
            out.oneMinusBeta[k] = s.oneMinusBeta();
            out.u[k] = s.u();
            out.s[k] = s.s();
            out.Gamma1[k] = s.Gamma1();
            out.Gamma3[k] = s.Gamma3();
            out.nablaAd[k] = s.nablaAd();
            out.soundSpeed[k] = s.soundSpeed();
            int mask = 0;
            for (var w : s.warnings()) {
                mask |= w.code().bit();
            }
            out.warnings[k] = mask;
        }
    }

    /** @return a copy of the {@code warnings} component, so that this record stays unchanged */
    @Override
    public int[] warnings() {
        return warnings.clone();
    }

    /** @return a copy of the {@code T} component, so that this record stays unchanged */
    @Override
    public double[] T() {
        return T.clone();
    }

    /** @return a copy of the {@code Pgas} component, so that this record stays unchanged */
    @Override
    public double[] Pgas() {
        return Pgas.clone();
    }

    /** @return a copy of the {@code Prad} component, so that this record stays unchanged */
    @Override
    public double[] Prad() {
        return Prad.clone();
    }

    /** @return a copy of the {@code beta} component, so that this record stays unchanged */
    @Override
    public double[] beta() {
        return beta.clone();
    }

    /** @return a copy of the {@code oneMinusBeta} component, so that this record stays unchanged */
    @Override
    public double[] oneMinusBeta() {
        return oneMinusBeta.clone();
    }

    /** @return a copy of the {@code nablaAd} component, so that this record stays unchanged */
    @Override
    public double[] nablaAd() {
        return nablaAd.clone();
    }

    /** @return a copy of the {@code soundSpeed} component, so that this record stays unchanged */
    @Override
    public double[] soundSpeed() {
        return soundSpeed.clone();
    }

    /** @return the number of rows */
    public int size() {
        return radial.size();
    }
}
