package org.stellabar.eos.fermi;

import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.physics.Constants;

/**
 * An ideal gas of electrons of any degeneracy and relativity with positrons in thermal equilibrium
 * (μ₊ = −μ₋, rest masses counted), at the net electron density fixed by charge neutrality
 * n₋ − n₊ = n₀ = ρ/(μ_e m_u).
 *
 * <p>With θ = kT/(m_e c²), η = (μ₋ − m_e c²)/kT and A = 8π√2 (m_e c/h)³ (Cox &amp; Giuli 1968,
 * <i>Principles of Stellar Structure</i>, ch. 24):
 * n = A θ^{3/2} [F_{1/2} + θ F_{3/2}], P = (2/3) A m_e c² θ^{5/2} [F_{3/2} + (θ/2) F_{5/2}],
 * E_kin = A m_e c² θ^{5/2} [F_{3/2} + θ F_{5/2}], the positrons' at η₊ = −η − 2/θ.
 *
 * <p>Energy convention: the energy density counts the kinetic energy of electrons and positrons
 * and the rest-mass energy of the pairs, 2 m_e c² n₊; the rest mass of the net electrons
 * n₀ m_e c² is not counted (it is constant at fixed ρ and composition).
 *
 * <p>Neutrality is solved for η by Halley's method kept in a bracket ({@link #solveEta}).
 * When pairs are abundant (|ψ| ≤ {@value #NET_FORM_PSI}, ψ = η + 1/θ = μ₋/kT), n₋ − n₊ is computed
 * as one integral with the kernel f(E − ψ) − f(E + ψ) = sinh ψ / (cosh E + cosh ψ), E = x + 1/θ,
 * which has no cancellation when n₊ ≈ n₋ ≫ n₀.
 */
public final class ElectronPositronGas {

    /** A = 8π√2 (m_e c/h)³, cm⁻³. */
    public static final double DENSITY_SCALE = 8.0 * Math.PI * Math.sqrt(2.0)
            * Math.pow(Constants.ELECTRON_MASS * Constants.SPEED_OF_LIGHT / Constants.PLANCK, 3);
    /** m_e c², erg. */
    public static final double REST_ENERGY = Constants.ELECTRON_MASS * Constants.SPEED_OF_LIGHT * Constants.SPEED_OF_LIGHT;

    /** Below this |ψ| the net density uses the sinh kernel. */
    static final double NET_FORM_PSI = 30.0;
    /** Bound on the neutrality iterations. */
    static final int MAX_ITERATIONS = 200;
    /** |ln[(n₋ − n₊)/n₀]| below which one more Halley step is the answer. */
    static final double RESIDUAL_TOLERANCE = 1e-7;

    private ElectronPositronGas() {
    }

    /**
     * The state of the pair gas.
     *
     * @param eta η of the electrons
     * @param theta kT/(m_e c²)
     * @param nElectron n₋, cm⁻³
     * @param nPositron n₊, cm⁻³
     * @param pressure P₋ + P₊, dyn/cm²
     * @param energyDensity E₋ + E₊ + 2 m_e c² n₊, erg/cm³
     */
    public record State(double eta, double theta, double nElectron, double nPositron, double pressure,
                        double energyDensity) {
    }

    /**
     * Solves neutrality for η and returns the gas.
     *
     * @param netDensity n₀ = ρ/(μ_e m_u), cm⁻³, positive
     * @param temperature T, K, positive
     * @return the state
     */
    public static State at(double netDensity, double temperature) {
        if (!(netDensity > 0.0 && netDensity < Double.MAX_VALUE)) {
            throw BadInputException.mustBePositive("net electron density", netDensity, "cm-3");
        }
        if (!(temperature > 0.0 && temperature < Double.MAX_VALUE)) {
            throw BadInputException.mustBePositive("temperature", temperature, "K");
        }
        double theta = Constants.BOLTZMANN * temperature / REST_ENERGY;
        double eta = solveEta(netDensity, theta);
        return stateAt(eta, theta);
    }

