package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.stellabar.scenario.ScenarioTestSupport.SOURCE;
import static org.stellabar.scenario.ScenarioTestSupport.assertError;
import static org.stellabar.scenario.ScenarioTestSupport.onlyError;

import org.junit.jupiter.api.Test;
import org.stellabar.eos.Electrons;
import org.stellabar.scenario.ScenarioError.Kind;

/** {@code electrons = "classical" | "fermi"} per star and in {@code [defaults]}, with its errors at file:line:column. */
class ElectronsKeyTest {

    private static final String CORE = "kind = \"isentropic\"\nmass = \"80 Msun\"\ncentral_temperature = 2e9\n"
            + "composition = { X = 0, Z = 1, metal_mass_number = 16 }\n";

    @Test
    void perStarAndAsTheDefault() {
        String toml = "name = \"t\"\n[defaults]\nelectrons = \"fermi\"\n\n[[star]]\nname = \"A\"\n" + CORE
                + "\n[[star]]\nname = \"B\"\nelectrons = \"classical\"\nmass = \"40 Msun\"\nradius = \"12 Rsun\"\n"
                + "\n[[star]]\nname = \"C\"\n" + CORE;
        Scenario s = ScenarioReader.read(SOURCE, toml);
        assertEquals(Electrons.fermi, s.stars().get(0).request().electrons());
        assertEquals(Electrons.classical, s.stars().get(1).request().electrons());
        assertEquals(Electrons.fermi, s.stars().get(2).request().electrons());
        // a pure-oxygen composition (X = Y = 0, Z = 1, A = 16) reads: 1/mu = 1/2 + 1/16
        assertEquals(16.0 / 9.0, s.stars().get(0).request().composition().mu(), 1e-15);
    }

    @Test
    void classicalWhenNotSaid() {
        String toml = "name = \"t\"\n[[star]]\nname = \"A\"\nmass = \"40 Msun\"\nradius = \"12 Rsun\"\n";
        assertEquals(Electrons.classical, ScenarioReader.read(SOURCE, toml).stars().get(0).request().electrons());
    }

    @Test
    void unknownWordPointsAtTheValue() {
        String toml = "name = \"t\"\n[[star]]\nname = \"A\"\nelectrons = \"quantum\"\n" + CORE;
        ScenarioError e = onlyError(toml);
        assertError(e, Kind.UNKNOWN_CHOICE, toml, "\"quantum\"");
        assertEquals("star[1].electrons", e.key());
    }

    @Test
    void unknownWordInTheDefaults() {
        String toml = "name = \"t\"\n[defaults]\nelectrons = \"degenerate\"\n[[star]]\nname = \"A\"\n" + CORE;
        assertError(onlyError(toml), Kind.UNKNOWN_CHOICE, toml, "\"degenerate\"");
    }

    @Test
    void standardModelRefusesFermiAtTheKey() {
        String toml = "name = \"t\"\n[[star]]\nname = \"A\"\nmass = \"40 Msun\"\nradius = \"12 Rsun\"\n"
                + "electrons = \"fermi\"\n";
        ScenarioError e = onlyError(toml);
        assertError(e, Kind.NOT_APPLICABLE, toml, "electrons");
        assertEquals("star[1].electrons", e.key());
    }

    @Test
    void standardModelRefusesAFermiDefaultAtItsTable() {
        String toml = "name = \"t\"\n[defaults]\nelectrons = \"fermi\"\n[[star]]\nname = \"A\"\nmass = \"40 Msun\"\n"
                + "radius = \"12 Rsun\"\n";
        assertError(onlyError(toml), Kind.NOT_APPLICABLE, toml, "[[star]]");
    }
}
