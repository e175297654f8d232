package org.stellabar.eos.fermi;

/**
 * The net number integral of electrons minus positrons in units of A θ^{3/2} (see
 * {@link ElectronPositronGas}): ∫₀^∞ x^{1/2}(1+θx)(1+θx/2)^{1/2} [f(E − ψ) − f(E + ψ)] dx with
 * E = x + 1/θ and ψ = μ₋/kT, f(y) = 1/(e^y + 1), written with the identity
 * f(E − ψ) − f(E + ψ) = sinh ψ / (cosh E + cosh ψ) = 2 sinh ψ e^{−E} / (1 + e^{−2E} + 2 cosh ψ e^{−E}),
 * which has no cancellation when electrons and positrons are nearly equal in number and no overflow
 * for |ψ| ≤ 30. The quadrature layout is that of {@link FermiDiracIntegrals} with the Fermi edge at
 * x = |ψ| − 1/θ: the kernel's poles lie at x = ±ψ − 1/θ ± iπ.
 */
final class NetDensityIntegral {

    private NetDensityIntegral() {
    }

    /**
     * @param psi ψ = η + 1/θ, |ψ| ≤ 30
     * @param theta θ &gt; 0 with 1/θ ≤ 600
     * @param derivative whether to return ∂/∂ψ (equal to ∂/∂η at fixed θ)
     * @return the integral or its ψ derivative
     */
    static double evaluate(double psi, double theta, boolean derivative) {
        double edge = Math.max(Math.abs(psi) - 1.0 / theta, 0.0);
        double low = Math.max(edge - FermiDiracIntegrals.BELOW_EDGE, 0.0);
        double high = edge + FermiDiracIntegrals.ABOVE_EDGE;
        double sum = 0.0;
        // [0, first]: u = √x, then graded pieces as in FermiDiracIntegrals.smoothRegion
        int pieces = (int) Math.ceil((high - low) / FermiDiracIntegrals.PIECE_WIDTH);
        double width = (high - low) / pieces;
        double smoothEnd = low > 0.0 ? low : width;
        double s = Math.min(smoothEnd, 2.0 / theta);
        sum += sqrtPiece(s, psi, theta, derivative);
        double a = s;
        for (int guard = 0; a < smoothEnd && guard < 64; guard++) {
            double next = Math.min(4.0 * a, smoothEnd);
            if (next > smoothEnd * (1 - 1e-12)) {
                next = smoothEnd;
            }
            sum += linearPiece(a, next, psi, theta, derivative);
            a = next;
        }
        for (int p = low > 0.0 ? 0 : 1; p < pieces; p++) {
            double pa = low + p * width;
            double pb = p == pieces - 1 ? high : pa + width;
            sum += linearPiece(pa, pb, psi, theta, derivative);
        }
        return sum;
    }

    /**
     * The integral and its ψ derivative in one pass over the nodes of {@link #evaluate}, each summed
     * in the same order as there.
     *
     * @param psi ψ = η + 1/θ, |ψ| ≤ 30
     * @param theta θ &gt; 0 with 1/θ ≤ 600
     * @param out receives {integral, ∂/∂ψ}
     */
    static void evaluateBoth(double psi, double theta, double[] out) {
        double edge = Math.max(Math.abs(psi) - 1.0 / theta, 0.0);
        double low = Math.max(edge - FermiDiracIntegrals.BELOW_EDGE, 0.0);
        double high = edge + FermiDiracIntegrals.ABOVE_EDGE;
        double[] sum = new double[2];
        double[] piece = new double[2];
        int pieces = (int) Math.ceil((high - low) / FermiDiracIntegrals.PIECE_WIDTH);
        double width = (high - low) / pieces;
        double smoothEnd = low > 0.0 ? low : width;
        double s = Math.min(smoothEnd, 2.0 / theta);
        sqrtPieceBoth(s, psi, theta, piece);
        sum[0] += piece[0];
        sum[1] += piece[1];
        double a = s;
        for (int guard = 0; a < smoothEnd && guard < 64; guard++) {
            double next = Math.min(4.0 * a, smoothEnd);
            if (next > smoothEnd * (1 - 1e-12)) {
                next = smoothEnd;
            }
            linearPieceBoth(a, next, psi, theta, piece);
            sum[0] += piece[0];
            sum[1] += piece[1];
            a = next;
        }
        for (int p = low > 0.0 ? 0 : 1; p < pieces; p++) {
            double pa = low + p * width;
            double pb = p == pieces - 1 ? high : pa + width;
            linearPieceBoth(pa, pb, psi, theta, piece);
            sum[0] += piece[0];
            sum[1] += piece[1];
        }
        out[0] = sum[0];
        out[1] = sum[1];
    }

