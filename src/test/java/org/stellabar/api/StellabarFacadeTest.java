package org.stellabar.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.audit.ProfileAudit;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StarModel;
import org.stellabar.survey.SequenceRow;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/** The entry points added for sequences and audits in memory: identities with the other entry points. */
class StellabarFacadeTest {

    private static final Composition MIX = Stellabar.composition(0.70, 0.28, 0.02);

    /** Each row of the sequence is the standard model of its mass: β the same as asked for directly. */
    @Test
    void sequenceRowsAreTheStandardModelsOfTheirMasses() {
        List<SequenceRow> rows = Stellabar.standardModelSequence(1, 100, 5, MIX);
        assertEquals(5, rows.size());
        // masses evenly spaced in log M: 1, 10^0.5, 10, 10^1.5, 100 Msun (to rounding of exp/log, 1e-12)
        for (int i = 0; i < rows.size(); i++) {
            double massMsun = rows.get(i).mass() / Constants.SOLAR_MASS;
            assertEquals(Math.pow(10, 0.5 * i), massMsun, 1e-12 * massMsun);
            // the same quartic solved for the same M and mu: equal to rounding
            assertEquals(Stellabar.standardModelBeta(massMsun, MIX).beta(), rows.get(i).beta(), 1e-12);
        }
    }

    /**
     * Our own standard model, audited in memory, agrees with our equation of state: its pressure
     * was computed from it, so the mismatch is rounding (the temperature came from the (rho, P)
     * inversion, converged to 1e-12 relative: 1e-9 leaves room for the conditioning at small beta).
     */
    @Test
    void ourOwnModelAuditsClean() {
        StarModel star = Stellabar.standardModel(40, 12, MIX);
        ProfileAudit audit = Stellabar.audit(star.profile(), MIX);
        // the last row is the vacuum surface (T = 0): the surface point, not a shell
        double[] t = star.profile().numbers("T").values();
        assertEquals(0.0, t[t.length - 1]);
        assertEquals(star.profile().rowCount() - 1, audit.star().shells());
        assertTrue(audit.star().maxPressureMismatch().orElseThrow() < 1e-9, audit.star().maxPressureMismatch().toString());
        assertTrue(audit.star().flaggedRows().isEmpty());
        // the same centre: beta of the innermost shell is the model's (uniform in a standard model)
        assertEquals(star.headline().centre().beta(), audit.star().centralBeta(), 1e-9);
    }

    /** A profile whose T column holds log10(T) is refused with the column and the fix named. */
    @Test
    void logTemperatureColumnIsRefused() {
        Table profile = Stellabar.standardModel(40, 12, MIX).profile();
        Table.Builder logged = new Table.Builder(profile.name(), profile.metadata());
        for (Column c : profile.columns()) {
            if (c instanceof NumberColumn n) {
                double[] v = n.values();
                if (n.name().equals("T")) {
                    for (int i = 0; i < v.length; i++) {
                        v[i] = v[i] > 0 ? Math.log10(v[i]) : 0.0; // the vacuum surface keeps T = 0
                    }
                }
                logged.number(n.name(), n.unit(), n.description(), v);
            }
        }
        BadInputException e = assertThrows(BadInputException.class, () -> Stellabar.audit(logged.build(), MIX));
        assertTrue(e.getMessage().contains("'T' (T)") && e.getMessage().contains("--log T"), e.getMessage());
    }

    /** The isentropic star asked for by mass and central temperature has them (to the finder's match tolerance). */
    @Test
    void isentropicStarHasTheRequestedCentreAndMass() {
        StarModel star = Stellabar.isentropicStar(40, 3e7, MIX);
        // the centre is the anchor: the homology T -> lambda T sets it, to the same match tolerance
        assertEquals(3e7, star.headline().centre().T(), 3e7 * org.stellabar.structure.IsentropicStarFinder.MATCH_TOLERANCE);
        double[] m = star.profile().numbers("m").values();
        // the outermost shell encloses the star's mass, which the finder matches to MATCH_TOLERANCE
        double tolerance = org.stellabar.structure.IsentropicStarFinder.MATCH_TOLERANCE;
        assertEquals(40 * Constants.SOLAR_MASS, m[m.length - 1], 40 * Constants.SOLAR_MASS * tolerance);
    }
}
