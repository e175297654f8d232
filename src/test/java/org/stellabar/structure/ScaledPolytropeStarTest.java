package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

class ScaledPolytropeStarTest {

    private static final StarBuilder BUILDER = new StarBuilder();
    private static final Composition SOLAR_LIKE = Composition.of(0.70, 0.28, 0.02);
    private static final double M = 40.0 * SOLAR_MASS;
    private static final double R = 12.0 * SOLAR_RADIUS;

    private static StarModel polytrope(double n, int points) {
        return BUILDER.build(PolytropeRequest.of(M, R, SOLAR_LIKE, n).withPoints(points));
    }

    private static double[] column(StarModel model, String name) {
        return model.profile().numbers(name).values();
    }

    @Nested
    class ClosedForms {

        /** n = 1: θ = sin ξ/ξ, ξ₁ = π, m/M = (sin ξ − ξ cos ξ)/π (Chandrasekhar 1939, ch. IV). */
        @Test
        void indexOneFollowsSineOverXi() {
            StarModel model = polytrope(1.0, 101);
            double[] x = column(model, "r_over_R");
            double[] rho = column(model, "rho");
            double[] m = column(model, "m_over_M");
            double rhoC = rho[0];
            for (int i = 1; i < x.length - 1; i++) {
                double xi = Math.PI * x[i];
                // the Lane-Emden integration's own accuracy is ~1e-13 (its documentation); 1e-10 leaves room
                assertEquals(Math.sin(xi) / xi, rho[i] / rhoC, 1e-10, "rho/rho_c at xi = " + xi);
                assertEquals((Math.sin(xi) - xi * Math.cos(xi)) / Math.PI, m[i], 1e-10, "m/M at xi = " + xi);
            }
            // rho_c/rho_mean = xi1^3/(3 omega_1) = pi^2/3 for n = 1
            assertEquals(Math.PI * Math.PI / 3.0, model.headline().centralToMeanDensity(), 1e-10);
        }

        /** n = 0: uniform density, P = P_c(1 − (r/R)²) with P_c = 3GM²/(8πR⁴). */
        @Test
        void indexZeroIsUniform() {
            StarModel model = polytrope(0.0, 51);
            double[] x = column(model, "r_over_R");
            double[] rho = column(model, "rho");
            double[] p = column(model, "P");
            double mean = 3.0 * M / (4.0 * Math.PI * R * R * R);
            double pc = 3.0 * GRAVITATION * M * M / (8.0 * Math.PI * R * R * R * R);
            for (int i = 0; i < x.length; i++) {
                assertEquals(1.0, rho[i] / mean, 1e-12, "uniform density, row " + i);
                assertEquals(1.0 - x[i] * x[i], p[i] / pc, 1e-11, "pressure, row " + i);
            }
        }
    }

    @Nested
    class Identities {

        /** m(R) = M: 4πα³ρ_c ∫ξ²θⁿ dξ from the table's ρ_c, independent of the m column. */
        @ParameterizedTest
        @ValueSource(doubles = {0.0, 0.5, 1.0, 1.5, 2.0, 3.0, 4.0, 4.5})
        void massInsideRadiusIsTheMass(double n) {
            StarModel model = polytrope(n, 11);
            LaneEmdenSolution le = BUILDER.polytrope(n);
            double alpha = R / le.xi1();
            double rhoC = column(model, "rho")[0];
            double integral = le.curve().integrate((xi, theta, dtheta) -> xi * xi * Math.pow(theta, n));
            // Gauss-Legendre on the dense solution is accurate to ~1e-12 (LaneEmdenCurve); 1e-10 as required
            assertEquals(1.0, 4.0 * Math.PI * alpha * alpha * alpha * rhoC * integral / M, 1e-10, "n = " + n);
            double[] m = column(model, "m");
            assertEquals(M, m[m.length - 1], 1e-10 * M);
        }

        /** The m column against the running integral of 4πr²ρ over the table itself. */
        @ParameterizedTest
        @ValueSource(doubles = {1.0, 2.0, 3.0, 4.0})
        void massColumnIntegratesTheDensityColumn(double n) {
            StarModel model = polytrope(n, 4001);
            double[] r = column(model, "r");
            double[] rho = column(model, "rho");
            double[] dm = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                dm[i] = 4.0 * Math.PI * r[i] * r[i] * rho[i];
            }
            double[] m = TabulatedQuadrature.cumulative(r, dm);
            double[] table = column(model, "m");
            // fourth-order quadrature with h = xi1/4000 on a smooth integrand (integer n): error < 1e-10 M
            for (int i = 0; i < r.length; i += 100) {
                assertEquals(table[i], m[i], 1e-9 * M, "row " + i);
            }
            assertEquals(1.0, m[r.length - 1] / M, 1e-10, "m(R)/M by quadrature, n = " + n);
        }

