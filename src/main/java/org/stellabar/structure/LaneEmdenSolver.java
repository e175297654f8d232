package org.stellabar.structure;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;

/**
 * Solves the Lane-Emden equation θ'' + (2/ξ)θ' + θⁿ = 0, θ(0) = 1, θ'(0) = 0, for a real index
 * 0 ≤ n &lt; 5 (Chandrasekhar 1939, <i>An Introduction to the Study of Stellar Structure</i>,
 * ch. IV; Horedt 2004, <i>Polytropes</i>, ch. 2).
 *
 * <p>Method. The central series (to ξ⁶) carries θ from the centre to ξ₀ = 10⁻², where the
 * equation's 2/ξ term is singular; from there Dormand–Prince 8(5,3) with adaptive steps
 * (Hipparchus {@link DormandPrince853Integrator}; Hairer, Nørsett &amp; Wanner 1993, §II.5)
 * integrates the system in t = ln ξ (see {@link LaneEmdenEquation} for why: the cost grows with
 * ln ξ₁, so n = 4.99 with ξ₁ ≈ 1.8·10³ costs about as much as n = 3), and an event detector
 * stops it where θ first vanishes. Its root is located to 10⁻¹⁴ in t, i.e. ξ₁ to 10⁻¹⁴ relative
 * beyond the integration error. The steps' dense output is kept, so θ and θ' are available at any
 * ξ afterwards ({@link LaneEmdenCurve}).
 *
 * <p>Accuracy. With the default relative tolerance 10⁻¹³, ξ₁ and ω_n agree with the closed
 * forms of n = 0 and 1 to about 10⁻¹³, and with an independent 50-digit Taylor-series
 * integration (n = 2, 3, 4, in the tests) to about 10⁻¹² or better (measured: ξ₁ within 1.3·10⁻¹³,
 * ω_n within 1.4·10⁻¹²); for non-integer n, tightening the tolerance to 10⁻¹⁵ moves them by less
 * than 10⁻¹¹ (n up to 4.99). θ between steps is good to about 10⁻¹², θ' to a few 10⁻¹².
 * Within 10⁻³ of n = 5 the surface is set by an ever smaller departure from the n = 5 solution
 * and ξ₁ loses accuracy as about 0.5·tolerance/(5 − n); the solution then says so
 * ({@link LaneEmdenSolution#accuracyNotes()}).
 *
 * <p>An immutable value: {@link #withTolerance(double)} returns a changed copy. Thread-safe:
 * every solve builds its own integrator (Hipparchus integrators are not thread-safe).
 */
public final class LaneEmdenSolver {

    /** Default relative tolerance of the integration. */
    public static final double DEFAULT_TOLERANCE = 1e-13;
    /** Largest polytropic index with a finite radius is just below this. */
    public static final double INDEX_LIMIT = 5.0;
    /** No integration goes beyond this ξ (n = 5 − 10⁻¹⁵ still ends near ξ₁ ≈ 2·10¹⁶). */
    public static final double XI_CEILING = 1e100;
    /** Bound on right-hand-side evaluations of one solve. */
    public static final int MAX_EVALUATIONS = 1_000_000;
    /** Location accuracy of the surface in t = ln ξ, i.e. relative accuracy of ξ₁. */
    static final double SURFACE_THRESHOLD = 1e-14;

    private final double tolerance;

    /** A solver with the {@link #DEFAULT_TOLERANCE}. */
    public LaneEmdenSolver() {
        this(DEFAULT_TOLERANCE);
    }

    private LaneEmdenSolver(double tolerance) {
        this.tolerance = tolerance;
    }

    /**
     * @param relativeTolerance relative tolerance per step, in [1e-15, 1e-3]
     * @return a solver with this tolerance
     * @throws BadInputException outside the range
     */
    public LaneEmdenSolver withTolerance(double relativeTolerance) {
        if (!(relativeTolerance >= 1e-15 && relativeTolerance <= 1e-3)) {
            throw new BadInputException("Lane-Emden tolerance " + relativeTolerance + " is outside [1e-15, 1e-3]");
        }
        return new LaneEmdenSolver(relativeTolerance);
    }

    /** @return the relative tolerance per step */
    public double tolerance() {
        return tolerance;
    }

    /**
     * Solves for the polytrope of index n out to its surface ξ₁.
     *
     * @param n polytropic index, 0 ≤ n &lt; 5
     * @return the solution with its constants and dense profile
     * @throws BadInputException if n is not finite, negative, or 5 or more (no finite radius)
     * @throws ConvergenceException if the integration fails within {@link #MAX_EVALUATIONS}
     */
    public LaneEmdenSolution solve(double n) {
        checkIndex(n);
        LaneEmdenCurve curve = integrate(n, XI_CEILING);
        if (!curve.reachesSurface()) {
            throw new ConvergenceException("Lane-Emden n = " + n + ": theta did not reach zero before xi = "
                    + XI_CEILING);
        }
        return new LaneEmdenSolution(curve, tolerance);
    }

