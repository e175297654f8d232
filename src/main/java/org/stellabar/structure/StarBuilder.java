package org.stellabar.structure;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.fermi.FermiEosSummary;
import org.stellabar.table.Inputs;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Builds the physical star a {@link StarRequest} asks for: the kind's {@link StarModelBuilder}
 * makes the structure, its stability and its luminosity ratio; this class adds what every kind
 * shares: the Eddington luminosity, the profile table, the metadata and the headline numbers.
 *
 * <p>Kinds are registered in {@link #BUILDERS}, one line each: a new kind is one request record,
 * one builder class and its line here.
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

    /** Assumptions of models on the fermi equation of state, for metadata. */
    public static final List<String> FERMI_PHYSICS = List.of(
            "equation of state: fermi (classical ions, electrons of any degeneracy and relativity with e+e- pairs"
                    + " in equilibrium through the Fermi-Dirac integrals, black-body radiation at the same T)",
            "energy convention: " + FermiEosSummary.ENERGY_CONVENTION,
            "no Coulomb or partial-ionization corrections; Newtonian hydrostatics",
            "stability: pressure-weighted <Gamma1> (pair softening included) against 4/3 (Newtonian) and"
                    + " 4/3 + K 2GM/(Rc^2) (post-Newtonian, Chandrasekhar 1964); marginal within 5 % of R_crit");

    /** One builder per kind. */
    private static final Map<StarKind, StarModelBuilder<?>> BUILDERS = register(
            new StandardModelBuilder(),
            new PolytropeStarBuilder(),
            new IsentropicStarBuilder());

    private final LaneEmdenSolver laneEmden;
    private final Map<Double, LaneEmdenSolution> solutions = new ConcurrentHashMap<>();
    private final StarBuildContext shared;

    /** A builder with the default Lane-Emden tolerance. */
    public StarBuilder() {
        this(new LaneEmdenSolver());
    }

    /**
     * @param laneEmden the Lane-Emden solver for polytropes
     */
    public StarBuilder(LaneEmdenSolver laneEmden) {
        this.laneEmden = Objects.requireNonNull(laneEmden, "laneEmden");
        this.shared = new StarBuildContext(this::polytrope, new EddingtonStandardModel(polytrope(3.0)));
    }

    /** @return the standard model used for kind standard and for L/L_Edd of the other kinds */
    public EddingtonStandardModel standardModel() {
        return shared.standardModel();
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
        return build(BUILDERS.get(request.kind()), request);
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

    private <R extends StarRequest> StarModel build(StarModelBuilder<R> kindBuilder, StarRequest request) {
        R typed = kindBuilder.requestType().cast(request);
        BuiltStar built = kindBuilder.build(typed, shared);
        StarStructure structure = built.structure();
        Composition composition = request.composition();
        double lEdd = EddingtonStandardModel.eddingtonLuminosity(request.mass(), composition);
        Metadata metadata = metadata(kindBuilder, typed, built);
        Table profile = ProfileTable.of(structure.profile(), structure.mass(), structure.radius(),
                built.polytropeIndex().orElse(Double.NaN), metadata);
        StarHeadline headline = new StarHeadline(request.name(), request.kind(), built.polytropeIndex(),
                structure.mass(), structure.radius(), composition, structure.centre(), built.stability(), lEdd,
                built.luminosityRatio(), built.luminosityRatioMeaning(), structure.virialCheck());
        return new StarModel(request, headline, structure, profile);
    }

    private static <R extends StarRequest> Metadata metadata(StarModelBuilder<R> kindBuilder, R request,
            BuiltStar built) {
        StarStructure structure = built.structure();
        Inputs.Builder inputs = Inputs.builder().text("name", request.name()).text("kind", request.kind().word())
                .number("M", request.mass(), "g", "total mass")
                .number("M_Msun", twelveDigits(request.mass() / SOLAR_MASS), "Msun",
                        "total mass in nominal solar masses");
        describeAnchor(request.anchor(), inputs);
        kindBuilder.describeInputs(request, inputs);
        Composition c = request.composition();
        inputs.text("composition", c.fromMu() ? String.format(Locale.US, "mu = %s (%s)", c.mu(), c.muImplication())
                : String.format(Locale.US, "X = %s, Y = %s, Z = %s (mu = %.10g)", fraction(c.X()), fraction(c.Y()),
                        fraction(c.Z()), c.mu()));
        inputs.integer("points", request.points(), "profile rows");
        List<String> notes = new ArrayList<>(structure.notes());
        if (request.electrons() == Electrons.classical) {
            notes.addAll(PHYSICS);
        } else {
            // the classical runs' metadata stays as it was: the choice is written where it differs
            inputs.text("electrons", request.electrons().name());
            notes.addAll(FERMI_PHYSICS);
        }
        notes.addAll(built.assumptions());
        notes.add("L/L_Edd: " + built.luminosityRatioMeaning()
                + "; L_Edd = 4 pi G M c/kappa_es, kappa_es = 0.2(1+X) cm2/g");
        String title = String.format(Locale.US, "stellabar model: %s star, M = %.6g Msun, R = %.6g Rsun%s",
                kindBuilder.title(request), structure.mass() / SOLAR_MASS, structure.radius() / SOLAR_RADIUS,
                request.name().equals(StarRequest.DEFAULT_NAME) ? "" : " (" + request.name() + ")");
        return Metadata.of(title, inputs.build(), notes);
    }

    /** A value in solar units to 12 significant digits: "40 Msun" reads 40.0, not 40.00000000000001. */
    private static double twelveDigits(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(12)).doubleValue();
    }

    /** What fixes the scale besides M, as metadata shows it (a radius in cm and solar radii). */
    private static void describeAnchor(ScaleAnchor anchor, Inputs.Builder inputs) {
        if (anchor instanceof ScaleAnchor.Radius r) {
            inputs.number("R", r.value(), "cm", "radius")
                    .number("R_Rsun", twelveDigits(r.value() / SOLAR_RADIUS), "Rsun", "radius in nominal solar radii");
        } else if (anchor instanceof ScaleAnchor.CentralTemperature t) {
            inputs.number("T_c", t.value(), "K", "central temperature");
        } else {
            inputs.number("s_per_baryon", anchor.value(), "", "entropy per baryon s m_u/k_B");
        }
    }

    /** A mass fraction to 12 significant digits: a derived Y or Z reads 0.02, not 0.020000000000000018. */
    private static String fraction(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(12)).stripTrailingZeros().toPlainString();
    }

    private static Map<StarKind, StarModelBuilder<?>> register(StarModelBuilder<?>... builders) {
        Map<StarKind, StarModelBuilder<?>> map = new EnumMap<>(StarKind.class);
        for (StarModelBuilder<?> b : builders) {
            map.put(b.kind(), b);
        }
        if (map.size() != StarKind.values().length) {
            throw new IllegalStateException("a star kind has no builder: " + map.keySet());
        }
        return map;
    }
}
