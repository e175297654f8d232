package org.stellabar.structure;

/**
 * Integrals of tabulated functions on non-uniform grids, as stellar profiles come.
 *
 * <p>Each interval [x_i, x_{i+1}] is integrated exactly under the parabola through the interval
 * and its left neighbour, and again under the parabola through it and its right neighbour; the
 * two are averaged where both exist. The errors of the two parabolas are equal and opposite to
 * leading order on a smooth grid, so the rule is fourth order (like Simpson's) on interior
 * intervals and third order on the two end intervals; it is exact for quadratics everywhere and
 * for cubics on uniform grids (tested). Unlike composite Simpson it needs no even count of
 * intervals and gives the running integral at every node, e.g. m(r) from ρ(r).
 */
public final class ProfileQuadrature {

    private ProfileQuadrature() {
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
        if (x.length != f.length) {
            throw new IllegalArgumentException("quadrature: " + x.length + " nodes but " + f.length + " values");
        }
        if (x.length < 2) {
            throw new IllegalArgumentException("quadrature needs at least 2 nodes, got " + x.length);
        }
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                throw new IllegalArgumentException("quadrature nodes must increase strictly: x[" + i + "] = " + x[i]
                        + " after " + x[i - 1]);
            }
        }
    }
}
