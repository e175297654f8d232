package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.Locale;
import java.util.Objects;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.Inversions;
import org.stellabar.eos.EosState;
import org.stellabar.physics.ConvergenceException;

/**
 * Integrates an isentropic star outwards from one central state (ρ_c, T_c) of the gas +
 * radiation mixture: hydrostatic equilibrium with the density taken on the adiabat through the
 * centre ({@link IsentropicEquations}).
 *
 * <p>Centre. The equations are singular at ξ = 0; the central series p = 1 − ξ²/6 +
 * ξ⁴/(45Γ1c), μ = ξ³/3 − ξ⁵/(30Γ1c) (from ρ̃ = 1 − ξ²/(6Γ1c) + …, Γ1c the central Γ1, which is
 * d ln P/d ln ρ along the adiabat) carries the state to ξ₀ = 10⁻⁵, where its truncation error
 * (ξ₀⁶ ≈ 10⁻³⁰) is far below the integration tolerance.
 *
 * <p>Surface. Dormand–Prince 8(5,3) (Hipparchus {@link DormandPrince853Integrator}; Hairer,
 * Nørsett &amp; Wanner 1993, §II.5) runs until P/P_c falls to {@link #SURFACE_PRESSURE_FRACTION}
 * ({@link PressureFractionDetector}). The rest of the star, out to P = 0, is added in closed
 * form: along an adiabat dh = dP/ρ exactly (h = u + P/ρ the specific enthalpy, which vanishes with
 * T at P = 0), and the layer beyond the stop point holds a negligible mass, so hydrostatic
 * equilibrium integrates to h(r_s) = GM(1/r_s − 1/R), i.e. R = r_s / (1 − h(r_s) r_s/(G m_s)).
 * The same thin layer holds the mass Δm = 4πr_s⁴P_s/(G m_s) (from dm/dP = −4πr⁴/(Gm)), which is
 * added to M. Both corrections are exact to first order in the layer's mass, itself of order
 * 10⁻¹¹ M here.
 *
 * <p>Homology. Under T → λT, ρ → λ³ρ the adiabats of this equation of state map onto each other
 * (the Sackur–Tetrode entropy shifts by a constant, T³/ρ and β stay), P → λ⁴P, and the scaled
 * structure is unchanged: the shape depends on β_c alone, M is independent of λ and R ∝ 1/λ.
 * {@link IsentropicStarFinder} builds on this.
 *
 * <p>An immutable value; every solve builds its own integrator (Hipparchus integrators are not
 * thread-safe).
 */
public final class IsentropicStructureSolver {

    /** P/P_c at which the integration stops; see the class documentation for the rest. */
    public static final double SURFACE_PRESSURE_FRACTION = 1e-12;
    /** Default relative tolerance per step. */
    public static final double DEFAULT_TOLERANCE = 1e-11;
    /** Bound on right-hand-side evaluations of one integration. */
    public static final int MAX_EVALUATIONS = 500_000;
    /** Where the central series hands over to the integrator, in ξ. */
    static final double START_RADIUS = 1e-5;
    /** No structure reaches this far in ξ (polytropes of index 1.5 to 3 end near 2.3 to 3.5). */
    static final double XI_CEILING = 1e3;

    private final Inversions inversion;
    private final double tolerance;

    /**
     * @param inversion the equation of state and its inversions; for the classical mixture the
     *     density comes from the (P, s) inversion at every step ({@link IsentropicEquations}), for any
     *     other from ρ and T carried along the adiabat ({@link AdiabatEquations})
     */
    public IsentropicStructureSolver(Inversions inversion) {
        this(inversion, DEFAULT_TOLERANCE);
    }

    private IsentropicStructureSolver(Inversions inversion, double tolerance) {
        this.inversion = Objects.requireNonNull(inversion, "inversion");
        this.tolerance = tolerance;
    }

    /**
     * @param relativeTolerance relative tolerance per step, in [1e-13, 1e-4]
     * @return a solver with this tolerance
     */
    public IsentropicStructureSolver withTolerance(double relativeTolerance) {
        if (!(relativeTolerance >= 1e-13 && relativeTolerance <= 1e-4)) {
            throw new IllegalArgumentException("tolerance " + relativeTolerance + " is outside [1e-13, 1e-4]");
        }
        return new IsentropicStructureSolver(inversion, relativeTolerance);
    }

    /** @return the equation of state and its inversions */
    public Inversions inversion() {
        return inversion;
    }

