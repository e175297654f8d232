package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.eos.ValidityWarning.Regime;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.table.Table;

/** Each row of a sequence says where its onset point lies outside the model. */
class SequenceWarningsTest {

    private static final Composition MIX = Composition.of(0.7, 0.28, 0.02);

    @Test
    void lowMassOnsetsAreFlaggedAndMassiveOnesAreNot() {
        Table t = new MassSequence(EddingtonStandardModel.create(), MIX, 0.1 * SOLAR_MASS, 1e6 * SOLAR_MASS, 2).table();
        double[] bits = t.numbers(MassSequence.CRITICAL_POINT_WARNINGS).values();
        int low = (int) bits[0];
        int high = (int) bits[1];
        // 0.1 Msun: rho_c ~ 3e18 g/cm3 and T_c ~ 8e11 K at the onset: degenerate, relativistic, pairs
        for (Regime r : new Regime[] {Regime.ELECTRON_DEGENERACY, Regime.RELATIVISTIC_ELECTRONS, Regime.PAIR_CREATION}) {
            assertEquals(r.bit(), low & r.bit(), r + " at 0.1 Msun");
        }
        // 1e6 Msun: rho_c ~ 1e-3 g/cm3, T_c ~ 2e7 K: none of those
        assertEquals(0, high & (Regime.ELECTRON_DEGENERACY.bit() | Regime.PAIR_CREATION.bit()), "at 1e6 Msun");
        // the same bits the equation of state gives at that point (one mask for profiles and sequences)
        ValidityCheck check = new GasRadiationEos(MIX).validity();
        double[] rho = t.numbers(MassSequence.RHO_C_CRIT).values();
        double[] temperature = t.numbers(MassSequence.T_C_CRIT).values();
        double[] beta = t.numbers(org.stellabar.eos.EosQuantities.BETA).values();
        assertEquals(check.mask(rho[0], temperature[0], beta[0]), low);
    }
}
