package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.ValidityWarning.Regime;

/**
 * Each validity warning fires on the far side of its documented threshold and not on the near
 * side. The threshold densities and temperatures are computed here from the definitions (with
 * CODATA 2018 constants typed in), not from {@link ValidityCheck}; the states sit a few per cent
 * on either side, more than any rounding and less than any plausible change of definition.
 */
class ValidityCheckTest {

    private static final double K = ReferenceMixture.K;
    private static final double H = ReferenceMixture.H;
    private static final double M_E = ReferenceMixture.M_E;
    private static final double M_U = ReferenceMixture.M_U;
    private static final double C = ReferenceMixture.C;
    /** Elementary charge in Gaussian units: 1.602176634e-19 C (CODATA 2018, exact) × c/10. */
    private static final double E = 1.602176634e-19 * C / 10;
    private static final double EV = 1.602176634e-12;

    private static final Composition SOLAR = Composition.of(0.70, 0.28, 0.02);
    private static final Composition HYDROGEN = Composition.of(1, 0, 0);
    private static final Composition HELIUM = Composition.of(0, 1, 0);

    private static boolean flags(Composition c, double rho, double t, Regime regime) {
        GasRadiationEos eos = new GasRadiationEos(c);
        EosState s = eos.state(rho, t);
        boolean inList = s.has(regime);
        boolean inMask = (eos.validity().mask(rho, t, s.beta()) & regime.bit()) != 0;
        assertEquals(inList, inMask, "list and mask agree for " + regime);
        return inList;
    }

    /** Density [g/cm3] where n_e λ_e³/2 = D, λ_e = h/√(2π m_e kT). */
    private static double degeneracyDensity(Composition c, double t, double d) {
        double lambda = H / Math.sqrt(2 * Math.PI * M_E * K * t);
        return 2 * d / (lambda * lambda * lambda) * c.muE() * M_U;
    }

    private static void straddles(Composition c, double rhoBelow, double rhoAbove, double tBelow, double tAbove,
            Regime regime) {
        assertFalse(flags(c, rhoBelow, tBelow, regime), regime + " must not fire at rho=" + rhoBelow + ", T=" + tBelow);
        assertTrue(flags(c, rhoAbove, tAbove, regime), regime + " must fire at rho=" + rhoAbove + ", T=" + tAbove);
    }

    @Nested
    class KnownStates {

        @ParameterizedTest(name = "X = {0}")
        @ValueSource(doubles = {0.70, 0.35})
        void solarCentreIsClean(double x) {
            // centre of the standard solar model: ρ_c ≈ 150 g/cm3, T_c ≈ 1.57e7 K, X_c ≈ 0.35 today
            // (Bahcall, Pinsonneault & Basu 2001, ApJ 555, 990; from memory). The electrons there are
            // mildly degenerate, D = n_e λ_e³/2 ≈ 0.2, not enough to flag.
            EosState s = new GasRadiationEos(Composition.fromAnyTwo(x, Double.NaN, 0.02)).state(150, 1.57e7);
            assertEquals(List.of(), s.warnings());
        }

        @Test
        void whiteDwarfInterior() {
            // a carbon white dwarf's interior, ρ ~ 1e6 g/cm3 and T ~ 1e7 K (Shapiro & Teukolsky 1983,
            // ch. 3 and 4, order of magnitude; from memory): degenerate, relativistic, coupled
            EosState s = new GasRadiationEos(Composition.of(0, 0, 1, 12)).state(1e6, 1e7);
            assertTrue(s.has(Regime.ELECTRON_DEGENERACY));
            assertTrue(s.has(Regime.RELATIVISTIC_ELECTRONS));
            assertTrue(s.has(Regime.COULOMB_COUPLING));
            assertFalse(s.has(Regime.PAIR_CREATION));
            assertFalse(s.has(Regime.RADIATION_DOMINATED));
            assertTrue(new GasRadiationEos(SOLAR).state(1e6, 1e7).has(Regime.ELECTRON_DEGENERACY));
        }