    private static void sqrtPieceBoth(double b, double psi, double theta, double[] out) {
        double half = 0.5 * Math.sqrt(b);
        double value = 0.0;
        double slope = 0.0;
        double[] kernel = new double[2];
        for (int i = 0; i < FermiDiracIntegrals.NODES; i++) {
            double u = half * (1.0 + FermiDiracIntegrals.GL_X[i]);
            double w = FermiDiracIntegrals.GL_W[i] * half * 2.0 * u;
            integrandBoth(u * u, u, psi, theta, kernel);
            value += w * kernel[0];
            slope += w * kernel[1];
        }
        out[0] = value;
        out[1] = slope;
    }

    private static void linearPieceBoth(double a, double b, double psi, double theta, double[] out) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double value = 0.0;
        double slope = 0.0;
        double[] kernel = new double[2];
        for (int i = 0; i < FermiDiracIntegrals.NODES; i++) {
            double x = mid + half * FermiDiracIntegrals.GL_X[i];
            double w = FermiDiracIntegrals.GL_W[i] * half;
            double root = Math.sqrt(x);
            integrandBoth(x, root, psi, theta, kernel);
            value += w * kernel[0];
            slope += w * kernel[1];
        }
        out[0] = value;
        out[1] = slope;
    }

    private static double sqrtPiece(double b, double psi, double theta, boolean derivative) {
        double half = 0.5 * Math.sqrt(b);
        double sum = 0.0;
        for (int i = 0; i < FermiDiracIntegrals.NODES; i++) {
            double u = half * (1.0 + FermiDiracIntegrals.GL_X[i]);
            sum += FermiDiracIntegrals.GL_W[i] * half * 2.0 * u * integrand(u * u, u, psi, theta, derivative);
        }
        return sum;
    }

    private static double linearPiece(double a, double b, double psi, double theta, boolean derivative) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double sum = 0.0;
        for (int i = 0; i < FermiDiracIntegrals.NODES; i++) {
            double x = mid + half * FermiDiracIntegrals.GL_X[i];
            sum += FermiDiracIntegrals.GL_W[i] * half * integrand(x, Math.sqrt(x), psi, theta, derivative);
        }
        return sum;
    }

    /** {@link #integrand} for the value and the derivative, sharing the exponentials (same expressions). */
    private static void integrandBoth(double x, double sqrtX, double psi, double theta, double[] out) {
        double e = Math.exp(-(x + 1.0 / theta));
        double coshTerm = 2.0 * Math.cosh(psi) * e;
        double denominator = 1.0 + e * e + coshTerm;
        double weight = sqrtX * (1.0 + theta * x) * Math.sqrt(1.0 + 0.5 * theta * x);
        out[0] = weight * (2.0 * Math.sinh(psi) * e / denominator);
        out[1] = weight * ((coshTerm * (1.0 + e * e) + 4.0 * e * e) / (denominator * denominator));
    }

    private static double integrand(double x, double sqrtX, double psi, double theta, boolean derivative) {
        double e = Math.exp(-(x + 1.0 / theta));
        double coshTerm = 2.0 * Math.cosh(psi) * e;
        double denominator = 1.0 + e * e + coshTerm;
        double kernel = derivative
                ? (coshTerm * (1.0 + e * e) + 4.0 * e * e) / (denominator * denominator)
                : 2.0 * Math.sinh(psi) * e / denominator;
        return sqrtX * (1.0 + theta * x) * Math.sqrt(1.0 + 0.5 * theta * x) * kernel;
    }
}