        /** Virial theorem 3∫P dV = −Ω with Ω = −3GM²/((5−n)R) (Chandrasekhar 1939, ch. IV). */
        @ParameterizedTest
        @ValueSource(doubles = {0.0, 1.0, 1.5, 2.0, 3.0, 4.0})
        void virialTheoremHoldsOnTheTable(double n) {
            StarModel model = polytrope(n, 4001);
            double[] r = column(model, "r");
            double[] p = column(model, "P");
            double[] f = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                f[i] = 4.0 * Math.PI * r[i] * r[i] * p[i];
            }
            double threePdV = 3.0 * TabulatedQuadrature.integral(r, f);
            double minusOmega = 3.0 * GRAVITATION * M * M / ((5.0 - n) * R);
            // quadrature error of order h^3.5 at the surface for n = 1.5 (P ~ (R-r)^2.5), far below 1e-8
            assertEquals(1.0, threePdV / minusOmega, 1e-8, "n = " + n);
            // the summary's check integrates the dense solution instead
            assertEquals(0.0, model.headline().virialCheck(), 1e-10, "virial_check, n = " + n);
        }

        /** The temperature is the root of the mixed EOS: P_gas + P_rad = P and β = P_gas/P at every row. */
        @ParameterizedTest
        @ValueSource(doubles = {0.5, 1.5, 3.0, 4.5})
        void temperatureSolvesTheMixedEos(double n) {
            StarModel model = polytrope(n, 201);
            GasRadiationEos eos = new GasRadiationEos(SOLAR_LIKE);
            double[] rho = column(model, "rho");
            double[] t = column(model, "T");
            double[] p = column(model, "P");
            double[] beta = column(model, "beta");
            double[] omb = column(model, "one_minus_beta");
            for (int i = 0; i < rho.length - 1; i++) {
                double pGas = eos.gasConstant() * rho[i] * t[i];
                double pRad = org.stellabar.physics.Constants.RADIATION_DENSITY * Math.pow(t[i], 4) / 3.0;
                // Newton on the quartic stops at a few ulps
                assertEquals(1.0, (pGas + pRad) / p[i], 1e-13, "row " + i);
                assertEquals(pGas / p[i], beta[i], 1e-13, "beta row " + i);
                assertEquals(pRad / p[i], omb[i], 1e-13, "1 - beta row " + i);
            }
        }
    }

    /** The stability integrals run on at least 1001 rows, so a coarse table does not spoil them. */
    @Test
    void stabilityDoesNotDependOnTheTableRows() {
        StabilityResult coarse = polytrope(2.5, 5).headline().stability();
        StabilityResult fine = polytrope(2.5, 4001).headline().stability();
        // fourth-order quadrature on 1001 against 4001 rows: ~1e-12 apart
        assertEquals(1.0, coarse.meanGamma1() / fine.meanGamma1(), 1e-9);
        assertEquals(1.0, coarse.relativisticCoefficient() / fine.relativisticCoefficient(), 1e-9);
        // and K agrees with the dense-solution integrals of LaneEmdenSolution
        assertEquals(1.0, fine.relativisticCoefficient() / BUILDER.polytrope(2.5).relativisticCoefficient(), 1e-9);
    }

    @Nested
    class Surface {

        @ParameterizedTest
        @ValueSource(doubles = {0.0, 1.5, 2.9, 3.0, 3.1, 4.5, 4.99})
        void surfaceRowHoldsLimitsAndNoNaN(double n) {
            StarModel model = polytrope(n, 101);
            Table table = model.profile();
            int last = table.rowCount() - 1;
            for (Column c : table.columns()) {
                for (double v : ((NumberColumn) c).values()) {
                    assertTrue(Double.isFinite(v), c.name());
                }
            }
            assertEquals(R, column(model, "r")[last]);
            assertEquals(M, column(model, "m")[last]);
            assertEquals(0.0, column(model, "P")[last]);
            assertEquals(0.0, column(model, "T")[last]);
            assertEquals(0.0, column(model, "c_s")[last]);
            double beta = column(model, "beta")[last];
            double expected = n < 3.0 ? 1.0 : n == 3.0 ? model.headline().centre().beta() : 0.0;
            assertEquals(expected, beta, 0.0, "surface limit of beta");
            // and the interior approaches it: the penultimate row lies between the centre and the limit
            double inner = column(model, "beta")[last - 1];
            double centre = column(model, "beta")[0];
            if (n != 3.0) {
                assertTrue((inner - centre) * (expected - centre) > 0.0, "beta moves towards its limit");
            }
        }

        @Test
        void convectiveFlagComparesGradients() {
            StarModel model = polytrope(1.5, 51);
            double[] nablaAd = column(model, "nabla_ad");
            double[] poly = column(model, "nabla_poly");
            double[] flag = column(model, "convective");
            for (int i = 0; i < flag.length; i++) {
                assertEquals(0.4, poly[i], 0.0);
                assertEquals(nablaAd[i] < 0.4 ? 1.0 : 0.0, flag[i], 0.0);
            }
            // radiation lowers nabla_ad below the ideal-gas 2/5 inside, so this n = 1.5 star convects there
            assertEquals(1.0, flag[0]);
        }
    }
}
