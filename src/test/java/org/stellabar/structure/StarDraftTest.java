package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StarRequestException.Component;
import org.stellabar.structure.StarRequestException.Problem;
import org.stellabar.structure.StarRequestException.Violation;

/** Which inputs each kind takes, and every value rule, reported all at once. */
class StarDraftTest {

    private static final double M = 40 * Constants.SOLAR_MASS;
    private static final double R = 10 * Constants.SOLAR_RADIUS;
    private static final OptionalDouble NONE = OptionalDouble.empty();

    private static StarDraft draft(StarKind kind, double mass, OptionalDouble radius, OptionalDouble index,
            OptionalDouble tc, OptionalDouble s, long points) {
        return new StarDraft("A", kind, mass, radius, index, tc, s, StarDraft.ANCHORS, Composition.DEFAULT, points);
    }

    private static List<Violation> violations(StarDraft draft) {
        return assertThrows(StarRequestException.class, draft::toRequest).violations();
    }

    @Test
    void eachKindBecomesItsOwnRecord() {
        assertInstanceOf(StandardModelRequest.class,
                draft(StarKind.standard, M, OptionalDouble.of(R), NONE, NONE, NONE, 400).toRequest());
        PolytropeRequest p = assertInstanceOf(PolytropeRequest.class,
                draft(StarKind.polytrope, M, OptionalDouble.of(R), OptionalDouble.of(1.5), NONE, NONE, 400)
                        .toRequest());
        assertEquals(1.5, p.index(), 0.0);
        IsentropicRequest i = assertInstanceOf(IsentropicRequest.class,
                draft(StarKind.isentropic, M, NONE, NONE, OptionalDouble.of(3e7), NONE, 400).toRequest());
        assertEquals(new ScaleAnchor.CentralTemperature(3e7), i.anchor());
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
    void massMustBePositiveAndFinite(double mass) {
        List<Violation> v = violations(draft(StarKind.standard, mass, OptionalDouble.of(R), NONE, NONE, NONE, 400));
        assertEquals(List.of(Component.mass), v.stream().map(Violation::component).toList());
    }

    @ParameterizedTest
    @ValueSource(doubles = {-0.5, 5.0, 6.0, Double.NaN})
    void polytropeIndexInZeroToFive(double n) {
        List<Violation> v = violations(draft(StarKind.polytrope, M, OptionalDouble.of(R), OptionalDouble.of(n), NONE,
                NONE, 400));
        assertEquals(new Violation(Component.index, Problem.OUT_OF_RANGE, v.get(0).message()), v.get(0));
    }

    @ParameterizedTest
    @ValueSource(longs = {2, 1, 0, -3, StarRequest.MAX_POINTS + 1})
    void pointsBound(long points) {
        List<Violation> v = violations(draft(StarKind.standard, M, OptionalDouble.of(R), NONE, NONE, NONE, points));
        assertEquals(Component.points, v.get(0).component());
    }

    @Test
    void kindRules() {
        // an index on a standard star: the standard model is n = 3 by construction
        assertEquals(Problem.NOT_APPLICABLE, violations(draft(StarKind.standard, M, OptionalDouble.of(R),
                OptionalDouble.of(3), NONE, NONE, 400)).get(0).problem());
        // a standard star with a central temperature besides its radius
        assertEquals(new Violation(Component.centralTemperature, Problem.CONFLICT, ""), blank(violations(
                draft(StarKind.standard, M, OptionalDouble.of(R), NONE, OptionalDouble.of(3e7), NONE, 400)).get(0)));
        // an isentropic star with two anchors: the second conflicts
        assertEquals(new Violation(Component.centralTemperature, Problem.CONFLICT, ""), blank(violations(
                draft(StarKind.isentropic, M, OptionalDouble.of(R), NONE, OptionalDouble.of(3e7), NONE, 400)).get(0)));
        // an isentropic star with none
        assertEquals(Problem.MISSING, violations(draft(StarKind.isentropic, M, NONE, NONE, NONE, NONE, 400))
                .get(0).problem());
        // a polytrope without its index
        assertEquals(new Violation(Component.index, Problem.MISSING, ""), blank(violations(
                draft(StarKind.polytrope, M, OptionalDouble.of(R), NONE, NONE, NONE, 400)).get(0)));
    }

    @Test
    void theFirstAnchorWrittenCounts() {
        StarDraft d = new StarDraft("A", StarKind.isentropic, M, OptionalDouble.of(R), NONE, OptionalDouble.of(3e7),
                NONE, List.of(Component.centralTemperature, Component.radius, Component.entropy), Composition.DEFAULT,
                400);
        assertEquals(new Violation(Component.radius, Problem.CONFLICT, ""), blank(violations(d).get(0)));
    }

    @Test
    void everyViolationAtOnce() {
        // Buchdahl 1959, Phys. Rev. 116, 1027: R > (9/4) GM/c^2, about 133 km for 40 Msun; 1 km is inside
        List<Violation> v = violations(draft(StarKind.standard, M, OptionalDouble.of(1e5), NONE, NONE, NONE, 2));
        assertEquals(List.of(Component.points, Component.radius), v.stream().map(Violation::component).toList());
        List<Violation> iso = violations(draft(StarKind.isentropic, M, NONE, OptionalDouble.of(2), OptionalDouble.of(1e15),
                NONE, 2));
        assertEquals(List.of(Component.points, Component.centralTemperature, Component.index),
                iso.stream().map(Violation::component).toList());
    }

    @Test
    void recordsRefuseWhatTheDraftRefuses() {
        Composition c = Composition.DEFAULT;
        assertThrows(StarRequestException.class, () -> new StandardModelRequest("A", M, 1e5, c, 400));
        assertThrows(StarRequestException.class, () -> new PolytropeRequest("A", M, R, 5.0, c, 400));
        assertThrows(StarRequestException.class, () -> new IsentropicRequest("A", M,
                new ScaleAnchor.Entropy(-1), c, 400));
        assertThrows(StarRequestException.class, () -> new StandardModelRequest("A", M, R, c, 2));
    }

    private static Violation blank(Violation v) {
        return new Violation(v.component(), v.problem(), "");
    }
}
