package org.stellabar.structure;

import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.stellabar.eos.EosState;
import org.stellabar.eos.EquationOfState;

/**
 * Hydrostatic equilibrium on one adiabat of any equation of state, in the scaled variables of
 * {@link IsentropicEquations} (ξ, p = P/P_c, μ, and the two virial integrals), with the density
 * and temperature carried along as ODE variables instead of found by inverting (P, s) → (ρ, T) at
 * every step: along an adiabat d ln P = Γ1 d ln ρ and d ln T = (Γ3 − 1) d ln ρ (Cox &amp; Giuli
 * 1968, §9.13), so
 *
 * <pre>
 *   d ln ρ/dξ = (dp/dξ)/(Γ1 p),   d ln T/dξ = (Γ3 − 1) d ln ρ/dξ,
 * </pre>
 *
 * with Γ1 and Γ3 from one forward state at (ρ, T). One state per right-hand side, where the
 * inversion costs tens (the Fermi–Dirac model's (P, s) inversion nests two Newton iterations).
 * The entropy is then conserved to the integration tolerance rather than exactly; the solver
 * reports the drift. The components after the first four are {@link #LN_RHO} and {@link #LN_T}.
 */
final class AdiabatEquations implements OrdinaryDifferentialEquation {

    static final int LN_RHO = 4;
    static final int LN_T = 5;

    private final EquationOfState eos;
    private final double centralDensity;

    /**
     * @param eos the equation of state
     * @param centralDensity ρ_c [g/cm3]
     */
    AdiabatEquations(EquationOfState eos, double centralDensity) {
        this.eos = eos;
        this.centralDensity = centralDensity;
    }

    @Override
    public int getDimension() {
        return 6;
    }

    @Override
    public double[] computeDerivatives(double xi, double[] y) {
        double p = y[IsentropicEquations.PRESSURE];
        double mu = y[IsentropicEquations.MASS];
        if (!(p > 0.0)) {
            // beyond the surface, which a trial stage may reach: no matter, nothing changes
            return new double[] {0.0, 0.0, 0.0, 0.0, 0.0, 0.0};
        }
        double rho = Math.exp(y[LN_RHO]);
        EosState state = eos.state(rho, Math.exp(y[LN_T]));
        double scaled = rho / centralDensity;
        double dp = -mu * scaled / (xi * xi);
        double dLnRho = dp / (state.Gamma1() * p);
        return new double[] {dp, xi * xi * scaled, p * xi * xi, mu * scaled * xi, dLnRho,
            (state.Gamma3() - 1.0) * dLnRho};
    }
}
