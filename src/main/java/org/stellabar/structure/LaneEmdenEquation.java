package org.stellabar.structure;

import org.hipparchus.ode.OrdinaryDifferentialEquation;

/**
 * The Lane-Emden equation θ'' + (2/ξ)θ' + θⁿ = 0 written as a first-order system in the
 * logarithmic radius t = ln ξ, for the state y = (θ, u) with u = ξ dθ/dξ = dθ/dt:
 *
 * <pre>
 *   dθ/dt = u
 *   du/dt = −u − ξ² max(θ, 0)ⁿ        (ξ = eᵗ)
 * </pre>
 *
 * <p>Why ln ξ: the integrator's step is then a fixed fraction of the radius reached, so the cost
 * grows with ln ξ₁ rather than with ξ₁. For n near 5, where ξ₁ runs into the thousands, θ follows
 * the power law θ ≈ √3/ξ of the n = 5 solution over most of the range; in t that is a smooth
 * exponential that an eighth-order method crosses in steps of order one, where in ξ itself the
 * step would have to stay a fraction of ξ anyway. The relative error of ξ₁ equals the absolute
 * error of t₁, which is what the event locator controls.
 *
 * <p>max(θ, 0)ⁿ continues the right-hand side past the surface, where the integrator samples
 * trial stages before the surface event stops it; θⁿ of a negative θ would be NaN for a
 * non-integer n.
 */
final class LaneEmdenEquation implements OrdinaryDifferentialEquation {

    private final double n;
    /** n when it is a small whole number (θⁿ then by multiplication, faster than pow), else −1. */
    private final int wholeIndex;

    /** @param n polytropic index, ≥ 0 */
    LaneEmdenEquation(double n) {
        this.n = n;
        this.wholeIndex = n == Math.rint(n) && n <= 8.0 ? (int) n : -1;
    }

    @Override
    public int getDimension() {
        return 2;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        double theta = y[0];
        double u = y[1];
        return new double[] {u, -u - source(t, theta)};
    }

    /** ξ² max(θ,0)ⁿ with ξ = eᵗ (the solver never lets ξ exceed 1e100, so ξ² stays finite). */
    private double source(double t, double theta) {
        double xi = Math.exp(t);
        if (n == 0.0) {
            return xi * xi;
        }
        if (theta <= 0.0) {
            return 0.0;
        }
        double power;
        if (wholeIndex >= 0) {
            power = 1.0;
            for (int i = 0; i < wholeIndex; i++) {
                power *= theta;
            }
        } else {
            power = Math.pow(theta, n);
        }
        return xi * xi * power;
    }
}