    /** The gas at given η and θ (no neutrality). */
    static State stateAt(double eta, double theta) {
        FermiDiracIntegrals.Values minus = FermiDiracIntegrals.evaluate(eta, theta);
        double etaPlus = -eta - 2.0 / theta;
        double n1 = DENSITY_SCALE * Math.pow(theta, 1.5);
        double p1 = DENSITY_SCALE * REST_ENERGY * Math.pow(theta, 2.5);
        double nMinus = n1 * (minus.value(0) + theta * minus.value(1));
        double pMinus = (2.0 / 3.0) * p1 * (minus.value(1) + 0.5 * theta * minus.value(2));
        double eMinus = p1 * (minus.value(1) + theta * minus.value(2));
        double nPlus = 0.0;
        double pPlus = 0.0;
        double ePlus = 0.0;
        if (etaPlus >= -FermiDiracIntegrals.MAX_ABS_ETA && etaPlus > -800.0) {
            FermiDiracIntegrals.Values plus = FermiDiracIntegrals.evaluate(etaPlus, theta);
            nPlus = n1 * (plus.value(0) + theta * plus.value(1));
            pPlus = (2.0 / 3.0) * p1 * (plus.value(1) + 0.5 * theta * plus.value(2));
            ePlus = p1 * (plus.value(1) + theta * plus.value(2)) + 2.0 * REST_ENERGY * nPlus;
        }
        return new State(eta, theta, nMinus, nPlus, pMinus + pPlus, eMinus + ePlus);
    }

