package org.stellabar.eos.fermi;

import org.stellabar.physics.BadInputException;

/**
 * The generalized Fermi–Dirac integrals F_k(η, θ) = ∫₀^∞ x^k (1 + θx/2)^{1/2} / (e^{x−η} + 1) dx
 * for k = 1/2, 3/2, 5/2 and their first derivatives in η and θ, evaluated together in one pass
 * over fixed quadrature nodes (Cox &amp; Giuli 1968, <i>Principles of Stellar Structure</i>, ch. 24,
 * where these integrals give the number density, pressure and energy of an ideal Fermi gas of
 * any degeneracy and relativity).
 *
 * <p>Method: piecewise Gauss–Legendre quadrature with the range split at the Fermi edge x = η,
 * the idea of Aparicio (1998, ApJS 117, 627) and of Gong, Zejda, Däppen &amp; Aparicio (2001,
 * Comput. Phys. Commun. 136, 294) — both recalled from memory, not re-read; the interval layout
 * below is our own and its accuracy is measured in {@code FermiDiracIntegralsTest} against the
 * closed form at θ = 0 and against mpmath quadrature. The Fermi factor is analytic in a strip of
 * half-width π about the real axis, so pieces of width at most {@value #PIECE_WIDTH} around the
 * edge with {@value #NODES}-point rules converge to below 1e-15; the edge region runs from
 * η − {@value #BELOW_EDGE} (where 1 − factor &lt; 3e-16) to max(η, 0) + {@value #ABOVE_EDGE}
 * (where the factor &lt; 2e-22). Below it the factor is 1 to double precision and the smooth
 * remainder x^k (1+θx/2)^{1/2} is integrated in two pieces, the first in u = √x, which removes
 * the square-root singularity at x = 0 (the same substitution is used for the first edge piece
 * when the edge region reaches x = 0).
 *
 * <p>No cancellation and no underflow: the factor and its η derivative f(1−f) are formed from
 * e^{−|x−η|}, never from 1 − f; for η &lt; 0 every integral is returned scaled by e^{−η}
 * ({@link Values#logScale()} = η), so that positron integrals at η₊ ≈ −2/θ (e.g. −10⁶) keep their
 * digits and the caller multiplies by e^{η} only when it forms a physical density (which then
 * underflows to an exact-to-double zero, never to NaN).
 */
public final class FermiDiracIntegrals {

    /** Gauss–Legendre points per piece. */
    static final int NODES = 20;
    /** Widest piece across the Fermi edge (in units of kT). */
    static final double PIECE_WIDTH = 4.0;
    /** The edge region starts this far below η. */
    static final double BELOW_EDGE = 36.0;
    /** The edge region ends this far above max(η, 0). */
    static final double ABOVE_EDGE = 50.0;

    /** Largest |η| accepted; beyond it the piece count or the exponent range would be exceeded. */
    public static final double MAX_ABS_ETA = 1.0e8;
    /** Largest θ accepted. */
    public static final double MAX_THETA = 1.0e4;

    static final double[] GL_X = new double[NODES];
    static final double[] GL_W = new double[NODES];

    static {
        legendreNodes(GL_X, GL_W);
    }

    private FermiDiracIntegrals() {
    }

    /**
     * The integrals and their derivatives. Index 0, 1, 2 stands for k = 1/2, 3/2, 5/2. Each value
     * is the true integral times e^{−logScale}.
     *
     * @param f F_k
     * @param dEta ∂F_k/∂η
     * @param dTheta ∂F_k/∂θ
     * @param logScale the natural logarithm of the factor the values must be multiplied by (min(η, 0))
     */
    public record Values(double[] f, double[] dEta, double[] dTheta, double logScale) {
        /**
         * Copies the arrays in.
         *
         * @param f F_k
         * @param dEta ∂F_k/∂η
         * @param dTheta ∂F_k/∂θ
         * @param logScale the natural logarithm of the factor the values must be multiplied by (min(η, 0))
         */
        public Values {
            f = f.clone();
            dEta = dEta.clone();
            dTheta = dTheta.clone();
        }

        /**
         * @param i 0 for k = 1/2, 1 for 3/2, 2 for 5/2
         * @return F_k unscaled for index i (0: k = 1/2, 1: 3/2, 2: 5/2); may underflow to 0
         */
        public double value(int i) {
            return f[i] * Math.exp(logScale);
        }

