package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;

import org.hipparchus.ode.DenseOutputModel;
import org.stellabar.eos.Inversions;
import org.stellabar.eos.EosState;

/**
 * One integrated isentropic star (see {@link IsentropicStructureSolver}): the central state, the
 * scales, where the integration stopped, the extrapolated surface, the virial integrals and the
 * dense output from which profiles are sampled.
 *
 * <p>Immutable once built: the dense output is only read (Hipparchus interpolators evaluate
 * without side effects).
 */
public final class IsentropicStar {

    private final Inversions inversion;
    private final EosState centre;
    private final double lengthScale;
    private final double xiStop;
    private final double xiSurface;
    private final double muTotal;
    private final double pressureIntegral;
    private final double potentialIntegral;
    private final DenseOutputModel dense;

    IsentropicStar(Inversions inversion, EosState centre, double lengthScale, double xiStop,
            double xiSurface, double muTotal, double pressureIntegral, double potentialIntegral,
            DenseOutputModel dense) {
        this.inversion = inversion;
        this.centre = centre;
        this.lengthScale = lengthScale;
        this.xiStop = xiStop;
        this.xiSurface = xiSurface;
        this.muTotal = muTotal;
        this.pressureIntegral = pressureIntegral;
        this.potentialIntegral = potentialIntegral;
        this.dense = dense;
    }

    /** @return whether the integration carried ln ρ and ln T ({@link AdiabatEquations}) */
    private boolean carriesDensity() {
        return dense.getInterpolatedState(xiStop).getPrimaryState().length > AdiabatEquations.LN_T;
    }

    /** @return the central state */
    public EosState centre() {
        return centre;
    }

    /** @return the length scale α = √(P_c/(4πG))/ρ_c [cm] */
    public double lengthScale() {
        return lengthScale;
    }

    /** @return the mass scale 4πα³ρ_c [g] */
    public double massScale() {
        return 4.0 * Math.PI * lengthScale * lengthScale * lengthScale * centre.rho();
    }

    /** @return total mass M, including the thin layer beyond the stop point [g] */
    public double mass() {
        return muTotal * massScale();
    }

    /** @return radius R where P = 0, extrapolated from the stop point [cm] */
    public double radius() {
        return xiSurface * lengthScale;
    }

    /** @return the radius where the integration stopped, P = {@link IsentropicStructureSolver#SURFACE_PRESSURE_FRACTION} P_c [cm] */
    public double stopRadius() {
        return xiStop * lengthScale;
    }

    /** @return ∫P dV from the centre to the stop radius [erg] */
    public double pressureVolumeIntegral() {
        return pressureIntegral * massScale() * centre.P() / centre.rho();
    }

    /** @return the gravitational energy Ω = −∫Gm dm/r from the centre to the stop radius [erg] */
    public double gravitationalEnergy() {
        double a = lengthScale;
        double rho = centre.rho();
        return -16.0 * Math.PI * Math.PI * GRAVITATION * rho * rho * a * a * a * a * a * potentialIntegral;
    }

    /**
     * The structure at evenly spaced radii from the centre to the stop radius (inclusive), with the
     * equation of state at every point; T and ρ from the adiabat at each pressure.
     *
     * @param points number of rows, at least 2
     * @return the profile
     */
    public StarProfile profile(int points) {
        double[] r = new double[points];
        double[] m = new double[points];
        double[] rho = new double[points];
        double[] pressure = new double[points];
        double[] temperature = new double[points];
        double pc = centre.P();
        double s = centre.s();
        double massScale = massScale();
        boolean carried = carriesDensity();
        for (int i = 0; i < points; i++) {
            double xi = i == points - 1 ? xiStop : xiStop * i / (points - 1);
            r[i] = xi * lengthScale;
            if (i == 0) {
                m[i] = 0.0;
                rho[i] = centre.rho();
                pressure[i] = pc;
                temperature[i] = centre.T();
                continue;
            }
            double p;
            double mu;
            if (carried && xi >= IsentropicStructureSolver.START_RADIUS) {
                // ρ and T carried along the adiabat by the integration (AdiabatEquations)
                double[] y = dense.getInterpolatedState(xi).getPrimaryState();
                pressure[i] = y[IsentropicEquations.PRESSURE] * pc;
                rho[i] = Math.exp(y[AdiabatEquations.LN_RHO]);
                temperature[i] = Math.exp(y[AdiabatEquations.LN_T]);
                m[i] = y[IsentropicEquations.MASS] * massScale;
                continue;
            }
            if (xi < IsentropicStructureSolver.START_RADIUS) {
                double xi2 = xi * xi;
                p = 1.0 - xi2 / 6.0 + xi2 * xi2 / (45.0 * centre.Gamma1());
                mu = xi * xi2 / 3.0 - xi * xi2 * xi2 / (30.0 * centre.Gamma1());
            } else {
                double[] y = dense.getInterpolatedState(xi).getPrimaryState();
                p = y[IsentropicEquations.PRESSURE];
                mu = y[IsentropicEquations.MASS];
            }
            pressure[i] = p * pc;
            temperature[i] = Math.exp(inversion.temperatureOnIsobar(pressure[i], s));
            rho[i] = inversion.density(pressure[i], temperature[i]);
            m[i] = mu * massScale;
        }
        return StarProfile.of(inversion.eos(), r, m, rho, pressure, temperature, Double.NaN, Double.NaN);
    }
}
