package org.stellabar.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;

class UnitTest {

    @Test
    void everyInputSpellingNamesOneUnit() {
        Set<String> seen = new HashSet<>();
        for (Unit u : Unit.values()) {
            for (String s : u.inputSpellings()) {
                assertTrue(seen.add(s), "spelling " + s + " twice");
            }
        }
    }

    @Test
    void eachDimensionStartsWithItsCgsUnit() {
        for (Dimension d : Dimension.values()) {
            assertEquals(1.0, d.factors().get(d.cgsUnit()), d.label());
        }
        assertEquals("g, kg, Msun, solMass", Dimension.MASS.acceptedUnits());
    }

    @Test
    void writtenSpellingsAsAstropyReadsThem() {
        // FITS Standard 4.0, section 4.3 and tables 3-6 (astropy's FITS parser rejects Msun and dyn);
        // cli.UnitSpellingAstropyTest parses every one with astropy
        assertEquals(Optional.of("solMass"), Unit.MSUN.written());
        assertEquals(Optional.of("erg/cm3"), Unit.DYN_PER_CM2.written());
        assertEquals(Optional.of("erg/(g.K)"), Unit.ERG_PER_G_K.written());
        assertEquals(Optional.of(""), Unit.NONE.written());
        assertEquals(Optional.empty(), Unit.K_B.written());
        assertEquals(Optional.empty(), Unit.KG.written(), "SI units are accepted on input, never written");
        for (Unit u : Unit.values()) {
            u.written().ifPresent(w -> assertEquals(Optional.of(u), Unit.read(w), "reads back: " + w));
        }
    }

    @Test
    void lookupByTableSpelling() {
        assertEquals(Optional.of(Unit.G_PER_CM3), Unit.of("g/cm3"));
        assertEquals(Optional.empty(), Unit.of("g/cm^3"), "an input alias is not a table spelling");
        assertEquals("M_☉", Unit.MSUN.chartLabel());
        assertEquals(Optional.empty(), Unit.CM_PER_S.dimension());
    }
}