    /**
     * η from n₋(η) − n₊(η) = n₀: Halley's method (Press et al., <i>Numerical Recipes</i>, 3rd ed.
     * 2007, §9.4; cubic convergence) on g(η) = ln[(n₋ − n₊)/n₀], which is linear in η for
     * non-degenerate electrons and ~(3/2) ln η for degenerate ones, with the first two derivatives
     * from the same pass over the quadrature nodes as the value ({@link FermiDiracIntegrals#densitySums},
     * {@link NetDensityIntegral}). The iterates are kept inside the bracket of the points seen so
     * far: a step that would leave it is replaced by Newton's step on (n₋ − n₊)/n₀ − 1 (which does
     * not overshoot a convex increasing function from above), and that by bisection.
     *
     * <p>Convergence: once |g| ≤ {@value #RESIDUAL_TOLERANCE} the Halley step leaves a residual of
     * order |g|³/12 ≲ 1e-22 (for g = ln η^a, ln e^η or ln sinh ψ, the forms met here), and even
     * Newton's step alone (were g'' poor) a relative error in η below ~(|g|/g')² |g''|/(2g'|η|) ≈ 2e-15;
     * so the stepped η is returned without another evaluation. Measured: over 20 000 random states
     * (n₀ 1e-10..1e35 cm⁻³, T 1e4..1e11 K) η agrees within one ulp with η iterated to |g| ≤ 1e-13. The count is bounded by
     * {@value #MAX_ITERATIONS}; from the starting value below it is two to four in practice.
     */
    static double solveEta(double netDensity, double theta) {
        double logScale = Math.log(DENSITY_SCALE / netDensity) + 1.5 * Math.log(theta);
        // A θ^{3/2}/n₀ as a product (a few ulps) rather than e^{logScale} (whose argument carries an
        // absolute rounding of ~1e-15, i.e. 20 ulps of a degenerate η): where it is a normal double
        double product = DENSITY_SCALE * theta * Math.sqrt(theta) / netDensity;
        double scale = product > 1e-300 && product < 1e300 ? product : Double.NaN;
        double guess = initialEta(netDensity, theta, logScale);
        if (guess > 0.5 * FermiDiracIntegrals.MAX_ABS_ETA) {
            double temperature = theta * REST_ENERGY / org.stellabar.physics.Constants.BOLTZMANN;
            throw new BadInputException(String.format(java.util.Locale.US,
                    "electrons at %.6g per cm3 and %.6g K are degenerate beyond the range of the Fermi-Dirac"
                            + " integrals (eta about %.3g, allowed up to %.3g); give a higher temperature or lower density",
                    netDensity, temperature, guess, 0.5 * FermiDiracIntegrals.MAX_ABS_ETA));
        }
        // ψ ≤ 0 means n₋ ≤ n₊: below the root without evaluating anything
        double lo = Math.max(-FermiDiracIntegrals.MAX_ABS_ETA, -1.0 / theta);
        double hi = FermiDiracIntegrals.MAX_ABS_ETA;
        boolean hiSeen = false;
        double[] g = new double[3];
        double eta = Math.max(guess, lo);
        double rise = 1.0;
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (eta <= lo) {
                // at ψ ≤ 0, or at a point already known to be low: up from the lower end, by a
                // doubling step while no upper end is known
                eta = hiSeen ? 0.5 * (lo + hi) : Math.min(lo + rise, FermiDiracIntegrals.MAX_ABS_ETA);
                rise *= 2.0;
                continue;
            }
            boolean positive = logNetOverTarget(eta, theta, logScale, scale, g);
            if (!positive) {
                lo = eta;
                continue;
            }
            double value = g[0];
            if (value == 0.0) {
                return eta;
            }
            if (value < 0.0) {
                lo = eta;
            } else {
                hi = eta;
                hiSeen = true;
            }
            double slope = g[1];
            double newton = value / slope;
            double correction = 0.5 * newton * g[2] / slope;
            double step = Math.abs(correction) < 0.5 ? newton / (1.0 - correction) : newton;
            double next = eta - step;
            if (Math.abs(value) <= RESIDUAL_TOLERANCE || Math.abs(step) <= 2.0 * Math.ulp(eta)) {
                // converged, or η can resolve the root no better (at ψ ≪ 1 an ulp of η is a large
                // part of ψ, as in any solve for η): the step, kept inside what is known
                return next >= lo && next <= hi ? next : eta;
            }
            if (!(next > lo && next < hi)) {
                // Newton on r − 1, r = e^g: step (1 − e^{−g})/g'
                next = eta + Math.expm1(-value) / slope;
            }
            if (!(next > lo && next < hi)) {
                next = hiSeen ? 0.5 * (lo + hi) : eta + Math.max(1.0, Math.abs(eta));
                if (next <= lo || next >= hi) {
                    // the bracket is two neighbouring doubles
                    return eta;
                }
            }
            eta = Math.min(next, FermiDiracIntegrals.MAX_ABS_ETA);
        }
        throw new ConvergenceException(String.format(java.util.Locale.US,
                "charge neutrality n- - n+ = rho/(mu_e m_u) at n0 = %.6g cm-3, theta = %.6g: no convergence in %d"
                        + " iterations (eta bracketed in [%.17g, %.17g])", netDensity, theta, MAX_ITERATIONS, lo, hi));
    }

    /**
     * A starting η from the limiting forms, good to a few per cent of n where one of them holds:
     * <ul>
     *   <li>non-degenerate electrons and positrons (Boltzmann statistics, any θ):
     *       n₀ = 2 A θ^{3/2} J(θ) e^{−1/θ} sinh ψ with J(θ) = ∫ x^{1/2}(1+θx)(1+θx/2)^{1/2} e^{−x} dx,
     *       taken as max[Γ(3/2)(1 + 15θ/8), √2 θ^{3/2}] (its small-θ expansion and its large-θ limit,
     *       by expanding the integrand), so ψ = asinh(n₀ e^{1/θ}/(2Aθ^{3/2}J)); pairs included;</li>
     *   <li>then the first degeneracy correction: inverting n ∝ e^η − e^{2η}/2^{3/2} (the
     *       non-relativistic series F_{1/2}(η) = Γ(3/2) Σ (−1)^{j+1} e^{jη}/j^{3/2}, Cox &amp; Giuli 1968,
     *       ch. 24) to first order, η ≈ ln u + u/√8 with u = e^{η_B}, while u ≤ 8;</li>
     *   <li>beyond, complete degeneracy with the Sommerfeld correction at any relativity (the
     *       Sommerfeld expansion of ∫ D(E) f dE, e.g. Cox &amp; Giuli 1968, ch. 24, with the density of
     *       states D ∝ p(1+E) of the relativistic gas), or where that correction is large,
     *       η ≈ η₀(1 − π²/(12η₀²)), η₀ the Fermi kinetic energy over kT.</li>
     * </ul>
     * The iteration does not depend on its accuracy, only its count does.
     */
    private static double initialEta(double netDensity, double theta, double logScale) {
        double j = boltzmannIntegral(theta);
        double inverseTheta = 1.0 / theta;
        // ln(n₀ e^{1/θ}/(2 A θ^{3/2} J)), then ψ = asinh(e^L) without overflow
        double l = -logScale - Math.log(2.0 * j) + inverseTheta;
        double psi = l > 0.0 ? l + Math.log1p(Math.sqrt(1.0 + Math.exp(-2.0 * l))) : asinhOfExp(l);
        double boltzmann = psi - inverseTheta;
        if (boltzmann < Math.log(8.0)) {
            return boltzmann + Math.exp(boltzmann) / Math.sqrt(8.0);
        }
        // completely degenerate: n₀ = (8π/3)(m_e c/h)³ x_F³
        double xF = Math.cbrt(3.0 * netDensity / (8.0 * Math.PI)) * Constants.PLANCK
                / (Constants.ELECTRON_MASS * Constants.SPEED_OF_LIGHT);
        double kinetic = xF * xF / (Math.sqrt(1.0 + xF * xF) + 1.0); // √(1+x²) − 1 without cancellation
        double degenerate = kinetic / theta;
        // Sommerfeld at any relativity, in units of m_e c: n ∝ ∫ p² dp f gives
        // p_μ³ = p_F³ − (π²/2) θ² D'(E_F), D(E) = p(1 + E), D' = (1+E)²/p + p (to order θ², at E_F)
        double correction = 0.5 * Math.PI * Math.PI * theta * theta * ((1.0 + kinetic) * (1.0 + kinetic) / xF + xF);
        double cube = xF * xF * xF - correction;
        if (cube > 0.5 * xF * xF * xF) {
            double p = Math.cbrt(cube);
            return Math.max(p * p / (Math.sqrt(1.0 + p * p) + 1.0) / theta, Math.log(8.0));
        }
        return Math.max(degenerate * (1.0 - Math.PI * Math.PI / (12.0 * degenerate * degenerate)), Math.log(8.0));
    }

    /**
     * J(θ) = ∫ x^{1/2}(1+θx)(1+θx/2)^{1/2} e^{−x} dx = e^{1/θ} K₂(1/θ)/√(2θ) approximately, to a few
     * per cent: for θ ≤ 1 the asymptotic series of K₂(z) for large z, (π/2z)^{1/2} e^{−z}(1 + 15/(8z)
     * + 105/(128z²) − 315/(1024z³)), for θ &gt; 1 its small-argument form 2/z² − 1/2 (Abramowitz &amp;
     * Stegun 1964, 9.7.2 and 9.6.11); only a starting value depends on it.
     */
    static double boltzmannIntegral(double theta) {
        if (theta <= 1.0) {
            return 0.5 * Math.sqrt(Math.PI) * (1.0 + theta * (1.875 + theta * (105.0 / 128.0 - theta * 315.0 / 1024.0)));
        }
        return (2.0 * theta * theta - 0.5) * Math.exp(1.0 / theta) / Math.sqrt(2.0 * theta);
    }

    /** asinh(e^l) for l ≤ 0. */
    private static double asinhOfExp(double l) {
        double z = Math.exp(l);
        return Math.log1p(z + z * z / (1.0 + Math.sqrt(1.0 + z * z)));
    }

    /**
     * g = ln[(n₋ − n₊)/n₀] and its first two η derivatives, with A θ^{3/2}/n₀ = e^{logScale} kept in
     * the logarithm so that nothing underflows or overflows.
     *
     * @param logScale ln(A θ^{3/2}/n₀)
     * @param scale A θ^{3/2}/n₀, or NaN where it is not a normal double
     * @param out receives {g, g', g''}
     * @return false where n₋ − n₊ ≤ 0 (out then undefined)
     */
    static boolean logNetOverTarget(double eta, double theta, double logScale, double scale, double[] out) {
        double psi = eta + 1.0 / theta;
        if (!(psi > 0.0)) {
            return false;
        }
        double[] s = new double[3];
        double logOfScaled; // ln of the factor s[0] is to be multiplied by, beyond the scale
        if (psi <= NET_FORM_PSI && 1.0 / theta <= 600.0) {
            NetDensityIntegral.evaluate(psi, theta, s);
            logOfScaled = 0.0;
        } else {
            double clamped = clampEta(eta);
            FermiDiracIntegrals.densitySums(clamped, theta, s);
            logOfScaled = Math.min(clamped, 0.0);
            // for ψ > 30 the positrons are below e^{−2ψ} < 1e-26 of the electrons: left out
            double etaPlus = -eta - 2.0 / theta;
            if (psi <= NET_FORM_PSI && etaPlus + logScale > -745.0) {
                double[] plus = new double[3];
                double clampedPlus = clampEta(etaPlus);
                FermiDiracIntegrals.densitySums(clampedPlus, theta, plus);
                // relative to the electrons' scale; ≤ 1 since η₊ < η
                double w = Math.exp(Math.min(clampedPlus, 0.0) - Math.min(clamped, 0.0));
                s[0] -= w * plus[0];
                s[1] += w * plus[1];
                s[2] -= w * plus[2];
            }
        }
        if (!(s[0] > 0.0)) {
            return false;
        }
        double slope = s[1] / s[0];
        out[0] = Double.isNaN(scale) ? Math.log(s[0]) + logOfScaled + logScale : Math.log(s[0] * scale) + logOfScaled;
        out[1] = slope;
        out[2] = s[2] / s[0] - slope * slope;
        return true;
    }

    private static double clampEta(double eta) {
        return Math.max(-FermiDiracIntegrals.MAX_ABS_ETA, Math.min(FermiDiracIntegrals.MAX_ABS_ETA, eta));
    }
}
