package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.structure.StarRequestException.Component;

class IsentropicStarFinderTest {

    private static final StarBuilder BUILDER = new StarBuilder();
    private static final Composition SOLAR_LIKE = Composition.of(0.70, 0.28, 0.02);
    private static final Composition MU_06 = Composition.ofMu(0.6);

    private static double[] column(StarModel model, String name) {
        return model.profile().numbers(name).values();
    }

    @Nested
    class Requests {

        /** 0.01 Msun: at the default reference 1e7 K its centre would be degenerate; the solver lowers it. */
        @ParameterizedTest
        @ValueSource(doubles = {0.01, 0.5, 5.0, 60.0, 1e3, 1e6})
        void massAndRadiusAreMatched(double massSolar) {
            double mass = massSolar * SOLAR_MASS;
            double radius = 10.0 * SOLAR_RADIUS * Math.pow(massSolar, 0.5);
            StarModel model = BUILDER.build(IsentropicRequest.withRadius(mass, radius, SOLAR_LIKE));
            // the builder itself refuses a mismatch above 1e-8; here we ask the same of the result
            assertEquals(1.0, model.headline().mass() / mass, 1e-8);
            assertEquals(1.0, model.headline().radius() / radius, 1e-8);
            double[] m = column(model, "m");
            double[] r = column(model, "r");
            // the last row is the stop point P = 1e-12 P_c: just inside R, holding all but ~1e-11 of M
            assertTrue(r[r.length - 1] < radius && r[r.length - 1] > 0.99 * radius);
            assertEquals(1.0, m[m.length - 1] / mass, 1e-9);
        }

        /** The three ways of fixing the second parameter give the same star. */
        @Test
        void radiusTemperatureAndEntropyRequestsAgree() {
            double mass = 50.0 * SOLAR_MASS;
            StarModel byRadius = BUILDER.build(IsentropicRequest.withRadius(mass, 20.0 * SOLAR_RADIUS, MU_06));
            double tc = byRadius.headline().centre().T();
            double s = byRadius.headline().centre().sPerBaryon();
            StarModel byTemperature = BUILDER.build(IsentropicRequest.withCentralTemperature(mass, tc, MU_06));
            StarModel byEntropy = BUILDER.build(IsentropicRequest.withEntropy(mass, s, MU_06));
            for (StarModel other : new StarModel[] {byTemperature, byEntropy}) {
                // all three end in an integration from the same centre; 1e-9 covers the root solves
                assertEquals(1.0, other.headline().radius() / byRadius.headline().radius(), 1e-9);
                assertEquals(1.0, other.headline().centre().rho() / byRadius.headline().centre().rho(), 1e-9);
                assertEquals(1.0, other.headline().mass() / mass, 1e-8);
            }
            assertEquals(s, byEntropy.headline().centre().sPerBaryon(), 1e-9 * s);
        }

        /** Homology of the mixed EOS: T → λT, ρ → λ³ρ keeps M and divides R by λ. */
        @Test
        void massIsIndependentOfTheTemperatureScale() {
            IsentropicStarFinder star = new IsentropicStarFinder(new GasRadiationEos(SOLAR_LIKE));
            double x = Math.log(0.3 / 0.7);
            IsentropicStar cool = star.solve(x, 1e7);
            IsentropicStar hot = star.solve(x, 3e8);
            // both integrations run in the same scaled variables; they differ only by rounding
            assertEquals(1.0, hot.mass() / cool.mass(), 1e-10);
            assertEquals(30.0, cool.radius() / hot.radius(), 30.0 * 1e-10);
            assertEquals(0.7, cool.centre().beta(), 1e-14);
        }
    }

    @Nested
    class Identities {

