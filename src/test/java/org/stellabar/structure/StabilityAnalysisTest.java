package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.Arrays;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.physics.BadInputException;

class StabilityAnalysisTest {

    private static final LaneEmdenSolver SOLVER = new LaneEmdenSolver();
    private static final double M = 50.0 * SOLAR_MASS;
    private static final double R = 12.0 * SOLAR_RADIUS;

    /** A polytrope of index n scaled to M, R, sampled at k radii, with Γ1 = gamma1 everywhere. */
    static RadialProfile polytrope(LaneEmdenSolution s, double mass, double radius, int k, double gamma1) {
        LaneEmdenProfile p = s.sample(k);
        double alpha = radius / s.xi1();
        double rhoC = s.centralToMeanDensity() * 3.0 * mass / (4.0 * Math.PI * Math.pow(radius, 3));
        double pC = s.centralPressureCoefficient() * GRAVITATION * mass * mass / Math.pow(radius, 4);
        double[] r = Arrays.stream(p.xi()).map(xi -> alpha * xi).toArray();
        double[] rho = Arrays.stream(p.densityRatio()).map(x -> rhoC * x).toArray();
        double[] pressure = Arrays.stream(p.pressureRatio()).map(x -> pC * x).toArray();
        double[] m = Arrays.stream(p.massFraction()).map(x -> mass * x).toArray();
        double[] g1 = new double[k];
        Arrays.fill(g1, gamma1);
        return new RadialProfile(r, m, rho, pressure, g1);
    }

    /** Uniform-density sphere in closed form: m = (4π/3)ρr³, P = (2π/3)Gρ²(R² − r²). */
    static RadialProfile uniformSphere(double mass, double radius, int k, java.util.function.DoubleUnaryOperator g1) {
        double rho0 = 3.0 * mass / (4.0 * Math.PI * Math.pow(radius, 3));
        double[] r = new double[k];
        double[] m = new double[k];
        double[] rho = new double[k];
        double[] pressure = new double[k];
        double[] gamma1 = new double[k];
        for (int i = 0; i < k; i++) {
            r[i] = radius * i / (k - 1);
            m[i] = 4.0 / 3.0 * Math.PI * rho0 * Math.pow(r[i], 3);
            rho[i] = rho0;
            pressure[i] = 2.0 * Math.PI / 3.0 * GRAVITATION * rho0 * rho0 * (radius * radius - r[i] * r[i]);
            gamma1[i] = g1.applyAsDouble(r[i] / radius);
        }
        return new RadialProfile(r, m, rho, pressure, gamma1);
    }

    @Nested
    class PressureWeightedGamma1 {
        // A uniform Γ1 is its own pressure-weighted mean (the two integrals are the same sum).
        @Test
        void uniformGamma1IsItsOwnMean() {
            RadialProfile p = polytrope(SOLVER.solve(3.0), M, R, 301, 1.45);
            assertEquals(1.45, StabilityAnalysis.analyze(p).meanGamma1(), 1e-14);
        }

        // Closed form: uniform sphere, Γ1 = 4/3 + 0.1(1 − x²), x = r/R. With P ∝ 1 − x² and
        // dV ∝ x² dx, ⟨Γ1⟩ − 4/3 = 0.1 ∫(1−x²)²x² / ∫(1−x²)x² = 0.1 (8/105)/(2/15) = 0.4/7.
        // Polynomials of degree ≤ 6 on 401 nodes: quadrature error ~h⁴ ≈ 4e-11; tolerance 1e-9.
        @Test
        void closedFormUniformSphere() {
            RadialProfile p = uniformSphere(M, R, 401, x -> 4.0 / 3.0 + 0.1 * (1.0 - x * x));
            StabilityResult s = StabilityAnalysis.analyze(p);
            assertEquals(0.4 / 7.0, s.newtonianMargin(), 1e-9);
        }
    }

