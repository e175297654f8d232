package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;

/** The written-out Gauss–Legendre literals of {@link LaneEmdenCurve} against an independent computation. */
class LaneEmdenCurveGaussRuleTest {

    @Test
    void literalsAreTheCorrectlyRoundedHighPrecisionRule() {
        // Hipparchus computes the 10-point rule in decimal arbitrary precision and rounds once, so
        // the literals must match it exactly (tolerance 0): any other value changes outputs.
        GaussIntegrator rule = new GaussIntegratorFactory().legendreHighPrecision(10, -1.0, 1.0);
        assertEquals(rule.getNumberOfPoints(), LaneEmdenCurve.GAUSS_NODES.length);
        for (int j = 0; j < rule.getNumberOfPoints(); j++) {
            assertEquals(rule.getPoint(j), LaneEmdenCurve.GAUSS_NODES[j], 0.0, "node " + j);
            assertEquals(rule.getWeight(j), LaneEmdenCurve.GAUSS_WEIGHTS[j], 0.0, "weight " + j);
        }
    }

    @Test
    void literalsAgreeWithThePublishedTable() {
        // Abramowitz & Stegun 1964, Table 25.4, n = 10, to the 15 decimals printed there (written here
        // from memory; they agree with the independent computation above to 1e-15).
        double[] nodes = {0.148874338981631, 0.433395394129247, 0.679409568299024, 0.865063366688985,
            0.973906528517172};
        double[] weights = {0.295524224714753, 0.269266719309996, 0.219086362515982, 0.149451349150581,
            0.066671344308688};
        for (int i = 0; i < 5; i++) {
            assertEquals(nodes[i], LaneEmdenCurve.GAUSS_NODES[5 + i], 1e-15, "node");
            assertEquals(nodes[i], -LaneEmdenCurve.GAUSS_NODES[4 - i], 1e-15, "node");
            assertEquals(weights[i], LaneEmdenCurve.GAUSS_WEIGHTS[5 + i], 1e-15, "weight");
            assertEquals(weights[i], LaneEmdenCurve.GAUSS_WEIGHTS[4 - i], 1e-15, "weight");
        }
    }
}
