package org.stellabar.eos.fermi;

/**
 * The Fermi–Dirac integrals of {@link FermiDiracIntegrals} for strong degeneracy, η ≥ {@value #MIN_ETA}:
 * the integral of the weight up to the edge plus the Sommerfeld series, instead of a quadrature
 * across the edge.
 *
 * <p>For a weight h analytic in the disc |z − η| &lt; η (here x^m (1+θx/2)^{±1/2}, whose branch points
 * are at 0 and −2/θ), splitting at x = η and using f(−t) = 1 − f(t), f(t) = 1/(e^t + 1), gives exactly
 * <pre>
 *   ∫₀^∞ h(x) f(x − η) dx = ∫₀^η h dx + ∫₀^η [h(η+t) − h(η−t)] f(t) dt + ∫_η^∞ h(η+t) f(t) dt,
 * </pre>
 * and the Taylor series of the odd bracket, integrated against f with ∫₀^∞ t^j f dt = j! η_D(j+1)
 * (η_D the Dirichlet eta function), is the Sommerfeld expansion (Cox &amp; Giuli 1968, <i>Principles
 * of Stellar Structure</i>, ch. 24, to its first term):
 * F = H(η) + Σ_{j odd} 2 j! η_D(j+1) c_j, with c_j = h^{(j)}(η)/j!. The η derivative is the same
 * series for h′ (∫ h f(1−f) dx = ∫ h′ f dx, as h(0) = 0), the second for h″; the entropy integral
 * ∫ h σ(x−η) dx with σ = −[f ln f + (1−f) ln(1−f)] is even in t and, since σ′(t) = t f′(t), has the
 * moments ∫₀^∞ t^j σ dt = (j+2) j! η_D(j+2) (integration by parts), so it is Σ_{j even} 2(j+2) j!
 * η_D(j+2) c_j.
 *
 * <p>Error (our own bound, by Cauchy's estimates): with r = 0.9η and T = 0.7η, the Taylor remainder
 * of the bracket on [0, T] is below M (t/r)^{N+1}/(1 − t/r), M ≤ 2 max |h| on |z − η| = r ≤
 * 2 (1.9)^{m+1/2} (0.1)^{−1/2} h(η); against f ≤ e^{−t} it integrates to at most
 * M (N+1)!/((1 − T/r) r^{N+1}); the parts beyond T (of the bracket, of the series' polynomial and
 * the last integral) are below M e^{−T} times 2 + 1/((1 − T/r)(1 − N/T)). At η = {@value #MIN_ETA}
 * and N = {@value #ORDER} (the terms kept) that is below 6e-20 h(η)·(N+1)!-term and 1e-18 h(η)
 * for the e^{−T} terms, for every m ≤ 7/2 — i.e. below 1e-16 of h(η) itself, where every integral
 * here is at least h(η)/4 (the η derivatives) or η h(η)/4 (the integrals); larger η only shrink it.
 * Measured against the quadrature across the edge and mpmath in {@code DegenerateSeriesTest}.
 *
 * <p>The integrals of the weights up to the edge, H(η) = ∫₀^η x^k (1+θx/2)^{1/2} dx and their θ
 * derivatives, are Gauss–Legendre sums with the pieces of {@link FermiDiracIntegrals}'s part below
 * the edge: [0, s] in u = √x with s = min(η, 2/θ) (every such piece has Bernstein ρ ≥ 4.6 about
 * the branch points u = ±i(2/θ)^{1/2}), then [b, 4b] in x (ρ = 3): the 20-point rule's truncation is
 * below 1e-18 of each piece. The Fermi factor does not enter them: no exponential per node.
 *
 * <p>Taylor coefficients: w(x) = x^m (1 + ax)^p (a = θ/2) solves x(1 + ax) w′ = [m(1 + ax) + p a x] w,
 * which about x = η gives the two-term recurrence in {@link #coefficients}; x^{k+1} w from x^k w by
 * multiplying the series by (η + s).
 */
final class DegenerateSeries {

    /** The least η at which the series is used. */
    static final double MIN_ETA = 100.0;
    /** The last odd power of t kept in the series. */
    static final int ORDER = 25;
    /** Coefficients c_0 … c_{ORDER+2} (the second derivative needs c_{j+2}). */
    private static final int TERMS = ORDER + 3;
    /** 2 j! η_D(j+1) for odd j (0 at even j). */
    static final double[] ODD_MOMENT = new double[TERMS];
    /** 2 (j+2) j! η_D(j+2) for even j (0 at odd j). */
    static final double[] EVEN_MOMENT = new double[TERMS];

    static {
        double factorial = 1.0;
        for (int j = 0; j < TERMS; j++) {
            if (j > 0) {
                factorial *= j;
            }
            if (j % 2 == 1) {
                ODD_MOMENT[j] = 2.0 * factorial * dirichletEta(j + 1);
            } else {
                EVEN_MOMENT[j] = 2.0 * (j + 2) * factorial * dirichletEta(j + 2);
            }
        }
    }

