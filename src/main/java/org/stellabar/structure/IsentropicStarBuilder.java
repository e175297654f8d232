package org.stellabar.structure;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.table.Inputs;

/**
 * An isentropic star found by shooting ({@link IsentropicStarFinder}) for its mass and anchor;
 * stability from {@link StabilityAnalysis} on the profile, sampled from the solution's dense
 * output with at least {@link StarBuildContext#STABILITY_POINTS} rows.
 */
public final class IsentropicStarBuilder implements StarModelBuilder<IsentropicRequest> {

    @Override
    public StarKind kind() {
        return StarKind.isentropic;
    }

    @Override
    public Class<IsentropicRequest> requestType() {
        return IsentropicRequest.class;
    }

    @Override
    public BuiltStar build(IsentropicRequest request, StarBuildContext shared) {
        IsentropicStar solution = find(request);
        boolean classical = request.electrons() == Electrons.classical;
        StarStructure structure = structure(solution, request.anchor(), request.points(), classical);
        StarStructure fine = request.points() >= StarBuildContext.STABILITY_POINTS ? structure
                : structure(solution, request.anchor(), StarBuildContext.STABILITY_POINTS, classical);
        StabilityResult stability = StabilityAnalysis.analyze(fine.stabilityProfile());
        double ratio = shared.standardModel().beta(structure.mass(), request.composition().mu()).oneMinusBeta();
        return new BuiltStar(structure, stability, ratio,
                "standard-model value 1 - beta(M, mu) for this M and mu; an isentropic star does not fix L",
                OptionalDouble.empty(), List.of());
    }

    /**
     * The stability of an integrated isentropic star, on at least
     * {@link StarBuildContext#STABILITY_POINTS} rows of its dense output: the one calculation the
     * builder and sequences of cores share.
     *
     * @param solution the star
     * @return ⟨Γ1⟩, the margins and R_crit
     */
    public static StabilityResult stabilityOf(IsentropicStar solution) {
        return StabilityAnalysis.analyze(structure(solution, new ScaleAnchor.CentralTemperature(solution.centre().T()),
                StarBuildContext.STABILITY_POINTS, false).stabilityProfile());
    }

    @Override
    public void describeInputs(IsentropicRequest request, Inputs.Builder inputs) {
        // fixed by M and its anchor alone, both described for every kind
    }

    @Override
    public String title(IsentropicRequest request) {
        return "isentropic";
    }

    private static IsentropicStar find(IsentropicRequest request) {
        if (request.electrons() != Electrons.classical) {
            DirectIsentropicStarFinder direct = new DirectIsentropicStarFinder(
                    request.electrons().inversions(request.composition()));
            ScaleAnchor anchor = request.anchor();
            if (anchor instanceof ScaleAnchor.Radius r) {
                return direct.withRadius(request.mass(), r.value());
            }
            if (anchor instanceof ScaleAnchor.CentralTemperature t) {
                return direct.withCentralTemperature(request.mass(), t.value());
            }
            return direct.withEntropy(request.mass(), anchor.value());
        }
        IsentropicStarFinder finder = new IsentropicStarFinder(new GasRadiationEos(request.composition()));
        ScaleAnchor anchor = request.anchor();
        if (anchor instanceof ScaleAnchor.Radius r) {
            return finder.withRadius(request.mass(), r.value());
        }
        if (anchor instanceof ScaleAnchor.CentralTemperature t) {
            return finder.withCentralTemperature(request.mass(), t.value());
        }
        return finder.withEntropy(request.mass(), anchor.value());
    }

    private static StarStructure structure(IsentropicStar solution, ScaleAnchor anchor, int points,
            boolean classical) {
        String constraint = anchor instanceof ScaleAnchor.Radius ? "M and R"
                : anchor instanceof ScaleAnchor.CentralTemperature ? "M and T_c" : "M and the entropy per baryon";
        StarProfile profile = solution.profile(points);
        double virial = 3.0 * solution.pressureVolumeIntegral() / -solution.gravitationalEnergy() - 1.0;
        return new StarStructure(solution.mass(), solution.radius(), solution.centre(), profile, false, virial,
                List.of(String.format(Locale.US, "isentropic star fixed by %s: hydrostatic equilibrium on one adiabat"
                                + " of the mixture (entropy per baryon %.10g k_B); beta varies with depth", constraint,
                        solution.centre().sPerBaryon()),
                        classical ? "found by shooting on ln((1-beta_c)/beta_c) for M (Brent), then scaling T_c: the"
                                + " adiabats map onto each other under T -> lambda T, rho -> lambda^3 rho, with M fixed"
                                + " and R ~ 1/T_c"
                                : "fermi EOS: found by shooting on ln rho_c for M (Brent; for a given R an outer solve on"
                                + " ln T_c), rho and T carried along the adiabat by d ln T = (Gamma3 - 1) d ln rho,"
                                + " d ln P = Gamma1 d ln rho",
                        String.format(Locale.US, "integrated outwards (Dormand-Prince 8(5,3), relative tolerance %.0e)"
                                + " to P = %.0e P_c at r_s = %.10g R; R from h(r_s) = GM(1/r_s - 1/R) along the"
                                + " adiabat (h = u + P/rho)", IsentropicStructureSolver.DEFAULT_TOLERANCE,
                                IsentropicStructureSolver.SURFACE_PRESSURE_FRACTION,
                                solution.stopRadius() / solution.radius()),
                        "profile rows evenly spaced in r from the centre to r_s (P = 1e-12 P_c); the surface row"
                                + " r = R, where rho = P = T = 0, is not tabulated (beta there tends to 1 only"
                                + " logarithmically in T)",
                        classical ? "T and rho at every row from the adiabat: (P, s) -> (rho, T)"
                                : "T and rho at every row from the integration's dense output"));
    }
}
