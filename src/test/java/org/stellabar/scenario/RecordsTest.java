package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;

/** The records check their own rules when built in code, not from a file. */
class RecordsTest {

    private static final Composition SOLAR = StarSpec.DEFAULT_COMPOSITION;
    private static final double M = 40 * Constants.SOLAR_MASS;
    private static final double R = 10 * Constants.SOLAR_RADIUS;

    @Test
    void factoriesBuildValidStars() {
        assertEquals(StarKind.STANDARD, StarSpec.standard("A", M, R, SOLAR).kind());
        assertEquals(1.5, StarSpec.polytrope("B", 1.5, M, R, SOLAR).index().getAsDouble(), 0.0);
        assertEquals(R, StarSpec.isentropicWithRadius("C", M, R, SOLAR).radius().getAsDouble(), 0.0);
        assertEquals(3e7, StarSpec.isentropicWithCentralTemperature("D", M, 3e7, SOLAR).centralTemperature()
                .getAsDouble(), 0.0);
        assertEquals(25, StarSpec.isentropicWithEntropy("E", M, 25, SOLAR).entropyPerBaryon().getAsDouble(), 0.0);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
    void massMustBePositiveAndFinite(double mass) {
        assertThrows(BadInputException.class, () -> StarSpec.standard("A", mass, R, SOLAR));
    }

    @ParameterizedTest
    @ValueSource(doubles = {-0.5, 5.0, 6.0, Double.NaN})
    void polytropeIndexInZeroToFive(double n) {
        assertThrows(BadInputException.class, () -> StarSpec.polytrope("A", n, M, R, SOLAR));
    }

    @Test
    void kindRules() {
        OptionalDouble none = OptionalDouble.empty();
        // index on a standard star
        assertThrows(BadInputException.class, () -> new StarSpec("A", "", StarKind.STANDARD, M, OptionalDouble.of(R),
                none, none, OptionalDouble.of(3), SOLAR, 400, StarSpec.DEFAULT_OUTPUTS, StarSpec.DEFAULT_CHARTS));
        // standard star with a central temperature besides its radius
        assertThrows(BadInputException.class, () -> new StarSpec("A", "", StarKind.STANDARD, M, OptionalDouble.of(R),
                OptionalDouble.of(3e7), none, none, SOLAR, 400, StarSpec.DEFAULT_OUTPUTS, StarSpec.DEFAULT_CHARTS));
        // isentropic star with two anchors
        assertThrows(BadInputException.class, () -> new StarSpec("A", "", StarKind.ISENTROPIC, M,
                OptionalDouble.of(R), OptionalDouble.of(3e7), none, none, SOLAR, 400, StarSpec.DEFAULT_OUTPUTS,
                StarSpec.DEFAULT_CHARTS));
        // isentropic star with none
        assertThrows(BadInputException.class, () -> new StarSpec("A", "", StarKind.ISENTROPIC, M, none, none, none,
                none, SOLAR, 400, StarSpec.DEFAULT_OUTPUTS, StarSpec.DEFAULT_CHARTS));
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 0, StarSpec.MAX_POINTS + 1})
    void pointsBound(int points) {
        StarSpec s = StarSpec.standard("A", M, R, SOLAR);
        assertThrows(BadInputException.class, () -> s.withPoints(points));
    }

    @Test
    void withersCopyAndSetsAreImmutable() {
        StarSpec s = StarSpec.standard("A", M, R, SOLAR).withOutputs(List.of(TableFormat.JSON))
                .withCharts(List.of()).withPoints(77).withNote("n");
        assertEquals(EnumSet.of(TableFormat.JSON), s.outputs());
        assertTrue(s.charts().isEmpty());
        assertEquals(77, s.points());
        assertEquals("n", s.note());
        assertThrows(UnsupportedOperationException.class, () -> s.outputs().add(TableFormat.CSV));
    }

    @Test
    void scenarioRefusesNoStarsAndDuplicateNames() {
        StarSpec a = StarSpec.standard("Alpha", M, R, SOLAR);
        StarSpec b = StarSpec.standard("ALPHA", M, R, SOLAR);
        assertThrows(BadInputException.class, () -> new Scenario("s", "", "", null, List.of(), null));
        assertThrows(BadInputException.class, () -> new Scenario("s", "", "", null, List.of(a, b), null));
        assertThrows(BadInputException.class, () -> new Scenario("a/b", "", "", null, List.of(a), null));
        Scenario ok = new Scenario("s", null, null, null, List.of(a), null);
        assertEquals(ScenarioOptions.DEFAULTS, ok.options());
        assertEquals(a, ok.star("alpha").orElseThrow());
    }

    @Test
    void exceptionNeedsAnError() {
        assertThrows(IllegalArgumentException.class, () -> new ScenarioException(List.of()));
    }
}
