package org.stellabar.numerics;

import org.stellabar.physics.ConvergenceException;

/**
 * Newton's method kept inside a bracket: a Newton step that would leave the bracket, or that
 * shrinks it too slowly, is replaced by bisection, so the iteration converges for any continuous
 * monotone function with a sign change and quadratically near a simple root (the "rtsafe"
 * scheme of Press et al., <i>Numerical Recipes</i>, 3rd ed. 2007, §9.4).
 */
public final class BracketedNewton {

    /** Largest number of iterations before giving up; bisection alone needs ~1100 for doubles. */
    public static final int MAX_ITERATIONS = 1200;

    /** A function with its derivative, evaluated without allocation. */
    public interface Function {
        /**
         * @param x the argument, inside the bracket
         * @return f(x)
         */
        double value(double x);

        /**
         * @param x the argument, inside the bracket
         * @return f'(x)
         */
        double derivative(double x);
    }

    private BracketedNewton() {
    }

    /**
     * Finds the root of {@code f} in [lo, hi], where f(lo) and f(hi) have opposite signs.
     *
     * @param what a name for the equation, used in the failure message
     * @param f the function
     * @param lo lower end of the bracket
     * @param hi upper end of the bracket
     * @param relativeTolerance convergence when a step changes x by less than this times max(1, |x|)
     * @return the root
     * @throws ConvergenceException if the bracket has no sign change or the count is exhausted
     */
    public static double solve(String what, Function f, double lo, double hi, double relativeTolerance) {
        return solve(() -> what, f, lo, hi, relativeTolerance);
    }

    /**
     * As {@link #solve(String, Function, double, double, double)}, the equation's name made only
     * for a failure message: a name with numbers in it (the luminosity of a catalogue star, say)
     * cost more to write than the solve itself, in a solve run thousands of times per star.
     *
     * @param what makes a name for the equation, used in the failure message
     * @param f the function
     * @param lo lower end of the bracket
     * @param hi upper end of the bracket
     * @param relativeTolerance convergence when a step changes x by less than this times max(1, |x|)
     * @return the root
     * @throws ConvergenceException if the bracket has no sign change or the count is exhausted
     */
    public static double solve(java.util.function.Supplier<String> what, Function f, double lo, double hi,
            double relativeTolerance) {
        double fLo = f.value(lo);
        double fHi = f.value(hi);
        if (Double.isNaN(fLo) || Double.isNaN(fHi)) {
            throw new ConvergenceException(what.get() + ": the function is NaN at an end of [" + lo + ", " + hi
                    + "] (f = " + fLo + ", " + fHi + ")");
        }
        if (fLo == 0.0) {
            return lo;
        }
        if (fHi == 0.0) {
            return hi;
        }
        if (Math.signum(fLo) == Math.signum(fHi)) {
            throw new ConvergenceException(what.get() + ": no sign change in [" + lo + ", " + hi + "] (f = " + fLo
                    + ", " + fHi + ")");
        }
        // orient so that f(a) < 0 < f(b)
        double a = fLo < 0 ? lo : hi;
        double b = fLo < 0 ? hi : lo;
        double x = 0.5 * (lo + hi);
        double previousStep = Math.abs(hi - lo);
        double step = previousStep;
        double fx = f.value(x);
        double dfx = f.derivative(x);
        if (fx == 0.0) {
            return x;
        }
        if (Double.isNaN(fx) || Double.isNaN(dfx)) {
            throw new ConvergenceException(what.get() + ": the function or its derivative is NaN at x = " + x);
        }
        // the midpoint's sign narrows the bracket at once, so that a first bisection step moves
        if (fx < 0.0) {
            a = x;
        } else {
            b = x;
        }
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            boolean newtonLeaves = ((x - b) * dfx - fx) * ((x - a) * dfx - fx) > 0.0;
            boolean newtonSlow = Math.abs(2.0 * fx) > Math.abs(previousStep * dfx);
            if (newtonLeaves || newtonSlow || dfx == 0.0) {
                previousStep = step;
                step = 0.5 * (b - a);
                double next = a + step;
                if (next == a || next == b) {
                    // the bracket is two neighbouring doubles: x, one of them, is the root
                    return x;
                }
                x = next;
            } else {
                previousStep = step;
                step = fx / dfx;
                double next = x - step;
                if (next == x) {
                    return x;
                }
                x = next;
            }
            if (Math.abs(step) <= relativeTolerance * Math.max(1.0, Math.abs(x))) {
                return x;
            }
            fx = f.value(x);
            dfx = f.derivative(x);
            if (fx == 0.0) {
                return x;
            }
            if (Double.isNaN(fx) || Double.isNaN(dfx)) {
                throw new ConvergenceException(what.get() + ": the function or its derivative is NaN at x = " + x
                        + " after " + (i + 1) + " iterations");
            }
            if (fx < 0.0) {
                a = x;
            } else {
                b = x;
            }
        }
        throw new ConvergenceException(what.get() + ": no convergence after " + MAX_ITERATIONS
                + " iterations; last x = " + x + ", f(x) = " + fx);
    }
}
