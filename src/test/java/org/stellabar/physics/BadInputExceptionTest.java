package org.stellabar.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class BadInputExceptionTest {

    @Test
    void messageFormatsPutValueUnitAndAllowanceInOneLine() {
        assertEquals("density = -1.0 g/cm3 is not allowed; it must be positive and finite",
                BadInputException.mustBePositive("density", -1.0, "g/cm3").getMessage());
        assertEquals("X = 1.5 is not allowed; give 0 <= X <= 1",
                BadInputException.notAllowed("X", 1.5, "", "give 0 <= X <= 1").getMessage());
        assertEquals("profile points 2 is not allowed; give 3 to 100000",
                BadInputException.notAllowed("profile points", 2, "give 3 to 100000").getMessage());
    }

    @Test
    void aboutReplacesTheSubjectAndKeepsTheDetail() {
        BadInputException e = new BadInputException("mass range", "upper mass 1.0 Msun must be above 2.0 Msun");
        assertEquals("mass range: upper mass 1.0 Msun must be above 2.0 Msun", e.getMessage());
        BadInputException named = e.about("--mass-range");
        assertEquals("--mass-range: upper mass 1.0 Msun must be above 2.0 Msun", named.getMessage());
        assertEquals("--mass-range", named.subject());
        assertEquals(e.detail(), named.detail());
        // without a subject the new one goes in front, as before
        assertEquals("--rho/--temp: density = 0.0 g/cm3 is not allowed; it must be positive and finite",
                BadInputException.mustBePositive("density", 0.0, "g/cm3").about("--rho/--temp").getMessage());
    }
}
