package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;

class StandardModelStarTest {

    private static final StarBuilder BUILDER = new StarBuilder();

    /**
     * The mixed-EOS inversion (ρ, P) → T along the n = 3 profile reproduces the quartic's β at
     * every row: P/ρ^{4/3} is the same everywhere, and so is the root.
     */
    @ParameterizedTest
    @CsvSource({"0.1, 0.6", "1, 0.62", "10, 0.62", "40, 0.5", "100, 1.3", "1e4, 0.62", "1e6, 1.9", "1e7, 0.6"})
    void inversionReproducesTheQuarticBetaEverywhere(double massSolar, double mu) {
        double mass = massSolar * SOLAR_MASS;
        double radius = 20.0 * SOLAR_RADIUS * Math.sqrt(massSolar);
        StarModel model = BUILDER.build(new StandardModelRequest("t", mass, radius, Composition.ofMu(mu), 301));
        BetaSolution quartic = BUILDER.standardModel().beta(mass, mu);
        double[] beta = model.profile().numbers("beta").values();
        double[] omb = model.profile().numbers("one_minus_beta").values();
        for (int i = 0; i < beta.length; i++) {
            // relative 1e-10 on both beta and 1 - beta (each is computed without cancellation)
            assertEquals(1.0, beta[i] / quartic.beta(), 1e-10, "beta, row " + i);
            assertEquals(1.0, omb[i] / quartic.oneMinusBeta(), 1e-10, "1 - beta, row " + i);
        }
        assertEquals(quartic.oneMinusBeta(), model.headline().luminosityRatio(), 1e-15);
    }

    @Test
    void summaryAgreesWithTheClosedFormStandardModel() {
        Composition c = Composition.of(0.7, 0.28, 0.02);
        double mass = 40.0 * SOLAR_MASS;
        double radius = 12.0 * SOLAR_RADIUS;
        StarModel model = BUILDER.build(StandardModelRequest.of(mass, radius, c));
        StandardModelState state = BUILDER.standardModel().model(mass, radius, c);
        StarHeadline s = model.headline();
        assertEquals(1.0, s.centre().rho() / state.centralDensity(), 1e-13);
        assertEquals(1.0, s.centre().P() / state.centralPressure(), 1e-13);
        assertEquals(1.0, s.centre().T() / state.centralTemperature(), 1e-12);
        assertEquals(state.eddingtonLuminosity(), s.eddingtonLuminosity(), 0.0);
        // Chandrasekhar 1939, Table 4: rho_c/rho_mean = 54.1825 for n = 3
        assertEquals(54.1825, s.centralToMeanDensity(), 1e-4);
        // Chandrasekhar 1965, ApJ 142, 1519: K3 = 1.1245 (four digits)
        assertEquals(1.1245, s.stability().relativisticCoefficient(), 1e-4);
        // uniform beta: <Gamma1> is Gamma1(beta) = (32 - 24b - 3b^2)/(24 - 21b) (Chandrasekhar 1939, ch. II)
        double b = s.centre().beta();
        assertEquals((32.0 - 24.0 * b - 3.0 * b * b) / (24.0 - 21.0 * b), s.stability().meanGamma1(), 1e-13);
    }

    /** Kind polytrope with n = 3 is the same star; its profile-based stability matches the closed form. */
    @Test
    void polytropeOfIndexThreeIsTheStandardModel() {
        Composition c = Composition.of(0.7, 0.28, 0.02);
        double mass = 300.0 * SOLAR_MASS;
        double radius = 30.0 * SOLAR_RADIUS;
        StarModel standard = BUILDER.build(StandardModelRequest.of(mass, radius, c).withPoints(401));
        StarModel polytrope = BUILDER.build(PolytropeRequest.of(mass, radius, c, 3.0).withPoints(401));
        double[] t1 = standard.profile().numbers("T").values();
        double[] t2 = polytrope.profile().numbers("T").values();
        for (int i = 0; i < t1.length; i++) {
            assertEquals(t1[i], t2[i], 0.0, "row " + i);
        }
        StabilityResult closed = standard.headline().stability();
        StabilityResult profile = polytrope.headline().stability();
        // a constant Gamma1 averages to itself up to rounding
        assertEquals(closed.meanGamma1(), profile.meanGamma1(), 1e-13);
        // K from fourth-order quadrature over 401 rows against the dense-solution value
        assertEquals(1.0, profile.relativisticCoefficient() / closed.relativisticCoefficient(), 1e-6);
        assertEquals(closed.verdict(), profile.verdict());
    }

    /** Supermassive limit β ≈ 4.28 μ⁻¹ (M/M☉)^(−1/2) (Shapiro &amp; Teukolsky 1983, ch. 17). */
    @Test
    void supermassiveBetaFollowsItsAsymptote() {
        double mu = 0.6;
        double massSolar = 1e8;
        StarModel model = BUILDER.build(StandardModelRequest.of(massSolar * SOLAR_MASS, 1e6 * SOLAR_RADIUS,
                Composition.ofMu(mu)));
        double asymptote = 4.28 / (mu * Math.sqrt(massSolar));
        // the asymptote drops terms of relative order beta (~1e-3) and quotes three digits
        assertEquals(1.0, model.headline().centre().beta() / asymptote, 3e-3);
    }

    @Test
    void indexOtherThanThreeIsRefused() {
        Composition c = Composition.of(0.7, 0.28, 0.02);
        StarRequestException e = assertThrows(StarRequestException.class, () -> new StarDraft("t",
                StarKind.standard, SOLAR_MASS, OptionalDouble.of(SOLAR_RADIUS), OptionalDouble.of(2.0),
                OptionalDouble.empty(), OptionalDouble.empty(), StarDraft.ANCHORS, c, 10).toRequest());
        assertEquals(StarRequestException.Component.index, e.component());
    }

    @Test
    void radiusIsRequired() {
        Composition c = Composition.of(0.7, 0.28, 0.02);
        StarRequestException e = assertThrows(StarRequestException.class, () -> new StarDraft("t",
                StarKind.standard, SOLAR_MASS, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), StarDraft.ANCHORS, c, 10).toRequest());
        assertEquals(StarRequestException.Component.radius, e.component());
    }

    /** Γ1 and ∇_ad of the profile follow the closed forms for a monatomic gas + radiation. */
    @Test
    void exponentsMatchTheMixtureFormulas() {
        StarModel model = BUILDER.build(StandardModelRequest.of(60.0 * SOLAR_MASS, 15.0 * SOLAR_RADIUS,
                Composition.of(0.7, 0.28, 0.02)));
        double b = model.headline().centre().beta();
        // DESIGN §7 (Chandrasekhar 1939, ch. II): nabla_ad = (8 - 6b)/(32 - 24b - 3b^2)
        double nablaAd = (8.0 - 6.0 * b) / (32.0 - 24.0 * b - 3.0 * b * b);
        for (double v : model.profile().numbers("nabla_ad").values()) {
            assertEquals(nablaAd, v, 1e-13);
        }
        double[] g1 = model.profile().numbers("Gamma1").values();
        double[] cs = model.profile().numbers("c_s").values();
        double[] p = model.profile().numbers("P").values();
        double[] rho = model.profile().numbers("rho").values();
        for (int i = 0; i < cs.length - 1; i++) {
            assertEquals(Math.sqrt(g1[i] * p[i] / rho[i]), cs[i], 1e-12 * cs[i]);
        }
        assertEquals(GasRadiationEos.gamma1(b, 1.0 - b, GasRadiationEos.gamma3MinusOne(b, 1.0 - b)), g1[0], 1e-13);
    }
}
