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
import org.stellabar.table.Quantity;
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

    private record NumberEntry(Quantity quantity, ToDoubleFunction<StarHeadline> value) implements Entry {
    }

    private record TextEntry(String name, String description, Function<StarHeadline, String> value)
            implements Entry {
    }

    /** Text field: the star's name. */
    public static final String NAME = "name";
    /** Text field: the kind of model. */
    public static final String KIND = "kind";
    /** Text field: the polytropic index, or {@link #NO_INDEX}. */
    public static final String INDEX = "index";
    /** Text field: stable, marginal or unstable. */
    public static final String VERDICT = "verdict";

    /** M [Msun] */
    public static final Quantity M = new Quantity("M", "Msun", "total mass in nominal solar masses");
    /** M_cgs [g] */
    public static final Quantity M_CGS = new Quantity("M_cgs", "g", "total mass");
    /** R [Rsun] */
    public static final Quantity R = new Quantity("R", "Rsun", "radius, where P = 0, in nominal solar radii");
    /** R_cgs [cm] */
    public static final Quantity R_CGS = new Quantity("R_cgs", "cm", "radius, where P = 0");
    /** mu [1] */
    public static final Quantity MU = new Quantity("mu", "", "mean molecular weight");
    /** X [1] */
    public static final Quantity X = new Quantity("X", "", "hydrogen mass fraction");
    /** Z [1] */
    public static final Quantity Z = new Quantity("Z", "", "metal mass fraction");
    /** rho_c [g/cm3] */
    public static final Quantity RHO_C = new Quantity("rho_c", "g/cm3", "central density");
    /** rho_mean [g/cm3] */
    public static final Quantity RHO_MEAN = new Quantity("rho_mean", "g/cm3", "mean density 3M/(4 pi R^3)");
    /** rho_c_over_mean [1] */
    public static final Quantity RHO_C_OVER_MEAN = new Quantity("rho_c_over_mean", "", "central over mean density");
    /** P_c [dyn/cm2] */
    public static final Quantity P_C = new Quantity("P_c", "dyn/cm2", "central pressure");
    /** T_c [K] */
    public static final Quantity T_C = new Quantity("T_c", "K", "central temperature");
    /** beta_c [1] */
    public static final Quantity BETA_C = new Quantity("beta_c", "", "central gas pressure fraction P_gas/P");
    /** one_minus_beta_c [1] */
    public static final Quantity ONE_MINUS_BETA_C = new Quantity("one_minus_beta_c", "", "central radiation pressure fraction P_rad/P");
    /** Gamma1_c [1] */
    public static final Quantity GAMMA1_C = new Quantity("Gamma1_c", "", "central first adiabatic exponent");
    /** s_per_baryon_c [1] */
    public static final Quantity S_PER_BARYON_C = new Quantity("s_per_baryon_c", "", "central entropy per baryon in units of k_B (the same everywhere in an"
                    + " isentropic star)");
    /** Gamma1_mean [1] */
    public static final Quantity GAMMA1_MEAN = new Quantity("Gamma1_mean", "", "pressure-weighted mean int(Gamma1 P dV)/int(P dV)");
    /** newtonian_margin [1] */
    public static final Quantity NEWTONIAN_MARGIN = new Quantity("newtonian_margin", "", "Gamma1_mean - 4/3 (negative: unstable)");
    /** K_gr [1] */
    public static final Quantity K_GR = new Quantity("K_gr", "", "structure constant K of the criterion Gamma1_mean - 4/3 > K 2GM/(Rc^2)");
    /** compactness [1] */
    public static final Quantity COMPACTNESS = new Quantity("compactness", "", "2GM/(Rc^2)");
    /** gr_threshold [1] */
    public static final Quantity GR_THRESHOLD = new Quantity("gr_threshold", "", "K 2GM/(Rc^2): the post-Newtonian threshold for Gamma1_mean - 4/3");
    /** gr_margin [1] */
    public static final Quantity GR_MARGIN = new Quantity("gr_margin", "", "Gamma1_mean - 4/3 - gr_threshold (negative: unstable in general relativity)");
    /** R_crit [Rsun] */
    public static final Quantity R_CRIT = new Quantity("R_crit", "Rsun", "radius at the onset of instability, homologous contraction at fixed M;"
                    + " 0 when Gamma1_mean <= 4/3 (no radius is stable)");
    /** R_crit_cgs [cm] */
    public static final Quantity R_CRIT_CGS = new Quantity("R_crit_cgs", "cm", "R_crit in cm; 0 when Gamma1_mean <= 4/3");
    /** L_Edd [Lsun] */
    public static final Quantity L_EDD = new Quantity("L_Edd", "Lsun", "Eddington luminosity 4 pi G M c/kappa_es, electron scattering, in nominal"
                    + " solar luminosities");
    /** L_Edd_cgs [erg/s] */
    public static final Quantity L_EDD_CGS = new Quantity("L_Edd_cgs", "erg/s", "Eddington luminosity 4 pi G M c/kappa_es");
    /** L_over_L_Edd [1] */
    public static final Quantity L_OVER_L_EDD = new Quantity("L_over_L_Edd", "", "L/L_Edd = 1 - beta of the standard model for this M and mu (the standard"
                    + " model's own; the other kinds do not fix L)");
    /** virial_check [1] */
    public static final Quantity VIRIAL_CHECK = new Quantity("virial_check", "", "3 int(P dV)/(-Omega) - 1, zero in hydrostatic equilibrium");

    /** Text of the index field for a star that is not a polytrope. */
    public static final String NO_INDEX = "none";

    private static final List<Entry> FIELDS = List.of(
            text(NAME, "star name", StarHeadline::name),
            text(KIND, "kind of model: standard, polytrope or isentropic", s -> s.kind().word()),
            text(INDEX, "polytropic index n (" + NO_INDEX + " for an isentropic star)",
                    s -> s.index().isPresent() ? Double.toString(s.index().getAsDouble()) : NO_INDEX),
            number(M, s -> s.mass() / SOLAR_MASS),
            number(M_CGS, StarHeadline::mass),
            number(R, s -> s.radius() / SOLAR_RADIUS),
            number(R_CGS, StarHeadline::radius),
            number(MU, s -> s.composition().mu()),
            number(X, s -> s.composition().X()),
            number(Z, s -> s.composition().Z()),
            number(RHO_C, s -> s.centre().rho()),
            number(RHO_MEAN, StarHeadline::meanDensity),
            number(RHO_C_OVER_MEAN, StarHeadline::centralToMeanDensity),
            number(P_C, s -> s.centre().P()),
            number(T_C, s -> s.centre().T()),
            number(BETA_C, s -> s.centre().beta()),
            number(ONE_MINUS_BETA_C, s -> s.centre().oneMinusBeta()),
            number(GAMMA1_C, s -> s.centre().Gamma1()),
            number(S_PER_BARYON_C, s -> s.centre().sPerBaryon()),
            number(GAMMA1_MEAN, s -> s.stability().meanGamma1()),
            number(NEWTONIAN_MARGIN, s -> s.stability().newtonianMargin()),
            number(K_GR, s -> s.stability().relativisticCoefficient()),
            number(COMPACTNESS, s -> s.stability().compactness()),
            number(GR_THRESHOLD, s -> s.stability().relativisticThreshold()),
            number(GR_MARGIN, s -> s.stability().relativisticMargin()),
            number(R_CRIT, s -> s.stability().criticalRadius().orElse(0.0) / SOLAR_RADIUS),
            number(R_CRIT_CGS, s -> s.stability().criticalRadius().orElse(0.0)),
            text(VERDICT, "dynamical stability: stable, marginal (within 5 % of R_crit) or unstable",
                    s -> s.stability().verdict().word()),
            number(L_EDD, s -> s.eddingtonLuminosity() / SOLAR_LUMINOSITY),
            number(L_EDD_CGS, StarHeadline::eddingtonLuminosity),
            number(L_OVER_L_EDD, StarHeadline::luminosityRatio),
            number(VIRIAL_CHECK, StarHeadline::virialCheck));

    /** Field of a star summary holding its profile table. */
    public static final String PROFILE_FIELD = ProfileTable.NAME;

    private StarSchema() {
    }

    /** @return the names of the schema's fields, in order */
    public static List<String> names() {
        List<String> names = new ArrayList<>();
        for (Entry e : FIELDS) {
            names.add(e instanceof NumberEntry n ? n.quantity().name() : ((TextEntry) e).name());
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
                b.number(n.quantity(), n.value().applyAsDouble(s));
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
                b.number(n.quantity(), column);
            } else {
                TextEntry t = (TextEntry) e;
                b.text(t.name(), t.description(), models.stream().map(m -> t.value().apply(m.headline())).toList());
            }
        }
        return b.build();
    }

    /**
     * One star's values of the schema as plain data, in schema order: what a table row holds, and
     * what a part of a sharded survey stores and a merge reads back.
     *
     * @param texts the text fields' values, in schema order
     * @param numbers the number fields' values, in schema order
     */
    public record Row(List<String> texts, double[] numbers) {
        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param texts the text fields' values, in schema order
         * @param numbers the number fields' values, in schema order
         */
        public Row {
            texts = List.copyOf(texts);
            numbers = numbers.clone();
        }

        /** @return a copy of the number fields' values */
        @Override
        public double[] numbers() {
            return numbers.clone();
        }
    }

    /** @return the names of the text fields, in schema order */
    public static List<String> textNames() {
        List<String> names = new ArrayList<>();
        for (Entry e : FIELDS) {
            if (e instanceof TextEntry t) {
                names.add(t.name());
            }
        }
        return names;
    }

    /** @return the number fields, in schema order */
    public static List<Quantity> numberQuantities() {
        List<Quantity> quantities = new ArrayList<>();
        for (Entry e : FIELDS) {
            if (e instanceof NumberEntry n) {
                quantities.add(n.quantity());
            }
        }
        return quantities;
    }

    /**
     * @param model a star
     * @return its values of the schema
     */
    public static Row row(StarModel model) {
        StarHeadline s = model.headline();
        List<String> texts = new ArrayList<>();
        List<Quantity> quantities = numberQuantities();
        double[] numbers = new double[quantities.size()];
        int k = 0;
        for (Entry e : FIELDS) {
            if (e instanceof NumberEntry n) {
                numbers[k++] = n.value().applyAsDouble(s);
            } else {
                texts.add(((TextEntry) e).value().apply(s));
            }
        }
        return new Row(texts, numbers);
    }

    /**
     * Adds the schema's columns for many stars' rows to a table, in schema order, with the
     * same names, units and descriptions as {@link #table}.
     *
     * @param builder the table being built
     * @param rows one row per star, in order
     * @param skip names of fields to leave out (e.g. the star's name where rows are not stars)
     */
    public static void addColumns(Table.Builder builder, List<Row> rows, java.util.Set<String> skip) {
        List<List<String>> texts = new ArrayList<>();
        for (int k = 0; k < textNames().size(); k++) {
            int field = k;
            texts.add(rows.stream().map(r -> r.texts().get(field)).toList());
        }
        List<double[]> numbers = new ArrayList<>();
        for (int k = 0; k < numberQuantities().size(); k++) {
            double[] column = new double[rows.size()];
            for (int i = 0; i < column.length; i++) {
                column[i] = rows.get(i).numbers[k];
            }
            numbers.add(column);
        }
        addColumns(builder, texts, numbers, skip);
    }

    /**
     * Adds the schema's columns, given column by column, to a table, in schema order.
     *
     * @param builder the table being built
     * @param texts the text fields' columns, in schema order
     * @param numbers the number fields' columns, in schema order
     * @param skip names of fields to leave out
     */
    public static void addColumns(Table.Builder builder, List<List<String>> texts, List<double[]> numbers,
            java.util.Set<String> skip) {
        int text = 0;
        int number = 0;
        for (Entry e : FIELDS) {
            if (e instanceof NumberEntry n) {
                double[] column = numbers.get(number++);
                if (!skip.contains(n.quantity().name())) {
                    builder.number(n.quantity(), column);
                }
            } else {
                TextEntry t = (TextEntry) e;
                List<String> column = texts.get(text++);
                if (!skip.contains(t.name())) {
                    builder.text(t.name(), t.description(), column);
                }
            }
        }
    }

    private static Entry number(Quantity quantity, ToDoubleFunction<StarHeadline> value) {
        return new NumberEntry(quantity, value);
    }

    private static Entry text(String name, String description, Function<StarHeadline, String> value) {
        return new TextEntry(name, description, value);
    }
}
