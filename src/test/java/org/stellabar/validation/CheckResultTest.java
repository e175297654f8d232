package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.stellabar.physics.BadInputException;

class CheckResultTest {

    private static ReferenceValue row(double value, Tolerance tolerance) {
        return new ReferenceValue("t.csv", 7, "q", Map.of("n", "3"), Double.toString(value), value, "", tolerance,
                Provenance.COMPUTED, "script");
    }

    @Test
    void absoluteAndRelativeDeviationsAreMeasuredAsTheToleranceSays() {
        CheckResult abs = CheckResult.compare("f", row(2.0, Tolerance.absolute(0.01)), 2.005);
        assertEquals(0.005, abs.deviation(), 1e-15);
        assertEquals(0.5, abs.ratio(), 1e-12);
        assertTrue(abs.passed());
        CheckResult rel = CheckResult.compare("f", row(2.0, Tolerance.relativeTo(1e-3)), 2.004);
        assertEquals(2e-3, rel.deviation(), 1e-15);
        assertFalse(rel.passed());
        assertEquals("q (n=3)", rel.label());
        assertEquals("t.csv line 7", rel.origin());
    }

    @Test
    void aValueExactlyAtTheToleranceStillPasses() {
        assertTrue(CheckResult.compare("f", row(1.0, Tolerance.absolute(0.5)), 1.5).passed());
    }

    @Test
    void aNonFiniteValueAlwaysFails() {
        CheckResult c = CheckResult.compare("f", row(1.0, Tolerance.relativeTo(1.0)), Double.NaN);
        assertFalse(c.passed());
        assertEquals(Double.POSITIVE_INFINITY, c.ratio());
        assertEquals("not finite", Numbers.brief(c.ratio()));
    }

    @Test
    void aToleranceMustBePositive() {
        assertThrows(BadInputException.class, () -> Tolerance.absolute(0.0));
        assertThrows(BadInputException.class, () -> Tolerance.relativeTo(Double.NaN));
    }

    @Test
    void numbersAreFormattedTheSameWayEverywhere() {
        assertEquals("6.89684861938", Numbers.significant(6.896848619376960, 12));
        assertEquals("1.24485444444e+17", Numbers.significant(1.2448544444366504e17, 12));
        assertEquals("8.5e-16", Numbers.significant(8.5e-16, 2));
        assertEquals("0", Numbers.significant(0.0, 5));
        assertEquals("0.00012", Numbers.significant(1.2e-4, 2));
        assertEquals("-0.0424297576045", Numbers.significant(-0.042429757604452952, 12));
        assertEquals("1e-13", Numbers.compact(1e-13));
        assertEquals("0.02", Numbers.compact(0.02));
    }
}
