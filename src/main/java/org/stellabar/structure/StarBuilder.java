package org.stellabar.structure;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Builds the physical star a {@link StarRequest} asks for: the structure (scaled polytrope,
 * standard model or isentropic star), its stability ({@link StabilityAnalysis}), its Eddington
 * luminosity, and the profile table with metadata saying how it was made.
 *
 * <p>Stability: the standard model has Γ1 the same everywhere and K = K₃, so its estimate comes
 * from {@link EddingtonStandardModel#model} in closed form; every other structure goes through
 * {@link StabilityAnalysis#analyze} on its profile out to R, sampled with at least
 * {@link #STABILITY_POINTS} rows whatever the table's rows.
 *
 * <p>L/L_Edd: 1 − β holds for the standard model under its assumptions (radiative equilibrium
 * with κη constant). A polytrope or an isentropic star does not fix its luminosity, so for those
 * the field holds the standard-model value 1 − β(M, μ) for the same M and μ, labelled as such.
 *
 * <p>Thread-safe: Lane-Emden solutions are cached per index in a concurrent map and shared (they
 * are immutable); everything else is built per call. Meant to be created once and asked for many
 * stars.
 */
public final class StarBuilder {

    /** Assumptions shared by every model, for metadata. */
    public static final List<String> PHYSICS = List.of(
            "fully ionized classical ideal gas of ions and electrons + black-body radiation at the same T",
            "no degeneracy, pair, Coulomb or partial-ionization corrections; Newtonian hydrostatics",
            "stability: pressure-weighted <Gamma1> against 4/3 (Newtonian) and 4/3 + K 2GM/(Rc^2)"
                    + " (post-Newtonian, Chandrasekhar 1964); marginal within 5 % of R_crit");

    /**
     * Fewest profile rows the stability integrals are computed on, whatever the table's rows: with
     * the fourth-order {@link ProfileQuadrature}, ⟨Γ1⟩ and K are then good to ~1e-9 (to ~1e-6 at
     * 200 rows, and off by per cent at a handful).
     */
    public static final int STABILITY_POINTS = 1001;

    private final LaneEmdenSolver laneEmden;
    private final EddingtonStandardModel standardModel;
    private final Map<Double, LaneEmdenSolution> solutions = new ConcurrentHashMap<>();

    /** A builder with the default Lane-Emden tolerance. */
    public StarBuilder() {
        this(new LaneEmdenSolver());
    }

    /**
     * @param laneEmden the Lane-Emden solver for polytropes
     */
    public StarBuilder(LaneEmdenSolver laneEmden) {
        this.laneEmden = Objects.requireNonNull(laneEmden, "laneEmden");
        this.standardModel = new EddingtonStandardModel(polytrope(3.0));
    }

    /** @return the standard model used for kind standard and for L/L_Edd of the other kinds */
    public EddingtonStandardModel standardModel() {
        return standardModel;
    }

    /**
     * Builds one star.
     *
     * @param request what to build
     * @return the model
     * @throws StarRequestException if the request has no solution (e.g. an isentropic star whose
     *     centre falls outside the range of the EOS, or that would be too compact to be static)
     * @throws org.stellabar.physics.ConvergenceException if an iteration exhausts its bound
     */
    public StarModel build(StarRequest request) {
        Composition composition = request.composition();
        GasRadiationEos eos = new GasRadiationEos(composition);
        StarStructure structure;
        StabilityResult stability;
        double lEdd = EddingtonStandardModel.eddingtonLuminosity(request.mass(), composition);
        double lRatio;
        String lMeaning;
        switch (request.kind()) {
            case standard -> {
                structure = new ScaledPolytropeStar(standardModel.polytrope(), eos).build(request.mass(),
                        request.radius(), request.points());
                StandardModelState state = standardModel.model(request.mass(), request.radius(), composition);
                stability = state.stability();
                lRatio = state.oneMinusBeta();
                lMeaning = "standard model: L/L_Edd = 1 - beta (radiative equilibrium, kappa_es eta constant)";
            }
            case polytrope -> {
                ScaledPolytropeStar star = new ScaledPolytropeStar(polytrope(request.index()), eos);
                structure = star.build(request.mass(), request.radius(), request.points());
                StarStructure fine = request.points() >= STABILITY_POINTS ? structure
                        : star.build(request.mass(), request.radius(), STABILITY_POINTS);
                stability = StabilityAnalysis.analyze(fine.stabilityProfile());
                lRatio = standardModel.beta(request.mass(), composition.mu()).oneMinusBeta();
                lMeaning = "standard-model value 1 - beta(M, mu) for this M and mu; a polytrope does not fix L";
            }
            case isentropic -> {
                IsentropicSolution solution = isentropicSolution(request, eos);
                structure = isentropic(solution, request, request.points());
                StarStructure fine = request.points() >= STABILITY_POINTS ? structure
                        : isentropic(solution, request, STABILITY_POINTS);
                stability = StabilityAnalysis.analyze(fine.stabilityProfile());
                lRatio = standardModel.beta(structure.mass(), composition.mu()).oneMinusBeta();
                lMeaning = "standard-model value 1 - beta(M, mu) for this M and mu; an isentropic star does not fix L";
            }
            default -> throw new IllegalStateException("unknown kind " + request.kind());
        }
        Metadata metadata = metadata(request, structure, lMeaning);
        double index = request.kind() == StarKind.isentropic ? Double.NaN : request.index();
        Table profile = ProfileTable.of(structure.profile(), structure.mass(), structure.radius(), index, metadata);
        StarSummary summary = new StarSummary(request.name(), request.kind(), index, structure.mass(),
                structure.radius(), composition, structure.centre(), stability, lEdd, lRatio, lMeaning,
                structure.virialCheck());
        return new StarModel(request, summary, structure, profile);
    }

    /**
     * The Lane-Emden solution of index n, solved once and cached.
     *
     * @param n polytropic index, 0 ≤ n &lt; 5
     * @return the solution
     */
    public LaneEmdenSolution polytrope(double n) {
        return solutions.computeIfAbsent(n, laneEmden::solve);
    }

    private static IsentropicSolution isentropicSolution(StarRequest request, GasRadiationEos eos) {
        IsentropicStar star = new IsentropicStar(eos);
        if (request.hasRadius()) {
            return star.withRadius(request.mass(), request.radius());
        }
        if (request.hasCentralTemperature()) {
            return star.withCentralTemperature(request.mass(), request.centralTemperature());
        }
        return star.withEntropy(request.mass(), request.entropyPerBaryon());
    }

    private static StarStructure isentropic(IsentropicSolution solution, StarRequest request, int points) {
        String constraint = request.hasRadius() ? "M and R"
                : request.hasCentralTemperature() ? "M and T_c" : "M and the entropy per baryon";
        StarProfile profile = solution.profile(points);
        double virial = 3.0 * solution.pressureVolumeIntegral() / -solution.gravitationalEnergy() - 1.0;
        return new StarStructure(solution.mass(), solution.radius(), solution.centre(), profile, false, virial,
                List.of(String.format(Locale.ROOT, "isentropic star fixed by %s: hydrostatic equilibrium on one adiabat"
                                + " of the mixture (entropy per baryon %.10g k_B); beta varies with depth", constraint,
                        solution.centre().sPerBaryon()),
                        "found by shooting on ln((1-beta_c)/beta_c) for M (Brent), then scaling T_c: the adiabats map"
                                + " onto each other under T -> lambda T, rho -> lambda^3 rho, with M fixed and R ~ 1/T_c",
                        String.format(Locale.ROOT, "integrated outwards (Dormand-Prince 8(5,3), relative tolerance %.0e)"
                                + " to P = %.0e P_c at r_s = %.10g R; R from h(r_s) = GM(1/r_s - 1/R) along the"
                                + " adiabat (h = u + P/rho)", IsentropicStructureSolver.DEFAULT_TOLERANCE,
                                IsentropicStructureSolver.SURFACE_PRESSURE_FRACTION,
                                solution.stopRadius() / solution.radius()),
                        "profile rows evenly spaced in r from the centre to r_s (P = 1e-12 P_c); the surface row"
                                + " r = R, where rho = P = T = 0, is not tabulated (beta there tends to 1 only"
                                + " logarithmically in T)",
                        "T and rho at every row from the adiabat: (P, s) -> (rho, T)"));
    }

    private static Metadata metadata(StarRequest request, StarStructure structure, String luminosityMeaning) {
        Inputs.Builder inputs = Inputs.builder().text("name", request.name()).text("kind", request.kind().name())
                .number("M", request.mass(), "g", "total mass")
                .number("M_Msun", twelveDigits(request.mass() / SOLAR_MASS), "Msun",
                        "total mass in nominal solar masses");
        if (request.hasRadius()) {
            inputs.number("R", request.radius(), "cm", "radius")
                    .number("R_Rsun", twelveDigits(request.radius() / SOLAR_RADIUS), "Rsun",
                            "radius in nominal solar radii");
        }
        if (request.kind() != StarKind.isentropic) {
            inputs.number("n", request.index(), "", "polytropic index");
        }
        if (request.hasCentralTemperature()) {
            inputs.number("T_c", request.centralTemperature(), "K", "central temperature");
        }
        if (request.hasEntropy()) {
            inputs.number("s_per_baryon", request.entropyPerBaryon(), "k_B", "entropy per baryon");
        }
        Composition c = request.composition();
        inputs.text("composition", c.fromMu() ? String.format(Locale.ROOT, "mu = %s", c.mu())
                : String.format(Locale.ROOT, "X = %s, Y = %s, Z = %s (mu = %.10g)", fraction(c.X()), fraction(c.Y()),
                        fraction(c.Z()), c.mu()));
        inputs.integer("points", request.points(), "profile rows");
        List<String> notes = new ArrayList<>(structure.notes());
        notes.addAll(PHYSICS);
        if (request.kind() == StarKind.standard) {
            notes.addAll(EddingtonStandardModel.ASSUMPTIONS);
        }
        notes.add("L/L_Edd: " + luminosityMeaning + "; L_Edd = 4 pi G M c/kappa_es, kappa_es = 0.2(1+X) cm2/g");
        String title = String.format(Locale.ROOT, "stellabar model: %s star, M = %.6g Msun, R = %.6g Rsun%s",
                request.kind() == StarKind.polytrope ? "polytrope n = " + request.index()
                        : request.kind() == StarKind.standard ? "standard-model" : "isentropic",
                structure.mass() / SOLAR_MASS, structure.radius() / SOLAR_RADIUS,
                request.name().equals(StarRequest.DEFAULT_NAME) ? "" : " (" + request.name() + ")");
        return Metadata.of(title, inputs.build(), notes);
    }

    /** A value in solar units to 12 significant digits: "40 Msun" reads 40.0, not 40.00000000000001. */
    private static double twelveDigits(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(12)).doubleValue();
    }

    /** A mass fraction to 12 significant digits: a derived Y or Z reads 0.02, not 0.020000000000000018. */
    private static String fraction(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(12)).stripTrailingZeros().toPlainString();
    }
}
