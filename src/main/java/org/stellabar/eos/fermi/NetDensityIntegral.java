package org.stellabar.eos.fermi;

/**
 * The net number integral of electrons minus positrons in units of A θ^{3/2} (see
 * {@link ElectronPositronGas}): ∫₀^∞ x^{1/2}(1+θx)(1+θx/2)^{1/2} [f(E − ψ) − f(E + ψ)] dx with
 * E = x + 1/θ and ψ = μ₋/kT, f(y) = 1/(e^y + 1), written with the identity
 * f(E − ψ) − f(E + ψ) = sinh ψ / (cosh E + cosh ψ) = 2 sinh ψ e^{−E} / (1 + e^{−2E} + 2 cosh ψ e^{−E}),
 * which has no cancellation when electrons and positrons are nearly equal in number and no overflow
 * for |ψ| ≤ 30. The quadrature layout is that of {@link FermiDiracIntegrals} with the Fermi edge at
 * x = |ψ| − 1/θ: the kernel's poles lie at x = ±ψ − 1/θ ± iπ.
 *
 * <p>With D = cosh E + cosh ψ the ψ derivatives of the kernel K = sinh ψ / D are
 * K' = (cosh ψ cosh E + 1)/D² and K'' = sinh ψ (cosh²E − cosh E cosh ψ − 2)/D³ (differentiation of
 * the identity above), each written in e = e^{−E} as below so that nothing overflows.
 */
final class NetDensityIntegral {

    private NetDensityIntegral() {
    }

    /**
     * The integral and its first two ψ derivatives (equal to the η derivatives at fixed θ) in one
     * pass over the nodes.
     *
     * @param psi ψ = η + 1/θ, |ψ| ≤ 30
     * @param theta θ &gt; 0 with 1/θ ≤ 600
     * @param out receives {integral, ∂/∂ψ, ∂²/∂ψ²}
     */
    static void evaluate(double psi, double theta, double[] out) {
        Kernel kernel = new Kernel(psi, theta);
        if (Math.abs(psi) - 1.0 / theta <= 2.0) {
            // the origin layout: nodes, weights and e^{−E} kept per θ
            FermiDiracIntegrals.OriginNodes nodes = FermiDiracIntegrals.OriginNodes.of(theta);
            for (int i = 0; i < nodes.count; i++) {
                kernel.addTerm(nodes.density[i], nodes.net[i]);
            }
            out[0] = kernel.value;
            out[1] = kernel.slope;
            out[2] = kernel.curvature;
            return;
        }
        FermiDiracIntegrals.Layout layout = FermiDiracIntegrals.Layout.ofThread(Math.abs(psi) - 1.0 / theta, theta);
        FermiDiracIntegrals.Nodes nodes = FermiDiracIntegrals.Nodes.ofThread();
        layout.nodes(layout.count, nodes);
        for (int i = 0; i < nodes.count; i++) {
            kernel.add(nodes.x[i], nodes.weight[i]);
        }
        out[0] = kernel.value;
        out[1] = kernel.slope;
        out[2] = kernel.curvature;
    }

    /** The kernel and its ψ derivatives at one node; cosh ψ and sinh ψ once per evaluation. */
    private static final class Kernel {
        private final double theta;
        private final double inverseTheta;
        private final double coshPsi;
        private final double sinhPsi;
        double value;
        double slope;
        double curvature;

        Kernel(double psi, double theta) {
            this.theta = theta;
            this.inverseTheta = 1.0 / theta;
            this.coshPsi = Math.cosh(psi);
            this.sinhPsi = Math.sinh(psi);
        }

        /**
         * @param x the abscissa
         * @param weight the quadrature weight times dx/dt
         */
        void add(double x, double weight) {
            addTerm(weight * (1.0 + theta * x) * Math.sqrt(x * (1.0 + 0.5 * theta * x)), Math.exp(-(x + inverseTheta)));
        }

        /**
         * @param w the weight times x^{1/2}(1+θx)(1+θx/2)^{1/2}
         * @param e e^{−E} = e^{−x−1/θ}
         */
        void addTerm(double w, double e) {
            double ee = e * e;
            double coshTerm = 2.0 * coshPsi * e;
            double onePlus = 1.0 + ee;
            double denominator = onePlus + coshTerm; // 2e D
            double inverse = 1.0 / denominator;
            value += w * (2.0 * sinhPsi * e * inverse);
            slope += w * ((coshTerm * onePlus + 4.0 * ee) * inverse * inverse);
            // K'' = sinh ψ (cosh²E − cosh E cosh ψ − 2)/D³ = 2e sinh ψ ((1+e²)² − 2e(1+e²)cosh ψ − 8e²)/(2eD)³
            curvature += w * (2.0 * e * sinhPsi * (onePlus * onePlus - coshTerm * onePlus - 8.0 * ee)
                    * inverse * inverse * inverse);
        }
    }
}
