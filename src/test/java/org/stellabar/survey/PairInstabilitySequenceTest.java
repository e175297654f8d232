package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.IsentropicRequest;
import org.stellabar.structure.ScaleAnchor;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;

/** The pair-instability sequence of an oxygen core: its models are the builder's, its onset a root. */
class PairInstabilitySequenceTest {

    private static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);

    /**
     * One 80 Msun core between 1.2e9 K (stable) and 2e9 K (unstable): each model's margin equals that
     * of the same star built on its own by {@link StarBuilder} (one calculation; the shootings start
     * from different guesses and each matches M to 1e-8, so 1e-6 in the margin), and at the onset the
     * star built there has a post-Newtonian margin of zero to what the root's 1e-4 in ln T_c allows
     * (the margin changes by ~0.1 per unit ln T_c: 1e-5; asserted 1e-4).
     */
    @Test
    void onsetIsWhereTheMarginVanishes() {
        double mass = 80.0 * SOLAR_MASS;
        PairInstabilitySequence.Result r = new PairInstabilitySequence(OXYGEN).run(List.of(mass), 1.2e9, 2e9, 2);
        assertEquals(2, r.models().size());
        assertTrue(r.models().get(0).stability().relativisticMargin() > 0.0);
        assertTrue(r.models().get(1).stability().relativisticMargin() < 0.0);
        StarBuilder builder = new StarBuilder();
        StarModel alone = builder.build(new IsentropicRequest("core", mass, new ScaleAnchor.CentralTemperature(2e9),
                OXYGEN, 400, Electrons.fermi));
        assertEquals(alone.headline().stability().relativisticMargin(),
                r.models().get(1).stability().relativisticMargin(), 1e-6);
        double onset = r.onsets().get(0).temperature().orElseThrow();
        assertTrue(onset > 1.2e9 && onset < 2e9, "onset " + onset);
        StarModel atOnset = builder.build(new IsentropicRequest("core", mass,
                new ScaleAnchor.CentralTemperature(onset), OXYGEN, 400, Electrons.fermi));
        assertEquals(0.0, atOnset.headline().stability().relativisticMargin(), 1e-4);
        assertEquals(onset, r.onsetTable().numbers(PairInstabilitySequence.T_ONSET).values()[0]);
    }

    @Test
    void impossibleRequestsAreBadInput() {
        PairInstabilitySequence s = new PairInstabilitySequence(OXYGEN);
        assertThrows(BadInputException.class, () -> s.run(List.of(), 1e9, 2e9, 3));
        assertThrows(BadInputException.class, () -> s.run(List.of(-SOLAR_MASS), 1e9, 2e9, 3));
        assertThrows(BadInputException.class, () -> s.run(List.of(SOLAR_MASS), 2e9, 1e9, 3));
        assertThrows(BadInputException.class, () -> s.run(List.of(SOLAR_MASS), 1e9, 2e9, 1));
    }
}
