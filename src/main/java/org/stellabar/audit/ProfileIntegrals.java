package org.stellabar.audit;

import org.stellabar.numerics.TabulatedQuadrature;

/**
 * Integrals over a tabulated star, with the part inside the innermost shell added as a uniform
 * sphere of that shell's values when the table does not reach the centre. The integrals use the
 * project's {@link TabulatedQuadrature} (piecewise parabolas, fourth order inside, third at the
 * ends) where the abscissae increase strictly; over mass, where a profile may repeat a value
 * (masses printed with few digits near the surface), they fall back to its trapezoidal rule
 * (second order), for which an interval of zero width simply adds nothing.
 */
final class ProfileIntegrals {

    private ProfileIntegrals() {
    }

    /**
     * @param x abscissae, non-decreasing
     * @param f values
     * @return ∫f dx from x[0] to x[n−1]
     */
    static double integral(double[] x, double[] f) {
        return TabulatedQuadrature.strictlyIncreasing(x) ? TabulatedQuadrature.integral(x, f)
                : TabulatedQuadrature.trapezoid(x, f);
    }

    /**
     * @param x abscissae, non-decreasing
     * @param f values
     * @return the running integral from x[0], 0 at the first node
     */
    static double[] cumulative(double[] x, double[] f) {
        return TabulatedQuadrature.strictlyIncreasing(x) ? TabulatedQuadrature.cumulative(x, f)
                : TabulatedQuadrature.trapezoidCumulative(x, f);
    }

    /**
     * Enclosed mass from radius and density: m = (4π/3)r₀³ρ₀ + ∫4πr²ρ dr.
     *
     * @param r radius [cm], strictly increasing
     * @param rho density [g/cm3]
     * @return m at each node [g]
     */
    static double[] massFromRadius(double[] r, double[] rho) {
        double[] f = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            f[i] = 4.0 * Math.PI * r[i] * r[i] * rho[i];
        }
        double[] m = cumulative(r, f);
        double core = 4.0 / 3.0 * Math.PI * r[0] * r[0] * r[0] * rho[0];
        for (int i = 0; i < m.length; i++) {
            // a parabola through steeply falling densities may dip: mass never decreases outwards
            m[i] = Math.max(m[i] + core, i == 0 ? 0.0 : m[i - 1]);
        }
        return m;
    }

    /**
     * Radius from enclosed mass and density: r³ = 3m₀/(4πρ₀) + ∫3/(4πρ) dm.
     *
     * @param m enclosed mass [g], non-decreasing
     * @param rho density [g/cm3], positive
     * @return r at each node [cm]
     */
    static double[] radiusFromMass(double[] m, double[] rho) {
        double[] f = new double[m.length];
        for (int i = 0; i < m.length; i++) {
            f[i] = 3.0 / (4.0 * Math.PI * rho[i]);
        }
        double[] cube = cumulative(m, f);
        double core = 3.0 * m[0] / (4.0 * Math.PI * rho[0]);
        double[] r = new double[m.length];
        for (int i = 0; i < m.length; i++) {
            r[i] = Math.cbrt(Math.max(cube[i] + core, i == 0 ? 0.0 : r[i - 1] * r[i - 1] * r[i - 1]));
        }
        return r;
    }

    /**
     * ∫P dV = (4π/3)r₀³P₀ + ∫4πr²P dr.
     *
     * @param r radius [cm], strictly increasing
     * @param P pressure [dyn/cm2]
     * @return the integral [erg]
     */
    static double pressureVolume(double[] r, double[] P) {
        double[] f = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            f[i] = 4.0 * Math.PI * r[i] * r[i] * P[i];
        }
        return 4.0 / 3.0 * Math.PI * r[0] * r[0] * r[0] * P[0] + integral(r, f);
    }

    /**
     * Ω = −(3/5)Gm₀²/r₀ − ∫Gm/r dm (the integrand is 0 at r = 0, where m/r → 0).
     *
     * @param r radius [cm]
     * @param m enclosed mass [g], non-decreasing
     * @param G the constant of gravitation [cm3/g/s2]
     * @return Ω [erg], negative
     */
    static double gravitationalEnergy(double[] r, double[] m, double G) {
        double[] f = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            f[i] = r[i] > 0.0 ? G * m[i] / r[i] : 0.0;
        }
        double core = r[0] > 0.0 ? 0.6 * G * m[0] * m[0] / r[0] : 0.0;
        return -(core + integral(m, f));
    }

    /**
     * Mass average of f: (m₀f₀ + ∫f dm)/M.
     *
     * @param m enclosed mass [g], non-decreasing
     * @param f values
     * @return the average
     */
    static double massAverage(double[] m, double[] f) {
        double total = m[m.length - 1];
        return (m[0] * f[0] + integral(m, f)) / total;
    }

    /**
     * The fraction of the mass where f &lt; threshold, f taken linear in m between nodes and
     * constant inside the innermost shell.
     *
     * @param m enclosed mass [g]
     * @param f values
     * @param threshold the threshold
     * @return the fraction in [0, 1]
     */
    static double massFractionBelow(double[] m, double[] f, double threshold) {
        double below = f[0] < threshold ? m[0] : 0.0;
        for (int i = 1; i < m.length; i++) {
            double dm = m[i] - m[i - 1];
            boolean a = f[i - 1] < threshold;
            boolean b = f[i] < threshold;
            if (a && b) {
                below += dm;
            } else if (a != b) {
                // linear crossing: the part of the interval on the low side
                double t = (threshold - f[i - 1]) / (f[i] - f[i - 1]);
                below += a ? t * dm : (1.0 - t) * dm;
            }
        }
        return Math.min(1.0, Math.max(0.0, below / m[m.length - 1]));
    }
}
