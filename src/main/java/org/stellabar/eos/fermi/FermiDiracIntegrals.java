package org.stellabar.eos.fermi;

import org.stellabar.physics.BadInputException;

/**
 * The generalized Fermi–Dirac integrals F_k(η, θ) = ∫₀^∞ x^k (1 + θx/2)^{1/2} / (e^{x−η} + 1) dx
 * for k = 1/2, 3/2, 5/2 and their first derivatives in η and θ, evaluated together in one pass
 * over fixed quadrature nodes (Cox &amp; Giuli 1968, <i>Principles of Stellar Structure</i>, ch. 24,
 * where these integrals give the number density, pressure and energy of an ideal Fermi gas of
 * any degeneracy and relativity).
 *
 * <p>Method: piecewise Gauss–Legendre quadrature with the range split around the Fermi edge x = η,
 * the idea of Aparicio (1998, ApJS 117, 627) and of Gong, Zejda, Däppen &amp; Aparicio (2001,
 * Comput. Phys. Commun. 136, 294) — both recalled from memory, not re-read; the piece layout
 * below is our own and its accuracy is measured in {@code FermiDiracIntegralsTest} against the
 * closed form at θ = 0 and against mpmath quadrature. The layout follows the singularities of the
 * integrand: the Fermi factor has poles at x = η ± iπ, the weight x^k (1+θx/2)^{1/2} branch points
 * at x = 0 and x = −2/θ. An n-point Gauss–Legendre rule on a piece converges like ρ^{−2n}, ρ the
 * largest Bernstein ellipse about the piece free of singularities (Trefethen 2013, <i>Approximation
 * Theory and Approximation Practice</i>, ch. 19); every piece here has ρ ≳ 2.8, so that the
 * {@value #NODES}-point rule's truncation is below 1e-17 of the piece:
 * <ul>
 *   <li>about the edge, pieces with ends at η + (−36, −16, −6, 0, 6, 16, 50) (those above 2),
 *       each at most three times as wide as its distance from the nearest pole; laid out in
 *       y = x − η so that x − η carries no rounding of x (at η = 3e4 an ulp of x is 4e-12);</li>
 *   <li>below η − 36 the Fermi factor is 1 to double precision (1 − factor &lt; 3e-16), and the
 *       smooth remainder is integrated on pieces [a, 4a] (a third of a length from the branch
 *       points), the first piece [0, s] in u = √x with s ≤ 2/θ, which removes the square-root
 *       singularity at x = 0 and keeps the branch point of (1+θx/2)^{1/2} an interval length away;</li>
 *   <li>when η ≤ 2 the edge is at the origin: [0, 2] in u = √x, then 6, 16, 52.</li>
 * </ul>
 * The last piece, [η + 16, η + 50], is 34 wide: its ellipse reaches ρ ≈ 3.6 before the poles, and
 * the factor e^{−y} it integrates is below e^{−16} of the edge's. Above max(η, 2) + 50 the factor
 * is below 2e-22. The earlier layout (pieces of width 4 across the whole edge region, ~500 nodes)
 * gave the same digits (measured: within 8e-15 over η ∈ [−800, 1e6] × θ ∈ [0, 1e4]) with three to
 * five times the work: now ~80 nodes at the origin and ~140–220 about a degenerate edge.
 *
 * <p>No cancellation and no underflow: the factor and its η derivative f(1−f) are formed from
 * e^{−|x−η|}, never from 1 − f; for η &lt; 0 every integral is returned scaled by e^{−η}
 * ({@link Values#logScale()} = η), so that positron integrals at η₊ ≈ −2/θ (e.g. −10⁶) keep their
 * digits and the caller multiplies by e^{η} only when it forms a physical density (which then
 * underflows to an exact-to-double zero, never to NaN).
 *
 * <p>Below η = {@value #BOLTZMANN_ETA} the scaled integrals do not depend on η at all (1 + e^{η−x}
 * rounds to 1 for every x ≥ 0, the Boltzmann limit), so they are computed once per θ and kept in a
 * small table: the same numbers bit for bit as a fresh evaluation, which is what a grid of states
 * at one temperature, or the positrons of every non-pair state, would otherwise repeat. The
 * entropy integral is linear in η there (σ e^{−η} = e^{−x}(x − η + 1)) and is shifted from the
 * table's η exactly so: like every entropy integral at η &lt; 0 it comes from the identity
 * T s = E + P − μn ({@link #entropyFromIdentity}), a sum of positive terms.
 *
 * <p>Work per node, where the states are (measured costs in src/bench/README.md):
 * <ul>
 *   <li>above η = 2 the edge pieces laid out in y are the same pieces at every η (the standard
 *       offsets, unsplit), so their nodes' Fermi factor, f(1−f), 1 − 2f and entropy per state are
 *       computed once ({@code EdgeTable}); an evaluation forms only x = η + y, one square root
 *       (x(1 + θx/2) under one root) and, for the θ derivatives, one division per node — the
 *       same numbers as the node-by-node expressions, bit for bit (tested);</li>
 *   <li>more than {@value #DEEP} below a degenerate edge the terms in e^{x−η} are left out (below
 *       1e-17 of the sums, see {@code DEEP}): no exponential at the nodes of the pieces in x;</li>
 *   <li>ln(1 + e) of the entropy per state comes from its series below e = 2⁻¹⁰, most nodes away
 *       from the edge, so that a logarithm is taken only near the edge; at η &lt; 0 the entropy per
 *       state is not summed at all (the identity above);</li>
 *   <li>the pair-rich states, electrons and positrons both at η &lt; 0, take one pass over the
 *       origin nodes for both species ({@link #evaluatePair});</li>
 *   <li>at η ≥ {@value DegenerateSeries#MIN_ETA} no quadrature across the edge at all: the integral of
 *       the weight up to the edge (no Fermi factor, kept per anchor) plus the Sommerfeld series
 *       ({@link DegenerateSeries}, with a bound on its error below 1e-18 and tests against mpmath and
 *       against the layout above).</li>
 * </ul>
 */
