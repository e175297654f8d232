package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;

/**
 * The stability summary of a scaled polytrope does not depend on how many rows the profile has,
 * up to the central concentration of n → 5 (where evenly spaced rows miss the core entirely),
 * and its K is the Lane-Emden solution's own relativistic coefficient.
 */
class PolytropeStabilityGridTest {

    private static final StarBuilder BUILDER = new StarBuilder();
    private static final Composition MIX = Composition.of(0.70, 0.28, 0.02);
    private static final double M = 60.0 * SOLAR_MASS;
    private static final double R = 13.0 * SOLAR_RADIUS;

    private static StabilityResult stability(double n, int points) {
        return BUILDER.build(PolytropeRequest.of(M, R, MIX, n).withPoints(points)).headline().stability();
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.5, 1.5, 3.0, 4.5, 4.9, 4.99, 4.999, 4.9999999})
    void summaryIsTheSameAtThreeAndAHundredThousandRows(double n) {
        StabilityResult coarse = stability(n, 3);
        StabilityResult fine = stability(n, 100_000);
        // the integrals come from the dense solution, not the rows: equal to the last bit
        assertEquals(fine.meanGamma1(), coarse.meanGamma1(), 0.0);
        assertEquals(fine.relativisticCoefficient(), coarse.relativisticCoefficient(), 0.0);
        assertEquals(fine.verdict(), coarse.verdict());
    }

    @ParameterizedTest
    @ValueSource(doubles = {1.5, 3.0, 4.5, 4.9, 4.99, 4.999})
    void relativisticCoefficientIsThePolytropesOwn(double n) {
        // K of a polytrope is a property of the Lane-Emden solution alone (Chandrasekhar 1964);
        // LaneEmdenSolution integrates it from θ and θ' only, the star from P, ρ and m in physical
        // units: two routes through the same dense output, agreeing to the quadrature's rounding
        // (1e-9 relative leaves three orders of magnitude of room)
        LaneEmdenSolution solution = new LaneEmdenSolver().solve(n);
        double expected = solution.relativisticCoefficient();
        double actual = stability(n, 200).relativisticCoefficient();
        assertEquals(1.0, actual / expected, 1e-9, "K for n = " + n);
        assertTrue(assumptions(n).stream().noneMatch(a -> a.contains("accurate to about")), "no accuracy note");
    }

    @Test
    void closeToFiveTheOutputSaysHowAccurateTheIntegralsAre() {
        // n = 4.9999999: xi1 ~ 1e7 and the two routes to K part at ~5e-7 (measured); the metadata says so
        String note = assumptions(4.9999999).stream().filter(a -> a.contains("accurate to about")).findFirst()
                .orElseThrow(() -> new AssertionError("no accuracy note at n = 4.9999999"));
        assertTrue(note.contains("n = 4.9999999"), note);
    }

    private static java.util.List<String> assumptions(double n) {
        return BUILDER.build(PolytropeRequest.of(M, R, MIX, n)).profile().metadata().notes();
    }

    @ParameterizedTest
    @ValueSource(doubles = {4.5, 4.999, 4.999999999999})
    void massFractionNeverExceedsOneAndNeverDecreases(double n) {
        double[] m = new LaneEmdenSolver().solve(n).sample(100_000).massFraction();
        for (int i = 1; i < m.length; i++) {
            assertTrue(m[i] >= m[i - 1] && m[i] <= 1.0, "m/M at row " + i + " = " + m[i]);
        }
        assertEquals(1.0, m[m.length - 1], 1e-12);
    }
}
