package org.stellabar.numerics;

/**
 * Integrals of tabulated functions on non-uniform grids, as stellar profiles come: the one
 * quadrature of the project (structure's stability integrals, audit's integrals over a read
 * profile).
 *
 * <p>Each interval [x_i, x_{i+1}] is integrated exactly under the parabola through the interval
 * and its left neighbour, and again under the parabola through it and its right neighbour; the
 * two are averaged where both exist. The errors of the two parabolas are equal and opposite to
 * leading order on a smooth grid, so the rule is fourth order (like Simpson's) on interior
 * intervals and third order on the two end intervals; it is exact for quadratics everywhere and
 * for cubics on uniform grids (tested). Unlike composite Simpson it needs no even count of
 * intervals and gives the running integral at every node, e.g. m(r) from ρ(r). The Lagrange
 * weights of a parabola integrated over one of its intervals are textbook Lagrange interpolation
 * integrated exactly, here worked out for unequal steps (the equal-step case is in Press et al.,
 * <i>Numerical Recipes</i>, 3rd ed. 2007, §4.1; from memory).
 *
 * <p>Where the abscissae only do not decrease (a table repeating a value, e.g. masses printed with
 * few digits near the surface), no parabola can pass through the repeated nodes; the trapezoidal
 * rule ({@link #trapezoid}, {@link #trapezoidCumulative}, second order) is offered for those
 * grids, on which an interval of zero width simply adds nothing.
 */
public final class TabulatedQuadrature {

    private TabulatedQuadrature() {
    }

    /**
     * The running integral F_i = ∫_{x_0}^{x_i} f dx.
     *
     * @param x nodes, strictly increasing, at least 2
     * @param f values at the nodes
     * @return F, with F_0 = 0
     * @throws IllegalArgumentException if the arrays differ in length, have fewer than 2 nodes, or x is not increasing
     */
    public static double[] cumulative(double[] x, double[] f) {
        check(x, f);
        int k = x.length;
        double[] out = new double[k];
        if (k == 2) {
            out[1] = 0.5 * (x[1] - x[0]) * (f[0] + f[1]);
            return out;
        }
        for (int i = 0; i < k - 1; i++) {
            double left = i > 0 ? lastInterval(x[i - 1], x[i], x[i + 1], f[i - 1], f[i], f[i + 1]) : Double.NaN;
            double right = i + 2 < k ? firstInterval(x[i], x[i + 1], x[i + 2], f[i], f[i + 1], f[i + 2])
                    : Double.NaN;
            double piece = Double.isNaN(left) ? right : Double.isNaN(right) ? left : 0.5 * (left + right);
            out[i + 1] = out[i] + piece;
        }
        return out;
    }

    /**
     * ∫_{x_0}^{x_last} f dx.
     *
     * @param x nodes, strictly increasing, at least 2
     * @param f values at the nodes
     * @return the integral
     * @throws IllegalArgumentException as {@link #cumulative}
     */
    public static double integral(double[] x, double[] f) {
        double[] c = cumulative(x, f);
        return c[c.length - 1];
    }

    /** ∫ from a to b of the parabola through (a, fa), (b, fb), (c, fc). */
    private static double firstInterval(double a, double b, double c, double fa, double fb, double fc) {
        double h0 = b - a;
        double h1 = c - b;
        // Lagrange weights integrated over [a, b]
        double wa = h0 * (2.0 * h0 + 3.0 * h1) / (6.0 * (h0 + h1));
        double wb = h0 * (h0 + 3.0 * h1) / (6.0 * h1);
        double wc = -h0 * h0 * h0 / (6.0 * h1 * (h0 + h1));
        return wa * fa + wb * fb + wc * fc;
    }

    /** ∫ from b to c of the parabola through (a, fa), (b, fb), (c, fc). */
    private static double lastInterval(double a, double b, double c, double fa, double fb, double fc) {
        double h0 = b - a;
        double h1 = c - b;
        double wc = h1 * (2.0 * h1 + 3.0 * h0) / (6.0 * (h0 + h1));
        double wb = h1 * (h1 + 3.0 * h0) / (6.0 * h0);
        double wa = -h1 * h1 * h1 / (6.0 * h0 * (h0 + h1));
        return wa * fa + wb * fb + wc * fc;
    }

    private static void check(double[] x, double[] f) {
        checkLengths(x, f, 2);
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                throw new IllegalArgumentException("quadrature nodes must increase strictly: x[" + i + "] = " + x[i]
                        + " after " + x[i - 1]);
            }
        }
    }

    /**
     * The running integral by trapezoids, F_i = Σ_{j ≤ i} (f_j + f_{j−1})(x_j − x_{j−1})/2.
     *
     * @param x nodes, non-decreasing, at least 1
     * @param f values at the nodes
     * @return F, with F_0 = 0
     * @throws IllegalArgumentException if the arrays differ in length or are empty
     */
    public static double[] trapezoidCumulative(double[] x, double[] f) {
        checkLengths(x, f, 1);
        double[] out = new double[x.length];
        for (int i = 1; i < x.length; i++) {
            out[i] = out[i - 1] + 0.5 * (f[i] + f[i - 1]) * (x[i] - x[i - 1]);
        }
        return out;
    }

    /**
     * ∫_{x_0}^{x_last} f dx by trapezoids.
     *
     * @param x nodes, non-decreasing, at least 1
     * @param f values at the nodes
     * @return the integral
     * @throws IllegalArgumentException as {@link #trapezoidCumulative}
     */
    public static double trapezoid(double[] x, double[] f) {
        checkLengths(x, f, 1);
        double sum = 0.0;
        for (int i = 1; i < x.length; i++) {
            sum += 0.5 * (f[i] + f[i - 1]) * (x[i] - x[i - 1]);
        }
        return sum;
    }

    /**
     * @param x nodes
     * @return true if every node exceeds the one before, as the parabolic rule needs
     */
    public static boolean strictlyIncreasing(double[] x) {
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                return false;
            }
        }
        return true;
    }

    private static void checkLengths(double[] x, double[] f, int fewest) {
        if (x.length != f.length) {
            throw new IllegalArgumentException("quadrature: " + x.length + " nodes but " + f.length + " values");
        }
        if (x.length < fewest) {
            throw new IllegalArgumentException("quadrature needs at least " + fewest + " nodes, got " + x.length);
        }
    }
}
