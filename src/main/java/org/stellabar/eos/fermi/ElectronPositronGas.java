package org.stellabar.eos.fermi;

import org.stellabar.numerics.BracketedNewton;
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
 * <p>Neutrality is solved for η by Newton's method kept in a bracket ({@link BracketedNewton}).
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
    private static final int MAX_BRACKET_STEPS = 200;

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

    /** η from n₋(η) − n₊(η) = n₀, bracketed. */
    static double solveEta(double netDensity, double theta) {
        double logScale = Math.log(DENSITY_SCALE / netDensity) + 1.5 * Math.log(theta);
        BracketedNewton.Function neutrality = new BracketedNewton.Function() {
            // Newton asks for the value and then the slope at the same η, and the solver re-evaluates
            // the bracket's ends the search already evaluated: value and slope come from one pass
            // over the quadrature nodes and the last few are kept
            private final double[] etas = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
            private final double[][] results = new double[4][2];
            private int next;

            @Override
            public double value(double eta) {
                return at(eta)[0] - 1.0;
            }

            @Override
            public double derivative(double eta) {
                return at(eta)[1];
            }

            private double[] at(double eta) {
                for (int i = 0; i < etas.length; i++) {
                    if (etas[i] == eta) {
                        return results[i];
                    }
                }
                int slot = next;
                next = (next + 1) % etas.length;
                netOverTargetBoth(eta, theta, logScale, results[slot]);
                etas[slot] = eta;
                return results[slot];
            }
        };
        double guess = initialEta(netDensity, theta, logScale);
        if (guess > 0.5 * FermiDiracIntegrals.MAX_ABS_ETA) {
            double temperature = theta * REST_ENERGY / org.stellabar.physics.Constants.BOLTZMANN;
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "electrons at %.6g per cm3 and %.6g K are degenerate beyond the range of the Fermi-Dirac"
                            + " integrals (eta about %.3g, allowed up to %.3g); give a higher temperature or lower density",
                    netDensity, temperature, guess, 0.5 * FermiDiracIntegrals.MAX_ABS_ETA));
        }
        double step = Math.max(1.0, 0.25 * Math.abs(guess));
        double lo = guess - step;
        double hi = guess + step;
        for (int i = 0; neutrality.value(lo) > 0.0; i++) {
            step *= 2.0;
            lo = Math.max(guess - step, -FermiDiracIntegrals.MAX_ABS_ETA);
            if (i > MAX_BRACKET_STEPS) {
                throw new ConvergenceException("charge neutrality: no lower bracket for eta below " + guess);
            }
        }
        step = Math.max(1.0, 0.25 * Math.abs(guess));
        for (int i = 0; neutrality.value(hi) < 0.0; i++) {
            step *= 2.0;
            hi = Math.min(guess + step, FermiDiracIntegrals.MAX_ABS_ETA);
            if (i > MAX_BRACKET_STEPS) {
                throw new ConvergenceException("charge neutrality: no upper bracket for eta above " + guess);
            }
        }
        return BracketedNewton.solve("charge neutrality n- - n+ = rho/(mu_e m_u)", neutrality, lo, hi, 1e-15);
    }

    /** Non-degenerate or completely degenerate estimate of η. */
    private static double initialEta(double netDensity, double theta, double logScale) {
        double boltzmann = -logScale - Math.log(0.5 * Math.sqrt(Math.PI));
        if (boltzmann < 0.0) {
            return boltzmann;
        }
        // completely degenerate: n₀ = (8π/3)(m_e c/h)³ x_F³
        double xF = Math.cbrt(3.0 * netDensity / (8.0 * Math.PI)) * Constants.PLANCK
                / (Constants.ELECTRON_MASS * Constants.SPEED_OF_LIGHT);
        double kinetic = xF * xF / (Math.sqrt(1.0 + xF * xF) + 1.0); // √(1+x²) − 1 without cancellation
        return Math.max(kinetic / theta, boltzmann > 0 ? 0.0 : boltzmann);
    }

    /**
     * (n₋ − n₊)/n₀ or its η derivative, with A θ^{3/2}/n₀ = e^{logScale} folded into the exponents so
     * that nothing underflows near the root.
     */
    static double netOverTarget(double eta, double theta, double logScale, boolean derivative) {
        double psi = eta + 1.0 / theta;
        if (Math.abs(psi) <= NET_FORM_PSI && 1.0 / theta <= 600.0) {
            return NetDensityIntegral.evaluate(psi, theta, derivative) * Math.exp(logScale);
        }
        FermiDiracIntegrals.Values minus = FermiDiracIntegrals.evaluate(clampEta(eta), theta);
        double etaPlus = -eta - 2.0 / theta;
        double minusPart = (derivative ? minus.dEta()[0] + theta * minus.dEta()[1] : minus.f()[0] + theta * minus.f()[1])
                * Math.exp(minus.logScale() + logScale);
        double plusPart = 0.0;
        if (etaPlus + logScale > -745.0) {
            FermiDiracIntegrals.Values plus = FermiDiracIntegrals.evaluate(clampEta(etaPlus), theta);
            plusPart = (derivative ? plus.dEta()[0] + theta * plus.dEta()[1] : plus.f()[0] + theta * plus.f()[1])
                    * Math.exp(plus.logScale() + logScale);
        }
        return derivative ? minusPart + plusPart : minusPart - plusPart;
    }

    /**
     * {@link #netOverTarget} and its η derivative from one evaluation of the integrals: the same
     * sums in the same order, so each equals the separate call's result bit for bit.
     *
     * @param out receives {(n₋ − n₊)/n₀, its η derivative}
     */
    static void netOverTargetBoth(double eta, double theta, double logScale, double[] out) {
        double psi = eta + 1.0 / theta;
        if (Math.abs(psi) <= NET_FORM_PSI && 1.0 / theta <= 600.0) {
            NetDensityIntegral.evaluateBoth(psi, theta, out);
            double scale = Math.exp(logScale);
            out[0] *= scale;
            out[1] *= scale;
            return;
        }
        FermiDiracIntegrals.Values minus = FermiDiracIntegrals.evaluate(clampEta(eta), theta);
        double etaPlus = -eta - 2.0 / theta;
        double minusScale = Math.exp(minus.logScale() + logScale);
        double minusValue = (minus.f()[0] + theta * minus.f()[1]) * minusScale;
        double minusSlope = (minus.dEta()[0] + theta * minus.dEta()[1]) * minusScale;
        double plusValue = 0.0;
        double plusSlope = 0.0;
        if (etaPlus + logScale > -745.0) {
            FermiDiracIntegrals.Values plus = FermiDiracIntegrals.evaluate(clampEta(etaPlus), theta);
            double plusScale = Math.exp(plus.logScale() + logScale);
            plusValue = (plus.f()[0] + theta * plus.f()[1]) * plusScale;
            plusSlope = (plus.dEta()[0] + theta * plus.dEta()[1]) * plusScale;
        }
        out[0] = minusValue - plusValue;
        out[1] = minusSlope + plusSlope;
    }

    private static double clampEta(double eta) {
        return Math.max(-FermiDiracIntegrals.MAX_ABS_ETA, Math.min(FermiDiracIntegrals.MAX_ABS_ETA, eta));
    }
}
