package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class UnitTextTest {

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', value = {
        "g/cm3      | g cm^{-3}",
        "dyn/cm2    | dyn cm^{-2}",
        "erg/g/K    | erg g^{-1} K^{-1}",
        "1/cm3      | cm^{-3}",
        "cm/s       | cm s^{-1}",
        "K          | K",
        "Msun       | M_☉",
        "erg/s      | erg s^{-1}",
        "g cm^{-3}  | g cm^{-3}",
        "km s^-1    | km s^-1",
    })
    void compactUnitsAreTypeset(String unit, String expected) {
        assertEquals(expected, UnitText.typeset(unit));
    }

    @org.junit.jupiter.api.Test
    void dimensionlessStaysEmpty() {
        assertEquals("", UnitText.typeset(""));
        assertEquals("Γ_1", Axis.linear("Γ_1", "").title());
        assertEquals("ρ [g cm^{-3}]", Axis.log("ρ", "g/cm3").title());
    }
}