public final class FermiDiracIntegrals {

    /** Gauss–Legendre points per piece. */
    static final int NODES = 20;
    /** The edge region starts this far below η. */
    static final double BELOW_EDGE = 36.0;
    /** The edge region ends this far above max(η, 0). */
    static final double ABOVE_EDGE = 50.0;
    /**
     * At or below this η, 1 + e^{η−x} is 1 in double precision for every x ≥ 0 (e^{−37} = 8.5e-17
     * is below half an ulp of 1), so the scaled integrals depend on θ only.
     */
    static final double BOLTZMANN_ETA = -37.0;
    /** Piece ends about the edge, as offsets from η (the last is {@link #ABOVE_EDGE}). */
    private static final double[] EDGE_OFFSETS = {-BELOW_EDGE, -16.0, -6.0, 0.0, 6.0, 16.0, ABOVE_EDGE};
    /** Piece ends when the edge is at the origin (η ≤ 2); the last is max(η, 0) + {@link #ABOVE_EDGE}. */
    private static final double[] ORIGIN_ENDS = {2.0, 6.0, 16.0};
    /** Edges at or below this are laid out from the origin. */
    private static final double ORIGIN_EDGE = 2.0;
    /** More pieces than any layout has (at most ~20 pieces [a, 4a] from 2e-4 to 1e8, plus the edge). */
    private static final int MAX_PIECES = 64;

    /** Largest |η| accepted; beyond it the piece count or the exponent range would be exceeded. */
    public static final double MAX_ABS_ETA = 1.0e8;
    /** Largest θ accepted. */
    public static final double MAX_THETA = 1.0e4;

    static final double[] GL_X = new double[NODES];
    static final double[] GL_W = new double[NODES];

