package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.eos.fermi.FermiGasRadiationEos;

/** The Γ1 = 4/3 boundary is where the equation of state itself says Γ1 = 4/3. */
class SofteningBoundaryTest {

    private static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);
    private static final FermiGasRadiationEos EOS = new FermiGasRadiationEos(OXYGEN);

    /**
     * At the upper edge Γ1 = 4/3: bisection to 1e-12 in ln ρ and dΓ1/d ln ρ ~ 1e-2 there leave
     * ~1e-14 in Γ1; 1e-10 allows the EOS's own rounding. Just below the edge Γ1 &lt; 4/3, just above &gt; 4/3.
     */
    @ParameterizedTest
    @ValueSource(doubles = {1e9, 2e9, 3e9})
    void upperEdgeIsWhereGammaOneIsFourThirds(double t) {
        SofteningBoundary.Span s = new SofteningBoundary(OXYGEN).at(t, 1.0, 1e8, 120);
        assertEquals(4.0 / 3.0, EOS.state(s.rhoHigh(), t).Gamma1(), 1e-10);
        assertTrue(EOS.state(s.rhoHigh() * 0.99, t).Gamma1() < 4.0 / 3.0);
        assertTrue(EOS.state(s.rhoHigh() * 1.01, t).Gamma1() > 4.0 / 3.0);
    }

    /** Below ~2e8 K pairs are too few and Γ1 ≥ 4/3 everywhere (radiation alone gives 4/3 only as ρ → 0). */
    @Test
    void noRegionWhenCool() {
        assertNull(new SofteningBoundary(OXYGEN).at(1e8, 1e-2, 1e8, 60));
    }
}
