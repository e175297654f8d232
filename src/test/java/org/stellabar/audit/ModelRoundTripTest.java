package org.stellabar.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.stellabar.eos.Composition;
import org.stellabar.output.CsvTableReader;
import org.stellabar.output.CsvWriter;
import org.stellabar.physics.Constants;
import org.stellabar.structure.PolytropeRequest;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.IsentropicRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequest;

/**
 * Profiles written by {@code stellabar model} (through the same CSV writer the command uses) audit
 * clean: our pressure is theirs, the hydrostatic residual is the truncation error of the
 * three-point differences and falls at second order as the rows double, and ⟨Γ1⟩ is the model's.
 */
class ModelRoundTripTest {

    private static final Composition MIXTURE = Composition.of(0.7, 0.28, 0.02);
    private static final StarBuilder BUILDER = new StarBuilder();

    /** Masses and radii are invented test values spanning gas- to radiation-dominated stars. */
    static Stream<Arguments> models() {
        return Stream.of(
                Arguments.of("standard", StandardModelRequest.of(40 * Constants.SOLAR_MASS, 12 * Constants.SOLAR_RADIUS,
                        MIXTURE)),
                Arguments.of("polytrope n = 1.5", PolytropeRequest.of(10 * Constants.SOLAR_MASS,
                        5 * Constants.SOLAR_RADIUS, MIXTURE, 1.5)),
                Arguments.of("isentropic", IsentropicRequest.withRadius(100 * Constants.SOLAR_MASS,
                        20 * Constants.SOLAR_RADIUS, MIXTURE)));
    }

    private static ProfileAudit audit(StarModel model) {
        StringWriter w = new StringWriter();
        try {
            CsvWriter.withComments().write(model.profile(), w);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<String> lines = w.toString().lines().toList();
        LoadedProfile loaded = new ProfileLoader(ColumnMapping.ourNames(), CompositionPolicy.wholeStar(MIXTURE), false)
                .load(new CsvProfileSource(new CsvTableReader().parse("profile.csv", lines)));
        return new ProfileAuditor().audit(loaded);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void pressureAndGamma1AgreeWithTheModel(String label, StarRequest request) {
        StarModel model = BUILDER.build(request);
        ProfileAudit a = audit(model);
        // the model's T came from our own inversion and was printed with all 17 digits
        assertTrue(a.star().maxPressureMismatch().getAsDouble() < 1e-10, label + ": "
                + a.star().maxPressureMismatch());
        assertTrue(a.star().flaggedRows().isEmpty());
        assertTrue(a.star().maxGamma1Difference().getAsDouble() < 1e-12, label);
        // <Gamma1>: the model integrates over its own stability profile (in closed form for the
        // standard model; out to the extrapolated surface beyond the last printed row for the
        // isentropic star), the audit over the printed rows with the same quadrature. Measured
        // differences: 2e-16 (standard, polytrope) and 1.5e-10 (isentropic, 200 rows); 1e-9 bounds both.
        assertEquals(model.headline().stability().meanGamma1(), a.star().gamma1Mean().getAsDouble(), 1e-9, label);
        assertEquals(model.headline().stability().newtonianMargin(),
                a.star().totals().stability().get().newtonianMargin(), 1e-9, label);
        assertEquals(model.headline().stability().verdict(), a.star().totals().stability().get().verdict(), label);
        // the star's mass and radius are the model's: exactly where the profile ends with its vacuum
        // surface row (polytropes); the isentropic profile stops at P = 1e-12 P_c, short of the
        // extrapolated surface the model reports, by 7e-5 R at 200 rows
        double closeness = a.profile().hasSurface() ? 1e-12 : 2e-4;
        assertEquals(model.headline().mass(), a.star().totals().mass().getAsDouble(),
                closeness * model.headline().mass(), label);
        assertEquals(model.headline().radius(), a.star().totals().radius().getAsDouble(),
                closeness * model.headline().radius(),
                label);
        // virial theorem to the quadrature's accuracy (piecewise parabolas on 200 rows)
        assertEquals(1.0 + a.star().totals().surfacePressureTerm().getAsDouble(),
                a.star().totals().virialRatio().getAsDouble(), 1e-4,
                label);
        // the standard model's central beta is the standard-model beta for its M and mu
        if (label.equals("standard")) {
            assertEquals(a.star().totals().standardModelBeta().getAsDouble(), a.star().centralBeta(), 1e-13);
        }
    }

    /**
     * The largest hydrostatic residual inside r/R = 0.9 (away from the surface, where the relative
     * residual of the last shells is only first order) quarters as the rows double.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void hydrostaticResidualFallsAtSecondOrder(String label, StarRequest request) {
        int[] points = {101, 201, 401, 801};
        double[] worst = new double[points.length];
        for (int k = 0; k < points.length; k++) {
            ProfileAudit a = audit(BUILDER.build(request.withPoints(points[k])));
            double[] x = a.shells().radiusFraction();
            double[] h = a.shells().hydrostaticResidual();
            for (int i = 0; i < x.length; i++) {
                if (x[i] <= 0.9) {
                    worst[k] = Math.max(worst[k], Math.abs(h[i]));
                }
            }
        }
        for (int k = 1; k < points.length; k++) {
            double order = Math.log(worst[k - 1] / worst[k]) / Math.log((points[k] - 1.0) / (points[k - 1] - 1.0));
            // second order within 0.15: distinct from first (1) and third (3)
            assertEquals(2.0, order, 0.15, label + " order from " + points[k - 1] + " to " + points[k] + " rows");
        }
    }
}