    /** Boltzmann-limit results by θ: immutable entries, read and replaced without locks. */
    private static final BoltzmannEntry[] BOLTZMANN = new BoltzmannEntry[64];

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
     * @param entropy the entropy integral ∫ x^{1/2}(1+θx)(1+θx/2)^{1/2} σ dx with
     *        σ = −[f ln f + (1−f) ln(1−f)], f the Fermi factor (the entropy per state of a Fermi gas;
     *        Landau &amp; Lifshitz, <i>Statistical Physics</i>, §55), so that the gas's entropy density is
     *        k A θ^{3/2} times it (A as in {@link ElectronPositronGas}): no difference of large terms,
     *        unlike (E + P − μn)/T, which loses the digits of a degenerate gas's small entropy; for
     *        η &lt; 0 it is formed from that identity ({@link #entropyFromIdentity}), where it has no
     *        cancellation (measured against the integral at 30 digits in {@code FermiGasRadiationEosTest})
     */
    public record Values(double[] f, double[] dEta, double[] dTheta, double logScale, double entropy) {
        /**
         * Copies the arrays in.
         *
         * @param f F_k
         * @param dEta ∂F_k/∂η
         * @param dTheta ∂F_k/∂θ
         * @param logScale the natural logarithm of the factor the values must be multiplied by (min(η, 0))
         * @param entropy the entropy-per-state integral, on the same scale
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

        /** Scaled F_k for index i, without copying the array. */
        double f(int i) {
            return f[i];
        }

        /** Scaled ∂F_k/∂η for index i, without copying the array. */
        double dEta(int i) {
            return dEta[i];
        }

        /** Scaled ∂F_k/∂θ for index i, without copying the array. */
        double dTheta(int i) {
            return dTheta[i];
        }
    }

    /** A Boltzmann-limit result at one θ. */
    private record BoltzmannEntry(double theta, Values values, double[] density) {
    }

    /**
     * Evaluates F_{1/2}, F_{3/2}, F_{5/2} and their η and θ derivatives.
     *
     * @param eta degeneracy parameter η (chemical potential without rest mass over kT), |η| ≤ 1e8
     * @param theta kT/(m_e c²), 0 ≤ θ ≤ 1e4
     * @return the integrals, scaled by e^{−min(η, 0)}
     */
    public static Values evaluate(double eta, double theta) {
        requireInRange(eta, theta);
        if (eta <= BOLTZMANN_ETA) {
            BoltzmannEntry entry = boltzmann(theta);
            Values v = entry.values();
            // the scaled F_k are η-free here, the entropy integral is not: from the identity at η
            return new Values(v.f, v.dEta, v.dTheta, eta, entropyFromIdentity(eta, theta, v.f[0], v.f[1], v.f[2]));
        }
        return compute(eta, theta);
    }

    /**
     * The integrals of the electrons at η and of the positrons at η₊ = −η − 2/θ, as
     * {@link #evaluate} gives each (the same numbers bit for bit), in one pass over the nodes where
     * both are below 0 and above {@value #BOLTZMANN_ETA} (the pair-rich states: both edges at the
     * origin, so that the nodes, weights and e^{−x} are shared and only the Fermi factors differ).
     *
     * @param eta the electrons' η
     * @param etaPlus the positrons' η₊, ≥ −800 (below, the caller leaves the positrons out)
     * @param theta θ
     * @param out receives {electrons, positrons}
     */
    static void evaluatePair(double eta, double etaPlus, double theta, Values[] out) {
        requireInRange(eta, theta);
        requireInRange(etaPlus, theta);
        if (eta < 0.0 && etaPlus < 0.0 && eta > BOLTZMANN_ETA && etaPlus > BOLTZMANN_ETA) {
            OriginNodes.of(theta).integralsScaledPair(eta, etaPlus, out);
            return;
        }
        out[0] = evaluate(eta, theta);
        out[1] = evaluate(etaPlus, theta);
    }

    /**
     * The entropy integral from the thermodynamic identity T s = E + P − μ n of one species (Cox &amp;
     * Giuli 1968, ch. 24; the rest mass drops out, as it adds m c² n to both E and μ n): in the
     * integrals' terms (5/3)F_{3/2} + (4/3)θF_{5/2} − η(F_{1/2} + θF_{3/2}), on the scale of its
     * arguments. Used for η &lt; 0 only, where every term is positive (no cancellation) and the
     * logarithms of the entropy per state are saved; above, a degenerate gas's small entropy would be
     * the difference of large terms, and the integral of the entropy per state is kept.
     */
    static double entropyFromIdentity(double eta, double theta, double f0, double f1, double f2) {
        return (5.0 / 3.0) * f1 + (4.0 / 3.0) * theta * f2 - eta * (f0 + theta * f1);
    }

    /**
     * The electron number sum of the pair gas and its first two η derivatives, from one pass over
     * the nodes: S = F_{1/2} + θF_{3/2} = ∫ x^{1/2}(1+θx)(1+θx/2)^{1/2} f dx with f the Fermi factor,
     * S' = ∫ … f(1−f) dx and S'' = ∫ … f(1−f)(1−2f) dx, each scaled by e^{−min(η, 0)} as in
     * {@link #evaluate}. S'' serves the neutrality iteration (Halley's method) only.
     *
     * @param eta η, |η| ≤ 1e8
     * @param theta θ, 0 ≤ θ ≤ 1e4
     * @param out receives {S, S', S''}
     */
    static void densitySums(double eta, double theta, double[] out) {
        requireInRange(eta, theta);
        double[] sums;
        if (eta <= BOLTZMANN_ETA) {
            sums = boltzmann(theta).density();
        } else {
            sums = new double[3];
            accumulateDensity(eta, theta, sums);
        }
        out[0] = sums[0];
        out[1] = sums[1];
        out[2] = sums[2];
    }

    private static void requireInRange(double eta, double theta) {
        if (!(Math.abs(eta) <= MAX_ABS_ETA)) {
            throw BadInputException.notAllowed("degeneracy parameter eta", eta, "", "|eta| <= " + MAX_ABS_ETA);
        }
        if (!(theta >= 0.0 && theta <= MAX_THETA)) {
            throw BadInputException.notAllowed("theta = kT/(m_e c^2)", theta, "", "0 <= theta <= " + MAX_THETA);
        }
    }

    /** The Boltzmann-limit entry for θ, computed at η = {@link #BOLTZMANN_ETA} on a miss. */
    private static BoltzmannEntry boltzmann(double theta) {
        long bits = Double.doubleToLongBits(theta);
        int slot = (int) (bits ^ (bits >>> 29) ^ (bits >>> 47)) & (BOLTZMANN.length - 1);
        BoltzmannEntry entry = BOLTZMANN[slot];
        if (entry != null && Double.doubleToLongBits(entry.theta()) == bits) {
            return entry;
        }
        double[] density = new double[3];
        accumulateDensity(BOLTZMANN_ETA, theta, density);
        entry = new BoltzmannEntry(theta, compute(BOLTZMANN_ETA, theta), density);
        BOLTZMANN[slot] = entry;
        return entry;
    }

    private static Values compute(double eta, double theta) {
        if (eta <= ORIGIN_EDGE) {
            return OriginNodes.of(theta).integrals(eta);
        }
        if (eta >= DegenerateSeries.MIN_ETA) {
            return DegenerateSeries.integrals(eta, theta);
        }
        return laidOut(eta, theta, true);
    }

    /**
     * The integrals at η above {@value #ORIGIN_EDGE} over the layout's nodes, with or without the
     * {@link EdgeTable} (which must give the same numbers bit for bit; the test checks it).
     */
    static Values laidOut(double eta, double theta, boolean withTable) {
        Layout layout = Layout.ofThread(eta, theta);
        int tabled = withTable ? layout.tableFrom() : layout.count;
        Nodes nodes = Nodes.ofThread();
        layout.nodes(tabled, nodes);
        Accumulator acc = new Accumulator(eta, theta);
        for (int i = 0; i < nodes.count; i++) {
            acc.add(nodes.x[i], nodes.d[i], nodes.weight[i]);
        }
        if (tabled < layout.count) {
            acc.addEdge(eta, EdgeTable.COUNT - (layout.count - tabled) * NODES);
        }
        return new Values(new double[] {acc.f0, acc.f1, acc.f2}, new double[] {acc.e0, acc.e1, acc.e2},
                new double[] {acc.d0, acc.d1, acc.d2}, Math.min(eta, 0.0), acc.entropy);
    }

    private static void accumulateDensity(double eta, double theta, double[] sums) {
        if (eta <= ORIGIN_EDGE) {
            OriginNodes.of(theta).densitySums(eta, sums);
            return;
        }
        if (eta >= DegenerateSeries.MIN_ETA) {
            DegenerateSeries.densitySums(eta, theta, sums);
            return;
        }
        Layout layout = Layout.ofThread(eta, theta);
        int tabled = layout.tableFrom();
        Nodes nodes = Nodes.ofThread();
        layout.nodes(tabled, nodes);
        DensityAccumulator acc = new DensityAccumulator(eta, theta);
        for (int i = 0; i < nodes.count; i++) {
            acc.add(nodes.x[i], nodes.d[i], nodes.weight[i]);
        }
        if (tabled < layout.count) {
            acc.addEdge(eta, EdgeTable.COUNT - (layout.count - tabled) * NODES);
        }
        sums[0] = acc.value;
        sums[1] = acc.slope;
        sums[2] = acc.curvature;
    }

    /**
     * The nodes of (part of) a layout in arrays, in the layout's order: the abscissa x, d = x − edge
     * (exact where the piece is laid out in y = x − edge), the weight times dx/dt and, where asked,
     * √x. One per thread, reused, so that an evaluation allocates no node arrays.
     */
    static final class Nodes {
        private static final ThreadLocal<Nodes> OF_THREAD = ThreadLocal.withInitial(Nodes::new);
        final double[] x = new double[MAX_PIECES * NODES];
        final double[] d = new double[MAX_PIECES * NODES];
        final double[] sqrtX = new double[MAX_PIECES * NODES];
        final double[] weight = new double[MAX_PIECES * NODES];
        int count;

        static Nodes ofThread() {
            return OF_THREAD.get();
        }
    }

    /**
     * The edge pieces [EDGE_OFFSETS[k], EDGE_OFFSETS[k+1]] in y = x − η, which every layout with the
     * edge above 2 ends with (those at least 2 above x = 0, unsplit where each is at most three times
     * as wide as its distance from x = 0: all six from η ≈ 43 on, the last three from η = 2): the
     * nodes are fixed in y, and with them the Fermi factor and everything formed from it, so these are
     * computed once, by the same expressions as {@link Accumulator#add} and
     * {@link DensityAccumulator#add} (the same numbers bit for bit); an evaluation then forms only
     * x = η + y, its square roots and the products: no exponential, division or logarithm per node.
     */
    static final class EdgeTable {
        static final int COUNT = (EDGE_OFFSETS.length - 1) * NODES;
        static final double[] Y = new double[COUNT];
        static final double[] WEIGHT = new double[COUNT];
        /** f. */
        static final double[] FACTOR = new double[COUNT];
        /** f(1 − f) as {@link Accumulator} forms it. */
        static final double[] FACTOR_DERIVATIVE = new double[COUNT];
        /** σ = −[f ln f + (1−f) ln(1−f)]. */
        static final double[] SIGMA = new double[COUNT];
        /** 1 − f as {@link DensityAccumulator} forms it. */
        static final double[] ONE_MINUS = new double[COUNT];
        /** 1 − 2f as {@link DensityAccumulator} forms it. */
        static final double[] ONE_MINUS_TWICE = new double[COUNT];

        static {
            int n = 0;
            for (int p = 0; p + 1 < EDGE_OFFSETS.length; p++) {
                double half = 0.5 * (EDGE_OFFSETS[p + 1] - EDGE_OFFSETS[p]);
                double mid = 0.5 * (EDGE_OFFSETS[p] + EDGE_OFFSETS[p + 1]);
                for (int i = 0; i < NODES; i++) {
                    double y = mid + half * GL_X[i];
                    Y[n] = y;
                    WEIGHT[n] = GL_W[i] * half;
                    double e = Math.exp(-Math.abs(y));
                    double inv = 1.0 / (1.0 + e);
                    if (y > 0.0) {
                        FACTOR[n] = e * inv;
                        FACTOR_DERIVATIVE[n] = FACTOR[n] * inv;
                        ONE_MINUS[n] = inv;
                        ONE_MINUS_TWICE[n] = (1.0 - e) * inv;
                    } else {
                        FACTOR[n] = inv;
                        FACTOR_DERIVATIVE[n] = inv * e * inv;
                        ONE_MINUS[n] = e * inv;
                        ONE_MINUS_TWICE[n] = (e - 1.0) * inv;
                    }
                    SIGMA[n] = Math.abs(y) * e * inv + log1p(e);
                    n++;
                }
            }
        }

        private EdgeTable() {
        }
    }

    /**
     * The pieces of one evaluation: piece 0 is [0, end[0]] in u = √x; piece p ≥ 1 runs from
     * {@code start[p]} to {@code end[p]}, in x, or in y = x − edge where {@code shifted[p]}.
     */
    static final class Layout {
        private static final ThreadLocal<Layout> OF_THREAD = ThreadLocal.withInitial(() -> new Layout(0.0));
        double edge;
        final double[] start = new double[MAX_PIECES];
        final double[] end = new double[MAX_PIECES];
        final boolean[] shifted = new boolean[MAX_PIECES];
        int count;

        private Layout(double edge) {
            this.edge = edge;
        }

        /**
         * @param edge the Fermi edge (η for the integrals, |ψ| − 1/θ for the net density)
         * @param theta θ ≥ 0
         * @return the layout
         */
        static Layout of(double edge, double theta) {
            return new Layout(edge).laidOut(theta);
        }

        /**
         * As {@link #of}, in this thread's layout, reused (an evaluation needs one at a time).
         *
         * @param edge the Fermi edge
         * @param theta θ ≥ 0
         * @return this thread's layout, laid out anew
         */
        static Layout ofThread(double edge, double theta) {
            Layout layout = OF_THREAD.get();
            layout.edge = edge;
            layout.count = 0;
            return layout.laidOut(theta);
        }

        private Layout laidOut(double theta) {
            Layout layout = this;
            // at the origin the top is fixed, so that the layout depends on θ alone (OriginNodes)
            double top = Math.max(edge, ORIGIN_EDGE) + ABOVE_EDGE;
            double thetaLimit = theta > 0.0 ? 2.0 / theta : Double.POSITIVE_INFINITY;
            if (edge <= ORIGIN_EDGE) {
                double s = Math.min(ORIGIN_ENDS[0], thetaLimit);
                layout.start[0] = 0.0;
                layout.end[0] = s;
                layout.count = 1;
                double a = s;
                for (int i = 0; i <= ORIGIN_ENDS.length; i++) {
                    double b = i < ORIGIN_ENDS.length ? ORIGIN_ENDS[i] : top;
                    a = layout.graded(a, b);
                }
                return layout;
            }
            // the first edge offset at least 2 above the origin ends the part laid out in x (one
            // closer would only add pieces [a, 4a] from a tiny a)
            int first = 0;
            while (edge + EDGE_OFFSETS[first] < ORIGIN_EDGE) {
                first++;
            }
            double low = edge + EDGE_OFFSETS[first];
            // when that end is the edge itself, [0, 2] in u keeps the poles at η ± iπ far enough
            double s = Math.min(Math.min(low, thetaLimit), EDGE_OFFSETS[first] == 0.0 ? ORIGIN_EDGE : low);
            layout.start[0] = 0.0;
            layout.end[0] = s;
            layout.count = 1;
            double a = layout.graded(s, low);
            // from here on in y = x − edge
            double ya = EDGE_OFFSETS[first];
            for (int i = first + 1; i < EDGE_OFFSETS.length; i++) {
                double yb = EDGE_OFFSETS[i];
                for (int guard = 0; ya < yb; guard++) {
                    if (guard > MAX_PIECES) {
                        throw new IllegalStateException("Fermi-Dirac quadrature layout did not close at edge " + edge);
                    }
                    // no piece wider than three times its distance from x = 0
                    double next = Math.min(yb, ya + 3.0 * (edge + ya));
                    if (next > yb - 1e-12 * Math.abs(yb)) {
                        next = yb;
                    }
                    layout.add(ya, next, true);
                    ya = next;
                }
            }
            return layout;
        }

        /** Pieces [a, min(4a, b)] in x until b; returns b. */
        private double graded(double a, double b) {
            for (int guard = 0; a < b; guard++) {
                if (guard > MAX_PIECES) {
                    throw new IllegalStateException("Fermi-Dirac quadrature layout did not close at edge " + edge);
                }
                double next = Math.min(4.0 * a, b);
                if (next > b * (1 - 1e-12)) {
                    next = b;
                }
                add(a, next, false);
                a = next;
            }
            return Math.max(a, b);
        }

        private void add(double a, double b, boolean inY) {
            if (count >= MAX_PIECES) {
                throw new IllegalStateException("Fermi-Dirac quadrature layout needs more than " + MAX_PIECES
                        + " pieces at edge " + edge);
            }
            start[count] = a;
            end[count] = b;
            shifted[count] = inY;
            count++;
        }

        /**
         * The nodes of pieces 0 to {@code pieces − 1}, in order, into {@code out}: piece 0 is
         * ∫ over x in [0, end[0]] with x = u², dx = 2u du; the others in x or in y = x − edge.
         */
        void nodes(int pieces, Nodes out) {
            nodes(pieces, out, false);
        }

        /** As {@link #nodes(int, Nodes)}, with √x in {@code out.sqrtX} where {@code roots}. */
        void nodes(int pieces, Nodes out, boolean roots) {
            int n = 0;
            double top = 0.5 * Math.sqrt(end[0]);
            for (int i = 0; i < NODES; i++) {
                double u = top * (1.0 + GL_X[i]);
                double x = u * u;
                out.x[n] = x;
                out.d[n] = x - edge;
                out.sqrtX[n] = u;
                out.weight[n] = GL_W[i] * top * 2.0 * u;
                n++;
            }
            for (int p = 1; p < pieces; p++) {
                double half = 0.5 * (end[p] - start[p]);
                double mid = 0.5 * (start[p] + end[p]);
                for (int i = 0; i < NODES; i++) {
                    double x;
                    double d;
                    if (shifted[p]) {
                        d = mid + half * GL_X[i];
                        x = edge + d;
                    } else {
                        x = mid + half * GL_X[i];
                        d = x - edge;
                    }
                    out.x[n] = x;
                    out.d[n] = d;
                    if (roots) {
                        out.sqrtX[n] = Math.sqrt(x);
                    }
                    out.weight[n] = GL_W[i] * half;
                    n++;
                }
            }
            out.count = n;
        }

        /**
         * @return the number of the layout's pieces that come before those the {@link EdgeTable}
         *     holds: the layout's last pieces that are the table's edge pieces
         *     [EDGE_OFFSETS[k], EDGE_OFFSETS[k+1]] in y, unsplit (at an edge above 2 all those from the
         *     first laid out in y, but for η ∈ [18, 19.3) and [38, 42.7), where the one nearest x = 0 is
         *     split); the piece count where there are none (the origin layout)
         */
        int tableFrom() {
            int p = count;
            int k = EDGE_OFFSETS.length - 1;
            while (p > 1 && k > 0 && shifted[p - 1] && start[p - 1] == EDGE_OFFSETS[k - 1] && end[p - 1] == EDGE_OFFSETS[k]) {
                p--;
                k--;
            }
            // any pieces before these (in x, or a split one in y) are summed node by node first
            return p;
        }
    }

    /**
     * The nodes of the layout for an edge at or below {@value #ORIGIN_EDGE}, which depend on θ only,
     * with everything that does not depend on η computed once: x, the weights times the integrands'
     * η-free parts and e^{−x}. An evaluation then needs no exponential per node (e^{η−x} = e^η e^{−x}),
     * the net density kernel none either (e^{−x−1/θ} is stored). Kept per θ like the Boltzmann limit;
     * the sums are those of the {@link Layout} loop, term for term.
     */
    static final class OriginNodes {
        private static final OriginNodes[] CACHE = new OriginNodes[64];
        final double theta;
        final int count;
        final double[] x;
        /** weight √x (1+θx/2)^{1/2}: the k = 1/2 integrand without the factor. */
        final double[] k0;
        /** weight √x · x/(4(1+θx/2)^{1/2}): its θ derivative. */
        final double[] t0;
        /** weight √x (1+θx)(1+θx/2)^{1/2}: the density integrand. */
        final double[] density;
        /** e^{−x}. */
        final double[] boltzmann;
        /** e^{−x−1/θ} (0 where 1/θ &gt; 600, where the net kernel is not used). */
        final double[] net;

        private OriginNodes(double theta) {
            this.theta = theta;
            Layout layout = Layout.of(0.0, theta);
            // the thread's scratch nodes: free here (no evaluation is under way when a θ is first met)
            Nodes all = Nodes.ofThread();
            layout.nodes(layout.count, all, true);
            int n = all.count;
            double[] xs = java.util.Arrays.copyOf(all.x, n);
            double[] sqrts = all.sqrtX;
            double[] weights = all.weight;
            count = n;
            x = xs;
            k0 = new double[n];
            t0 = new double[n];
            density = new double[n];
            boltzmann = new double[n];
            net = new double[n];
            double inverseTheta = theta > 0.0 ? 1.0 / theta : Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                double root = Math.sqrt(1.0 + 0.5 * theta * xs[i]);
                double w = weights[i] * sqrts[i];
                k0[i] = w * root;
                t0[i] = w * xs[i] / (4.0 * root);
                density[i] = w * (1.0 + theta * xs[i]) * root;
                boltzmann[i] = Math.exp(-xs[i]);
                net[i] = inverseTheta <= 600.0 ? Math.exp(-(xs[i] + inverseTheta)) : 0.0;
            }
        }

        static OriginNodes of(double theta) {
            long bits = Double.doubleToLongBits(theta);
            int slot = (int) (bits ^ (bits >>> 29) ^ (bits >>> 47)) & (CACHE.length - 1);
            OriginNodes nodes = CACHE[slot];
            if (nodes != null && Double.doubleToLongBits(nodes.theta) == bits) {
                return nodes;
            }
            nodes = new OriginNodes(theta);
            CACHE[slot] = nodes;
            return nodes;
        }

        /** As {@link Accumulator} at η ≤ 2. */
        Values integrals(double eta) {
            boolean scaled = eta < 0.0;
            double expEta = Math.exp(eta);
            double f0 = 0.0, f1 = 0.0, f2 = 0.0, e0 = 0.0, e1 = 0.0, e2 = 0.0, d0 = 0.0, d1 = 0.0, d2 = 0.0;
            double entropy = 0.0;
            for (int i = 0; i < count; i++) {
                double xi = x[i];
                double d = xi - eta;
                double factor;
                double factorDerivative;
                double sigma;
                if (scaled) {
                    // the entropy from the identity after the loop (no logarithm per node)
                    double e = expEta * boltzmann[i];
                    double oneMinus = 1.0 / (1.0 + e);
                    factor = boltzmann[i] * oneMinus;
                    factorDerivative = factor * oneMinus;
                    sigma = 0.0;
                } else {
                    double e = d > 0.0 ? expEta * boltzmann[i] : Math.exp(d);
                    double inv = 1.0 / (1.0 + e);
                    if (d > 0.0) {
                        factor = e * inv;
                        factorDerivative = factor * inv;
                    } else {
                        factor = inv;
                        factorDerivative = inv * e * inv;
                    }
                    sigma = Math.abs(d) * e * inv + log1p(e);
                }
                double a0 = k0[i];
                double a1 = a0 * xi;
                double a2 = a1 * xi;
                double b0 = t0[i];
                double b1 = b0 * xi;
                double b2 = b1 * xi;
                f0 += a0 * factor;
                f1 += a1 * factor;
                f2 += a2 * factor;
                e0 += a0 * factorDerivative;
                e1 += a1 * factorDerivative;
                e2 += a2 * factorDerivative;
                d0 += b0 * factor;
                d1 += b1 * factor;
                d2 += b2 * factor;
                entropy += (a0 + theta * a1) * sigma;
            }
            if (scaled) {
                entropy = entropyFromIdentity(eta, theta, f0, f1, f2);
            }
            return new Values(new double[] {f0, f1, f2}, new double[] {e0, e1, e2}, new double[] {d0, d1, d2},
                    Math.min(eta, 0.0), entropy);
        }

        /**
         * {@link #integrals} at two η below 0 in one loop (the electrons' and the positrons'): the
         * same operations per species in the same order, so the same numbers; the nodes' weights and
         * e^{−x} are loaded once for both.
         */
        void integralsScaledPair(double eta, double etaPlus, Values[] out) {
            double expEta = Math.exp(eta);
            double expEtaPlus = Math.exp(etaPlus);
            double f0 = 0.0, f1 = 0.0, f2 = 0.0, e0 = 0.0, e1 = 0.0, e2 = 0.0, d0 = 0.0, d1 = 0.0, d2 = 0.0;
            double g0 = 0.0, g1 = 0.0, g2 = 0.0, h0 = 0.0, h1 = 0.0, h2 = 0.0, c0 = 0.0, c1 = 0.0, c2 = 0.0;
            for (int i = 0; i < count; i++) {
                double xi = x[i];
                double b = boltzmann[i];
                double oneMinus = 1.0 / (1.0 + expEta * b);
                double oneMinusPlus = 1.0 / (1.0 + expEtaPlus * b);
                double factor = b * oneMinus;
                double factorDerivative = factor * oneMinus;
                double factorPlus = b * oneMinusPlus;
                double factorDerivativePlus = factorPlus * oneMinusPlus;
                double a0 = k0[i];
                double a1 = a0 * xi;
                double a2 = a1 * xi;
                double b0 = t0[i];
                double b1 = b0 * xi;
                double b2 = b1 * xi;
                f0 += a0 * factor;
                f1 += a1 * factor;
                f2 += a2 * factor;
                e0 += a0 * factorDerivative;
                e1 += a1 * factorDerivative;
                e2 += a2 * factorDerivative;
                d0 += b0 * factor;
                d1 += b1 * factor;
                d2 += b2 * factor;
                g0 += a0 * factorPlus;
                g1 += a1 * factorPlus;
                g2 += a2 * factorPlus;
                h0 += a0 * factorDerivativePlus;
                h1 += a1 * factorDerivativePlus;
                h2 += a2 * factorDerivativePlus;
                c0 += b0 * factorPlus;
                c1 += b1 * factorPlus;
                c2 += b2 * factorPlus;
            }
            out[0] = new Values(new double[] {f0, f1, f2}, new double[] {e0, e1, e2}, new double[] {d0, d1, d2},
                    eta, entropyFromIdentity(eta, theta, f0, f1, f2));
            out[1] = new Values(new double[] {g0, g1, g2}, new double[] {h0, h1, h2}, new double[] {c0, c1, c2},
                    etaPlus, entropyFromIdentity(etaPlus, theta, g0, g1, g2));
        }

        /** As {@link DensityAccumulator} at η ≤ 2. */
        void densitySums(double eta, double[] sums) {
            boolean scaled = eta < 0.0;
            double expEta = Math.exp(eta);
            double value = 0.0;
            double slope = 0.0;
            double curvature = 0.0;
            for (int i = 0; i < count; i++) {
                double d = x[i] - eta;
                double factor;
                double oneMinus;
                double oneMinusTwice;
                if (scaled) {
                    double e = expEta * boltzmann[i];
                    oneMinus = 1.0 / (1.0 + e);
                    factor = boltzmann[i] * oneMinus;
                    oneMinusTwice = (1.0 - e) * oneMinus;
                } else {
                    double e = d > 0.0 ? expEta * boltzmann[i] : Math.exp(d);
                    double inv = 1.0 / (1.0 + e);
                    if (d > 0.0) {
                        factor = e * inv;
                        oneMinus = inv;
                        oneMinusTwice = (1.0 - e) * inv;
                    } else {
                        factor = inv;
                        oneMinus = e * inv;
                        oneMinusTwice = (e - 1.0) * inv;
                    }
                }
                double wf = density[i] * factor;
                double wfd = wf * oneMinus;
                value += wf;
                slope += wfd;
                curvature += wfd * oneMinusTwice;
            }
            sums[0] = value;
            sums[1] = slope;
            sums[2] = curvature;
        }
    }

    /** Sums the three integrals and their derivatives over quadrature points. */
    private static final class Accumulator {
        private final double eta;
        private final double theta;
        private final boolean scaled;
        double f0;
        double f1;
        double f2;
        double e0;
        double e1;
        double e2;
        double d0;
        double d1;
        double d2;
        double entropy;

        Accumulator(double eta, double theta) {
            this.eta = eta;
            this.theta = theta;
            this.scaled = eta < 0.0;
        }

        /**
         * @param x the abscissa
         * @param d x − η, without the rounding of x where the piece is laid out in y = x − η
         * @param weight the quadrature weight times dx/dt
         */
        void add(double x, double d, double weight) {
            // Fermi factor f and f(1−f) from e = exp(−|x−η|): no cancellation, no overflow
            // and σ = −[f ln f + (1−f) ln(1−f)] = |d| f(|d|) + ln(1 + e^{−|d|}), even in d
            double factor;
            double factorDerivative;
            double sigma;
            if (scaled) {
                // η < 0 ≤ x: f e^{−η} = e^{−x} / (1 + e^{η−x}); (1−f) = 1 / (1 + e^{η−x});
                // σ e^{−η} = d f e^{−η} + e^{−x} ln(1 + e^{η−x})/e^{η−x}, the last ratio as in log1p below
                double e = Math.exp(-d);
                double oneMinus = 1.0 / (1.0 + e);
                double boltzmann = Math.exp(-x);
                factor = boltzmann * oneMinus;
                factorDerivative = factor * oneMinus;
                double u = 1.0 + e;
                sigma = d * factor + boltzmann * logOnePlusOver(e);
            } else if (d < -DEEP) {
                // f = 1, and the terms in e = e^{d} (f(1−f), σ) are left out: negligible (see DEEP)
                double stretch = 1.0 + 0.5 * theta * x;
                double k0 = weight * Math.sqrt(x * stretch);
                double t0 = k0 * x / (4.0 * stretch);
                double k1 = k0 * x;
                double t1 = t0 * x;
                f0 += k0;
                f1 += k1;
                f2 += k1 * x;
                d0 += t0;
                d1 += t1;
                d2 += t1 * x;
                return;
            } else {
                double e = Math.exp(-Math.abs(d));
                double u = 1.0 + e;
                if (u == 1.0) {
                    // far from the edge (|d| > 37): 1/(1 + e) is 1, so f is 1 below the edge and e
                    // above it, f(1−f) = e and σ = |d| e + e, exactly as the general expressions
                    // give them, without the division and the logarithm
                    factor = d > 0.0 ? e : 1.0;
                    factorDerivative = e;
                    sigma = Math.abs(d) * e + e;
                } else {
                    double inv = 1.0 / u;
                    if (d > 0.0) {
                        factor = e * inv;
                        factorDerivative = factor * inv;
                    } else {
                        factor = inv;
                        factorDerivative = inv * e * inv;
                    }
                    sigma = Math.abs(d) * e * inv + log1p(e);
                }
            }
            sum(x, weight, factor, factorDerivative, sigma);
        }

        /**
         * The {@link EdgeTable}'s nodes from {@code from} on, about the edge at η: the terms of
         * {@link #sum}, written out with the sums in local variables (the same operations in the
         * same order, so the same numbers), which the compiler keeps in registers.
         */
        void addEdge(double edge, int from) {
            double s0 = f0;
            double s1 = f1;
            double s2 = f2;
            double u0 = e0;
            double u1 = e1;
            double u2 = e2;
            double v0 = d0;
            double v1 = d1;
            double v2 = d2;
            double ent = entropy;
            double[] ys = EdgeTable.Y;
            double[] weights = EdgeTable.WEIGHT;
            double[] factors = EdgeTable.FACTOR;
            double[] derivatives = EdgeTable.FACTOR_DERIVATIVE;
            double[] sigmas = EdgeTable.SIGMA;
            for (int i = from; i < EdgeTable.COUNT; i++) {
                double x = edge + ys[i];
                double factor = factors[i];
                double factorDerivative = derivatives[i];
                double stretch = 1.0 + 0.5 * theta * x;
                double k0 = weights[i] * Math.sqrt(x * stretch);
                double t0 = k0 * x / (4.0 * stretch);
                double k1 = k0 * x;
                double k2 = k1 * x;
                double t1 = t0 * x;
                double t2 = t1 * x;
                s0 += k0 * factor;
                s1 += k1 * factor;
                s2 += k2 * factor;
                u0 += k0 * factorDerivative;
                u1 += k1 * factorDerivative;
                u2 += k2 * factorDerivative;
                v0 += t0 * factor;
                v1 += t1 * factor;
                v2 += t2 * factor;
                ent += (k0 + theta * k1) * sigmas[i];
            }
            f0 = s0;
            f1 = s1;
            f2 = s2;
            e0 = u0;
            e1 = u1;
            e2 = u2;
            d0 = v0;
            d1 = v1;
            d2 = v2;
            entropy = ent;
        }

        private void sum(double x, double weight, double factor, double factorDerivative, double sigma) {
            // x^{1/2} (1+θx/2)^{1/2} under one square root, and its θ derivative
            // x^{3/2}/(4(1+θx/2)^{1/2}) = k0 x/(4(1+θx/2)): one root and one division per node
            double stretch = 1.0 + 0.5 * theta * x;
            double k0 = weight * Math.sqrt(x * stretch);
            double t0 = k0 * x / (4.0 * stretch);
            double k1 = k0 * x;
            double k2 = k1 * x;
            double t1 = t0 * x;
            double t2 = t1 * x;
            f0 += k0 * factor;
            f1 += k1 * factor;
            f2 += k2 * factor;
            e0 += k0 * factorDerivative;
            e1 += k1 * factorDerivative;
            e2 += k2 * factorDerivative;
            d0 += t0 * factor;
            d1 += t1 * factor;
            d2 += t2 * factor;
            entropy += (k0 + theta * k1) * sigma;
        }
    }

    /**
     * Nodes farther than this below a degenerate edge (x &lt; η − 45, so η &gt; 45) take f = 1 and leave
     * out the terms in e = e^{x−η} &lt; 3e-20 — those of f(1−f) and σ, whose integrals are then
     * dominated by the edge: together they are below ∫₀^{η−45} w(x) (|x−η| + 1) e^{x−η} dx
     * &le; 46 e^{−45} w(η) ≈ 1.3e-18 w(η), against at least ~w(η)/4 from the edge (f(1−f) is 1/4 at
     * x = η), i.e. under 1e-17 of the sums, a tenth of their last bit: this saves the exponential
     * at nodes far below the edge, most of the work of the pieces laid out in x.
     */
    static final double DEEP = 45.0;

    /** ln(1 + e) for 0 ≤ e ≤ 1, to a few ulps ({@link #logOnePlusOver}). */
    private static double log1p(double e) {
        return e * logOnePlusOver(e);
    }

    /** Below this e the series of ln(1 + e)/e is used: its first term left out, e⁶/7, is under 2e-19. */
    private static final double SERIES_BELOW = 0x1p-10;

    /**
     * ln(1 + e)/e for 0 ≤ e ≤ 1, to a few ulps: below 2⁻¹⁰ its alternating series
     * 1 − e/2 + e²/3 − e³/4 + e⁴/5 − e⁵/6 (the first term left out below 2e-19, no logarithm: most
     * nodes away from the edge), else ln(u)/(u − 1) with u = 1 + e rounded (Goldberg 1991,
     * ACM Computing Surveys 23, 5, Theorem 4; {@link Math#log1p} is a native call several times
     * slower, and this sits in the innermost loop).
     */
    private static double logOnePlusOver(double e) {
        if (e < SERIES_BELOW) {
            return 1.0 - e * (0.5 - e * (1.0 / 3.0 - e * (0.25 - e * (0.2 - e * (1.0 / 6.0)))));
        }
        double u = 1.0 + e;
        return Math.log(u) / (u - 1.0);
    }

    /** Sums F_{1/2} + θF_{3/2} and its first two η derivatives. */
    private static final class DensityAccumulator {
        private final double theta;
        private final boolean scaled;
        double value;
        double slope;
        double curvature;

        DensityAccumulator(double eta, double theta) {
            this.theta = theta;
            this.scaled = eta < 0.0;
        }

        /** As {@link Accumulator#add}. */
        void add(double x, double d, double weight) {
            double factor;
            double oneMinus;
            double oneMinusTwice; // 1 − 2f
            if (scaled) {
                double e = Math.exp(-d);
                oneMinus = 1.0 / (1.0 + e);
                factor = Math.exp(-x) * oneMinus;
                oneMinusTwice = (1.0 - e) * oneMinus;
            } else if (d < -DEEP) {
                // f = 1, and 1 − f = e left out (negligible, see DEEP)
                value += weight * (1.0 + theta * x) * Math.sqrt(x * (1.0 + 0.5 * theta * x));
                return;
            } else {
                double e = Math.exp(-Math.abs(d));
                double u = 1.0 + e;
                double inv = u == 1.0 ? 1.0 : 1.0 / u;
                if (d > 0.0) {
                    factor = e * inv;
                    oneMinus = inv;
                    oneMinusTwice = (1.0 - e) * inv;
                } else {
                    factor = inv;
                    oneMinus = e * inv;
                    oneMinusTwice = (e - 1.0) * inv;
                }
            }
            sum(weight * (1.0 + theta * x) * Math.sqrt(x * (1.0 + 0.5 * theta * x)), factor, oneMinus, oneMinusTwice);
        }

        /** The {@link EdgeTable}'s nodes from {@code from} on, about the edge at η (sums in locals, as in {@link Accumulator#addEdge}). */
        void addEdge(double edge, int from) {
            double v = value;
            double s1 = slope;
            double s2 = curvature;
            for (int i = from; i < EdgeTable.COUNT; i++) {
                double x = edge + EdgeTable.Y[i];
                double wf = EdgeTable.WEIGHT[i] * (1.0 + theta * x) * Math.sqrt(x * (1.0 + 0.5 * theta * x))
                        * EdgeTable.FACTOR[i];
                double wfd = wf * EdgeTable.ONE_MINUS[i];
                v += wf;
                s1 += wfd;
                s2 += wfd * EdgeTable.ONE_MINUS_TWICE[i];
            }
            value = v;
            slope = s1;
            curvature = s2;
        }

        private void sum(double w, double factor, double oneMinus, double oneMinusTwice) {
            double wf = w * factor;
            double wfd = wf * oneMinus;
            value += wf;
            slope += wfd;
            curvature += wfd * oneMinusTwice;
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
