package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.OptionalDouble;
import org.stellabar.structure.PolytropeRequest;
import org.stellabar.structure.ScaleAnchor;

/**
 * Helpers for asserting what a scenario text is rejected for, and where. Expected lines and
 * columns are found by locating a marker in the text itself, never counted by hand.
 */
final class ScenarioTestSupport {

    static final String SOURCE = "test.toml";

    private ScenarioTestSupport() {
    }

    /** @return the star's radius, if that is what fixes its scale */
    static OptionalDouble radius(ScenarioStar star) {
        return star.request().anchor() instanceof ScaleAnchor.Radius r ? OptionalDouble.of(r.value())
                : OptionalDouble.empty();
    }

    /** @return the star's central temperature, if that is what fixes its scale */
    static OptionalDouble centralTemperature(ScenarioStar star) {
        return star.request().anchor() instanceof ScaleAnchor.CentralTemperature t ? OptionalDouble.of(t.value())
                : OptionalDouble.empty();
    }

    /** @return the star's entropy per baryon, if that is what fixes its scale */
    static OptionalDouble entropyPerBaryon(ScenarioStar star) {
        return star.request().anchor() instanceof ScaleAnchor.Entropy e ? OptionalDouble.of(e.value())
                : OptionalDouble.empty();
    }

    /** @return the star's polytropic index, if it is a polytrope */
    static OptionalDouble index(ScenarioStar star) {
        return star.request() instanceof PolytropeRequest p ? OptionalDouble.of(p.index()) : OptionalDouble.empty();
    }

    /** @return every error the text is rejected with */
    static List<ScenarioError> errorsOf(String toml) {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(SOURCE, toml));
        return e.errors();
    }

    /** @return the one error the text is rejected with (fails if there are more) */
    static ScenarioError onlyError(String toml) {
        List<ScenarioError> errors = errorsOf(toml);
        assertEquals(1, errors.size(), () -> "expected one error, got:\n" + join(errors));
        return errors.get(0);
    }

    /** Asserts the error's kind and that it points at the first character of the n-th {@code marker}. */
    static void assertError(ScenarioError error, ScenarioError.Kind kind, String toml, String marker,
            int occurrence) {
        int index = -1;
        for (int i = 0; i < occurrence; i++) {
            index = toml.indexOf(marker, index + 1);
            if (index < 0) {
                fail("marker '" + marker + "' occurs fewer than " + occurrence + " times");
            }
        }
        assertErrorAt(error, kind, toml, index);
    }

    /** Asserts the error's kind and that it points at the first {@code marker}. */
    static void assertError(ScenarioError error, ScenarioError.Kind kind, String toml, String marker) {
        assertError(error, kind, toml, marker, 1);
    }

    /**
     * Asserts the error's kind and that it points at {@code target} inside the first occurrence of
     * {@code context}, e.g. the value {@code "400"} in the line {@code points = "400"}.
     */
    static void assertErrorWithin(ScenarioError error, ScenarioError.Kind kind, String toml, String context,
            String target) {
        int start = toml.indexOf(context);
        int offset = context.indexOf(target);
        if (start < 0 || offset < 0) {
            fail("context '" + context + "' or target '" + target + "' not found");
        }
        assertErrorAt(error, kind, toml, start + offset);
    }

    private static void assertErrorAt(ScenarioError error, ScenarioError.Kind kind, String toml, int index) {
        int line = 1 + (int) toml.substring(0, index).chars().filter(c -> c == '\n').count();
        int column = index - toml.lastIndexOf('\n', index - 1);
        assertEquals(kind, error.kind(), error::toString);
        assertEquals(line + ":" + column, error.line() + ":" + error.column(), error::toString);
        assertTrue(error.toString().startsWith(SOURCE + ":" + line + ":" + column + ": "), error::toString);
    }

    /** Asserts that exactly one error has this kind and points at the marker. */
    static ScenarioError assertOneOf(List<ScenarioError> errors, ScenarioError.Kind kind, String toml,
            String marker) {
        List<ScenarioError> ofKind = errors.stream().filter(e -> e.kind() == kind).toList();
        assertEquals(1, ofKind.size(), () -> "expected one " + kind + " among:\n" + join(errors));
        assertError(ofKind.get(0), kind, toml, marker);
        return ofKind.get(0);
    }

    static String join(List<ScenarioError> errors) {
        StringBuilder b = new StringBuilder();
        for (ScenarioError e : errors) {
            b.append(e).append('\n');
        }
        return b.toString();
    }
}