    @Nested
    class RelativisticCoefficient {
        // Homogeneous sphere: the integrals in StabilityAnalysis give K = 19/42 exactly (worked by
        // hand: (4/9)(64π³/315) + (1/3)(64π³/63) over (16π²/45)·(8π/3)); Chandrasekhar 1964 quotes
        // 19/42 for the homogeneous sphere (from memory). Closed-form profile on 801 nodes: 1e-8.
        @Test
        void homogeneousSphereFromProfile() {
            RadialProfile p = uniformSphere(M, R, 801, x -> 5.0 / 3.0);
            assertEquals(19.0 / 42.0, StabilityAnalysis.analyze(p).relativisticCoefficient(), 1e-8);
        }

        // The same from the Lane-Emden integrals of n = 0 (Gauss on the dense output): 1e-11.
        @Test
        void homogeneousSphereFromLaneEmden() {
            assertEquals(19.0 / 42.0, SOLVER.solve(0.0).relativisticCoefficient(), 1e-11);
        }

        // Chandrasekhar 1965, ApJ 142, 1519 (as quoted in the project design: K₃ ≈ 1.1245,
        // K₁.₅ ≈ 0.6451): four decimals, so ±6e-5.
        @ParameterizedTest
        @CsvSource({"3.0, 1.1245", "1.5, 0.6451"})
        void tabulatedValues(double n, double k) {
            assertEquals(k, SOLVER.solve(n).relativisticCoefficient(), 6e-5);
        }

        // Shapiro & Teukolsky 1983, §6.10: E = k₁KMρ_c^(1/3) − k₂GM^(5/3)ρ_c^(1/3) −
        // k₄(G²/c²)M^(7/3)ρ_c^(2/3) for n = 3 with k₂ = 0.639001, k₄ = 0.918294 (from memory);
        // the energy criterion then gives K₃ = k₄(ρ_cR³/M)^(1/3)/(3k₂). Six figures: 2e-6.
        @Test
        void shapiroTeukolskyEnergyCoefficients() {
            LaneEmdenSolution s = SOLVER.solve(3.0);
            double rhoCR3OverM = s.centralToMeanDensity() * 3.0 / (4.0 * Math.PI);
            double k = 0.918294 * Math.cbrt(rhoCR3OverM) / (3.0 * 0.639001);
            assertEquals(k, s.relativisticCoefficient(), 2e-6 * k);
        }

        // The profile integrals (TabulatedQuadrature on 4001 shells) against the Lane-Emden ones
        // (Gauss on the dense output): two quadratures of the same quantity, 1e-6.
        @ParameterizedTest
        @ValueSource(doubles = {1.0, 1.5, 3.0, 4.0})
        void profileAgreesWithLaneEmden(double n) {
            LaneEmdenSolution s = SOLVER.solve(n);
            StabilityResult r = StabilityAnalysis.analyze(polytrope(s, M, R, 4001, 1.4));
            assertEquals(s.relativisticCoefficient(), r.relativisticCoefficient(),
                    1e-6 * s.relativisticCoefficient());
        }
    }

