package org.stellabar.structure;

import java.util.Arrays;
import java.util.List;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.stellabar.physics.BadInputException;

/**
 * A Lane-Emden function θ(ξ) and its slope dθ/dξ on [0, ξ_end], continuous in ξ: the central
 * series inside {@link LaneEmdenSeries#RADIUS}, the integrator's own dense output (the
 * seventh-order continuous extension of Dormand–Prince 8(5,3), Hairer, Nørsett &amp; Wanner 1993,
 * <i>Solving Ordinary Differential Equations I</i>, §II.6) beyond it. The error of an interpolated
 * value is of the order of the integration tolerance.
 *
 * <p>Immutable and thread-safe: Hipparchus step interpolators copy their stage derivatives and
 * evaluate without side effects, and this class only reads them.
 */
public final class LaneEmdenCurve {

    /**
     * Gauss–Legendre rule on [−1, 1], 10 nodes: the correctly rounded doubles of the nodes and
     * weights of Abramowitz &amp; Stegun 1964, <i>Handbook of Mathematical Functions</i>, Table 25.4
     * (n = 10), as Hipparchus' {@code GaussIntegratorFactory.legendreHighPrecision(10, -1, 1)}
     * computes them. Written out because that computation, in decimal arbitrary precision, cost a
     * quarter of a second of every command's start-up; {@code LaneEmdenCurveGaussRuleTest} checks the
     * literals against it.
     */
    static final double[] GAUSS_NODES = {
        -0.9739065285171717, -0.8650633666889845, -0.6794095682990244, -0.4333953941292472,
        -0.14887433898163122, 0.14887433898163122, 0.4333953941292472, 0.6794095682990244,
        0.8650633666889845, 0.9739065285171717};
    static final double[] GAUSS_WEIGHTS = {
        0.06667134430868814, 0.1494513491505806, 0.21908636251598204, 0.26926671930999635,
        0.29552422471475287, 0.29552422471475287, 0.26926671930999635, 0.21908636251598204,
        0.1494513491505806, 0.06667134430868814};

    private final double n;
    private final double xiEnd;
    private final boolean surface;
    private final double thetaEnd;
    private final double dthetaEnd;
    /** Dense output steps in order; stepEnds[i] is the t = ln ξ at which step i ends. */
    private final ODEStateInterpolator[] steps;
    private final double[] stepEnds;

    LaneEmdenCurve(double n, List<ODEStateInterpolator> steps, boolean surface, double xiEnd, double thetaEnd,
            double dthetaEnd) {
        this.n = n;
        this.steps = steps.toArray(new ODEStateInterpolator[0]);
        this.stepEnds = new double[this.steps.length];
        for (int i = 0; i < this.steps.length; i++) {
            stepEnds[i] = this.steps[i].getCurrentState().getTime();
        }
        this.surface = surface;
        this.xiEnd = xiEnd;
        this.thetaEnd = thetaEnd;
        this.dthetaEnd = dthetaEnd;
    }

    /** @return the polytropic index n */
    public double n() {
        return n;
    }

    /** @return the outermost ξ of the curve: ξ₁ if {@link #reachesSurface()}, else the requested end */
    public double xiEnd() {
        return xiEnd;
    }

    /** @return true if the curve ends where θ first reaches zero */
    public boolean reachesSurface() {
        return surface;
    }

    /** @return the number of integration steps stored (a measure of the work done) */
    public int stepCount() {
        return steps.length;
    }

    /**
     * θ at ξ.
     *
     * @param xi dimensionless radius in [0, {@link #xiEnd()}]
     * @return θ(ξ), never negative (0 at the surface)
     * @throws BadInputException if ξ is outside the curve
     */
    public double theta(double xi) {
        return at(xi).theta();
    }

    /**
     * dθ/dξ at ξ.
     *
     * @param xi dimensionless radius in [0, {@link #xiEnd()}]
     * @return dθ/dξ (0 at the centre, negative outside it)
     * @throws BadInputException if ξ is outside the curve
     */
    public double dthetaDxi(double xi) {
        return at(xi).dthetaDxi();
    }