    /**
     * Integrates θ from the centre out to ξ_end, or to the surface if that comes first. Unlike
     * {@link #solve(double)} this accepts any n ≥ 0, including n ≥ 5 where θ never vanishes
     * (for n = 5, θ = (1 + ξ²/3)^(−1/2)).
     *
     * @param n polytropic index, finite and ≥ 0
     * @param xiEnd outermost radius wanted, &gt; 0 and ≤ {@link #XI_CEILING}
     * @return the curve on [0, min(ξ_end, ξ₁)]
     * @throws BadInputException if n or ξ_end is out of range
     * @throws ConvergenceException if the integration fails within {@link #MAX_EVALUATIONS}
     */
    public LaneEmdenCurve integrate(double n, double xiEnd) {
        if (!Double.isFinite(n) || n < 0.0) {
            throw new BadInputException("polytropic index n = " + n + " must be a finite number >= 0");
        }
        if (!(xiEnd > 0.0 && xiEnd <= XI_CEILING)) {
            throw new BadInputException("Lane-Emden end radius xi = " + xiEnd + " must be in (0, " + XI_CEILING + "]");
        }
        double xi0 = LaneEmdenSeries.RADIUS;
        if (xiEnd <= xi0) {
            return new LaneEmdenCurve(n, List.of(), false, xiEnd, LaneEmdenSeries.theta(n, xiEnd),
                    LaneEmdenSeries.xiDtheta(n, xiEnd) / xiEnd);
        }
        double t0 = Math.log(xi0);
        double tEnd = Math.log(xiEnd);
        // Absolute tolerance below the relative one: θ falls to ~1e-3 over the outer region for n
        // near 5 and to zero at the surface. What fixes ξ₁ is the error of θ near the surface over
        // the slope dθ/dt = −ω_n/ξ₁ there (≥ 1e-4 for n ≤ 4.999), so 1e-4 of the relative
        // tolerance keeps ξ₁ to about the relative tolerance; a much smaller one would make the
        // non-smooth θⁿ (n < 1) at the surface demand steps below any sensible minimum.
        double absolute = tolerance * 1e-4;
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, 2.0, absolute, tolerance);
        integrator.setMaxEvaluations(MAX_EVALUATIONS);
        List<ODEStateInterpolator> steps = new ArrayList<>();
        integrator.addStepHandler(steps::add);
        boolean[] reached = new boolean[1];
        integrator.addEventDetector(new SurfaceDetector(AdaptableInterval.of(1.0), 200,
                new BracketingNthOrderBrentSolver(0.0, SURFACE_THRESHOLD, 0.0, 5),
                (state, detector, increasing) -> {
                    reached[0] = true;
                    return Action.STOP;
                }));
        ODEState start = new ODEState(t0,
                new double[] {LaneEmdenSeries.theta(n, xi0), LaneEmdenSeries.xiDtheta(n, xi0)});
        ODEStateAndDerivative last;
        try {
            last = integrator.integrate(new LaneEmdenEquation(n), start, tEnd);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException("Lane-Emden n = " + n + ": integration failed: " + e.getMessage());
        }
        double[] y = last.getPrimaryState();
        double xiLast = reached[0] ? Math.exp(last.getTime()) : xiEnd;
        double theta = reached[0] ? 0.0 : y[0];
        return new LaneEmdenCurve(n, steps, reached[0], xiLast, theta, y[1] / xiLast);
    }

    /**
     * Checks that a polytrope of index n has a finite radius.
     *
     * @param n polytropic index
     * @throws BadInputException naming the value and why it is refused
     */
    public static void checkIndex(double n) {
        if (Double.isNaN(n)) {
            throw new BadInputException("polytropic index n is not a number; allowed 0 <= n < 5");
        }
        if (n < 0.0) {
            throw new BadInputException("polytropic index n = " + n
                    + " is negative; allowed 0 <= n < 5");
        }
        if (n == INDEX_LIMIT) {
            throw new BadInputException("polytropic index n = 5 has an infinite radius (theta = (1 + xi^2/3)^(-1/2) "
                    + "never reaches zero; its mass is finite); allowed 0 <= n < 5");
        }
        if (n > INDEX_LIMIT) {
            throw new BadInputException("polytropic index n = " + n
                    + " has no finite radius (theta never reaches zero for n >= 5); allowed 0 <= n < 5");
        }
    }
}
