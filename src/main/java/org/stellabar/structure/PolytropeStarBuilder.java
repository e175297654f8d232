package org.stellabar.structure;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.stellabar.table.Inputs;

/**
 * A Lane-Emden polytrope scaled to M and R ({@link ScaledPolytropeStar}); stability from the
 * integrals of {@link StabilityAnalysis} on the Lane-Emden solution's dense output
 * ({@link ScaledPolytropeStar#stability}), so that it does not depend on the table's rows.
 */
public final class PolytropeStarBuilder implements StarModelBuilder<PolytropeRequest> {

    /** Relative disagreement of the two K routes above which the output carries a note. */
    static final double ACCURACY_NOTE_ABOVE = 1e-8;

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
                request.electrons().inversions(request.composition()));
        StarStructure structure = star.build(request.mass(), request.radius(), request.points());
        StabilityResult stability = star.stability(request.mass(), request.radius());
        double ratio = shared.standardModel().beta(request.mass(), request.composition().mu()).oneMinusBeta();
        return new BuiltStar(structure, stability, ratio,
                "standard-model value 1 - beta(M, mu) for this M and mu; a polytrope does not fix L",
                OptionalDouble.of(request.index()), accuracy(stability, star.polytrope()));
    }

    /**
     * K by two routes over the same dense solution (the star's physical integrals and the
     * Lane-Emden solution's dimensionless one) measures the quadrature's accuracy; close to n = 5,
     * where the mass sits in a core a tiny fraction of R across, it falls below the usual ~1e-12
     * and the output says by how much.
     */
    private static List<String> accuracy(StabilityResult stability, LaneEmdenSolution polytrope) {
        double disagreement = Math.abs(stability.relativisticCoefficient() / polytrope.relativisticCoefficient() - 1.0);
        if (!(disagreement > ACCURACY_NOTE_ABOVE)) {
            return List.of();
        }
        return List.of(String.format(Locale.US, "stability integrals accurate to about %.1g relative only"
                + " (two quadrature routes over the Lane-Emden solution disagree by that much): n = %s is so close"
                + " to 5 that the mass sits in a core of radius xi ~ 1 out of xi1 = %.4g; K, R_crit and <Gamma1>"
                + " carry that uncertainty", disagreement, polytrope.n(), polytrope.xi1()));
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
