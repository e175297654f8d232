package org.stellabar.observed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.structure.EddingtonStandardModel;

class UncertaintyPropagationTest {

    private static final ObservedStarAnalysis ANALYSIS = new ObservedStarAnalysis(EddingtonStandardModel.create());

    private static ObservedStar star(int row, Measurement l, Measurement t, Measurement m) {
        return new ObservedStar("s" + row, row, Optional.of(l), Optional.of(t), Optional.empty(), Optional.of(m),
                Optional.empty(), Composition.DEFAULT);
    }

    private static double halfWidth(Percentiles p) {
        return 0.5 * (p.p84() - p.p16());
    }

    @Test
    void reproducibleWithTheSeed() {
        ObservedStar s = star(3, new Measurement(2e5 * SOLAR_LUMINOSITY, 0.1, true), new Measurement(4e4, 2000, false),
                new Measurement(50 * SOLAR_MASS, 10 * SOLAR_MASS, false));
        EstimateSpread a = new UncertaintyPropagation(ANALYSIS).spread(s).orElseThrow();
        EstimateSpread b = new UncertaintyPropagation(ANALYSIS).spread(s).orElseThrow();
        assertEquals(a, b);
        EstimateSpread other = new UncertaintyPropagation(ANALYSIS, UncertaintyPropagation.SEED + 1,
                UncertaintyPropagation.SAMPLES).spread(s).orElseThrow();
        assertNotEquals(a.of(SpreadQuantity.GAMMA_E), other.of(SpreadQuantity.GAMMA_E));
    }

    @Test
    void noErrorsNoSpread() {
        ObservedStar s = star(1, Measurement.exact(1e5 * SOLAR_LUMINOSITY), Measurement.exact(3e4),
                Measurement.exact(30 * SOLAR_MASS));
        assertTrue(new UncertaintyPropagation(ANALYSIS).spread(s).isEmpty());
    }

    // For small errors the percentiles converge to linear propagation: Γ_e ∝ L/M gives
    // σ(ln Γ_e)² = σ(ln L)² + σ(ln M)², and R ∝ L^(1/2) T^(-2) gives σ(log R)² = (σ_logL/2)² +
    // (2σ_logT)². With 20000 draws the half-width (p84 − p16)/2 of a normal sample scatters by
    // about 1.2 % of σ (common practice, no source); 4 % allows three times that plus the
    // curvature of 10^x over 1e-4 dex.
    @Test
    void convergesToLinearPropagation() {
        double relL = 1e-4;
        double relM = 2e-4;
        double dexT = 5e-5;
        ObservedStar s = new ObservedStar("lin", 5,
                Optional.of(new Measurement(1e5 * SOLAR_LUMINOSITY, relL * 1e5 * SOLAR_LUMINOSITY, false)),
                Optional.of(new Measurement(3e4, dexT, true)), Optional.empty(),
                Optional.of(new Measurement(30 * SOLAR_MASS, relM * 30 * SOLAR_MASS, false)), Optional.empty(),
                Composition.DEFAULT);
        UncertaintyPropagation mc = new UncertaintyPropagation(ANALYSIS, UncertaintyPropagation.SEED, 20000);
        EstimateSpread spread = mc.spread(s).orElseThrow();
        ObservedEstimate central = ANALYSIS.analyze(s).estimate().orElseThrow();
        Percentiles gamma = spread.of(SpreadQuantity.GAMMA_E);
        double linearGamma = central.eddingtonFactor() * Math.hypot(relL, relM);
        assertEquals(central.eddingtonFactor(), gamma.median(), 0.05 * linearGamma, "median");
        assertEquals(linearGamma, halfWidth(gamma), 0.04 * linearGamma, "Gamma_e");
        Percentiles r = spread.of(SpreadQuantity.RADIUS);
        double linearR = central.radius() * Math.hypot(0.5 * relL, 2.0 * dexT * Math.log(10));
        assertEquals(linearR, halfWidth(r), 0.04 * linearR, "R");
        assertEquals(0, spread.failedSamples());
    }
}