        /**
         * On one adiabat of gas + radiation, with s = s₀ + (k/μm_u)(1.5 ln T − ln ρ) + 4aT³/(3ρ) and
         * P_rad/P_gas = aT³/(3ρk/μm_u) = (1−β)/β, the combination 4(1−β)/β + ln((1−β)/β) − 1.5 ln T
         * is the same at every point (closed form from the entropy of DESIGN §3).
         */
        @ParameterizedTest
        @ValueSource(doubles = {1.0, 100.0, 1e5})
        void everyRowLiesOnTheSameAdiabat(double massSolar) {
            StarModel model = BUILDER.build(IsentropicRequest.withCentralTemperature(massSolar * SOLAR_MASS, 2e7,
                    SOLAR_LIKE).withPoints(301));
            double[] beta = column(model, "beta");
            double[] omb = column(model, "one_minus_beta");
            double[] t = column(model, "T");
            double ref = invariant(beta[0], omb[0], t[0]);
            for (int i = 0; i < beta.length; i++) {
                // each term is O(1..1e3); the (P, s) inversion is solved to ~1e-15 relative
                assertEquals(ref, invariant(beta[i], omb[i], t[i]), 1e-9 * Math.max(1.0, Math.abs(ref)), "row " + i);
            }
        }

        private double invariant(double beta, double oneMinusBeta, double temperature) {
            return 4.0 * oneMinusBeta / beta + Math.log(oneMinusBeta / beta) - 1.5 * Math.log(temperature);
        }

        /**
         * Virial theorem 3∫P dV = −Ω over the star. The ODE carries both integrals with relative
         * tolerance 1e-11 per step (a few hundred steps); the truncation at P = 1e-12 P_c leaves out
         * the surface term 4πr_s³P_s, about 4e-11 of |Ω|. 1e-9 is ten times what both allow.
         */
        @ParameterizedTest
        @ValueSource(doubles = {1.0, 30.0, 1e3, 1e6})
        void virialTheoremHolds(double massSolar) {
            StarModel model = BUILDER.build(IsentropicRequest.withRadius(massSolar * SOLAR_MASS,
                    30.0 * SOLAR_RADIUS, SOLAR_LIKE));
            assertEquals(0.0, model.headline().virialCheck(), 1e-9);
        }

