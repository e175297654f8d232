package org.stellabar.structure;

import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.stellabar.eos.Inversions;

/**
 * Hydrostatic equilibrium on one adiabat of the gas + radiation mixture, in the scaled variables
 * of {@link IsentropicStructureSolver}: radius ξ = r/α with α² = P_c/(4πGρ_c²), pressure
 * p = P/P_c, mass μ = m/(4πα³ρ_c), density ρ̃ = ρ/ρ_c. Then dP/dr = −Gmρ/r² and dm/dr = 4πr²ρ
 * read
 *
 * <pre>
 *   dp/dξ = −μ ρ̃ / ξ²,   dμ/dξ = ξ² ρ̃,
 * </pre>
 *
 * and two integrals ride along for the virial theorem: I_P = ∫ p ξ² dξ (so that ∫P dV =
 * 4πα³P_c I_P) and I_Ω = ∫ μ ρ̃ ξ dξ (so that Ω = −∫Gm dm/r = −(4π)²Gρ_c²α⁵ I_Ω). The density
 * at each pressure comes from the equation of state on the adiabat,
 * ρ = ρ(P, s) via {@link Inversions#temperatureOnIsobar}; beyond the surface (p ≤ 0, which a
 * trial stage may reach) the density is zero.
 */
final class IsentropicEquations implements OrdinaryDifferentialEquation {

    static final int PRESSURE = 0;
    static final int MASS = 1;
    static final int PRESSURE_INTEGRAL = 2;
    static final int POTENTIAL_INTEGRAL = 3;

    private final Inversions inversion;
    private final double centralPressure;
    private final double centralDensity;
    private final double entropy;

    /**
     * @param inversion the equation of state and its inversions
     * @param centralPressure P_c [dyn/cm2]
     * @param centralDensity ρ_c [g/cm3]
     * @param entropy the specific entropy of the adiabat [erg/g/K]
     */
    IsentropicEquations(Inversions inversion, double centralPressure, double centralDensity, double entropy) {
        this.inversion = inversion;
        this.centralPressure = centralPressure;
        this.centralDensity = centralDensity;
        this.entropy = entropy;
    }

    @Override
    public int getDimension() {
        return 4;
    }

    @Override
    public double[] computeDerivatives(double xi, double[] y) {
        double p = y[PRESSURE];
        double mu = y[MASS];
        double rho = p > 0.0 ? scaledDensity(p) : 0.0;
        return new double[] {-mu * rho / (xi * xi), xi * xi * rho, p * xi * xi, mu * rho * xi};
    }

    /**
     * @param p P/P_c, positive
     * @return ρ/ρ_c on the adiabat
     */
    double scaledDensity(double p) {
        double pressure = p * centralPressure;
        double t = Math.exp(inversion.temperatureOnIsobar(pressure, entropy));
        return inversion.density(pressure, t) / centralDensity;
    }
}
