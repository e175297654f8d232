package org.stellabar.eos.fermi;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.physics.Constants;

class ElectronPositronGasTest {

    private static final double MC = Constants.ELECTRON_MASS * Constants.SPEED_OF_LIGHT;

    /**
     * Completely degenerate relativistic gas: P = (π m_e⁴c⁵/3h³)[x(2x²−3)√(1+x²) + 3 asinh x] with
     * n₀ = (8π/3)(m_e c/h)³ x³ (Chandrasekhar 1939, <i>An Introduction to the Study of Stellar
     * Structure</i>, ch. X). At these temperatures the thermal correction, of order (kT/E_F)², is below
     * 1e-11 (E_F ≥ 0.1 m_e c², kT ≤ 1.7e-7 m_e c² … 1.7e-5 m_e c² at x = 20), so the tolerance 1e-10 leaves
     * room for rounding in the closed form.
     */
    @ParameterizedTest(name = "x = {0}, T = {1}")
    @CsvSource({"0.5, 1000", "1, 1000", "3, 1000", "20, 1e5"})
    void chandrasekharPressureAtZeroTemperature(double x, double temperature) {
        double netDensity = 8.0 * Math.PI / 3.0 * Math.pow(MC / Constants.PLANCK, 3) * x * x * x;
        ElectronPositronGas.State state = ElectronPositronGas.at(netDensity, temperature);
        double coefficient = Math.PI * Math.pow(Constants.ELECTRON_MASS, 4) * Math.pow(Constants.SPEED_OF_LIGHT, 5)
                / (3.0 * Math.pow(Constants.PLANCK, 3));
        double expected = coefficient * (x * (2 * x * x - 3) * Math.sqrt(1 + x * x) + 3 * asinh(x));
        assertRelative(expected, state.pressure(), 1e-10, "Chandrasekhar pressure");
        assertTrue(state.nPositron() == 0.0, "no positrons at 1000 K");
    }

    /**
     * Non-degenerate pairs: n₊n₋ = π⁻⁴(m_e c/ħ)⁶ θ² K₂(1/θ)² (Boltzmann limit of the Jüttner
     * distribution; the chemical potentials cancel in the product). At θ = 0.04 and these densities
     * η ≤ −19 and η₊ ≤ −25, so Fermi corrections (~e^η) are below 1e-8; tolerance 1e-8 … 1e-10 by row.
     */
    @ParameterizedTest(name = "theta = {0}, n0 = {1}")
    @CsvSource({"0.04, 1e10, 1e-10", "0.04, 1e15, 1e-10", "0.04, 1e20, 1e-8", "0.03, 1e5, 1e-10"})
    void boltzmannPairProduct(double theta, double netDensity, double tolerance) {
        double temperature = theta * ElectronPositronGas.REST_ENERGY / Constants.BOLTZMANN;
        ElectronPositronGas.State state = ElectronPositronGas.at(netDensity, temperature);
        double k2 = besselK2(1.0 / theta);
        double expected = Math.pow(MC / Constants.HBAR, 6) * theta * theta * k2 * k2 / Math.pow(Math.PI, 4);
        assertRelative(expected, state.nElectron() * state.nPositron(), tolerance, "n+ n-");
    }

    /**
     * Charge neutrality as solved: n₋ − n₊ = n₀ (identity), where the direct difference has no
     * cancellation (n₊ ≤ n₀) and where pairs dominate (checked through the sinh form's own difference).
     */
    @ParameterizedTest(name = "n0 = {0}, T = {1}")
    @CsvSource({"1e13, 1e4", "6e27, 1e6", "6e33, 1e9", "6e33, 1e11", "6e14, 3e9", "6e27, 1e10"})
    void neutralityHolds(double netDensity, double temperature) {
        ElectronPositronGas.State state = ElectronPositronGas.at(netDensity, temperature);
        double cancellation = state.nPositron() / netDensity;
        double tolerance = 1e-12 * Math.max(1.0, cancellation);
        assertRelative(netDensity, state.nElectron() - state.nPositron(), tolerance, "n- - n+");
        assertTrue(Double.isFinite(state.pressure()) && state.pressure() > 0, "pressure");
    }

    /** K₂(z) = ∫₀^∞ e^{−z cosh t} cosh 2t dt (integral representation, Abramowitz &amp; Stegun 9.6.24) by the trapezoid rule, which converges geometrically for this analytic integrand. */
    static double besselK2(double z) {
        double h = 0.02;
        double sum = 0.5; // t = 0 term, e^{−z(cosh 0 − 1)} cosh 0 / 2 with e^{−z} factored
        for (int i = 1; i < 100000; i++) {
            double t = i * h;
            double term = Math.exp(-z * (Math.cosh(t) - 1.0)) * Math.cosh(2.0 * t);
            sum += term;
            if (term < 1e-22 * sum) {
                break;
            }
        }
        return Math.exp(-z) * sum * h;
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(1 + x * x));
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertTrue(Double.isFinite(actual), what + " not finite");
        double error = Math.abs(actual - expected) / Math.abs(expected);
        assertTrue(error <= tolerance, what + ": expected " + expected + " got " + actual + " (relative " + error + ")");
    }
}
