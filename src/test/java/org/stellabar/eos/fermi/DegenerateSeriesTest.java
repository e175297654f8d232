package org.stellabar.eos.fermi;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class DegenerateSeriesTest {

    /**
     * Rows of validation/fermi/degenerate-series-mpmath.csv: the integrals, their η and θ derivatives,
     * the entropy integral and S″ by 30-digit mpmath quadrature of the definitions
     * (validation/scripts/degenerate_series_mpmath.py), η = 100 … 1e6, θ = 0 … 1e4.
     */
    static Stream<Arguments> referenceRows() throws IOException {
        return Files.readAllLines(Path.of("validation", "fermi", "degenerate-series-mpmath.csv")).stream()
                .filter(l -> !l.startsWith("#") && !l.startsWith("eta,")).map(l -> Arguments.of((Object) l.split(",")));
    }

    /**
     * Tolerance 2e-14 relative: the series' truncation is below 1e-18 (the bound in
     * {@link DegenerateSeries}); what remains is rounding in the integral to the edge, sums of 20–400
     * positive terms of a few ulps each, and in the series (a correction of relative size ~1/η²);
     * measured: within 2e-15 of every value here (the quadrature across the edge: within 2.7e-15).
     */
    @ParameterizedTest(name = "eta={0} theta={1}")
    @MethodSource("referenceRows")
    void agreesWithMpmath(String[] row) {
        double eta = Double.parseDouble(row[0]);
        double theta = Double.parseDouble(row[1]);
        FermiDiracIntegrals.Values values = DegenerateSeries.integrals(eta, theta);
        String at = " at eta = " + eta + ", theta = " + theta;
        for (int i = 0; i < 3; i++) {
            assertRelative(Double.parseDouble(row[2 + i]), values.f(i), 2e-14, "F" + i + at);
            assertRelative(Double.parseDouble(row[5 + i]), values.dEta(i), 2e-14, "dF/deta " + i + at);
            assertRelative(Double.parseDouble(row[8 + i]), values.dTheta(i), 2e-14, "dF/dtheta " + i + at);
        }
        assertRelative(Double.parseDouble(row[11]), values.entropy(), 2e-14, "entropy" + at);
        double[] sums = new double[3];
        DegenerateSeries.densitySums(eta, theta, sums);
        double density = Double.parseDouble(row[2]) + theta * Double.parseDouble(row[3]);
        double slope = Double.parseDouble(row[5]) + theta * Double.parseDouble(row[6]);
        assertRelative(density, sums[0], 2e-14, "S" + at);
        assertRelative(slope, sums[1], 2e-14, "S'" + at);
        assertRelative(Double.parseDouble(row[12]), sums[2], 2e-14, "S''" + at);
    }

    /**
     * Against the Gauss–Legendre quadrature across the edge ({@link FermiDiracIntegrals#laidOut}, itself
     * within 1e-13 of mpmath in {@code FermiDiracIntegralsTest}) over η ∈ [100, 1e8] × θ ∈ {0} ∪
     * [1e-9, 1e4], densest near the switch at η = 100 and the orders' steps (150, 300, 1000). Tolerance
     * 1e-14 relative: both are sums of up to ~400 positive terms (a few ulps each, measured apart by at
     * most 4e-15 over these 4000 points). The Sommerfeld terms are ~1/η² of the integrals (1e-4 at
     * η = 100), ~(j+1)/η of the η derivatives and ~1 of the entropy, so a wrong moment, coefficient or
     * anchor shift fails here; the last terms kept are below rounding by design (the bound).
     */
    @Test
    void agreesWithTheQuadratureAcrossTheEdge() {
        Random random = new Random(20261204L);
        for (int k = 0; k < 4000; k++) {
            double eta = k < 2000 ? 100.0 * Math.pow(10.0, 1.2 * random.nextDouble())
                    : Math.pow(10.0, 2.0 + 6.0 * random.nextDouble());
            double theta = k % 10 == 0 ? 0.0 : Math.pow(10.0, -9.0 + 13.0 * random.nextDouble());
            FermiDiracIntegrals.Values series = DegenerateSeries.integrals(eta, theta);
            FermiDiracIntegrals.Values quadrature = FermiDiracIntegrals.laidOut(eta, theta, true);
            String at = " at eta = " + eta + ", theta = " + theta;
            for (int i = 0; i < 3; i++) {
                assertRelative(quadrature.f(i), series.f(i), 1e-14, "F" + i + at);
                assertRelative(quadrature.dEta(i), series.dEta(i), 1e-14, "dF/deta " + i + at);
                assertRelative(quadrature.dTheta(i), series.dTheta(i), 1e-14, "dF/dtheta " + i + at);
            }
            assertRelative(quadrature.entropy(), series.entropy(), 1e-14, "entropy" + at);
            double[] sums = new double[3];
            DegenerateSeries.densitySums(eta, theta, sums);
            assertRelative(quadrature.f(0) + theta * quadrature.f(1), sums[0], 1e-14, "S" + at);
            assertRelative(quadrature.dEta(0) + theta * quadrature.dEta(1), sums[1], 1e-14, "S'" + at);
        }
    }

    /**
     * The integrals to the edge are kept per anchor: a value must not depend on whether its entry was
     * there (first call, a call after the table was filled with other anchors and temperatures, a
     * repeated call), bit for bit.
     */
    @Test
    void anchoredEntriesGiveTheSameNumbersAsAFreshEvaluation() {
        Random random = new Random(11L);
        for (int k = 0; k < 50; k++) {
            double eta = Math.pow(10.0, 2.0 + 6.0 * random.nextDouble());
            double theta = Math.pow(10.0, -9.0 + 13.0 * random.nextDouble());
            // a neighbour first (usually the same anchor, so the entry is there for η), then η itself;
            // then the table filled with others, and η again, its entry computed anew
            DegenerateSeries.integrals(eta * (1.0 + 1e-6), theta);
            FermiDiracIntegrals.Values first = DegenerateSeries.integrals(eta, theta);
            FermiDiracIntegrals.Values again = DegenerateSeries.integrals(eta, theta);
            for (int other = 0; other < 300; other++) {
                DegenerateSeries.integrals(100.0 + 37.0 * other + random.nextDouble(), 1e-3 * (1 + other));
            }
            FermiDiracIntegrals.Values evicted = DegenerateSeries.integrals(eta, theta);
            String at = "eta = " + eta + ", theta = " + theta;
            for (FermiDiracIntegrals.Values v : new FermiDiracIntegrals.Values[] {again, evicted}) {
                assertArrayEquals(first.f(), v.f(), 0.0, at);
                assertArrayEquals(first.dEta(), v.dEta(), 0.0, at);
                assertArrayEquals(first.dTheta(), v.dTheta(), 0.0, at);
                assertEquals(first.entropy(), v.entropy(), 0.0, at);
            }
        }
    }

    /**
     * At θ = 0 the weight is x^{1/2}, whose Taylor coefficients about η are binom(1/2, j) η^{1/2−j}
     * (the binomial series): the recurrence must give them, to rounding (1e-14 relative over 24 terms).
     */
    @Test
    void coefficientsAreTheBinomialSeriesAtThetaZero() {
        double eta = 237.5;
        double[] c = new double[24];
        DegenerateSeries.coefficients(eta, 0.0, 0.5, 0.5, Math.sqrt(eta), c);
        double binomial = 1.0;
        for (int j = 0; j < c.length; j++) {
            assertRelative(binomial * Math.pow(eta, 0.5 - j), c[j], 1e-14, "c_" + j);
            binomial *= (0.5 - j) / (j + 1.0);
        }
    }

    /**
     * η_D(2) = (1/2) ζ(2) = π²/12 and η_D(4) = (7/8) ζ(4) = 7π⁴/720 (Euler's ζ(2) = π²/6, ζ(4) = π⁴/90;
     * common practice), to a few ulps; η_D(s) → 1 − 2^{−s} + 3^{−s} for large s (the next term 4^{−s}).
     */
    @Test
    void dirichletEtaHasItsClosedForms() {
        assertRelative(Math.PI * Math.PI / 12.0, DegenerateSeries.dirichletEta(2), 1e-15, "eta_D(2)");
        assertRelative(7.0 * Math.pow(Math.PI, 4) / 720.0, DegenerateSeries.dirichletEta(4), 1e-15, "eta_D(4)");
        double s = 30;
        assertRelative(1.0 - Math.pow(2.0, -s) + Math.pow(3.0, -s), DegenerateSeries.dirichletEta(30), 1e-15,
                "eta_D(30)");
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertTrue(Double.isFinite(actual), what + " not finite");
        double error = Math.abs(actual - expected) / Math.abs(expected);
        assertTrue(error <= tolerance, what + ": expected " + expected + " got " + actual + " (relative " + error + ")");
    }
}
