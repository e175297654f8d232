package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StabilityVerdict;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

class MassSequenceTest {

    private static final EddingtonStandardModel MODEL = EddingtonStandardModel.create();
    private static final Composition MIX = Composition.of(0.7, 0.28, 0.02);

    // The whole advertised range, 0.1 to 1e8 Msun (and down to 0.01): every value finite (the
    // table itself refuses non-finite numbers, so building it is the check) and physical.
    @Test
    void fullRangeIsFinite() {
        for (double low : new double[] {0.01, 0.1}) {
            Table t = new MassSequence(MODEL, MIX, low * SOLAR_MASS, 1e8 * SOLAR_MASS, 401).table();
            assertEquals(401, t.rowCount());
            for (Column c : t.columns()) {
                for (double v : ((NumberColumn) c).values()) {
                    assertTrue(Double.isFinite(v), c.name());
                }
            }
            double[] beta = t.numbers("beta").values();
            double[] omb = t.numbers("one_minus_beta").values();
            for (int i = 0; i < beta.length; i++) {
                assertTrue(beta[i] > 0.0 && beta[i] <= 1.0 && omb[i] >= 0.0 && omb[i] < 1.0, "row " + i);
                // β + (1 − β) = 1 to rounding: each computed without cancellation, so this is a check
                assertEquals(1.0, beta[i] + omb[i], 2e-15, "row " + i); // a few ulps: 1 - beta = A beta^4 rounds 5 products
                if (i > 0) {
                    assertTrue(beta[i] < beta[i - 1], "beta falls with mass");
                }
            }
            assertTrue(t.numbers("Gamma1_minus_4_3").get(400) > 0.0);
        }
    }

    @Test
    void endsAreExactAndLogSpaced() {
        MassSequence s = new MassSequence(MODEL, MIX, 1.0 * SOLAR_MASS, 1e6 * SOLAR_MASS, 61);
        assertEquals(SOLAR_MASS, s.mass(0));
        assertEquals(1e6 * SOLAR_MASS, s.mass(60));
        assertEquals(10.0 * SOLAR_MASS, s.mass(10), 1e-13 * 10.0 * SOLAR_MASS);
        assertEquals(1e3 * SOLAR_MASS, s.mass(30), 1e-13 * 1e3 * SOLAR_MASS);
    }

    // Each row is the standard model of its mass: the sequence must match the model's own
    // answers (β, critical radius) and, at the critical radius, the model must be marginal.
    @Test
    void rowsAreStandardModels() {
        MassSequence s = new MassSequence(MODEL, MIX, 10.0 * SOLAR_MASS, 1e7 * SOLAR_MASS, 7);
        for (int i = 0; i < s.size(); i++) {
            SequenceRow r = s.row(i);
            assertEquals(MODEL.beta(r.mass(), MIX.mu()).beta(), r.beta(), 0.0);
            assertEquals(MODEL.criticalRadius(r.mass(), MIX.mu()), r.criticalRadius(), 1e-14 * r.criticalRadius());
            assertEquals(StabilityVerdict.MARGINAL, MODEL.model(r.mass(), r.criticalRadius(), MIX).stability().verdict());
            assertEquals(r.oneMinusBeta() * r.eddingtonLuminosity(), r.luminosity(), 1e-15 * r.luminosity());
            // R_crit/(GM/c²) = 2K₃/(Γ1 − 4/3): an identity of the criterion
            double ratio = r.criticalRadius() * SPEED_OF_LIGHT * SPEED_OF_LIGHT / (GRAVITATION * r.mass());
            assertEquals(2.0 * MODEL.relativisticCoefficient() / r.gamma1Excess(), ratio, 1e-12 * ratio);
        }
    }

    // Shards concatenate to the whole, and repeated parallel runs give identical tables.
    @Test
    void shardsAndRepeatsAgree() {
        MassSequence s = new MassSequence(MODEL, MIX, 0.5 * SOLAR_MASS, 2e7 * SOLAR_MASS, 1000);
        Table whole = s.table();
        Table again = s.table();
        List<SequenceRow> pieces = new ArrayList<>();
        pieces.addAll(s.rows(0, 333));
        pieces.addAll(s.rows(333, 700));
        pieces.addAll(s.rows(700, 1000));
        assertEquals(s.rows(0, 1000), pieces);
        for (Column c : whole.columns()) {
            assertArrayEquals(((NumberColumn) c).values(), again.numbers(c.name()).values(), c.name());
        }
        Table shard = s.table(333, 700);
        assertArrayEquals(java.util.Arrays.copyOfRange(whole.numbers("beta").values(), 333, 700),
                shard.numbers("beta").values());
    }

    @Test
    void badRanges() {
        assertThrows(BadInputException.class, () -> new MassSequence(MODEL, MIX, SOLAR_MASS, SOLAR_MASS, 10));
        assertThrows(BadInputException.class, () -> new MassSequence(MODEL, MIX, 2 * SOLAR_MASS, SOLAR_MASS, 10));
        assertThrows(BadInputException.class, () -> new MassSequence(MODEL, MIX, 0.0, SOLAR_MASS, 10));
        assertThrows(BadInputException.class, () -> new MassSequence(MODEL, MIX, -1.0, SOLAR_MASS, 10));
        assertThrows(BadInputException.class, () -> new MassSequence(MODEL, MIX, SOLAR_MASS, 2 * SOLAR_MASS, 1));
        assertThrows(BadInputException.class,
                () -> new MassSequence(MODEL, MIX, SOLAR_MASS, Double.POSITIVE_INFINITY, 10));
    }
}
