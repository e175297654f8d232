package org.stellabar.audit;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.numerics.ThreePointDerivative;

/**
 * How far a profile is from hydrostatic equilibrium and mass continuity, shell by shell.
 *
 * <p>The hydrostatic residual is (dP/dr + Gmρ/r²)/(Gmρ/r²), and the mass-continuity residual
 * (dm/dr)/(4πr²ρ) − 1. The derivatives are three-point Lagrange differences on the profile's own
 * non-uniform grid ({@link ThreePointDerivative}, second order; one-sided at the ends): dP/dr in
 * r, dm/dr as 3r² dm/d(r³) in r³ (m ∝ r³ near the centre). At r = 0 the hydrostatic ratio is
 * 0/0 and is taken to its limit with the derivative in r² (P is even in r):
 * (2 dP/d(r²) + (4π/3)Gρ²)/((4π/3)Gρ²). Internal to the audit.
 *
 * @param hydrostatic the hydrostatic residual at each shell, or null where not computed
 * @param continuity the mass-continuity residual at each shell, or null where not computed
 * @param maxHydrostatic largest |hydrostatic residual|
 * @param maxHydrostaticRow the data row where it occurs (0 if not computed)
 * @param rmsHydrostatic mass-weighted root-mean-square hydrostatic residual over the interior
 * @param maxContinuity largest |mass-continuity residual|
 */
record EquilibriumResiduals(double[] hydrostatic, double[] continuity, OptionalDouble maxHydrostatic,
        int maxHydrostaticRow, OptionalDouble rmsHydrostatic, OptionalDouble maxContinuity) {

    /**
     * The residuals a profile allows: none without radii read from the file (derived radii would
     * test only the integration), no mass continuity with masses integrated from the radii.
     *
     * @param rows the data-row number of each shell
     * @param g radii and masses
     * @param rho density [g/cm3]
     * @param P pressure [dyn/cm2], the profile's where it gives one
     * @return the residuals
     */
    static EquilibriumResiduals of(int[] rows, ShellGeometry g, double[] rho, double[] P) {
        if (g.r() == null || g.radiusDerived()) {
            return new EquilibriumResiduals(null, null, OptionalDouble.empty(), 0, OptionalDouble.empty(),
                    OptionalDouble.empty());
        }
        double[] hydrostatic = hydrostaticResidual(g.r(), g.m(), rho, P);
        double worst = 0.0;
        int worstRow = 0;
        for (int i = 0; i < hydrostatic.length; i++) {
            if (Math.abs(hydrostatic[i]) >= worst) {
                worst = Math.abs(hydrostatic[i]);
                worstRow = rows[i];
            }
        }
        double[] continuity = null;
        OptionalDouble maxContinuity = OptionalDouble.empty();
        if (!g.massDerived()) {
            continuity = massContinuityResidual(g.r(), g.m(), rho);
            maxContinuity = OptionalDouble.of(Arrays.stream(continuity).map(Math::abs).max().orElse(0.0));
        }
        return new EquilibriumResiduals(hydrostatic, continuity, OptionalDouble.of(worst), worstRow,
                interiorRms(g.m(), hydrostatic), maxContinuity);
    }

    /**
     * (dP/dr + Gmρ/r²)/(Gmρ/r²) at every shell, dP/dr by three-point differences; at r = 0 the
     * limit (2 dP/d(r²) + (4π/3)Gρ²)/((4π/3)Gρ²).
     */
    static double[] hydrostaticResidual(double[] r, double[] m, double[] rho, double[] P) {
        int n = r.length;
        double[] dPdr = ThreePointDerivative.of(r, P);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            if (r[i] > 0.0) {
                double weight = GRAVITATION * m[i] * rho[i] / (r[i] * r[i]);
                out[i] = (dPdr[i] + weight) / weight;
            } else {
                double dPdr2 = ThreePointDerivative.atStart(0.0, r[1] * r[1], r[2] * r[2], P[0], P[1], P[2]);
                double weight = 4.0 / 3.0 * Math.PI * GRAVITATION * rho[0] * rho[0];
                out[i] = (2.0 * dPdr2 + weight) / weight;
            }
        }
        return out;
    }

    /**
     * (dm/dr)/(4πr²ρ) − 1 at every shell, written as (dm/dy)/((4π/3)ρ) − 1 with y = r³ and dm/dy by
     * three-point differences in y. Near the centre m grows as r³, and a three-point difference in r
     * of r³ is wrong by h²/r² relative (a third at the first shell, at any resolution); in y the
     * leading term is linear and the error is second order everywhere, the centre included.
     */
    static double[] massContinuityResidual(double[] r, double[] m, double[] rho) {
        int n = r.length;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = r[i] * r[i] * r[i];
        }
        double[] dmdy = ThreePointDerivative.of(y, m);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = dmdy[i] / (4.0 / 3.0 * Math.PI * rho[i]) - 1.0;
        }
        return out;
    }

    /**
     * Mass-weighted root-mean-square of a residual over the interior shells: the first and last
     * shell, where the differences are one-sided and (at a surface) the relative residual is not
     * small, are left out (their values stay in the table and in the maximum). Trapezoids in m, as
     * masses may repeat (see {@link ProfileIntegrals}).
     */
    static OptionalDouble interiorRms(double[] m, double[] residual) {
        int n = m.length;
        if (n < 4 || !(m[n - 2] > m[1])) {
            return OptionalDouble.empty();
        }
        double[] mass = Arrays.copyOfRange(m, 1, n - 1);
        double[] squares = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            squares[i - 1] = residual[i] * residual[i];
        }
        return OptionalDouble.of(Math.sqrt(TabulatedQuadrature.trapezoid(mass, squares) / (m[n - 2] - m[1])));
    }
}