    private DegenerateSeries() {
    }

    /**
     * η_D(s) = Σ_{n≥1} (−1)^{n+1} n^{−s} for s ≥ 1 by the alternating-series acceleration of Cohen,
     * Rodriguez Villegas &amp; Zagier (2000, Experimental Mathematics 9, 3, Algorithm 1): with 30 terms
     * the error is below 2/(3+√8)^{30} ≈ 2e-23, what remains is rounding (a few ulps).
     *
     * @param s the argument, ≥ 1
     * @return η_D(s)
     */
    static double dirichletEta(int s) {
        int n = 30;
        double d = Math.pow(3.0 + Math.sqrt(8.0), n);
        d = 0.5 * (d + 1.0 / d);
        double b = -1.0;
        double c = -d;
        double sum = 0.0;
        for (int k = 0; k < n; k++) {
            c = b - c;
            sum += c * Math.pow(k + 1.0, -s);
            b = (k + n) * (k - n) * b / ((k + 0.5) * (k + 1.0));
        }
        return sum / d;
    }

    /**
     * F_k, ∂F_k/∂η, ∂F_k/∂θ for k = 1/2, 3/2, 5/2 and the entropy integral, as
     * {@link FermiDiracIntegrals#evaluate} defines them (unscaled: η &gt; 0).
     *
     * @param eta η ≥ {@value #MIN_ETA}
     * @param theta θ ≥ 0
     * @return the integrals
     */
    static FermiDiracIntegrals.Values integrals(double eta, double theta) {
        double[] below = new double[6];
        edgeIntegrals(eta, theta, below, true);
        double a = 0.5 * theta;
        double[] c0 = new double[TERMS];
        double[] c1 = new double[TERMS];
        double[] c2 = new double[TERMS];
        coefficients(eta, a, 0.5, 0.5, Math.sqrt(eta * (1.0 + a * eta)), c0);
        shifted(eta, c0, c1);
        shifted(eta, c1, c2);
        double[] v0 = new double[TERMS];
        double[] v1 = new double[TERMS];
        double[] v2 = new double[TERMS];
        coefficients(eta, a, 1.5, -0.5, 0.25 * eta * Math.sqrt(eta / (1.0 + a * eta)), v0);
        shifted(eta, v0, v1);
        shifted(eta, v1, v2);
        double[] f = {below[0] + oddSum(c0), below[1] + oddSum(c1), below[2] + oddSum(c2)};
        double[] dEta = {slopeSum(c0), slopeSum(c1), slopeSum(c2)};
        double[] dTheta = {below[3] + oddSum(v0), below[4] + oddSum(v1), below[5] + oddSum(v2)};
        double entropy = 0.0;
        for (int j = TERMS - 1; j >= 0; j -= 1) {
            entropy += EVEN_MOMENT[j] * (c0[j] + theta * c1[j]);
        }
        return new FermiDiracIntegrals.Values(f, dEta, dTheta, 0.0, entropy);
    }

    /**
     * S = F_{1/2} + θF_{3/2} and its first two η derivatives, as
     * {@link FermiDiracIntegrals#densitySums} defines them.
     *
     * @param eta η ≥ {@value #MIN_ETA}
     * @param theta θ ≥ 0
     * @param out receives {S, S′, S″}
     */
    static void densitySums(double eta, double theta, double[] out) {
        double[] below = new double[6];
        edgeIntegrals(eta, theta, below, false);
        double a = 0.5 * theta;
        // the density weight x^{1/2}(1 + θx)(1 + ax)^{1/2} = w_{1/2} + θ w_{3/2}
        double[] c0 = new double[TERMS];
        coefficients(eta, a, 0.5, 0.5, Math.sqrt(eta * (1.0 + a * eta)), c0);
        double[] s = new double[TERMS];
        s[0] = c0[0] + theta * (eta * c0[0]);
        for (int j = 1; j < TERMS; j++) {
            s[j] = c0[j] + theta * (eta * c0[j] + c0[j - 1]);
        }
        double value = 0.0;
        double slope = 0.0;
        double curvature = 0.0;
        for (int j = ORDER; j >= 1; j -= 2) {
            value += ODD_MOMENT[j] * s[j];
            slope += ODD_MOMENT[j] * (j + 1) * s[j + 1];
            curvature += ODD_MOMENT[j] * ((j + 1) * (j + 2)) * s[j + 2];
        }
        out[0] = (below[0] + theta * below[1]) + value;
        out[1] = s[0] + slope;
        out[2] = s[1] + curvature;
    }

