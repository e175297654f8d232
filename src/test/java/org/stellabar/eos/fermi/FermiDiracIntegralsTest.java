package org.stellabar.eos.fermi;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.stellabar.physics.BadInputException;

class FermiDiracIntegralsTest {

    /**
     * Rows of validation/fermi/fermi-dirac-integrals.csv, computed at 30 digits by
     * validation/scripts/fermi_dirac_mpmath.py: θ = 0 rows from the closed form
     * F_k(η, 0) = −Γ(k+1) Li_{k+1}(−e^η) (Cox &amp; Giuli 1968, ch. 24), the others by mpmath quadrature.
     */
    static Stream<String[]> referenceRows() throws IOException {
        List<String> lines = Files.readAllLines(Path.of("validation", "fermi", "fermi-dirac-integrals.csv"));
        return lines.stream().filter(l -> !l.startsWith("#") && !l.startsWith("k,")).map(l -> l.split(","));
    }

    /**
     * Tolerance 1e-13 relative: the quadrature's truncation is below 1e-15 by the strip-of-analyticity
     * estimate; what remains is rounding in sums of up to ~500 terms of one sign.
     */
    @ParameterizedTest(name = "k={0} eta={1} theta={2}")
    @MethodSource("referenceRows")
    void agreesWithMpmath(String k, String eta, String theta, String f, String dEta, String dTheta, String how) {
        int index = (int) Math.round(Double.parseDouble(k) - 0.5);
        FermiDiracIntegrals.Values values = FermiDiracIntegrals.evaluate(Double.parseDouble(eta), Double.parseDouble(theta));
        assertRelative(Double.parseDouble(f), values.f()[index], 1e-13, "F " + how);
        assertRelative(Double.parseDouble(dEta), values.dEta()[index], 1e-13, "dF/deta " + how);
        assertRelative(Double.parseDouble(dTheta), values.dTheta()[index], 1e-13, "dF/dtheta " + how);
    }

    /** The scale is e^{min(η, 0)}: F_k(η, 0) → Γ(k+1) e^η as η → −∞ (Boltzmann limit, closed form). */
    @Test
    void boltzmannLimitKeepsDigitsBelowUnderflow() {
        FermiDiracIntegrals.Values values = FermiDiracIntegrals.evaluate(-1.0e6, 0.0);
        assertEquals(-1.0e6, values.logScale());
        assertRelative(Math.sqrt(Math.PI) / 2.0, values.f()[0], 1e-14, "Gamma(3/2)");
        assertRelative(0.75 * Math.sqrt(Math.PI), values.f()[1], 1e-14, "Gamma(5/2)");
        assertRelative(1.875 * Math.sqrt(Math.PI), values.f()[2], 1e-14, "Gamma(7/2)");
        assertEquals(0.0, values.value(0));
    }

    /**
     * Strong degeneracy at θ = 0: F_k(η, 0) = η^{k+1}/(k+1) [1 + (π²/6) k(k+1)/η² + …] (the Sommerfeld
     * expansion, Cox &amp; Giuli 1968, ch. 24); at η = 1e5 the next term is ~1e-19 relative.
     */
    @Test
    void sommerfeldExpansionAtHighDegeneracy() {
        double eta = 1.0e5;
        FermiDiracIntegrals.Values values = FermiDiracIntegrals.evaluate(eta, 0.0);
        for (int i = 0; i < 3; i++) {
            double k = i + 0.5;
            double expected = Math.pow(eta, k + 1) / (k + 1) * (1 + Math.PI * Math.PI / 6 * k * (k + 1) / (eta * eta));
            assertRelative(expected, values.f()[i], 1e-13, "Sommerfeld k=" + k);
        }
    }

    /**
     * Above η = 2 the nodes about the edge come from a table fixed in y = x − η (their Fermi factors
     * computed once): the integrals must be the numbers of the node-by-node evaluation, bit for bit.
     * (The quadrature with the table is what {@code evaluate} uses for 2 &lt; η &lt; 100; above, the
     * series of {@link DegenerateSeries}, tested against it in {@code DegenerateSeriesTest}.)
     */
    @Test
    void edgeTableGivesTheNodeByNodeNumbers() {
        java.util.Random random = new java.util.Random(20261204L);
        for (int k = 0; k < 3000; k++) {
            // the pieces' boundaries in η (2, 8, 18, 19.3, 38, 42.7) densely, then up to 1e8
            double eta = k < 200 ? 2.0 + 0.2 * k + 0.013 * random.nextDouble()
                    : Math.pow(10.0, 0.31 + 7.68 * random.nextDouble());
            double theta = k % 10 == 0 ? 0.0 : Math.pow(10.0, -9.0 + 13.0 * random.nextDouble());
            FermiDiracIntegrals.Values table = FermiDiracIntegrals.laidOut(eta, theta, true);
            FermiDiracIntegrals.Values nodes = FermiDiracIntegrals.laidOut(eta, theta, false);
            String at = "eta = " + eta + ", theta = " + theta;
            assertArrayEquals(nodes.f(), table.f(), 0.0, at);
            assertArrayEquals(nodes.dEta(), table.dEta(), 0.0, at);
            assertArrayEquals(nodes.dTheta(), table.dTheta(), 0.0, at);
            assertEquals(nodes.entropy(), table.entropy(), 0.0, at);
        }
    }

    @Test
    void refusesOutOfRange() {
        assertThrows(BadInputException.class, () -> FermiDiracIntegrals.evaluate(Double.NaN, 1.0));
        assertThrows(BadInputException.class, () -> FermiDiracIntegrals.evaluate(0.0, -1.0));
        assertThrows(BadInputException.class, () -> FermiDiracIntegrals.evaluate(2e8, 1.0));
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertTrue(Double.isFinite(actual), what + " not finite");
        double error = Math.abs(actual - expected) / Math.abs(expected);
        assertTrue(error <= tolerance, what + ": expected " + expected + " got " + actual + " (relative " + error + ")");
    }
}
