package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityWarning.Regime;
import org.stellabar.physics.Constants;
import org.stellabar.table.Table;

/** Every profile row carries the validity warnings of its own (ρ, T). */
class ProfileWarningsTest {

    private static final Composition MIX = Composition.fromAnyTwo(0.7, Double.NaN, 0.02);

    @Test
    void eachRowsMaskIsTheEquationOfStateMaskAtThatRow() {
        StarModel model = new StarBuilder().build(StandardModelRequest.of(1e5 * Constants.SOLAR_MASS,
                140 * Constants.SOLAR_RADIUS, MIX).withPoints(60));
        Table p = model.profile();
        GasRadiationEos eos = new GasRadiationEos(MIX);
        double[] rho = p.numbers("rho").values();
        double[] t = p.numbers("T").values();
        double[] beta = p.numbers("beta").values();
        double[] mask = p.numbers("warning_mask").values();
        for (int i = 0; i < rho.length; i++) {
            if (rho[i] > 0 && t[i] > 0) {
                assertEquals(eos.validity().mask(rho[i], t[i], beta[i]), (int) mask[i], "row " + i);
            } else {
                assertEquals(0, (int) mask[i], "the surface row has no state and no warning");
            }
        }
        // a 1e5 Msun standard model has beta ~ 0.02 everywhere: radiation dominates at the centre
        assertTrue(((int) mask[0] & Regime.RADIATION_DOMINATED.bit()) != 0);
    }

    @Test
    void aGasDominatedCentreCarriesNoWarning() {
        StarModel model = new StarBuilder().build(StandardModelRequest.of(Constants.SOLAR_MASS, Constants.SOLAR_RADIUS,
                MIX).withPoints(40));
        // the Sun as an n = 3 model: rho_c ~ 76 g/cm3, T_c ~ 1.2e7 K, classical, ionized, beta ~ 0.9997
        assertEquals(0, (int) model.profile().numbers("warning_mask").get(0));
    }
}
