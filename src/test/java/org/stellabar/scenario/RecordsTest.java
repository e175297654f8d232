package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StandardModelRequest;

/** The scenario records check their own rules when built in code, not from a file. */
class RecordsTest {

    private static final Composition SOLAR = Composition.DEFAULT;
    private static final double M = 40 * Constants.SOLAR_MASS;
    private static final double R = 10 * Constants.SOLAR_RADIUS;

    private static ScenarioStar star(String name) {
        return ScenarioStar.of(new StandardModelRequest(name, M, R, SOLAR, 400));
    }

    @Test
    void starNamesMustBeUsableAsFileNames() {
        assertThrows(BadInputException.class, () -> star("a/b"));
        assertThrows(BadInputException.class, () -> star(""));
    }

    @Test
    void starSetsAreCopiedAndImmutable() {
        ScenarioStar s = new ScenarioStar(star("A").request(), "n", EnumSet.of(TableFormat.JSON), EnumSet.noneOf(ChartGroup.class));
        assertEquals(EnumSet.of(TableFormat.JSON), s.outputs());
        assertTrue(s.charts().isEmpty());
        assertEquals("n", s.note());
        assertThrows(UnsupportedOperationException.class, () -> s.outputs().add(TableFormat.CSV));
    }

    @Test
    void scenarioRefusesNoStarsAndDuplicateNames() {
        ScenarioStar a = star("Alpha");
        ScenarioStar b = star("ALPHA");
        assertThrows(BadInputException.class, () -> new Scenario("s", "", "", null, List.of(), null));
        assertThrows(BadInputException.class, () -> new Scenario("s", "", "", null, List.of(a, b), null));
        assertThrows(BadInputException.class, () -> new Scenario("a/b", "", "", null, List.of(a), null));
        Scenario ok = new Scenario("s", null, null, null, List.of(a), null);
        assertEquals(ScenarioOptions.DEFAULTS, ok.options());
        assertEquals(a, ok.star("alpha").orElseThrow());
    }

    @Test
    void oneStarScenarioIsNamedAfterItsStar() {
        Scenario one = Scenario.ofOne(star("Vesper"), "command-line options");
        assertEquals("Vesper", one.name());
        assertEquals(1, one.stars().size());
    }

    @Test
    void exceptionNeedsAnError() {
        assertThrows(IllegalArgumentException.class, () -> new ScenarioException(List.of()));
    }
}
