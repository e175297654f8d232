package org.stellabar.structure;

import java.util.List;
import java.util.OptionalDouble;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.table.Inputs;

/**
 * A Lane-Emden polytrope scaled to M and R ({@link ScaledPolytropeStar}); stability from
 * {@link StabilityAnalysis} on the profile, sampled with at least
 * {@link StarBuildContext#STABILITY_POINTS} rows whatever the table's rows.
 */
public final class PolytropeStarBuilder implements StarModelBuilder<PolytropeRequest> {

    @Override
    public StarKind kind() {
        return StarKind.polytrope;
    }

    @Override
    public Class<PolytropeRequest> requestType() {
        return PolytropeRequest.class;
    }

    @Override
    public BuiltStar build(PolytropeRequest request, StarBuildContext shared) {
        ScaledPolytropeStar star = new ScaledPolytropeStar(shared.polytrope(request.index()),
                new GasRadiationEos(request.composition()));
        StarStructure structure = star.build(request.mass(), request.radius(), request.points());
        StarStructure fine = request.points() >= StarBuildContext.STABILITY_POINTS ? structure
                : star.build(request.mass(), request.radius(), StarBuildContext.STABILITY_POINTS);
        StabilityResult stability = StabilityAnalysis.analyze(fine.stabilityProfile());
        double ratio = shared.standardModel().beta(request.mass(), request.composition().mu()).oneMinusBeta();
        return new BuiltStar(structure, stability, ratio,
                "standard-model value 1 - beta(M, mu) for this M and mu; a polytrope does not fix L",
                OptionalDouble.of(request.index()), List.of());
    }

    @Override
    public void describeInputs(PolytropeRequest request, Inputs.Builder inputs) {
        inputs.number("n", request.index(), "", "polytropic index");
    }

    @Override
    public String title(PolytropeRequest request) {
        return "polytrope n = " + request.index();
    }
}
