package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.physics.BadInputException;

class EddingtonStandardModelTest {

    private static final EddingtonStandardModel MODEL = EddingtonStandardModel.create();
    private static final Composition SOLAR_MIX = Composition.of(0.70, 0.28, 0.02);

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertEquals(expected, actual, tolerance * Math.abs(expected), what);
    }

    @Nested
    class Quartic {
        // C ≈ 0.00299 (project design; Chandrasekhar 1939, ch. VI, writes 1 − β = 0.00298 μ⁴β⁴M²
        // with older constants, from memory): 0.3 % covers the rounding of three figures.
        @Test
        void coefficient() {
            assertRelative(0.00299, MODEL.quarticCoefficient(), 3e-3, "C");
        }

        // Kippenhahn, Weigert & Weiss 2012, ch. 19: M/M☉ = 18.3 √(1−β)/(μ²β²) (i.e. 1/√C):
        // three figures, so 0.3 %, over the whole mass range.
        @ParameterizedTest
        @ValueSource(doubles = {0.01, 0.3, 1.0, 10.0, 100.0, 1e4, 1e8})
        void textbookMassFormula(double massInSuns) {
            double mu = 0.62;
            BetaSolution b = MODEL.beta(massInSuns * SOLAR_MASS, mu);
            double implied = 18.3 * Math.sqrt(b.oneMinusBeta()) / (mu * mu * b.beta() * b.beta());
            assertRelative(massInSuns, implied, 3e-3, "M from 18.3 sqrt(1-beta)/(mu^2 beta^2)");
        }

        // Supermassive limit β ≈ 4.28 μ⁻¹ (M/M☉)^(−1/2) (Shapiro & Teukolsky 1983, ch. 17):
        // three figures plus the neglected factor (1 − β)^(1/4) ≈ 1 − β/4, so 0.5 % at β ≤ 0.01.
        @ParameterizedTest
        @ValueSource(doubles = {1e6, 1e7, 1e8})
        void supermassiveLimit(double massInSuns) {
            double mu = 0.5;
            BetaSolution b = MODEL.beta(massInSuns * SOLAR_MASS, mu);
            assertRelative(4.28 / (mu * Math.sqrt(massInSuns)), b.beta(), 5e-3, "beta");
        }

        // Independent solution: bisection of Aβ⁴ + β − 1 = 0 in 60-digit decimal arithmetic with
        // A = Cμ⁴(M/M☉)² formed in decimal from the same double C; 1 − β is then 1 − β exactly
        // in decimal. Required 1e-12 relative on 1 − β and β; asserted 2e-14 (the double
        // iteration stops at 2⁻⁵⁰ and A itself carries a few ulps).
        @ParameterizedTest
        @ValueSource(doubles = {0.01, 0.03, 0.1, 1.0, 3.0, 10.0, 30.0, 100.0, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8})
        void againstDecimalBisection(double massInSuns) {
            for (double mu : new double[] {0.5, 0.62, 1.3, 2.0}) {
                BetaSolution b = MODEL.beta(massInSuns * SOLAR_MASS, mu);
                BigDecimal[] ref = decimalQuartic(MODEL.quarticCoefficient(), mu, massInSuns);
                assertRelative(ref[0].doubleValue(), b.beta(), 2e-14, "beta at " + massInSuns + " Msun, mu " + mu);
                assertRelative(ref[1].doubleValue(), b.oneMinusBeta(), 2e-14,
                        "1-beta at " + massInSuns + " Msun, mu " + mu);
            }
        }

        private BigDecimal[] decimalQuartic(double c, double mu, double massInSuns) {
            MathContext mc = new MathContext(60, RoundingMode.HALF_EVEN);
            BigDecimal m = new BigDecimal(SOLAR_MASS * massInSuns, mc).divide(new BigDecimal(SOLAR_MASS), mc);
            BigDecimal a = new BigDecimal(c).multiply(new BigDecimal(mu).pow(4), mc).multiply(m.pow(2), mc);
            BigDecimal lo = BigDecimal.ZERO;
            BigDecimal hi = BigDecimal.ONE;
            for (int i = 0; i < 200; i++) {
                BigDecimal mid = lo.add(hi).divide(BigDecimal.valueOf(2), mc);
                BigDecimal f = a.multiply(mid.pow(4), mc).add(mid).subtract(BigDecimal.ONE);
                if (f.signum() > 0) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            BigDecimal beta = lo.add(hi).divide(BigDecimal.valueOf(2), mc);
            return new BigDecimal[] {beta, BigDecimal.ONE.subtract(beta, mc)};
        }

        // The low-mass end: with A = Cμ⁴(M/M☉)², 1 − β = A(1 − 4A + O(A²)) from the quartic, and
        // no digit is lost to cancellation (1 − β ~ 4e-8 here; forming it as 1 − β would keep only
        // ~8 digits). The O(A²) remainder is ~1e-14 relative: tolerance 1e-13.
        @Test
        void lowMassLimit() {
            BetaSolution b = MODEL.beta(0.01 * SOLAR_MASS, 0.6);
            double leading = MODEL.quarticCoefficient() * Math.pow(0.6, 4) * 1e-4;
            assertRelative(leading * Math.pow(b.beta(), 4), b.oneMinusBeta(), 1e-15, "1-beta = A beta^4");
            assertRelative(leading * (1.0 - 4.0 * leading), b.oneMinusBeta(), 1e-13, "two leading orders");
        }

        @Test
        void badInput() {
            assertThrows(BadInputException.class, () -> MODEL.beta(-1.0, 0.6));
            assertThrows(BadInputException.class, () -> MODEL.beta(0.0, 0.6));
            assertThrows(BadInputException.class, () -> MODEL.beta(Double.NaN, 0.6));
            assertThrows(BadInputException.class, () -> MODEL.beta(SOLAR_MASS, 0.0));
            assertThrows(BadInputException.class,
                    () -> new EddingtonStandardModel(new LaneEmdenSolver().solve(1.5)));
        }
    }

    @Nested
    class Centre {
        // The Sun as an n = 3 polytrope: ρ_c = 54.18 ρ̄ ≈ 76.4 g/cm3, P_c ≈ 1.245e17 dyn/cm2
        // (the textbook n = 3 Sun, from memory). With IAU 2015 M☉, R☉: three to four figures.
        @Test
        void sun() {
            StandardModelState s = MODEL.model(SOLAR_MASS, SOLAR_RADIUS, SOLAR_MIX);
            assertRelative(76.4, s.centralDensity(), 1e-3, "rho_c");
            assertRelative(1.245e17, s.centralPressure(), 1e-3, "P_c");
            // T_c ≈ 1.2e7 K for μ ≈ 0.62 (the Eddington-model Sun, from memory): two figures.
            assertRelative(1.2e7, s.centralTemperature(), 2e-2, "T_c");
        }

        // The central temperature from the gas pressure (used) must satisfy the radiation pressure
        // too: (1 − β)P_c = aT_c⁴/3, an identity of the model that ties C to ω₃ and the constants.
        @ParameterizedTest
        @ValueSource(doubles = {0.05, 1.0, 20.0, 300.0, 1e5, 1e8})
        void radiationPressureIdentity(double massInSuns) {
            double mass = massInSuns * SOLAR_MASS;
            double radius = SOLAR_RADIUS * Math.pow(massInSuns, 0.6);
            StandardModelState s = MODEL.model(mass, radius, SOLAR_MIX);
            double t = s.centralTemperature();
            assertRelative(s.oneMinusBeta() * s.centralPressure(), RADIATION_DENSITY * t * t * t * t / 3.0, 1e-12,
                    "P_rad at the centre");
        }

        // L_Edd = 4πGMc/κ with κ = 0.4 cm2/g (X = 1): 1.25e38 erg/s per solar mass (commonly
        // quoted as ~1.26e38 erg/s, from memory); 1 %.
        @Test
        void eddingtonLuminosity() {
            double lEdd = EddingtonStandardModel.eddingtonLuminosity(SOLAR_MASS, Composition.of(1.0, 0.0, 0.0));
            assertRelative(1.26e38, lEdd, 1e-2, "L_Edd");
            StandardModelState s = MODEL.model(40 * SOLAR_MASS, 10 * SOLAR_RADIUS, SOLAR_MIX);
            assertRelative(s.oneMinusBeta(), s.luminosity() / s.eddingtonLuminosity(), 1e-15, "L/L_Edd = 1-beta");
        }
    }

    @Nested
    class AdiabaticExponent {
        // Γ1 → 4/3 + β/6 as β → 0 (project design; expand (32 − 24β − 3β²)/(24 − 21β)); the
        // next term is O(β²), so at β = 1e-4 the relative difference of Γ1 − 4/3 is ~1e-4.
        @ParameterizedTest
        @ValueSource(doubles = {1e-2, 1e-4, 1e-6})
        void smallBeta(double beta) {
            BetaSolution b = new BetaSolution(beta, 1.0 - beta);
            assertRelative(beta / 6.0, EddingtonStandardModel.gamma1Excess(b), 2.0 * beta, "Gamma1 - 4/3");
        }

        // The cancellation-free Γ1 − 4/3 agrees with the EOS's Γ1 (Chandrasekhar's general form)
        // where no cancellation hurts, and Γ1 = 5/3 at β = 1 (closed form).
        @ParameterizedTest
        @ValueSource(doubles = {0.05, 0.3, 0.5, 0.9, 0.999})
        void agreesWithTheEos(double beta) {
            BetaSolution b = new BetaSolution(beta, 1.0 - beta);
            double g1 = GasRadiationEos.gamma1(beta, 1.0 - beta, GasRadiationEos.gamma3MinusOne(beta, 1.0 - beta));
            assertEquals(g1, 4.0 / 3.0 + EddingtonStandardModel.gamma1Excess(b), 1e-15);
            assertEquals(5.0 / 3.0, 4.0 / 3.0 + EddingtonStandardModel.gamma1Excess(new BetaSolution(1.0, 0.0)),
                    1e-15);
        }
    }

    @Nested
    class Stability {
        // The standard model's onset radius depends on M and μ only; at that radius the model is
        // marginal and a star twice as large is stable, one half as large unstable.
        @Test
        void onsetOfASupermassiveStar() {
            double mass = 1e6 * SOLAR_MASS;
            Composition mix = Composition.ofMu(0.6);
            double rCrit = MODEL.criticalRadius(mass, mix.mu());
            assertEquals(StabilityVerdict.MARGINAL, MODEL.model(mass, rCrit, mix).stability().verdict());
            assertEquals(StabilityVerdict.STABLE, MODEL.model(mass, 2 * rCrit, mix).stability().verdict());
            assertEquals(StabilityVerdict.UNSTABLE, MODEL.model(mass, 0.5 * rCrit, mix).stability().verdict());
            assertRelative(rCrit, MODEL.model(mass, 3 * rCrit, mix).stability().criticalRadius().getAsDouble(), 1e-13,
                    "R_crit independent of R");
            assertTrue(rCrit > SOLAR_RADIUS * 1e3, "R_crit = " + rCrit);
        }
    }
}
