package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.eos.Samples.relative;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;

/**
 * Round trips of every inversion to 1e-12 relative, over seeded random states of the plane and at
 * the extremes β = 1 − 1e-10 and β = 1e-8; requests without a solution are bad input.
 *
 * <p>Why 1e-12 is attainable: each inverse problem below is well conditioned — T from (ρ, P)
 * with δT/T = δP/(χ_T P) and χ_T ≥ 1; T from (ρ, s) with δln T = δs/c_V where the rounding of
 * s is at most about 100 ε k per particle and c_V ≥ 1.5 k per particle; (ρ, T) from (P, s) and
 * from (β, P) likewise. The one ill-conditioned direction is ρ from (P, T) when β is small:
 * P holds P_gas only to ε P, so ρ carries a relative error of about 2ε/β whatever the method;
 * there the test asserts the backward error (P reproduced to rounding) and the forward error
 * against that bound.
 */
class EosInversionTest {

    private static final double ROUND_TRIP = 1e-12;

    static Stream<Arguments> randomStates() {
        List<Arguments> rows = new ArrayList<>();
        int seed = 1;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : Samples.plane(900 + seed++, 400)) {
                rows.add(Arguments.of(eos.state(p[0], p[1])));
            }
        }
        return rows.stream();
    }

    /** States at the extremes the brief names, at pressures from a stellar atmosphere to a core. */
    static Stream<Arguments> extremeStates() {
        List<Arguments> rows = new ArrayList<>();
        for (Composition c : Samples.COMPOSITIONS) {
            EosInversion inversion = new EosInversion(new GasRadiationEos(c));
            for (double pressure : new double[] {1e3, 1e12, 1e17, 1e22}) {
                rows.add(Arguments.of(inversion.atOneMinusBetaPressure(1e-10, pressure)));
                rows.add(Arguments.of(inversion.atBetaPressure(1e-8, pressure)));
            }
        }
        return rows.stream();
    }

    static Stream<Arguments> allStates() {
        return Stream.concat(randomStates(), extremeStates());
    }

    private static EosInversion inversionFor(EosState s) {
        return new EosInversion(new GasRadiationEos(s.composition()));
    }

    @ParameterizedTest
    @MethodSource("allStates")
    void temperatureFromDensityAndPressure(EosState s) {
        EosInversion inversion = inversionFor(s);
        relative(s.T(), inversion.temperature(s.rho(), s.P()), ROUND_TRIP, "(rho, P) -> T");
        relative(s.T(), inversion.atDensityPressure(s.rho(), s.P()).T(), ROUND_TRIP, "state (rho, P)");
    }

    @ParameterizedTest
    @MethodSource("allStates")
    void densityFromPressureAndTemperature(EosState s) {
        EosInversion inversion = inversionFor(s);
        if (s.P() <= s.Prad()) {
            // β below the rounding of P: as a double, P is pure radiation and no density gives it
            assertThrows(BadInputException.class, () -> inversion.density(s.P(), s.T()));
            return;
        }
        double rho = inversion.density(s.P(), s.T());
        // backward error: the density found reproduces P to rounding
        relative(s.P(), inversion.eos().state(rho, s.T()).P(), 1e-15, "P reproduced");
        // forward error within the conditioning bound 2ε/β (see the class comment)
        relative(s.rho(), rho, ROUND_TRIP + 1e-15 / s.beta(), "(P, T) -> rho at beta " + s.beta());
        relative(s.rho(), inversion.atPressureTemperature(s.P(), s.T()).rho(), ROUND_TRIP + 1e-15 / s.beta(),
                "state (P, T)");
    }

    @ParameterizedTest
    @MethodSource("allStates")
    void temperatureFromDensityAndEntropy(EosState s) {
        if (s.s() <= 0) {
            // Sackur–Tetrode entropy is negative only deep in the degenerate corner (outside the model)
            assertThrows(BadInputException.class, () -> inversionFor(s).atDensityEntropy(s.rho(), s.s()));
            return;
        }
        relative(s.T(), inversionFor(s).atDensityEntropy(s.rho(), s.s()).T(), ROUND_TRIP, "(rho, s) -> T");
    }

    @ParameterizedTest
    @MethodSource("allStates")
    void stateFromPressureAndEntropy(EosState s) {
        if (s.s() <= 0) {
            assertThrows(BadInputException.class, () -> inversionFor(s).atPressureEntropy(s.P(), s.s()));
            return;
        }
        EosInversion inversion = inversionFor(s);
        EosState found = inversion.atPressureEntropy(s.P(), s.s());
        relative(s.rho(), found.rho(), ROUND_TRIP, "(P, s) -> rho at beta " + s.beta());
        relative(s.T(), found.T(), ROUND_TRIP, "(P, s) -> T");
        relative(s.oneMinusBeta(), found.oneMinusBeta(), ROUND_TRIP, "(P, s) -> 1 - beta");
        relative(Math.log(s.T()), inversion.temperatureOnIsobar(s.P(), s.s()), 1e-14, "ln T on the isobar");
    }

    /**
     * (β, P) → (ρ, T) with T = (3(1 − β)P/a)^{1/4} and ρ ∝ β: the fraction that is small must be
     * passed itself, since a double near 1 holds the small complement only to ε/(small). So the
     * round trip goes through β when β ≤ 1/2 and through 1 − β when 1 − β ≤ 1/2; the other form
     * is checked where it is well conditioned too.
     */
    @ParameterizedTest
    @MethodSource("allStates")
    void stateFromBetaAndPressure(EosState s) {
        EosInversion inversion = inversionFor(s);
        EosState found = s.beta() <= 0.5 ? inversion.atBetaPressure(s.beta(), s.P())
                : inversion.atOneMinusBetaPressure(s.oneMinusBeta(), s.P());
        relative(s.rho(), found.rho(), ROUND_TRIP, "(beta, P) -> rho");
        relative(s.T(), found.T(), ROUND_TRIP, "(beta, P) -> T");
        relative(s.P(), found.P(), ROUND_TRIP, "(beta, P) -> P");
        relative(s.beta(), found.beta(), ROUND_TRIP, "beta kept");
        relative(s.oneMinusBeta(), found.oneMinusBeta(), ROUND_TRIP, "1 - beta kept");
        if (s.beta() > 1e-3 && s.oneMinusBeta() > 1e-3) {
            EosState other = s.beta() <= 0.5 ? inversion.atOneMinusBetaPressure(s.oneMinusBeta(), s.P())
                    : inversion.atBetaPressure(s.beta(), s.P());
            // conditioning: ε/min(β, 1 − β) ≤ 1e-13
            relative(s.rho(), other.rho(), ROUND_TRIP, "the other form -> rho");
            relative(s.T(), other.T(), ROUND_TRIP, "the other form -> T");
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-10, 1e-8, 1e-3, 0.5, 1 - 1e-8, 1 - 1e-10})
    void namedBetas(double beta) {
        EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
        for (double pressure : new double[] {1e5, 1e17, 1e25}) {
            EosState s = inversion.atBetaPressure(beta, pressure);
            relative(beta, s.beta(), ROUND_TRIP, "beta");
            relative(pressure, s.P(), ROUND_TRIP, "P");
            // T = (3(1−β)P/a)^{1/4} (closed form)
            relative(Math.pow(3 * (1 - beta) * pressure / Constants.RADIATION_DENSITY, 0.25), s.T(), ROUND_TRIP, "T");
        }
    }

    @Test
    void isobarInversionReachesStatesFarBelowTheRoundingOfP() {
        // β = 1e-20: P_gas is 1e-4 of an ulp of P, yet (P, s) fixes the state through the
        // radiation entropy 4aT³/(3ρ); regression for a search in T that could not go below β ~ 1e-11
        EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
        EosState s = inversion.eos().state(1e-12, 1e10);
        assertTrue(s.beta() < 1e-19);
        EosState found = inversion.atPressureEntropy(s.P(), s.s());
        relative(s.rho(), found.rho(), ROUND_TRIP, "rho");
        relative(s.T(), found.T(), ROUND_TRIP, "T");
    }

    @Test
    void isobarInversionFromTheMidpointRegression() {
        // an earlier search returned the bracket's midpoint (T = 0.014 K) for this state
        EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
        EosState s = inversion.eos().state(1e-6, 1e9);
        relative(1e9, Math.exp(inversion.temperatureOnIsobar(s.P(), s.s())), ROUND_TRIP, "T");
    }

    @Nested
    class NoSolution {

        private final GasRadiationEos eos = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02));
        private final EosInversion inversion = new EosInversion(eos);

        @ParameterizedTest
        @ValueSource(doubles = {1.0, 0.999999, 0.5, 1e-10})
        void pressureAtOrBelowTheRadiationPressure(double fraction) {
            double t = 1e7;
            double pRad = Constants.RADIATION_DENSITY * Math.pow(t, 4) / 3;
            assertThrows(BadInputException.class, () -> inversion.density(fraction * pRad, t));
            assertThrows(BadInputException.class, () -> inversion.atPressureTemperature(fraction * pRad, t));
        }

        @ParameterizedTest
        @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY})
        void entropyNotPositiveAndFinite(double s) {
            assertThrows(BadInputException.class, () -> inversion.atDensityEntropy(1.0, s));
            assertThrows(BadInputException.class, () -> inversion.atPressureEntropy(1e15, s));
            assertThrows(BadInputException.class, () -> inversion.temperatureOnIsobar(1e15, s));
        }

        @Test
        void entropyBelowWhatTheClassicalGasAllows() {
            // at ρ = 1e-30 g/cm3 even T = 0.01 K leaves every species non-degenerate and s > 0
            double rho = 1e-30;
            double floor = eos.entropy(rho, EosInversion.T_SEARCH_MIN);
            assertTrue(floor > 0);
            assertThrows(BadInputException.class, () -> inversion.atDensityEntropy(rho, floor / 2));
        }

        @Test
        void entropyAboveWhatTheModelReaches() {
            double ceiling = eos.entropy(1.0, EosInversion.T_SEARCH_MAX);
            assertThrows(BadInputException.class, () -> inversion.atDensityEntropy(1.0, 2 * ceiling));
            assertThrows(BadInputException.class, () -> inversion.atPressureEntropy(1e15, 1e300));
        }

        @ParameterizedTest
        @ValueSource(doubles = {0.0, 1.0, -0.1, 1.1, Double.NaN})
        void betaOutsideTheOpenInterval(double beta) {
            assertThrows(BadInputException.class, () -> inversion.atBetaPressure(beta, 1e17));
            assertThrows(BadInputException.class, () -> inversion.atOneMinusBetaPressure(beta, 1e17));
        }

        @ParameterizedTest
        @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
        void nonPositiveInputs(double bad) {
            assertThrows(BadInputException.class, () -> inversion.temperature(bad, 1e15));
            assertThrows(BadInputException.class, () -> inversion.temperature(1.0, bad));
            assertThrows(BadInputException.class, () -> inversion.density(bad, 1e7));
            assertThrows(BadInputException.class, () -> inversion.density(1e15, bad));
            assertThrows(BadInputException.class, () -> inversion.atBetaPressure(0.5, bad));
            assertThrows(BadInputException.class, () -> inversion.atDensityEntropy(bad, 1e8));
            assertThrows(BadInputException.class, () -> eos.state(bad, 1e7));
            assertThrows(BadInputException.class, () -> eos.state(1.0, bad));
        }

        @Test
        void statesBeyondTheDoubleRange() {
            // regression: these gave Infinity (u, c_V, c_P), which crashed the writers
            assertThrows(BadInputException.class, () -> eos.state(1e-300, 1e10));
            assertThrows(BadInputException.class, () -> eos.state(1.0, 1e80));
            assertThrows(BadInputException.class, () -> eos.state(Double.MIN_VALUE, 1e3));
            // and a state just inside the range is fine and finite
            EosState s = eos.state(1e-100, 1e10);
            assertTrue(Double.isFinite(s.cP()) && Double.isFinite(s.u()));
        }
    }

    @Test
    void quarticNeedsFewSteps() {
        // the documented bound on Newton from an upper bound: count iterations indirectly through
        // the result being a root to rounding
        EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
        for (double[] p : Samples.plane(5, 2000)) {
            double pressure = inversion.eos().state(p[0], p[1]).P();
            double t = inversion.temperature(p[0], pressure);
            double residual = Constants.RADIATION_DENSITY * Math.pow(t, 4) / 3 + inversion.eos().gasConstant() * p[0] * t
                    - pressure;
            assertEquals(0.0, residual / pressure, 1e-15);
        }
    }
}