        @Test
        void pairsAtTwoBillionKelvin() {
            assertTrue(new GasRadiationEos(SOLAR).state(1e3, 2e9).has(Regime.PAIR_CREATION));
        }

        @Test
        void coolThinGasIsNotIonized() {
            // ρ = 1e-12 g/cm3 at 1000 K: hydrogen is atomic or molecular (Saha gives ~1 neutral)
            EosState s = new GasRadiationEos(SOLAR).state(1e-12, 1e3);
            assertTrue(s.has(Regime.PARTIAL_IONIZATION));
        }

        @Test
        void massiveStarCoreIsRadiationDominatedOnlyWhenBetaIsBelowOneHalf() {
            EosInversion inversion = new EosInversion(new GasRadiationEos(SOLAR));
            assertTrue(inversion.atBetaPressure(0.49, 1e17).has(Regime.RADIATION_DOMINATED));
            assertFalse(inversion.atBetaPressure(0.51, 1e17).has(Regime.RADIATION_DOMINATED));
        }
    }

    @Nested
    class Thresholds {

        @ParameterizedTest(name = "T = {0} K")
        @ValueSource(doubles = {1e4, 1e6, 1e7, 1e8})
        void degeneracyAtDEqualsOne(double t) {
            double rho = degeneracyDensity(SOLAR, t, 1.0);
            straddles(SOLAR, rho / 1.05, rho * 1.05, t, t, Regime.ELECTRON_DEGENERACY);
        }

        @Test
        void thermallyRelativisticAboveOneTenthOfTheRestEnergy() {
            double t = 0.1 * M_E * C * C / K;
            straddles(SOLAR, 1e-3, 1e-3, t / 1.02, t * 1.02, Regime.RELATIVISTIC_ELECTRONS);
        }

        @Test
        void degenerateElectronsRelativisticAboveOneTenthOfMeC() {
            // p_F = ħ(3π² n_e)^{1/3} = 0.1 m_e c at n_e = (0.1 m_e c/ħ)³/(3π²)
            double hbar = H / (2 * Math.PI);
            double ne = Math.pow(0.1 * M_E * C / hbar, 3) / (3 * Math.PI * Math.PI);
            double rho = ne * SOLAR.muE() * M_U;
            double t = 1e5;
            assertTrue(rho / 1.1 > degeneracyDensity(SOLAR, t, 1.0), "degenerate on both sides");
            straddles(SOLAR, rho / 1.1, rho * 1.1, t, t, Regime.RELATIVISTIC_ELECTRONS);
        }

        @Test
        void highFermiMomentumAloneIsNotFlaggedWhenNotDegenerate() {
            // ρ = 1e4 g/cm3 at 3e8 K: p_F ≈ 0.2 m_e c but D ≈ 0.2, and kT ≈ 0.05 m_e c²
            double rho = 1e4;
            double t = 3e8;
            assertTrue(rho < degeneracyDensity(SOLAR, t, 1.0));
            assertFalse(flags(SOLAR, rho, t, Regime.RELATIVISTIC_ELECTRONS));
        }

        @Test
        void pairsAboveOneBillionKelvin() {
            straddles(SOLAR, 1.0, 1.0, 0.99e9, 1.01e9, Regime.PAIR_CREATION);
        }

        @ParameterizedTest(name = "T = {0} K")
        @ValueSource(doubles = {1e5, 1e6, 1e7})
        void coulombCouplingAtGammaOne(double t) {
            // pure hydrogen: Γ_C = e²/(a kT) = 1 at a = e²/(kT), n = 3/(4π a³), ρ = n m_u; Γ_C ∝ ρ^{1/3}
            double a = E * E / (K * t);
            double rho = 3 / (4 * Math.PI * a * a * a) * M_U;
            straddles(HYDROGEN, rho / 1.2, rho * 1.2, t, t, Regime.COULOMB_COUPLING);
        }

