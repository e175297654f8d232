package org.stellabar.structure;

import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;
import org.stellabar.eos.EosStateSummary;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * The one schema of a star's headline numbers, declared once: every field with its name, unit and
 * description. One star becomes a {@link Summary} ({@code model --format json}, a star's JSON
 * file); many stars become a {@link Table} with the same names, units and values, one row per star
 * (a scenario's {@code summary.csv/json/fits}).
 *
 * <p>Units: masses, radii and luminosities in nominal solar units (IAU 2015 B3) under the plain
 * names {@code M}, {@code R}, {@code R_crit}, {@code L_Edd}, with the CGS values beside them as
 * {@code M_cgs}, {@code R_cgs}, {@code R_crit_cgs}, {@code L_Edd_cgs}; everything else CGS.
 * {@code R_crit} is 0 when ⟨Γ1⟩ ≤ 4/3 (no radius is stable; the verdict says unstable).
 */
public final class StarSchema {

    /** One field of the schema: a number with its unit, or text. */
    private sealed interface Entry permits NumberEntry, TextEntry {
    }

    private record NumberEntry(String name, String unit, String description, ToDoubleFunction<StarHeadline> value)
            implements Entry {
    }

    private record TextEntry(String name, String description, Function<StarHeadline, String> value)
            implements Entry {
    }

    /** Text of the index field for a star that is not a polytrope. */
    public static final String NO_INDEX = "none";

    private static final List<Entry> FIELDS = List.of(
            text("name", "star name", StarHeadline::name),
            text("kind", "kind of model: standard, polytrope or isentropic", s -> s.kind().word()),
            text("index", "polytropic index n (" + NO_INDEX + " for an isentropic star)",
                    s -> s.index().isPresent() ? Double.toString(s.index().getAsDouble()) : NO_INDEX),
            number("M", "Msun", "total mass in nominal solar masses", s -> s.mass() / SOLAR_MASS),
            number("M_cgs", "g", "total mass", StarHeadline::mass),
            number("R", "Rsun", "radius, where P = 0, in nominal solar radii", s -> s.radius() / SOLAR_RADIUS),
            number("R_cgs", "cm", "radius, where P = 0", StarHeadline::radius),
            number("mu", "", "mean molecular weight", s -> s.composition().mu()),
            number("X", "", "hydrogen mass fraction", s -> s.composition().X()),
            number("Z", "", "metal mass fraction", s -> s.composition().Z()),
            number("rho_c", "g/cm3", "central density", s -> s.centre().rho()),
            number("rho_mean", "g/cm3", "mean density 3M/(4 pi R^3)", StarHeadline::meanDensity),
            number("rho_c_over_mean", "", "central over mean density", StarHeadline::centralToMeanDensity),
            number("P_c", "dyn/cm2", "central pressure", s -> s.centre().P()),
            number("T_c", "K", "central temperature", s -> s.centre().T()),
            number("beta_c", "", "central gas pressure fraction P_gas/P", s -> s.centre().beta()),
            number("one_minus_beta_c", "", "central radiation pressure fraction P_rad/P",
                    s -> s.centre().oneMinusBeta()),
            number("Gamma1_c", "", "central first adiabatic exponent", s -> s.centre().Gamma1()),
            number("s_per_baryon_c", "", "central entropy per baryon in units of k_B (the same everywhere in an"
                    + " isentropic star)",
                    s -> s.centre().sPerBaryon()),
            number("Gamma1_mean", "", "pressure-weighted mean int(Gamma1 P dV)/int(P dV)",
                    s -> s.stability().meanGamma1()),
            number("newtonian_margin", "", "Gamma1_mean - 4/3 (negative: unstable)",
                    s -> s.stability().newtonianMargin()),
            number("K_gr", "", "structure constant K of the criterion Gamma1_mean - 4/3 > K 2GM/(Rc^2)",
                    s -> s.stability().relativisticCoefficient()),
            number("compactness", "", "2GM/(Rc^2)", s -> s.stability().compactness()),
            number("gr_threshold", "", "K 2GM/(Rc^2): the post-Newtonian threshold for Gamma1_mean - 4/3",
                    s -> s.stability().relativisticThreshold()),
            number("gr_margin", "", "Gamma1_mean - 4/3 - gr_threshold (negative: unstable in general relativity)",
                    s -> s.stability().relativisticMargin()),
            number("R_crit", "Rsun", "radius at the onset of instability, homologous contraction at fixed M;"
                    + " 0 when Gamma1_mean <= 4/3 (no radius is stable)",
                    s -> s.stability().criticalRadius().orElse(0.0) / SOLAR_RADIUS),
            number("R_crit_cgs", "cm", "R_crit in cm; 0 when Gamma1_mean <= 4/3",
                    s -> s.stability().criticalRadius().orElse(0.0)),
            text("verdict", "dynamical stability: stable, marginal (within 5 % of R_crit) or unstable",
                    s -> s.stability().verdict().word()),
            number("L_Edd", "Lsun", "Eddington luminosity 4 pi G M c/kappa_es, electron scattering, in nominal"
                    + " solar luminosities", s -> s.eddingtonLuminosity() / SOLAR_LUMINOSITY),
            number("L_Edd_cgs", "erg/s", "Eddington luminosity 4 pi G M c/kappa_es",
                    StarHeadline::eddingtonLuminosity),
            number("L_over_L_Edd", "", "L/L_Edd = 1 - beta of the standard model for this M and mu (the standard"
                    + " model's own; the other kinds do not fix L)", StarHeadline::luminosityRatio),
            number("virial_check", "", "3 int(P dV)/(-Omega) - 1, zero in hydrostatic equilibrium",
                    StarHeadline::virialCheck));

    /** Field of a star summary holding its profile table. */
    public static final String PROFILE_FIELD = ProfileTable.NAME;

    private StarSchema() {
    }

    /** @return the names of the schema's fields, in order */
    public static List<String> names() {
        List<String> names = new ArrayList<>();
        for (Entry e : FIELDS) {
            names.add(e instanceof NumberEntry n ? n.name() : ((TextEntry) e).name());
        }
        return names;
    }

    /**
     * One star as a summary: the schema's fields, then the composition and the central validity
     * warnings, and optionally the profile table.
     *
     * @param model the star
     * @param withProfile true to include the profile table as the last field
     * @return the summary, with the profile table's metadata
     */
    public static Summary summary(StarModel model, boolean withProfile) {
        StarHeadline s = model.headline();
        Metadata metadata = model.profile().metadata();
        Summary.Builder b = new Summary.Builder("model", metadata);
        for (Entry e : FIELDS) {
            if (e instanceof NumberEntry n) {
                b.number(n.name(), n.value().applyAsDouble(s), n.unit(), n.description());
            } else {
                TextEntry t = (TextEntry) e;
                b.text(t.name(), t.value().apply(s), t.description());
            }
        }
        b.nested("composition", EosStateSummary.composition(s.composition(), metadata), "the mixture")
                .summaries("warnings", EosStateSummary.warnings(s.centre().warnings(), metadata),
                        "where the idealized physics is doubtful at the centre");
        if (withProfile) {
            b.table(PROFILE_FIELD, model.profile(), "radial profile");
        }
        return b.build();
    }

    /**
     * Many stars as one table, one row per star, with the same fields as {@link #summary}.
     *
     * @param name the table's name
     * @param metadata what and from where
     * @param models the stars, in order
     * @return the table
     */
    public static Table table(String name, Metadata metadata, List<StarModel> models) {
        Table.Builder b = new Table.Builder(name, metadata);
        for (Entry e : FIELDS) {
            if (e instanceof NumberEntry n) {
                double[] column = new double[models.size()];
                for (int i = 0; i < column.length; i++) {
                    column[i] = n.value().applyAsDouble(models.get(i).headline());
                }
                b.number(n.name(), n.unit(), n.description(), column);
            } else {
                TextEntry t = (TextEntry) e;
                b.text(t.name(), t.description(), models.stream().map(m -> t.value().apply(m.headline())).toList());
            }
        }
        return b.build();
    }

    private static Entry number(String name, String unit, String description, ToDoubleFunction<StarHeadline> value) {
        return new NumberEntry(name, unit, description, value);
    }

    private static Entry text(String name, String description, Function<StarHeadline, String> value) {
        return new TextEntry(name, description, value);
    }
}