        /** @return a copy of the {@code f} component, so that this record stays unchanged */
        @Override
        public double[] f() {
            return f.clone();
        }

        /** @return a copy of the {@code dEta} component, so that this record stays unchanged */
        @Override
        public double[] dEta() {
            return dEta.clone();
        }

        /** @return a copy of the {@code dTheta} component, so that this record stays unchanged */
        @Override
        public double[] dTheta() {
            return dTheta.clone();
        }
    }

    /**
     * Evaluates F_{1/2}, F_{3/2}, F_{5/2} and their η and θ derivatives.
     *
     * @param eta degeneracy parameter η (chemical potential without rest mass over kT), |η| ≤ 1e8
     * @param theta kT/(m_e c²), 0 ≤ θ ≤ 1e4
     * @return the integrals, scaled by e^{−min(η, 0)}
     */
    public static Values evaluate(double eta, double theta) {
        if (!(Math.abs(eta) <= MAX_ABS_ETA)) {
            throw BadInputException.notAllowed("degeneracy parameter eta", eta, "", "|eta| <= " + MAX_ABS_ETA);
        }
        if (!(theta >= 0.0 && theta <= MAX_THETA)) {
            throw BadInputException.notAllowed("theta = kT/(m_e c^2)", theta, "", "0 <= theta <= " + MAX_THETA);
        }
        Accumulator acc = new Accumulator(eta, theta);
        double edgeLow = Math.max(eta - BELOW_EDGE, 0.0);
        double edgeHigh = Math.max(eta, 0.0) + ABOVE_EDGE;
        int pieces = (int) Math.ceil((edgeHigh - edgeLow) / PIECE_WIDTH);
        double width = (edgeHigh - edgeLow) / pieces;
        int first = 0;
        if (edgeLow > 0.0) {
            acc.smoothRegion(edgeLow);
        } else {
            acc.smoothRegion(width);
            first = 1;
        }
        if (eta > 0.0) {
            // laid out in y = x − η, so that x − η in the Fermi factor carries no rounding of x
            // (at η = 3e4 an ulp of x is 4e-12)
            double yLow = edgeLow - eta;
            for (int p = first; p < pieces; p++) {
                double ya = yLow + p * width;
                double yb = p == pieces - 1 ? edgeHigh - eta : ya + width;
                acc.edgePiece(ya, yb);
            }
        } else {
            for (int p = first; p < pieces; p++) {
                double a = p * width;
                double b = p == pieces - 1 ? edgeHigh : a + width;
                acc.linearPiece(a, b);
            }
        }
        return new Values(acc.f, acc.dEta, acc.dTheta, Math.min(eta, 0.0));
    }

    /** Sums the three integrals and their derivatives over quadrature points. */
    private static final class Accumulator {
        private final double eta;
        private final double theta;
        private final boolean scaled;
        final double[] f = new double[3];
        final double[] dEta = new double[3];
        final double[] dTheta = new double[3];

        Accumulator(double eta, double theta) {
            this.eta = eta;
            this.theta = theta;
            this.scaled = eta < 0.0;
        }

        /**
         * ∫ over x in [0, b] where the Fermi factor is smooth: [0, s] in u = √x with s ≤ 2/θ, so the
         * branch point of (1+θx/2)^{1/2} at u = i(2/θ)^{1/2} lies at least one interval length away,
         * then pieces [a, 4a] in x, whose singularities at x = 0 and −2/θ lie a third of a length away.
         */
        void smoothRegion(double b) {
            double s = theta > 0.0 ? Math.min(b, 2.0 / theta) : b;
            sqrtPiece(s);
            double a = s;
            for (int guard = 0; a < b && guard < 64; guard++) {
                double next = Math.min(4.0 * a, b);
                if (next > b * (1 - 1e-12)) {
                    next = b;
                }
                linearPiece(a, next);
                a = next;
            }
        }

        /** ∫ over x in [0, b] with x = u², dx = 2u du. */
        void sqrtPiece(double b) {
            double uMax = Math.sqrt(b);
            double half = 0.5 * uMax;
            for (int i = 0; i < NODES; i++) {
                double u = half * (1.0 + GL_X[i]);
                add(u * u, u * u - eta, u, GL_W[i] * half * 2.0 * u);
            }
        }