    /**
     * Integrates the star whose centre is at (ρ_c, T_c).
     *
     * @param centralDensity ρ_c [g/cm3]
     * @param centralTemperature T_c [K]
     * @return the structure out to its surface
     * @throws ConvergenceException if the integration fails or never reaches the stop pressure
     */
    public IsentropicStar solve(double centralDensity, double centralTemperature) {
        EosState centre = inversion.eos().state(centralDensity, centralTemperature);
        double pc = centre.P();
        double rhoC = centre.rho();
        boolean carried = !(inversion instanceof EosInversion);
        OrdinaryDifferentialEquation equations = carried ? new AdiabatEquations(inversion.eos(), rhoC)
                : new IsentropicEquations(inversion, pc, rhoC, centre.s());

        double xi0 = START_RADIUS;
        double g1 = centre.Gamma1();
        double xi2 = xi0 * xi0;
        double[] y0 = new double[carried ? 6 : 4];
        y0[IsentropicEquations.PRESSURE] = 1.0 - xi2 / 6.0 + xi2 * xi2 / (45.0 * g1);
        y0[IsentropicEquations.MASS] = xi0 * xi2 / 3.0 - xi0 * xi2 * xi2 / (30.0 * g1);
        y0[IsentropicEquations.PRESSURE_INTEGRAL] = xi0 * xi2 / 3.0;
        y0[IsentropicEquations.POTENTIAL_INTEGRAL] = xi0 * xi2 * xi2 / 15.0;
        if (carried) {
            // ln(ρ/ρ_c) = −ξ²/(6Γ1c) and ln(T/T_c) = (Γ3c − 1) ln(ρ/ρ_c) to the same order as p
            double lnDensityRatio = -xi2 / (6.0 * g1);
            y0[AdiabatEquations.LN_RHO] = Math.log(rhoC) + lnDensityRatio;
            y0[AdiabatEquations.LN_T] = Math.log(centralTemperature) + (centre.Gamma3() - 1.0) * lnDensityRatio;
        }

        // absolute tolerances far below the smallest values that matter: p falls to 1e-12 and
        // must keep its relative accuracy there; the other components start near 1e-15..1e-25
        double[] absolute = carried ? new double[] {1e-24, 1e-24, 1e-30, 1e-30, 1e-13, 1e-13}
                : new double[] {1e-24, 1e-24, 1e-30, 1e-30};
        double[] relative = carried ? new double[] {tolerance, tolerance, tolerance, tolerance, tolerance, tolerance}
                : new double[] {tolerance, tolerance, tolerance, tolerance};
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, 0.25, absolute, relative);
        integrator.setMaxEvaluations(MAX_EVALUATIONS);
        DenseOutputModel dense = new DenseOutputModel();
        integrator.addStepHandler(dense);
        boolean[] stopped = new boolean[1];
        integrator.addEventDetector(new PressureFractionDetector(SURFACE_PRESSURE_FRACTION, AdaptableInterval.of(0.1),
                200, new BracketingNthOrderBrentSolver(0.0, 1e-14, 0.0, 5), (state, detector, increasing) -> {
                    stopped[0] = true;
                    return Action.STOP;
                }));
        ODEStateAndDerivative last;
        try {
            last = integrator.integrate(equations, new ODEState(xi0, y0), XI_CEILING);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic structure from rho_c = %.6g g/cm3, T_c = %.6g K: integration failed: %s", rhoC,
                    centralTemperature, e.getMessage()));
        }
        if (!stopped[0]) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic structure from rho_c = %.6g g/cm3, T_c = %.6g K: P/P_c never fell to %.1e before"
                            + " xi = %.0f", rhoC, centralTemperature, SURFACE_PRESSURE_FRACTION, XI_CEILING));
        }
        double[] y = last.getPrimaryState();
        double xiStop = last.getTime();
        double pStop = y[IsentropicEquations.PRESSURE];
        double muStop = y[IsentropicEquations.MASS];
        EosState stop = carried
                ? inversion.eos().state(Math.exp(y[AdiabatEquations.LN_RHO]), Math.exp(y[AdiabatEquations.LN_T]))
                : inversion.atPressureEntropy(pStop * pc, centre.s());
        double enthalpy = (stop.u() + stop.P() / stop.rho()) * rhoC / pc;
        double shrink = 1.0 - enthalpy * xiStop / muStop;
        if (!(shrink > 0.0)) {
            throw new ConvergenceException("isentropic structure: the surface extrapolation failed (h r_s/(G m_s) = "
                    + (1.0 - shrink) + " >= 1)");
        }
        double xiSurface = xiStop / shrink;
        double muTotal = muStop + xiStop * xiStop * xiStop * xiStop * pStop / muStop;
        double lengthScale = Math.sqrt(pc / (4.0 * Math.PI * GRAVITATION)) / rhoC;
        return new IsentropicStar(inversion, centre, lengthScale, xiStop, xiSurface, muTotal,
                y[IsentropicEquations.PRESSURE_INTEGRAL], y[IsentropicEquations.POTENTIAL_INTEGRAL], dense);
    }
}
