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
 * of the bracket after t^N is below M (t/r)^{N+1}/(1 − t/r) on [0, T], with M ≤ 2 max |h| on
 * |z − η| = r ≤ 2 (1.9)^{m} (1.9 or 1/0.1)^{|p|} h(η) ≤ 60 h(η) for the weights here (m ≤ 7/2);
 * against f ≤ e^{−t} it integrates to at most 4.5 M (N+1)!/r^{N+1}; the parts beyond T (of the
 * bracket, of the series' polynomial, and the last integral) are below M e^{−T} (2 + 4.5/(1 − N/T)).
 * With the orders of {@link #order} (N = 21, 17, 13, 9 from η = 100, 150, 300, 1000) that is below
 * 3e-20 h(η) (and 1e-18 h(η) for the series of h′ and h″ of the η derivatives, and for the entropy's
 * even bracket h(η+t) + h(η−t) against σ ≤ (1 + t) e^{−t}, with N + 1 even terms), where every integral
 * here is at least h(η)/4 (the η derivatives, the entropy) or η h(η)/4 (the integrals): far below
 * the rounding of the sums. Measured against the quadrature across the edge and against mpmath in
 * {@code DegenerateSeriesTest}.
 *
 * <p>The integrals of the weights up to the edge, H(η) = ∫₀^η x^k (1+θx/2)^{1/2} dx and their θ
 * derivatives, are Gauss–Legendre sums with the pieces of {@link FermiDiracIntegrals}'s part below
 * the edge: [0, s] in u = √x with s = min(η, 2/θ) (every such piece has Bernstein ρ ≥ 4.6 about
 * the branch points u = ±i(2/θ)^{1/2}), then [b, 4b] in x (ρ = 3): the 20-point rule's truncation is
 * below 1e-18 of each piece. The Fermi factor does not enter them: no exponential per node. They are
 * taken to an anchor that depends on η alone and kept per anchor and θ ({@link AnchoredIntegrals}),
 * the rest to η from the Taylor series above.
 *
 * <p>Taylor coefficients: w(x) = x^m (1 + ax)^p (a = θ/2) solves x(1 + ax) w′ = [m(1 + ax) + p a x] w,
 * which about x = η gives the two-term recurrence in {@link #coefficients}; x^{k+1} w from x^k w by
 * multiplying the series by (η + s).
 */
final class DegenerateSeries {

    /** The least η at which the series is used. */
    static final double MIN_ETA = 100.0;
    /** The most odd powers of t kept in the series ({@link #order}). */
    private static final int MAX_ORDER = 21;
    /** Moments tabulated: c_0 … c_{MAX_ORDER+2} (the second derivative needs c_{j+2}). */
    private static final int TERMS = MAX_ORDER + 3;
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
     * The last odd power kept at η: the smallest of 9, 13, 17, 21 for which the bound in the class
     * comment, at the least η of its range, is below 1e-19 h(η) (η ≥ 1000, 300, 150, 100 in turn).
     */
    static int order(double eta) {
        return eta >= 1000.0 ? 9 : eta >= 300.0 ? 13 : eta >= 150.0 ? 17 : 21;
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
        double a = 0.5 * theta;
        int order = order(eta);
        int terms = order + 2;
        double[] c = new double[terms];
        double[] v = new double[terms];
        double big = 1.0 + a * eta;
        coefficients(eta, a, 0.5, 0.5, Math.sqrt(eta * big), c, 1.5, -0.5, 0.25 * eta * Math.sqrt(eta / big), v);
        // the series of x^{3/2}(…) and x^{5/2}(…) from that of x^{1/2}(…): (η + s) times it, twice;
        // odd j for the integrals, j + 1 for their η derivatives, even j for the entropy
        double f0 = 0.0, f1 = 0.0, f2 = 0.0, e0 = 0.0, e1 = 0.0, e2 = 0.0, t0 = 0.0, t1 = 0.0, t2 = 0.0;
        double entropy = 0.0;
        for (int j = order; j >= 1; j -= 2) {
            double moment = ODD_MOMENT[j];
            double c1 = eta * c[j] + c[j - 1];
            double c1Before = j >= 2 ? eta * c[j - 1] + c[j - 2] : eta * c[j - 1];
            double c2 = eta * c1 + c1Before;
            double n1 = eta * c[j + 1] + c[j];
            double n2 = eta * n1 + c1;
            double v1 = eta * v[j] + v[j - 1];
            double v1Before = j >= 2 ? eta * v[j - 1] + v[j - 2] : eta * v[j - 1];
            f0 += moment * c[j];
            f1 += moment * c1;
            f2 += moment * c2;
            double slopeMoment = moment * (j + 1);
            e0 += slopeMoment * c[j + 1];
            e1 += slopeMoment * n1;
            e2 += slopeMoment * n2;
            t0 += moment * v[j];
            t1 += moment * v1;
            t2 += moment * (eta * v1 + v1Before);
            // even powers j + 1 and j − 1 of the entropy series (x^{1/2}(1 + θx)(…) = w_{1/2} + θ w_{3/2})
            entropy += EVEN_MOMENT[j + 1] * (c[j + 1] + theta * n1);
        }
        entropy += EVEN_MOMENT[0] * (c[0] + theta * (eta * c[0]));
        // ∫₀^η from ∫₀^anchor plus ∫_anchor^η of the same Taylor series: Σ_j c_j (−1)^j Δ^{j+1}/(j+1)
        AnchoredIntegrals anchored = AnchoredIntegrals.at(eta, theta);
        double gap = eta - anchored.anchor;
        double g0 = 0.0, g1 = 0.0, g2 = 0.0, h0 = 0.0, h1 = 0.0, h2 = 0.0;
        for (int j = terms - 1; j >= 0; j--) {
            double c1 = eta * c[j] + (j >= 1 ? c[j - 1] : 0.0);
            double c1Before = j >= 1 ? eta * c[j - 1] + (j >= 2 ? c[j - 2] : 0.0) : 0.0;
            double v1 = eta * v[j] + (j >= 1 ? v[j - 1] : 0.0);
            double v1Before = j >= 1 ? eta * v[j - 1] + (j >= 2 ? v[j - 2] : 0.0) : 0.0;
            double power = RECIPROCAL[j + 1] * ((j & 1) == 0 ? 1.0 : -1.0);
            g0 = g0 * gap + power * c[j];
            g1 = g1 * gap + power * c1;
            g2 = g2 * gap + power * (eta * c1 + c1Before);
            h0 = h0 * gap + power * v[j];
            h1 = h1 * gap + power * v1;
            h2 = h2 * gap + power * (eta * v1 + v1Before);
        }
        double[] below = anchored.values;
        double c10 = eta * c[0];
        double[] f = {(below[0] + g0 * gap) + f0, (below[1] + g1 * gap) + f1, (below[2] + g2 * gap) + f2};
        double[] dEta = {c[0] + e0, c10 + e1, eta * c10 + e2};
        double[] dTheta = {(below[3] + h0 * gap) + t0, (below[4] + h1 * gap) + t1, (below[5] + h2 * gap) + t2};
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
        double a = 0.5 * theta;
        int order = order(eta);
        double[] c = new double[order + 3];
        coefficients(eta, a, 0.5, 0.5, Math.sqrt(eta * (1.0 + a * eta)), c);
        // the density weight x^{1/2}(1 + θx)(1 + ax)^{1/2} = w_{1/2} + θ w_{3/2}: s_j = c_j + θ(η c_j + c_{j−1})
        double value = 0.0;
        double slope = 0.0;
        double curvature = 0.0;
        for (int j = order; j >= 1; j -= 2) {
            double moment = ODD_MOMENT[j];
            double s0 = c[j] + theta * (eta * c[j] + c[j - 1]);
            double s1 = c[j + 1] + theta * (eta * c[j + 1] + c[j]);
            double s2 = c[j + 2] + theta * (eta * c[j + 2] + c[j + 1]);
            value += moment * s0;
            slope += moment * (j + 1) * s1;
            curvature += moment * ((j + 1) * (j + 2)) * s2;
        }
        AnchoredIntegrals anchored = AnchoredIntegrals.at(eta, theta);
        double gap = eta - anchored.anchor;
        double shift = 0.0;
        for (int j = c.length - 1; j >= 0; j--) {
            double sj = c[j] + theta * (eta * c[j] + (j >= 1 ? c[j - 1] : 0.0));
            shift = shift * gap + RECIPROCAL[j + 1] * ((j & 1) == 0 ? sj : -sj);
        }
        double[] below = anchored.values;
        out[0] = ((below[0] + theta * below[1]) + shift * gap) + value;
        out[1] = c[0] + theta * (eta * c[0]) + slope;
        out[2] = c[1] + theta * (eta * c[1] + c[0]) + curvature;
    }

    /** 1/j for j = 1 … 32 (index j): the recurrence's divisions as products. */
    private static final double[] RECIPROCAL = new double[33];

    static {
        for (int j = 1; j < RECIPROCAL.length; j++) {
            RECIPROCAL[j] = 1.0 / j;
        }
    }

    /**
     * Taylor coefficients about x = η of w(x) = x^m (1 + ax)^p: from x(1 + ax) w′ = [m(1 + ax) + pax] w,
     * with B = 1 + aη, ηB (j+1) c_{j+1} = [mB + paη − (B + aη) j] c_j + a (m + p + 1 − j) c_{j−1}.
     * The recurrence comes from a first-order equation, so it has no second solution to grow: a
     * rounding error at one step propagates like the coefficients themselves.
     *
     * @param first c_0 = w(η)
     * @param c receives c_0 … c_{c.length − 1}
     */
    static void coefficients(double eta, double a, double m, double p, double first, double[] c) {
        double big = 1.0 + a * eta;
        double inverse = 1.0 / (eta * big);
        double lead = m * big + p * a * eta;
        double step = big + a * eta;
        double previous = 0.0;
        double current = first;
        c[0] = first;
        for (int j = 0; j + 1 < c.length; j++) {
            double scale = inverse * RECIPROCAL[j + 1];
            double next = (lead - step * j) * scale * current + a * (m + p + 1.0 - j) * scale * previous;
            c[j + 1] = next;
            previous = current;
            current = next;
        }
    }

    /** {@link #coefficients} for two weights at once (independent chains, interleaved). */
    private static void coefficients(double eta, double a, double m, double p, double first, double[] c,
                                     double mv, double pv, double firstV, double[] v) {
        double big = 1.0 + a * eta;
        double inverse = 1.0 / (eta * big);
        double lead = m * big + p * a * eta;
        double leadV = mv * big + pv * a * eta;
        double step = big + a * eta;
        double previous = 0.0;
        double current = first;
        double previousV = 0.0;
        double currentV = firstV;
        c[0] = first;
        v[0] = firstV;
        for (int j = 0; j + 1 < c.length; j++) {
            double scale = inverse * RECIPROCAL[j + 1];
            double next = (lead - step * j) * scale * current + a * (m + p + 1.0 - j) * scale * previous;
            double nextV = (leadV - step * j) * scale * currentV + a * (mv + pv + 1.0 - j) * scale * previousV;
            c[j + 1] = next;
            v[j + 1] = nextV;
            previous = current;
            current = next;
            previousV = currentV;
            currentV = nextV;
        }
    }

    /**
     * The integrals to the edge ({@link #edgeIntegrals}) at an anchor below η that depends on η alone:
     * η with all but the leading 8 bits of its mantissa cleared, so 0 ≤ η − anchor &lt; 2⁻⁸ η. The rest,
     * ∫_anchor^η, comes from the Taylor series about η that the Sommerfeld terms use anyway (it
     * converges within η of it, here with ratio below 2⁻⁸: the ≥ 11 terms kept leave under 1e-26).
     * Neutrality's iterates and the final η share an anchor nearly always, and so do neighbouring
     * states; the entries are kept like {@link FermiDiracIntegrals}' Boltzmann table (immutable,
     * read and replaced without locks), and the numbers are the same whether or not they come from it.
     */
    static final class AnchoredIntegrals {
        private static final AnchoredIntegrals[] CACHE = new AnchoredIntegrals[64];
        /** Mantissa bits cleared: 52 − 8. */
        private static final long LOW_BITS = (1L << 44) - 1;
        final double anchor;
        final double theta;
        /** ∫₀^anchor x^k (1+θx/2)^{1/2} dx (k = 1/2, 3/2, 5/2), then their θ derivatives. */
        final double[] values;

        private AnchoredIntegrals(double anchor, double theta) {
            this.anchor = anchor;
            this.theta = theta;
            this.values = new double[6];
            edgeIntegrals(anchor, theta, values, true);
        }

        static AnchoredIntegrals at(double eta, double theta) {
            double anchor = Double.longBitsToDouble(Double.doubleToRawLongBits(eta) & ~LOW_BITS);
            long a = Double.doubleToLongBits(anchor);
            long t = Double.doubleToLongBits(theta);
            long mix = a * 0x9E3779B97F4A7C15L ^ t;
            int slot = (int) (mix ^ (mix >>> 29) ^ (mix >>> 47)) & (CACHE.length - 1);
            AnchoredIntegrals entry = CACHE[slot];
            if (entry != null && Double.doubleToLongBits(entry.anchor) == a && Double.doubleToLongBits(entry.theta) == t) {
                return entry;
            }
            entry = new AnchoredIntegrals(anchor, theta);
            CACHE[slot] = entry;
            return entry;
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
        java.util.Arrays.fill(out, 0, 6, 0.0);
        double top = 0.5 * Math.sqrt(s);
        for (int i = 0; i < nodes; i++) {
            double u = top * (1.0 + gx[i]);
            addNode(u * u, gw[i] * top * 2.0 * u, theta, withTheta, out);
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
                addNode(mid + half * gx[i], gw[i] * half, theta, withTheta, out);
            }
            lower = upper;
        }
    }

    /**
     * Adds one node's terms to the sums of {@link #edgeIntegrals}: the weight times
     * (1+θx/2)^{1/2} times x^{1/2}, x^{3/2}, x^{5/2}, and where {@code withTheta} the θ
     * derivatives' terms.
     *
     * @param x the node
     * @param scale the quadrature weight with the Jacobian of the piece's variable
     */
    private static void addNode(double x, double scale, double theta, boolean withTheta, double[] out) {
        double stretch = 1.0 + 0.5 * theta * x;
        double k0 = scale * Math.sqrt(x * stretch);
        double k1 = k0 * x;
        out[0] += k0;
        out[1] += k1;
        out[2] += k1 * x;
        if (withTheta) {
            double t0 = k0 * x / (4.0 * stretch);
            double t1 = t0 * x;
            out[3] += t0;
            out[4] += t1;
            out[5] += t1 * x;
        }
    }
}