    /**
     * θ and dθ/dξ at ξ in one evaluation.
     *
     * @param xi dimensionless radius in [0, {@link #xiEnd()}]
     * @return the point
     * @throws BadInputException if ξ is outside the curve
     */
    public LaneEmdenPoint at(double xi) {
        checkRange(xi);
        if (xi <= LaneEmdenSeries.RADIUS) {
            return new LaneEmdenPoint(xi, LaneEmdenSeries.theta(n, xi),
                    xi == 0.0 ? 0.0 : LaneEmdenSeries.xiDtheta(n, xi) / xi);
        }
        if (xi >= xiEnd) {
            return new LaneEmdenPoint(xiEnd, thetaEnd, dthetaEnd);
        }
        double[] y = state(xi).getPrimaryState();
        return new LaneEmdenPoint(xi, Math.max(y[0], 0.0), y[1] / xi);
    }

    /** A function of one point of the curve, to be integrated over ξ. */
    @FunctionalInterface
    public interface Integrand {
        /**
         * @param xi ξ
         * @param theta θ(ξ) ≥ 0
         * @param dthetaDxi dθ/dξ
         * @return the integrand's value
         */
        double value(double xi, double theta, double dthetaDxi);
    }

    /**
     * ∫₀^ξ_end f(ξ, θ, θ') dξ by Gauss–Legendre quadrature (10 nodes) on every integration step,
     * in t = ln ξ, with the last step split in four because integrands holding θⁿ are not smooth
     * at the surface for non-integer n. The error is of the order of the integration tolerance for
     * integrands smooth in ξ.
     *
     * @param f the integrand
     * @return the integral
     */
    public double integrate(Integrand f) {
        return integrate(new Integrand[] {f})[0];
    }

    /**
     * Several integrals in one pass over the dense output (each node interpolated once), by the
     * rule of {@link #integrate(Integrand)}.
     *
     * @param fs the integrands
     * @return their integrals, in order
     */
    public double[] integrate(Integrand... fs) {
        double[] total = new double[fs.length];
        double xi0 = Math.min(LaneEmdenSeries.RADIUS, xiEnd);
        for (int j = 0; j < GAUSS_NODES.length; j++) {
            double xi = 0.5 * xi0 * (1.0 + GAUSS_NODES[j]);
            double theta = LaneEmdenSeries.theta(n, xi);
            double dtheta = LaneEmdenSeries.xiDtheta(n, xi) / xi;
            for (int k = 0; k < fs.length; k++) {
                total[k] += 0.5 * xi0 * GAUSS_WEIGHTS[j] * fs[k].value(xi, theta, dtheta);
            }
        }
        for (int i = 0; i < steps.length; i++) {
            double ta = steps[i].getPreviousState().getTime();
            double tb = steps[i].getCurrentState().getTime();
            int pieces = i == steps.length - 1 ? 4 : 1;
            for (int piece = 0; piece < pieces; piece++) {
                double a = ta + (tb - ta) * piece / pieces;
                double b = ta + (tb - ta) * (piece + 1) / pieces;
                for (int j = 0; j < GAUSS_NODES.length; j++) {
                    double t = 0.5 * (a + b) + 0.5 * (b - a) * GAUSS_NODES[j];
                    double xi = Math.exp(t);
                    double[] y = steps[i].getInterpolatedState(t).getPrimaryState();
                    double theta = Math.max(y[0], 0.0);
                    double dtheta = y[1] / xi;
                    double weight = 0.5 * (b - a) * GAUSS_WEIGHTS[j] * xi;
                    for (int k = 0; k < fs.length; k++) {
                        total[k] += weight * fs[k].value(xi, theta, dtheta);
                    }
                }
            }
        }
        return total;
    }

    private ODEStateAndDerivative state(double xi) {
        double t = Math.log(xi);
        int i = Arrays.binarySearch(stepEnds, t);
        if (i < 0) {
            i = -i - 1;
        }
        if (i >= steps.length) {
            i = steps.length - 1;
        }
        return steps[i].getInterpolatedState(t);
    }

    private void checkRange(double xi) {
        if (!(xi >= 0.0 && xi <= xiEnd)) {
            throw new BadInputException("dimensionless radius xi = " + xi + " is outside the Lane-Emden solution for n = "
                    + n + "; allowed 0 <= xi <= " + xiEnd);
        }
    }
}