        /** The m and P columns satisfy dm/dr = 4πr²ρ and dP/dr = −Gmρ/r², integrated over the table. */
        @Test
        void profileIsInHydrostaticEquilibrium() {
            double mass = 20.0 * SOLAR_MASS;
            StarModel model = BUILDER.build(IsentropicRequest.withRadius(mass, 8.0 * SOLAR_RADIUS, SOLAR_LIKE)
                    .withPoints(2001));
            double[] r = column(model, "r");
            double[] m = column(model, "m");
            double[] rho = column(model, "rho");
            double[] p = column(model, "P");
            double[] dm = new double[r.length];
            double[] dp = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                dm[i] = 4.0 * Math.PI * r[i] * r[i] * rho[i];
                // Gm/r² → (4π/3)Gρ_c r at the centre, which is 0 at r = 0
                dp[i] = i == 0 ? 0.0 : -GRAVITATION * m[i] * rho[i] / (r[i] * r[i]);
            }
            double[] mq = TabulatedQuadrature.cumulative(r, dm);
            double[] pq = TabulatedQuadrature.cumulative(r, dp);
            for (int i = 0; i < r.length; i += 50) {
                // fourth-order quadrature over 2000 intervals of a smooth profile: ~1e-12 relative
                assertEquals(m[i], mq[i], 1e-9 * mass, "m, row " + i);
                assertEquals(p[i], p[0] + pq[i], 1e-9 * p[0], "P, row " + i);
            }
        }
    }

    @Nested
    class Limits {

        /**
         * Supermassive stars: β nearly constant. Along the adiabat Δ[4(1−β)/β + ln((1−β)/β)] =
         * 1.5 Δln T, and T falls by (10⁻¹²)^{1/4} from the centre to the last row, so
         * Δβ/β ≈ (1.5 · ln 10³) β/4 ≈ 2.6 β_c: a few per cent at 10⁵–10⁶ M☉. We allow 3 β_c.
         */
        @ParameterizedTest
        @ValueSource(doubles = {1e5, 1e6})
        void betaIsNearlyConstantInSupermassiveStars(double massSolar) {
            StarModel model = BUILDER.build(IsentropicRequest.withCentralTemperature(massSolar * SOLAR_MASS, 1e8,
                    MU_06).withPoints(401));
            double[] beta = column(model, "beta");
            double bc = beta[0];
            assertTrue(bc < 0.03, "radiation-dominated centre, beta_c = " + bc);
            for (double b : beta) {
                assertEquals(1.0, b / bc, 3.0 * bc);
            }
        }

        /**
         * As β → 0, Γ1 → 4/3 and the structure tends to the n = 3 polytrope: ρ/ρ_c → θ₃³ at fixed
         * ξ/ξ₁ and ρ_c/ρ̄ → 54.1825 (Chandrasekhar 1939, Table 4). The departures are first order in
         * Γ1 − 4/3 ≈ β/6, so each divided by β_c must stay about the same from 10⁵ to 10⁷ M☉ while
         * β_c falls tenfold (we allow 15 %), and stay below 3 β_c.
         */
        @Test
        void supermassiveStructureTendsToIndexThree() {
            LaneEmdenSolution n3 = BUILDER.polytrope(3.0);
            double[] masses = {1e5, 1e6, 1e7};
            double[] profileDeparture = new double[3];
            double[] densityDeparture = new double[3];
            double[] betaC = new double[3];
            for (int k = 0; k < 3; k++) {
                StarModel model = BUILDER.build(IsentropicRequest.withCentralTemperature(masses[k] * SOLAR_MASS, 1e8,
                        MU_06).withPoints(401));
                double[] x = column(model, "r_over_R");
                double[] rho = column(model, "rho");
                double worst = 0.0;
                for (int i = 0; i < x.length; i++) {
                    double theta = n3.theta(n3.xi1() * x[i]);
                    worst = Math.max(worst, Math.abs(rho[i] / rho[0] - theta * theta * theta));
                }
                betaC[k] = model.headline().centre().beta();
                profileDeparture[k] = worst / betaC[k];
                densityDeparture[k] = Math.abs(model.headline().centralToMeanDensity() / 54.1825 - 1.0) / betaC[k];
                assertTrue(worst < 3.0 * betaC[k], "rho/rho_c against theta_3^3 at " + masses[k] + " Msun: " + worst);
                assertTrue(densityDeparture[k] < 3.0, "rho_c/rho_mean at " + masses[k] + " Msun");
            }
            assertTrue(betaC[2] < 0.2 * betaC[0]);
            assertEquals(1.0, profileDeparture[2] / profileDeparture[0], 0.15, "departure of rho/rho_c is linear in beta");
            assertEquals(1.0, densityDeparture[2] / densityDeparture[0], 0.15, "departure of rho_c/rho_mean is linear in beta");
        }

        /**
         * Stability of supermassive isentropic stars: Γ1 − 4/3 → β/6 as β → 0 (DESIGN §7 form of
         * Γ1, expanded), so ⟨Γ1⟩ − 4/3 ≈ β_c/6 to within the spread of β across the star (3 β_c, see
         * above); and K tends to K₃ = 1.1245 (Chandrasekhar 1965, ApJ 142, 1519), departing at first
         * order in β: the departure over β_c must stay the same (within 5 %) while β_c falls tenfold.
         */
        @Test
        void supermassiveStabilityTendsToTheIndexThreeValues() {
            double[] departure = new double[2];
            double[] masses = {1e5, 1e7};
            for (int k = 0; k < 2; k++) {
                StarModel model = BUILDER.build(IsentropicRequest.withCentralTemperature(masses[k] * SOLAR_MASS,
                        1e8, MU_06));
                double bc = model.headline().centre().beta();
                StabilityResult st = model.headline().stability();
                assertEquals(1.0, st.newtonianMargin() / (bc / 6.0), 3.0 * bc);
                assertTrue(st.relativisticCoefficient() < 1.1245 + 1e-4);
                departure[k] = (1.0 - st.relativisticCoefficient() / 1.1245) / bc;
            }
            assertEquals(1.0, departure[1] / departure[0], 0.05);
        }

        /** A gas-dominated isentropic star has K₁.₅ = 0.6451 (Chandrasekhar 1965, four digits). */
        @Test
        void gasDominatedStabilityHasTheIndexThreeHalvesConstant() {
            StarModel model = BUILDER.build(IsentropicRequest.withRadius(0.1 * SOLAR_MASS, 0.2 * SOLAR_RADIUS,
                    SOLAR_LIKE));
            assertEquals(0.6451, model.headline().stability().relativisticCoefficient(), 1e-4);
            // <Gamma1> -> 5/3 as beta -> 1; Gamma1 - 5/3 is of order 1 - beta ~ 1e-5 here
            assertEquals(5.0 / 3.0, model.headline().stability().meanGamma1(), 1e-4);
        }

        /**
         * As β → 1 the mixture is an ideal monatomic gas (Γ1 = 5/3) and the isentropic star the n = 3/2
         * polytrope: ρ_c/ρ̄ → 5.99071 (Chandrasekhar 1939, Table 4). The departure is first order in
         * 1 − β_c ≈ 1e-5 here; we allow 10 (1 − β_c).
         */
        @Test
        void gasDominatedStarIsIndexThreeHalves() {
            StarModel model = BUILDER.build(IsentropicRequest.withRadius(0.1 * SOLAR_MASS, 0.2 * SOLAR_RADIUS,
                    SOLAR_LIKE));
            double omb = model.headline().centre().oneMinusBeta();
            assertTrue(omb < 1e-4);
            assertEquals(5.99071, model.headline().centralToMeanDensity(), 10.0 * omb * 5.99071 + 1e-5);
            assertEquals(1.0, model.headline().centralToMeanDensity() / BUILDER.polytrope(1.5).centralToMeanDensity(),
                    10.0 * omb);
        }
    }

    @Nested
    class NoSolution {

        @Test
        void centreTooHotMakesTheStarTooCompact() {
            StarRequestException e = assertThrows(StarRequestException.class, () -> BUILDER.build(
                    IsentropicRequest.withCentralTemperature(SOLAR_MASS, 1e13, SOLAR_LIKE)));
            assertEquals(Component.centralTemperature, e.component());
        }

        @Test
        void entropyBeyondTheEosRange() {
            // at fixed beta_c the entropy per baryon falls by 1.5/mu per e-fold of T_c; 1e4 k_B would
            // need T_c far below the 1e-2 K end of the EOS range
            StarRequestException e = assertThrows(StarRequestException.class, () -> BUILDER.build(
                    IsentropicRequest.withEntropy(SOLAR_MASS, 1e4, SOLAR_LIKE)));
            assertEquals(Component.entropy, e.component());
        }

        @Test
        void radiusTheClassicalAdiabatCannotReach() {
            // a 1 Msun isentropic star of 4 km (outside Buchdahl's 3.3 km) needs T_c ~ 1e12 K and a
            // centre so dense that the classical gas entropy is negative: fully degenerate matter
            double radius = 4e5;
            assertTrue(radius > StarRequestRules.buchdahlRadius(SOLAR_MASS));
            StarRequestException e = assertThrows(StarRequestException.class, () -> BUILDER.build(
                    IsentropicRequest.withRadius(SOLAR_MASS, radius, SOLAR_LIKE)));
            assertEquals(Component.radius, e.component());
        }

        @Test
        void exactlyOneSecondParameter() {
            StarRequestException e = assertThrows(StarRequestException.class, () -> new StarDraft("t",
                    StarKind.isentropic, SOLAR_MASS, OptionalDouble.of(SOLAR_RADIUS), OptionalDouble.empty(),
                    OptionalDouble.of(1e7), OptionalDouble.empty(), StarDraft.ANCHORS, SOLAR_LIKE, 10).toRequest());
            assertEquals(Component.centralTemperature, e.component());
            assertEquals(StarRequestException.Problem.CONFLICT, e.violations().get(0).problem());
            assertThrows(StarRequestException.class, () -> new StarDraft("t", StarKind.isentropic, SOLAR_MASS,
                    OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                    StarDraft.ANCHORS, SOLAR_LIKE, 10).toRequest());
        }

        @Test
        void centralTemperatureOutsideTheEosRange() {
            StarRequestException e = assertThrows(StarRequestException.class, () -> new IsentropicRequest("t",
                    SOLAR_MASS, new ScaleAnchor.CentralTemperature(10.0 * EosInversion.T_SEARCH_MAX), SOLAR_LIKE, 10));
            assertEquals(Component.centralTemperature, e.component());
        }
    }
}
