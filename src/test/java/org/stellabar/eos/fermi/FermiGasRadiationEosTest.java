package org.stellabar.eos.fermi;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.physics.Constants;

class FermiGasRadiationEosTest {

    private static final Composition OXYGEN = Composition.of(0.0, 0.0, 1.0, 16.0);
    private static final Composition SOLAR = Composition.of(0.70, 0.28, 0.02, 16.0);

    /**
     * Classical limit: where electrons are non-degenerate (e^η ≪ 1) and non-relativistic (θ ≪ 1), the
     * pressure, energy, entropy and Γ1 approach {@link GasRadiationEos}. The first corrections are the
     * Fermi correction to the electron pressure, e^η/2^{5/2}, and the relativistic one, (5/4)θ (the θ term
     * of F_{3/2} + (θ/2)F_{5/2} over F_{1/2} + θF_{3/2}; from the expansion of the integrand), each times the
     * electrons' share of P; the tolerance is 3θ + e^η. Measured (solar mix, rows in order):
     * ΔP/P = 3.1e-7, 9.8e-5, 3.0e-4, 1.2e-12; ΔΓ1/Γ1 = −7.7e-6, −8.7e-5, −7.6e-4, −1.6e-7;
     * Δu/u = 1.1e-5, 2.1e-4, 1.4e-3, 3.3e-7 (u differs by the electrons' relativistic kinetic energy).
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @CsvSource({"1e-6, 1e5", "1e-2, 1e6", "1, 1e7", "1e-4, 3e7"})
    void classicalLimit(double rho, double T) {
        FermiGasRadiationEos.FermiState fermi = new FermiGasRadiationEos(SOLAR).fermiState(rho, T);
        EosState classical = new GasRadiationEos(SOLAR).state(rho, T);
        double theta = Constants.BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        double tolerance = 3.0 * theta + Math.exp(fermi.eta());
        assertRelative(classical.P(), fermi.common().P(), tolerance, "P");
        assertRelative(classical.Gamma1(), fermi.common().Gamma1(), tolerance, "Gamma1");
        assertRelative(classical.u(), fermi.common().u(), tolerance, "u");
        // entropy differs by the electrons' Fermi correction only, relative to the electron entropy ~ k/(μ_e m_u)·(several)
        double sScale = Constants.BOLTZMANN / (SOLAR.mu() * Constants.ATOMIC_MASS_UNIT);
        assertTrue(Math.abs(classical.s() - fermi.common().s()) <= 10 * tolerance * sScale,
                "s: " + classical.s() + " vs " + fermi.common().s());
    }

    /**
     * The pair gas's entropy, computed as the integral of the entropy per state −[f ln f + (1−f) ln(1−f)],
     * equals (E + P − μ₋(n₋ − n₊))/T with μ₊ = −μ₋ (Cox &amp; Giuli 1968, ch. 24; identity), i.e.
     * (E + P − kTη n₀)/T in our energy convention. The difference form loses digits in proportion to
     * (E + P)/(T S): the tolerance is 1e-14 times that ratio (sums of ~200 terms, a few ulps each), at
     * least 1e-14; pair-rich, degenerate, classical and relativistic points, and electrons in the
     * Boltzmann limit η ≤ −37 (ρ = 1e-13, T = 1e8: η ≈ −39; 1e-14, 3e7: η ≈ −41), where the integrals
     * come from the per-θ table. At η &lt; 0 the code forms the entropy from the identity per species, so
     * there this checks only that the two species' terms add up to the form in n₀ (the positrons' −μ₋ −
     * 2m_e c²); the independent checks at η &lt; 0 are the two tests below.
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @CsvSource({"1e4, 2e9", "1e8, 1e8", "1e2, 1e7", "1e-2, 5e9", "1e6, 3e9", "1e9, 1e10", "1e7, 1e6", "1e-8, 1e5",
        "1e-13, 1e8", "1e-14, 3e7"})
    void entropyIntegralEqualsThermodynamicIdentity(double rho, double T) {
        double n0 = rho * OXYGEN.electronsPerGram();
        double theta = Constants.BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        double eta = ElectronPositronGas.solveEta(n0, theta);
        FermiGasRadiationEos.PairTerms pairs = FermiGasRadiationEos.PairTerms.at(eta, theta);
        double fromIntegral = Constants.BOLTZMANN * pairs.entropy;
        double sum = pairs.e + pairs.p;
        double fromIdentity = (sum - Constants.BOLTZMANN * T * eta * n0) / T;
        double tolerance = 1e-14 * Math.max(1.0, sum / (T * fromIntegral));
        assertRelative(fromIdentity, fromIntegral, tolerance, "entropy density");
    }

    /**
     * The pair gas's entropy at η &lt; 0, where the code forms it from the identity T s = E + P − μ n per
     * species (so that the test above compares the identity with itself there, up to the assembly of the
     * two species), against the integral of the entropy per state −[f ln f + (1−f) ln(1−f)] computed
     * independently at 30 digits: validation/fermi/pair-entropy-mpmath.csv, written by
     * validation/scripts/pair_entropy_mpmath.py (mpmath tanh-sinh quadrature, η by findroot). This checks
     * the identity and the positrons' chemical potential −μ₋ − 2m_e c² (rest mass). Tolerance 1e-13: the
     * quadrature sums carry ~1e-15 relative rounding, and S moves with η by ∂ln S/∂η ≈ −(n/S) ~ 1 times η's
     * error (~1e-15 relative to |η| ≤ 40, so ≤ 4e-14 absolute).
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @MethodSource("entropyReferences")
    void entropyAtNegativeEtaMatchesIntegralOfEntropyPerState(double rho, double T, double etaReference,
                                                              double entropyReference) {
        double n0 = rho * OXYGEN.electronsPerGram();
        double theta = Constants.BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        double eta = ElectronPositronGas.solveEta(n0, theta);
        assertTrue(eta < 0.0 && Math.abs(eta - etaReference) <= 1e-12 * Math.max(1.0, Math.abs(eta)),
                "eta " + eta + " vs " + etaReference);
        FermiGasRadiationEos.PairTerms pairs = FermiGasRadiationEos.PairTerms.at(eta, theta);
        assertRelative(entropyReference, pairs.entropy, 1e-13, "pair entropy density over k");
    }

    static List<Arguments> entropyReferences() throws java.io.IOException {
        List<Arguments> rows = new ArrayList<>();
        for (String line : java.nio.file.Files.readAllLines(java.nio.file.Path.of("validation", "fermi",
                "pair-entropy-mpmath.csv"))) {
            if (line.startsWith("#") || line.startsWith("rho,")) {
                continue;
            }
            String[] f = line.split(",");
            rows.add(Arguments.of(Double.parseDouble(f[0]), Double.parseDouble(f[1]), Double.parseDouble(f[2]),
                    Double.parseDouble(f[3])));
        }
        assertTrue(rows.size() >= 4, "reference rows");
        return rows;
    }

    /**
     * (∂s/∂T)_ρ = (∂u/∂T)_ρ / T (from du = T ds + (P/ρ²) dρ; Cox &amp; Giuli 1968, §9.3) for the pair gas
     * alone at η &lt; 0, by central differences of its entropy density S and energy density E in ln T
     * at fixed η-solve (each state solved for neutrality): T dS/dlnT = dE/dlnT at fixed n₀. S comes
     * from the identity, E from the energy integrals: a wrong positron convention in S (±2 m_e c² n₊/kT)
     * or a wrong factor would break this. Five-point stencil, step h = 1e-3: truncation ~h⁴ ≈ 1e-12,
     * rounding ~1e-15/h ≈ 1e-12 of E; tolerance 1e-9 relative to dE/dlnT.
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @CsvSource({"1e4, 2e9", "1e-2, 5e9", "1e2, 1e7", "1e-13, 1e8", "1e-4, 1e9", "1, 5e8"})
    void pairEntropySlopeMatchesEnergySlopeAtNegativeEta(double rho, double T) {
        double n0 = rho * OXYGEN.electronsPerGram();
        DoubleUnaryOperator entropy = x -> pairsAt(n0, T * Math.exp(x)).entropy * Constants.BOLTZMANN;
        DoubleUnaryOperator energy = x -> pairsAt(n0, T * Math.exp(x)).e;
        double theta = Constants.BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        assertTrue(ElectronPositronGas.solveEta(n0, theta) < 0.0, "eta < 0 at this point");
        double dE = derivative(energy);
        double dS = derivative(entropy);
        assertRelative(dE, T * dS, 1e-9, "T (dS/dlnT) vs dE/dlnT");
    }

    private static FermiGasRadiationEos.PairTerms pairsAt(double n0, double T) {
        double theta = Constants.BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        return FermiGasRadiationEos.PairTerms.at(ElectronPositronGas.solveEta(n0, theta), theta);
    }

    static List<Arguments> planePoints() {
        List<Arguments> points = new ArrayList<>();
        for (int i = -10; i <= 10; i += 2) {
            for (int j = 4; j <= 11; j++) {
                points.add(Arguments.of(Math.pow(10, i), Math.pow(10, j)));
            }
        }
        return points;
    }

    /**
     * Thermodynamic consistency over ρ ∈ [1e-10, 1e10] g/cm3 × T ∈ [1e4, 1e11] K, by five-point finite
     * differences in ln ρ and ln T (step 1e-3: truncation ~h⁴ ≈ 1e-12, rounding ~1e-16/h ≈ 1e-13):
     * the Maxwell relation ρ²(∂s/∂ρ)_T = −(∂P/∂T)_ρ and the energy equation ρ²(∂u/∂ρ)_T = P − T(∂P/∂T)_ρ
     * (identities; e.g. Cox &amp; Giuli 1968, §9.3), each scaled by P/T or P; and the analytic χ_ρ, χ_T,
     * c_V against finite differences of P and u. Tolerance 1e-9 (c_V: plus the stencil's rounding of u).
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @MethodSource("planePoints")
    void consistentOverThePlane(double rho, double T) {
        FermiGasRadiationEos eos = new FermiGasRadiationEos(OXYGEN);
        EosState state = eos.state(rho, T);
        double p = state.P();
        double dPdLnT = derivative(x -> eos.state(rho, T * Math.exp(x)).P());
        double dPdLnRho = derivative(x -> eos.state(rho * Math.exp(x), T).P());
        double dSdLnRho = derivative(x -> eos.state(rho * Math.exp(x), T).s());
        double dUdLnRho = derivative(x -> eos.state(rho * Math.exp(x), T).u());
        double dUdLnT = derivative(x -> eos.state(rho, T * Math.exp(x)).u());
        // Maxwell: ρ ∂s/∂lnρ = −(1/T)... i.e. ρT (∂s/∂ln ρ)_T = −(∂P/∂ln T)_ρ
        assertAbsolute(-dPdLnT, rho * T * dSdLnRho, 1e-9 * p, "Maxwell relation");
        // energy equation: ρ (∂u/∂ln ρ)_T = P − (∂P/∂ln T)_ρ
        assertAbsolute(p - dPdLnT, rho * dUdLnRho, 1e-9 * p, "energy equation");
        assertAbsolute(dPdLnRho / p, state.chiRho(), 1e-9, "chi_rho");
        assertAbsolute(dPdLnT / p, state.chiT(), 1e-9, "chi_T");
        // where the electrons are strongly degenerate u (~E_F/m_u) exceeds T c_V by up to 1e10 and the
        // difference of u loses digits: u carries ~1e-14 relative rounding from the quadrature sums, so
        // the stencil's rounding, ~1e-14 |u| / h, is allowed for
        assertAbsolute(dUdLnT / T, state.cV(), 1e-9 * state.cV() + 1e-11 * Math.abs(state.u()) / T, "c_V");
        assertTrue(state.Gamma1() > 1.0 && state.Gamma1() < 5.0 / 3.0 + 1e-9, "Gamma1 " + state.Gamma1());
    }

    @Test
    void coveredWarningsAreNotRaised() {
        EosState state = new FermiGasRadiationEos(OXYGEN).state(1e6, 2e9);
        assertTrue(state.warnings().stream().noneMatch(w -> w.code() == ValidityWarning.Regime.PAIR_CREATION
                || w.code() == ValidityWarning.Regime.ELECTRON_DEGENERACY
                || w.code() == ValidityWarning.Regime.RELATIVISTIC_ELECTRONS));
        assertTrue(new GasRadiationEos(OXYGEN).state(1e6, 2e9).has(ValidityWarning.Regime.PAIR_CREATION));
    }

    /** Five-point central difference at x = 0 with step 1e-3. */
    private static double derivative(DoubleUnaryOperator f) {
        double h = 1e-3;
        return (f.applyAsDouble(-2 * h) - 8 * f.applyAsDouble(-h) + 8 * f.applyAsDouble(h) - f.applyAsDouble(2 * h))
                / (12 * h);
    }

    private static void assertAbsolute(double expected, double actual, double tolerance, String what) {
        assertTrue(Double.isFinite(actual), what + " not finite");
        assertTrue(Math.abs(actual - expected) <= tolerance,
                what + ": expected " + expected + " got " + actual + " (difference " + Math.abs(actual - expected) + ", allowed " + tolerance + ")");
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        double error = Math.abs(actual - expected) / Math.abs(expected);
        assertTrue(error <= tolerance, what + ": expected " + expected + " got " + actual + " (relative " + error
                + ", allowed " + tolerance + ")");
    }
}