    @Nested
    class Identities {
        // Virial theorem 3∫P dV = −Ω = 3GM²/((5−n)R) (Chandrasekhar 1939, ch. IV) on a scaled
        // profile of 4001 shells: 1e-8 as required.
        @ParameterizedTest
        @ValueSource(doubles = {1.0, 2.0, 3.0, 4.0})
        void virial(double n) {
            RadialProfile p = polytrope(SOLVER.solve(n), M, R, 4001, 1.4);
            double[] r = p.r();
            double[] pressure = p.P();
            double[] integrand = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                integrand[i] = 4.0 * Math.PI * r[i] * r[i] * pressure[i];
            }
            double threePdV = 3.0 * TabulatedQuadrature.integral(r, integrand);
            double omega = 3.0 * GRAVITATION * M * M / ((5.0 - n) * R);
            assertEquals(omega, threePdV, 1e-8 * omega);
        }
    }

    @Nested
    class OnsetAndVerdict {
        private final double k3 = SOLVER.solve(3.0).relativisticCoefficient();

        // R_crit solves ⟨Γ1⟩ − 4/3 = K·2GM/(R c²): at R = R_crit the margin vanishes (to
        // rounding) and the verdict is marginal; ρ_c scales as R⁻³.
        @Test
        void criticalRadiusIsTheRoot() {
            StabilityResult far = StabilityAnalysis.assess(M, R, 10.0, 4.0 / 3.0 + 1e-4, k3);
            double rCrit = far.criticalRadius().getAsDouble();
            assertEquals(2.0 * GRAVITATION * M * k3 / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * 1e-4), rCrit, 1e-9 * rCrit);
            assertEquals(10.0 * Math.pow(R / rCrit, 3), far.criticalCentralDensity().getAsDouble(),
                    1e-12 * far.criticalCentralDensity().getAsDouble());
            StabilityResult at = StabilityAnalysis.assess(M, rCrit, 1.0, 4.0 / 3.0 + 1e-4, k3);
            assertEquals(0.0, at.relativisticMargin(), 1e-15);
            assertEquals(StabilityVerdict.MARGINAL, at.verdict());
            assertEquals(1.0, at.radiusOverCritical().getAsDouble(), 1e-12);
        }

        // The band: R/R_crit above 1.05 stable, below 0.95 unstable, between marginal.
        @ParameterizedTest
        @CsvSource({"1.2, STABLE", "1.051, STABLE", "1.04, MARGINAL", "0.96, MARGINAL", "0.949, UNSTABLE",
            "0.5, UNSTABLE"})
        void band(double ratio, StabilityVerdict expected) {
            double rCrit = StabilityAnalysis.assess(M, R, 1.0, 4.0 / 3.0 + 1e-3, k3).criticalRadius().getAsDouble();
            assertEquals(expected, StabilityAnalysis.assess(M, ratio * rCrit, 1.0, 4.0 / 3.0 + 1e-3, k3).verdict());
        }

        // ⟨Γ1⟩ ≤ 4/3 is unstable at any radius and has no critical radius.
        @Test
        void newtonianInstability() {
            StabilityResult s = StabilityAnalysis.assess(M, 1e20, 1.0, 4.0 / 3.0 - 1e-6, k3);
            assertEquals(StabilityVerdict.UNSTABLE, s.verdict());
            assertFalse(s.criticalRadius().isPresent());
            assertTrue(s.newtonianMargin() < 0.0);
        }

        // A solar-type n = 3 gas star: ⟨Γ1⟩ ≈ 5/3, 2GM/Rc² ~ 4e-6 (common practice: the Sun's
        // compactness is 4.2e-6): plainly stable.
        @Test
        void sunLikeStarIsStable() {
            RadialProfile p = polytrope(SOLVER.solve(3.0), SOLAR_MASS, SOLAR_RADIUS, 501, 5.0 / 3.0);
            StabilityResult s = StabilityAnalysis.analyze(p);
            assertEquals(StabilityVerdict.STABLE, s.verdict());
            assertEquals(4.2e-6, s.compactness(), 0.1e-6);
        }
    }

    @Nested
    class BadProfiles {
        @Test
        void refused() {
            double[] ok = {0.0, 1.0, 2.0};
            double[] m = {0.0, 1.0, 2.0};
            double[] g = {1.4, 1.4, 1.4};
            assertThrows(BadInputException.class, () -> new RadialProfile(ok, m, ok, ok, new double[] {1.4, 1.4}));
            assertThrows(BadInputException.class,
                    () -> new RadialProfile(new double[] {0.0, 2.0, 1.0}, m, ok, ok, g));
            assertThrows(BadInputException.class,
                    () -> new RadialProfile(ok, m, ok, new double[] {1.0, Double.NaN, 0.0}, g));
            assertThrows(BadInputException.class,
                    () -> new RadialProfile(ok, m, ok, ok, new double[] {1.4, -1.0, 1.4}));
            assertThrows(BadInputException.class, () -> new RadialProfile(new double[] {0, 1}, new double[] {0, 1},
                    new double[] {1, 1}, new double[] {1, 0}, new double[] {1.4, 1.4}));
        }
    }
}