    /** Σ_{j odd} 2 j! η_D(j+1) c_j, smallest terms first. */
    private static double oddSum(double[] c) {
        double sum = 0.0;
        for (int j = ORDER; j >= 1; j -= 2) {
            sum += ODD_MOMENT[j] * c[j];
        }
        return sum;
    }

    /** The η derivative: c_0 + Σ_{j odd} 2 j! η_D(j+1) (j+1) c_{j+1}. */
    private static double slopeSum(double[] c) {
        double sum = 0.0;
        for (int j = ORDER; j >= 1; j -= 2) {
            sum += ODD_MOMENT[j] * (j + 1) * c[j + 1];
        }
        return c[0] + sum;
    }

    /**
     * Taylor coefficients about x = η of w(x) = x^m (1 + ax)^p: from x(1 + ax) w′ = [m(1 + ax) + pax] w,
     * with B = 1 + aη, ηB (j+1) c_{j+1} = [mB + paη − (B + aη) j] c_j + a (m + p + 1 − j) c_{j−1}.
     * The recurrence comes from a first-order equation, so it has no second solution to grow: a
     * rounding error at one step propagates like the coefficients themselves.
     */
    static void coefficients(double eta, double a, double m, double p, double first, double[] c) {
        double big = 1.0 + a * eta;
        double inverse = 1.0 / (eta * big);
        double lead = m * big + p * a * eta;
        double step = big + a * eta;
        c[0] = first;
        double previous = 0.0;
        double current = first;
        for (int j = 0; j + 1 < c.length; j++) {
            double next = ((lead - step * j) * current + a * (m + p + 1.0 - j) * previous) * inverse / (j + 1);
            c[j + 1] = next;
            previous = current;
            current = next;
        }
    }

    /** The coefficients of x · w about η, x = η + s: η c_j + c_{j−1}. */
    private static void shifted(double eta, double[] c, double[] out) {
        out[0] = eta * c[0];
        for (int j = 1; j < c.length; j++) {
            out[j] = eta * c[j] + c[j - 1];
        }
    }

    /**
     * ∫₀^η x^k (1+θx/2)^{1/2} dx for k = 1/2, 3/2, 5/2 into out[0..2] and, where {@code withTheta},
     * their θ derivatives ∫₀^η x^{k+1}/(4(1+θx/2)^{1/2}) dx into out[3..5]: Gauss–Legendre on [0, s]
     * in u = √x (s = min(η, 2/θ)), then on [b, min(4b, η)] in x.
     */
    static void edgeIntegrals(double eta, double theta, double[] out, boolean withTheta) {
        double[] gx = FermiDiracIntegrals.GL_X;
        double[] gw = FermiDiracIntegrals.GL_W;
        int nodes = FermiDiracIntegrals.NODES;
        double s = theta > 0.0 ? Math.min(eta, 2.0 / theta) : eta;
        double w0 = 0.0;
        double w1 = 0.0;
        double w2 = 0.0;
        double v0 = 0.0;
        double v1 = 0.0;
        double v2 = 0.0;
        double top = 0.5 * Math.sqrt(s);
        for (int i = 0; i < nodes; i++) {
            double u = top * (1.0 + gx[i]);
            double x = u * u;
            double stretch = 1.0 + 0.5 * theta * x;
            double k0 = gw[i] * top * 2.0 * u * Math.sqrt(x * stretch);
            double k1 = k0 * x;
            w0 += k0;
            w1 += k1;
            w2 += k1 * x;
            if (withTheta) {
                double t0 = k0 * x / (4.0 * stretch);
                double t1 = t0 * x;
                v0 += t0;
                v1 += t1;
                v2 += t1 * x;
            }
        }
        double lower = s;
        for (int guard = 0; lower < eta; guard++) {
            if (guard > 64) {
                throw new IllegalStateException("Fermi-Dirac quadrature below the edge did not close at eta " + eta);
            }
            double upper = Math.min(4.0 * lower, eta);
            if (upper > eta * (1 - 1e-12)) {
                upper = eta;
            }
            double half = 0.5 * (upper - lower);
            double mid = 0.5 * (upper + lower);
            for (int i = 0; i < nodes; i++) {
                double x = mid + half * gx[i];
                double stretch = 1.0 + 0.5 * theta * x;
                double k0 = gw[i] * half * Math.sqrt(x * stretch);
                double k1 = k0 * x;
                w0 += k0;
                w1 += k1;
                w2 += k1 * x;
                if (withTheta) {
                    double t0 = k0 * x / (4.0 * stretch);
                    double t1 = t0 * x;
                    v0 += t0;
                    v1 += t1;
                    v2 += t1 * x;
                }
            }
            lower = upper;
        }
        out[0] = w0;
        out[1] = w1;
        out[2] = w2;
        out[3] = v0;
        out[4] = v1;
        out[5] = v2;
    }
}
