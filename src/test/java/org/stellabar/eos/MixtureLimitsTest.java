package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.eos.Samples.relative;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The exponents of the mixture in its limits and against the closed forms for a γ = 5/3 gas,
 * Γ1 = (32 − 24β − 3β²)/(24 − 21β) and ∇_ad = (8 − 6β)/(32 − 24β − 3β²) (Chandrasekhar 1939,
 * <i>An Introduction to the Study of Stellar Structure</i>, ch. II; also DESIGN §7).
 */
class MixtureLimitsTest {

    private static final EosInversion INVERSION = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
    /** Two ulp of numbers between 1 and 2: a closed form evaluated in a few roundings. */
    private static final double ULP2 = 4.5e-16;
    /** Closed forms of a few operations on numbers of order one: rounding only. */
    private static final double CLOSED_FORM_TOLERANCE = 1e-14;

    @Nested
    class PureGas {

        @Test
        void exponentsAtBetaOne() {
            double g3 = GasRadiationEos.gamma3MinusOne(1.0, 0.0);
            double g1 = GasRadiationEos.gamma1(1.0, 0.0, g3);
            // the monatomic ideal gas: Γ1 = Γ2 = Γ3 = 5/3, ∇_ad = 2/5 (closed form)
            assertEquals(5.0 / 3.0, g1, ULP2);
            assertEquals(5.0 / 3.0, 1.0 + g3, ULP2);
            assertEquals(5.0 / 3.0, GasRadiationEos.gamma2(g1, g3), ULP2);
            assertEquals(0.4, g3 / g1, ULP2);
        }

        @ParameterizedTest
        @ValueSource(doubles = {1e-10, 1e-13})
        void statesTendToTheGasValues(double oneMinusBeta) {
            // near β = 1 the exponents move linearly in 1 − β; the slopes of the closed forms are
            // −5/3 (Γ1), −10/3 (Γ2), −8/3 (Γ3), −6/5 (∇_ad), −1 (χ_ρ), 3 (χ_T): tolerance 20(1 − β)
            EosState s = INVERSION.atOneMinusBetaPressure(oneMinusBeta, 1e17);
            double tolerance = 20 * oneMinusBeta + 1e-15;
            assertEquals(5.0 / 3.0, s.Gamma1(), tolerance);
            assertEquals(5.0 / 3.0, s.Gamma2(), tolerance);
            assertEquals(5.0 / 3.0, s.Gamma3(), tolerance);
            assertEquals(0.4, s.nablaAd(), tolerance);
            assertEquals(1.0, s.chiRho(), tolerance);
            assertEquals(1.0, s.chiT(), tolerance);
            assertTrue(s.Gamma1() < 5.0 / 3.0, "radiation always lowers Gamma1");
        }
    }

    @Nested
    class PureRadiation {

        @Test
        void exponentsAtBetaZero() {
            double g3 = GasRadiationEos.gamma3MinusOne(0.0, 1.0);
            double g1 = GasRadiationEos.gamma1(0.0, 1.0, g3);
            // the photon gas: Γ1 = Γ2 = Γ3 = 4/3, ∇_ad = 1/4 (closed form)
            assertEquals(4.0 / 3.0, g1, ULP2);
            assertEquals(4.0 / 3.0, 1.0 + g3, ULP2);
            assertEquals(4.0 / 3.0, GasRadiationEos.gamma2(g1, g3), ULP2);
            assertEquals(0.25, g3 / g1, ULP2);
        }

        @ParameterizedTest
        @ValueSource(doubles = {1e-4, 1e-6, 1e-8, 1e-12})
        void smallBetaSeries(double beta) {
            // Taylor series of the closed form: Γ1 = 4/3 + β/6 + β²/48 + O(β³) (expanded with a
            // computer-algebra system from Chandrasekhar's form); the remainder after β/6 is
            // below β²/40 for β ≤ 1e-4
            EosState s = INVERSION.atBetaPressure(beta, 1e17);
            assertEquals(4.0 / 3.0 + beta / 6.0, s.Gamma1(), beta * beta / 40.0 + 1e-15);
            assertEquals(0.25, s.nablaAd(), 2 * beta);
            assertEquals(4.0 / 3.0, s.Gamma3(), 2 * beta);
            assertTrue(s.Gamma1() > 4.0 / 3.0, "gas always raises Gamma1 above 4/3");
        }
    }

    @ParameterizedTest(name = "beta = {0}")
    @ValueSource(doubles = {0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9})
    void chandrasekharClosedForms(double beta) {
        double b = beta;
        double gamma1 = (32 - 24 * b - 3 * b * b) / (24 - 21 * b);
        double nablaAd = (8 - 6 * b) / (32 - 24 * b - 3 * b * b);
        // Γ3 − 1 = (2/3)(4 − 3β)/(8 − 7β) for γ = 5/3 (Chandrasekhar 1939, ch. II)
        double gamma3 = 1 + 2.0 / 3.0 * (4 - 3 * b) / (8 - 7 * b);
        // Γ2 = 1 + (4 − 3β)(γ − 1)/(β² + 3(γ − 1)(1 − β)(4 + β)) (Chandrasekhar 1939, ch. II, from
        // memory; it satisfies Γ2/(Γ2 − 1) = Γ1/(Γ3 − 1), checked symbolically)
        double gamma2 = 1 + (4 - 3 * b) * (2.0 / 3.0) / (b * b + 2 * (1 - b) * (4 + b));

        relative(gamma1, GasRadiationEos.gamma1(b, 1 - b, GasRadiationEos.gamma3MinusOne(b, 1 - b)),
                CLOSED_FORM_TOLERANCE, "static Gamma1");
        EosState s = INVERSION.atBetaPressure(beta, 3.7e16);
        relative(beta, s.beta(), 1e-14, "beta of the state");
        relative(gamma1, s.Gamma1(), CLOSED_FORM_TOLERANCE, "Gamma1");
        relative(nablaAd, s.nablaAd(), CLOSED_FORM_TOLERANCE, "nabla_ad");
        relative(gamma3, s.Gamma3(), CLOSED_FORM_TOLERANCE, "Gamma3");
        relative(gamma2, s.Gamma2(), CLOSED_FORM_TOLERANCE, "Gamma2");
    }

    @Test
    void exponentsFallMonotonicallyWithRadiation() {
        double previous = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= 1000; i++) {
            double b = 1.0 - i / 1000.0;
            double g1 = GasRadiationEos.gamma1(b, i / 1000.0, GasRadiationEos.gamma3MinusOne(b, i / 1000.0));
            assertTrue(g1 < previous && g1 >= 4.0 / 3.0 && g1 <= 5.0 / 3.0, "Gamma1 at beta " + b);
            previous = g1;
        }
    }
}
