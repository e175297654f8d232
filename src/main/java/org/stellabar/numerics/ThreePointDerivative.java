package org.stellabar.numerics;

/**
 * First derivative of tabulated values on a non-uniform grid by three-point Lagrange
 * differences: the derivative at each node of the parabola through it and its two neighbours
 * (one-sided through the first or last three nodes at the ends). The truncation error is
 * +f'''·h₁h₂/6 at interior nodes and −f'''·h(h₁+h₂)/6 at the ends (h the step next to the end
 * node), second order in the local
 * spacing (e.g. Fornberg 1988, Math. Comp. 51, 699, for the general weights; the three-point case
 * is textbook). Exact for quadratics. The one derivative of tabulated values in the project.
 */
public final class ThreePointDerivative {

    private ThreePointDerivative() {
    }

    /**
     * @param x nodes, strictly increasing, at least three
     * @param f values at the nodes
     * @return f'(x) at every node
     * @throws IllegalArgumentException with fewer than three nodes or arrays of different lengths
     */
    public static double[] of(double[] x, double[] f) {
        int n = x.length;
        if (n < 3 || f.length != n) {
            throw new IllegalArgumentException("three-point differences need at least three nodes");
        }
        double[] d = new double[n];
        for (int i = 1; i < n - 1; i++) {
            double h1 = x[i] - x[i - 1];
            double h2 = x[i + 1] - x[i];
            d[i] = -h2 / (h1 * (h1 + h2)) * f[i - 1] + (h2 - h1) / (h1 * h2) * f[i] + h1 / (h2 * (h1 + h2)) * f[i + 1];
        }
        d[0] = atStart(x[0], x[1], x[2], f[0], f[1], f[2]);
        double h1 = x[n - 2] - x[n - 3];
        double h2 = x[n - 1] - x[n - 2];
        d[n - 1] = h2 / (h1 * (h1 + h2)) * f[n - 3] - (h1 + h2) / (h1 * h2) * f[n - 2]
                + (h1 + 2.0 * h2) / (h2 * (h1 + h2)) * f[n - 1];
        return d;
    }

    /**
     * The one-sided three-point derivative at x0 from (x0, x1, x2).
     *
     * @param x0 the node where the derivative is wanted
     * @param x1 the next node, x1 &gt; x0
     * @param x2 the one after, x2 &gt; x1
     * @param f0 f(x0)
     * @param f1 f(x1)
     * @param f2 f(x2)
     * @return f'(x0)
     */
    public static double atStart(double x0, double x1, double x2, double f0, double f1, double f2) {
        double h1 = x1 - x0;
        double h2 = x2 - x1;
        return -(2.0 * h1 + h2) / (h1 * (h1 + h2)) * f0 + (h1 + h2) / (h1 * h2) * f1 - h1 / (h2 * (h1 + h2)) * f2;
    }
}