        @Test
        void hydrogenIonizationAtOnePerCentNeutral() {
            // Saha for H (13.598434 eV, NIST Atomic Spectra Database; from memory), weights g(H⁰) = 2,
            // g(H⁺) = 1: n⁺/n⁰ = e^{−χ/kT}/(n_e λ_e³) = e^{−χ/kT}/(2D); 1 % neutral at 2D = e^{−χ/kT}/99
            double t = 1e4;
            double d = Math.exp(-13.598434 * EV / (K * t)) / 198;
            double rho = degeneracyDensity(HYDROGEN, t, d);
            straddles(HYDROGEN, rho / 1.2, rho * 1.2, t, t, Regime.PARTIAL_IONIZATION);
        }

        @Test
        void heliumIonizationAtOnePerCentNotFullyIonized() {
            // Saha for He⁺ → He²⁺ (54.417765 eV, NIST ASD; from memory), g(He⁺) = 2, g(He²⁺) = 1
            double t = 1e5;
            double d = Math.exp(-54.417765 * EV / (K * t)) / 198;
            double rho = degeneracyDensity(HELIUM, t, d);
            straddles(HELIUM, rho / 1.2, rho * 1.2, t, t, Regime.PARTIAL_IONIZATION);
        }

        @Test
        void sahaIsNotAppliedAboveOneMillionKelvin() {
            // at ρ = 1 g/cm3 Saha would leave He⁺ recombined at 1e6 K; pressure ionization, outside
            // Saha, keeps it ionized, so the check stops at 1e6 K as documented
            straddles(HELIUM, 1.0, 1.0, 1.01e6, 0.99e6, Regime.PARTIAL_IONIZATION);
        }
    }

    @Test
    void messagesAreOneFiniteLineEach() {
        int seen = 0;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : Samples.plane(31, 500)) {
                EosState s = eos.state(p[0], p[1]);
                Set<Regime> codes = s.warnings().stream().map(ValidityWarning::code).collect(Collectors.toSet());
                assertEquals(s.warnings().size(), codes.size(), "no duplicates");
                for (ValidityWarning w : s.warnings()) {
                    assertFalse(w.message().contains("\n") || w.message().contains("NaN")
                            || w.message().contains("Infinity"), w.message());
                    assertTrue(w.message().matches(".*\\d.*"), "quotes its number: " + w.message());
                    seen++;
                }
            }
        }
        assertTrue(seen > 500, "the sample exercises the messages: " + seen);
    }

    @Test
    void linesAreWrittenOnDemandAndEqualTheDescriptions() {
        GasRadiationEos eos = new GasRadiationEos(SOLAR);
        EosState s = eos.state(1e6, 2e9);
        assertTrue(s.warnings().size() >= 3);
        for (ValidityWarning w : s.warnings()) {
            String line = eos.validity().describe(w.code(), s.rho(), s.T(), s.beta());
            assertEquals(line, w.message());
            assertEquals(line, w.message(), "the same line on a second read");
            ValidityWarning eager = new ValidityWarning(w.code(), line);
            assertEquals(eager, w);
            assertEquals(eager.hashCode(), w.hashCode());
            assertEquals(eager.toString(), w.toString());
        }
        assertEquals(s.warnings(), eos.state(1e6, 2e9).warnings());
        assertThrows(NullPointerException.class, () -> new ValidityWarning(null, "x"));
        assertThrows(NullPointerException.class, () -> new ValidityWarning(Regime.PAIR_CREATION, (String) null));
    }

    @Test
    void absurdInputsGiveWordsNotInfinity() {
        // T = 1e-300 K: λ_e³ and hence D and Γ_C overflow while the state itself stays finite
        EosState s = new GasRadiationEos(SOLAR).state(1.0, 1e-300);
        assertTrue(s.has(Regime.ELECTRON_DEGENERACY) && s.has(Regime.COULOMB_COUPLING));
        for (ValidityWarning w : s.warnings()) {
            assertFalse(w.message().contains("Infinity") || w.message().contains("NaN"), w.message());
        }
    }

    @Test
    void stableCodes() {
        // README, "Validity warnings (stable codes)"
        assertEquals(List.of("electron_degeneracy", "relativistic_electrons", "pair_creation", "coulomb_coupling",
                "partial_ionization", "radiation_dominated"),
                java.util.Arrays.stream(Regime.values()).map(Regime::code).toList());
    }
}
