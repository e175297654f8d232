package org.stellabar.observed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.EddingtonStandardModel;

class MassFromLuminosityTest {

    private static final MassFromLuminosity INVERSE = new MassFromLuminosity(EddingtonStandardModel.create());

    // Round trip M -> L_model(M) -> M -> L_model: the luminosity back to 1e-10 relative (the root is
    // solved to ~1e-15 in ln M, and L_model grows at most as M^3, so ~3e-15 in L), over the whole range.
    @ParameterizedTest
    @CsvSource({"0.02, 0.70", "1.0, 0.70", "8.0, 0.70", "40.0, 0.0", "300.0, 0.74", "1e5, 0.70", "5e7, 0.2"})
    void roundTrip(double massInSuns, double x) {
        Composition c = Composition.fromAnyTwo(x, Double.NaN, 0.02 * (1 - x));
        double l = INVERSE.luminosity(massInSuns * SOLAR_MASS, c);
        double m = INVERSE.mass(l, c);
        assertEquals(l, INVERSE.luminosity(m, c), 1e-10 * l, "L back");
        assertEquals(massInSuns * SOLAR_MASS, m, 1e-10 * massInSuns * SOLAR_MASS, "M back");
    }

    @ParameterizedTest
    @CsvSource({"1e20", "1e-12"})
    void outsideTheModelsRange(double lumInErgs) {
        assertThrows(BadInputException.class, () -> INVERSE.mass(lumInErgs, Composition.DEFAULT));
    }
}