        /** ∫ over x in [a, b], a &gt; 0. */
        void linearPiece(double a, double b) {
            double half = 0.5 * (b - a);
            double mid = 0.5 * (a + b);
            for (int i = 0; i < NODES; i++) {
                double x = mid + half * GL_X[i];
                add(x, x - eta, Math.sqrt(x), GL_W[i] * half);
            }
        }

        /** ∫ over x = η + y for y in [ya, yb], η + ya &gt; 0. */
        void edgePiece(double ya, double yb) {
            double half = 0.5 * (yb - ya);
            double mid = 0.5 * (ya + yb);
            for (int i = 0; i < NODES; i++) {
                double y = mid + half * GL_X[i];
                double x = eta + y;
                add(x, y, Math.sqrt(x), GL_W[i] * half);
            }
        }

        private void add(double x, double d, double sqrtX, double weight) {
            // Fermi factor f and f(1−f) from e = exp(−|x−η|): no cancellation, no overflow
            double factor;
            double factorDerivative;
            if (scaled) {
                // η < 0 ≤ x: f e^{−η} = e^{−x} / (1 + e^{η−x}); (1−f) = 1 / (1 + e^{η−x})
                double e = Math.exp(-d);
                double oneMinus = 1.0 / (1.0 + e);
                factor = Math.exp(-x) * oneMinus;
                factorDerivative = factor * oneMinus;
            } else {
                double e = Math.exp(-Math.abs(d));
                double inv = 1.0 / (1.0 + e);
                if (d > 0.0) {
                    factor = e * inv;
                    factorDerivative = factor * inv;
                } else {
                    factor = inv;
                    factorDerivative = inv * e * inv;
                }
            }
            double root = Math.sqrt(1.0 + 0.5 * theta * x);
            double w = weight * sqrtX;
            double k0 = w * root; // x^{1/2} (1+θx/2)^{1/2}
            double t0 = w * x / (4.0 * root); // ∂/∂θ of that
            double k1 = k0 * x;
            double k2 = k1 * x;
            double t1 = t0 * x;
            double t2 = t1 * x;
            f[0] += k0 * factor;
            f[1] += k1 * factor;
            f[2] += k2 * factor;
            dEta[0] += k0 * factorDerivative;
            dEta[1] += k1 * factorDerivative;
            dEta[2] += k2 * factorDerivative;
            dTheta[0] += t0 * factor;
            dTheta[1] += t1 * factor;
            dTheta[2] += t2 * factor;
        }
    }

    /**
     * Gauss–Legendre nodes and weights on [−1, 1] by Newton's method on P_n with the three-term
     * recurrence (Press et al., <i>Numerical Recipes</i>, 3rd ed. 2007, §4.6, routine gauleg).
     */
    private static void legendreNodes(double[] x, double[] w) {
        int n = x.length;
        int m = (n + 1) / 2;
        for (int i = 0; i < m; i++) {
            double z = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double derivative = 0.0;
            boolean converged = false;
            for (int iteration = 0; iteration < 100 && !converged; iteration++) {
                double p1 = 1.0;
                double p2 = 0.0;
                for (int j = 0; j < n; j++) {
                    double p3 = p2;
                    p2 = p1;
                    p1 = ((2.0 * j + 1.0) * z * p2 - j * p3) / (j + 1.0);
                }
                derivative = n * (z * p1 - p2) / (z * z - 1.0);
                double previous = z;
                z = previous - p1 / derivative;
                converged = Math.abs(z - previous) <= 1e-14;
            }
            if (!converged) {
                throw new IllegalStateException("Gauss-Legendre nodes did not converge");
            }
            derivative = legendreDerivative(n, z);
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = 2.0 / ((1.0 - z * z) * derivative * derivative);
            w[n - 1 - i] = w[i];
        }
    }

    /** P_n'(z) by the three-term recurrence. */
    private static double legendreDerivative(int n, double z) {
        double p1 = 1.0;
        double p2 = 0.0;
        for (int j = 0; j < n; j++) {
            double p3 = p2;
            p2 = p1;
            p1 = ((2.0 * j + 1.0) * z * p2 - j * p3) / (j + 1.0);
        }
        return n * (z * p1 - p2) / (z * z - 1.0);
    }
}
