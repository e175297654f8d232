package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarSchema;

/** The survey's points are the models one would build one by one, in the documented order. */
class PlaneSurveyTest {

    @Test
    void eachPointIsTheModelBuiltAlone() {
        SurveyAxis mass = new SurveyAxis(AxisQuantity.mass, 10 * SOLAR_MASS, 1e4 * SOLAR_MASS, 4, AxisSpacing.log);
        SurveyAxis radius = new SurveyAxis(AxisQuantity.radius, 10 * SOLAR_RADIUS, 40 * SOLAR_RADIUS, 3,
                AxisSpacing.linear);
        SurveyPlan plan = new SurveyPlan("s", StarKind.standard, Map.of(), OptionalDouble.empty(), Composition.DEFAULT,
                50, List.of(mass, radius), org.stellabar.eos.Electrons.classical);
        List<SurveyOutcome> outcomes = new PlaneSurvey().compute(plan, 0, plan.size());
        assertEquals(12, outcomes.size());
        StarBuilder alone = new StarBuilder();
        for (int p = 0; p < plan.size(); p++) {
            // the first axis is the outer one: point p is mass index p / 3, radius index p % 3
            double m = mass.value(p / 3);
            double r = radius.value(p % 3);
            var model = alone.build(new StandardModelRequest("s-" + (p + 1), m, r, Composition.DEFAULT, 50));
            assertTrue(outcomes.get(p).ok(), outcomes.get(p).failure());
            // identity: the same computation, bit for bit
            assertArrayEquals(StarSchema.row(model).numbers(), outcomes.get(p).row().numbers(), "point " + p);
        }
    }

    @Test
    void logarithmicStepsAreGeometricWithExactEnds() {
        SurveyAxis a = new SurveyAxis(AxisQuantity.central_temperature, 1e7, 1e9, 5, AxisSpacing.log);
        assertEquals(1e7, a.value(0));
        assertEquals(1e9, a.value(4));
        // closed form: 1e7 * 100^(k/4); relative 1e-15 covers pow's rounding
        for (int k = 1; k < 4; k++) {
            assertEquals(1e7 * Math.pow(10.0, k / 2.0), a.value(k), 1e-15 * a.value(k));
        }
    }

    @Test
    void contourOfALinearFieldIsTheExactLine() {
        double[] x = {0, 1, 2, 3};
        double[] y = {0, 0.5, 1.0, 1.5, 2.0, 2.5, 3.0};
        double[][] v = new double[x.length][y.length];
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < y.length; j++) {
                v[i][j] = x[i] - y[j] - 0.25; // zero on y = x - 0.25
            }
        }
        List<double[]> segments = ContourSegments.at(x, y, v, 0.0);
        assertFalse(segments.isEmpty());
        for (double[] s : segments) {
            // linear interpolation of a linear field is exact (to rounding)
            assertEquals(s[0] - 0.25, s[1], 1e-12);
            assertEquals(s[2] - 0.25, s[3], 1e-12);
        }
        v[1][1] = Double.NaN; // a failed point: the four cells around it have no segment
        assertTrue(ContourSegments.at(x, y, v, 0.0).size() < segments.size());
    }
}
