package org.stellabar.observed;

import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.stellabar.structure.StarSchema;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * The columns of the observed-star table and the fields of its JSON, declared once. Units follow
 * the star summary ({@link StarSchema}): M, R and L in nominal solar units (IAU 2015), the centre in
 * CGS; the shared quantities are {@link StarSchema}'s own constants.
 *
 * <p>The table holds the stars with an estimate; the JSON holds every row under {@code stars},
 * a row without an estimate with its name, row number and {@code errors} only. When any star has
 * catalogue errors, every {@link SpreadQuantity} gains three columns ({@code _p16},
 * {@code _median}, {@code _p84}); a star without errors repeats its value in all three.
 */
public final class ObservedSchema {

    /** Field and column of the star's identifier. */
    public static final String NAME = "name";
    /** Field and column of where the mass came from. */
    public static final String MASS_SOURCE = "mass_source";
    /** Field of each star's problems. */
    public static final String ERRORS = "errors";
    /** Field of the stars in the JSON. */
    public static final String STARS = "stars";

    /** row [1] */
    public static final Quantity ROW = Quantity.integer("row", "data row of the catalogue, counted from 1 after the header");
    /** L [Lsun] */
    public static final Quantity L = new Quantity("L", "Lsun", "luminosity in nominal solar luminosities");
    /** Teff [K] */
    public static final Quantity TEFF = new Quantity("Teff", "K", "effective temperature");
    /** M [Msun] */
    public static final Quantity M = StarSchema.M.withDescription("mass in nominal solar masses (see mass_source)");
    /** R [Rsun] */
    public static final Quantity R = StarSchema.R.withDescription("radius in nominal solar radii (Stefan-Boltzmann where not given)");
    /** log_g [1] */
    public static final Quantity LOG_G = Quantity.dimensionless("log_g", "log10 of the surface gravity GM/R^2 in cm/s2");
    /** L_Edd [Lsun] */
    public static final Quantity L_EDD = StarSchema.L_EDD;
    /** Gamma_e [1] */
    public static final Quantity GAMMA_E = Quantity.dimensionless("Gamma_e",
            "Eddington factor L/L_Edd = kappa_es L/(4 pi G M c), kappa_es = 0.2(1+X) cm2/g");
    /** beta_standard [1] */
    public static final Quantity BETA_STANDARD = Quantity.dimensionless("beta_standard",
            "gas pressure fraction of the standard model of this M and mu");
    /** one_minus_beta_standard [1] */
    public static final Quantity ONE_MINUS_BETA_STANDARD = Quantity.dimensionless("one_minus_beta_standard",
            "1 - beta of the standard model: its L/L_Edd");
    /** Gamma_e_over_one_minus_beta [1] */
    public static final Quantity GAMMA_E_OVER_ONE_MINUS_BETA = Quantity.dimensionless("Gamma_e_over_one_minus_beta",
            "observed Gamma_e over the standard model's L/L_Edd = 1 - beta");
    /** M_from_L [Msun] */
    public static final Quantity M_FROM_L = new Quantity("M_from_L", "Msun",
            "mass of the standard model with this L (model-dependent estimate) in nominal solar masses");
    /** rho_c [g/cm3] */
    public static final Quantity RHO_C = StarSchema.RHO_C.withDescription("central density of the standard model scaled to (M, R)");
    /** T_c [K] */
    public static final Quantity T_C = StarSchema.T_C.withDescription("central temperature of the standard model scaled to (M, R)");
    /** P_c [dyn/cm2] */
    public static final Quantity P_C = StarSchema.P_C.withDescription("central pressure of the standard model scaled to (M, R)");
    /** Gamma1_mean [1] */
    public static final Quantity GAMMA1_MEAN = StarSchema.GAMMA1_MEAN;
    /** newtonian_margin [1] */
    public static final Quantity NEWTONIAN_MARGIN = StarSchema.NEWTONIAN_MARGIN;
    /** gr_margin [1] */
    public static final Quantity GR_MARGIN = StarSchema.GR_MARGIN;
    /** mu [1] */
    public static final Quantity MU = StarSchema.MU;
    /** X [1] */
    public static final Quantity X = StarSchema.X;
    /** Z [1] */
    public static final Quantity Z = StarSchema.Z;

    private record Entry(Quantity quantity, ToDoubleFunction<ObservedEstimate> value) {
    }

    private record SpreadEntry(Quantity quantity, SpreadQuantity spread, double scale) {
    }

    private static final List<Entry> ENTRIES = List.of(
            new Entry(L, e -> e.luminosity() / SOLAR_LUMINOSITY),
            new Entry(TEFF, ObservedEstimate::temperature),
            new Entry(M, e -> e.mass() / SOLAR_MASS),
            new Entry(R, e -> e.radius() / SOLAR_RADIUS),
            new Entry(LOG_G, ObservedEstimate::logGravity),
            new Entry(L_EDD, e -> e.eddingtonLuminosity() / SOLAR_LUMINOSITY),
            new Entry(GAMMA_E, ObservedEstimate::eddingtonFactor),
            new Entry(BETA_STANDARD, e -> e.standard().beta()),
            new Entry(ONE_MINUS_BETA_STANDARD, e -> e.standard().oneMinusBeta()),
            new Entry(GAMMA_E_OVER_ONE_MINUS_BETA, ObservedEstimate::eddingtonFactorOverModel),
            new Entry(M_FROM_L, e -> e.massFromLuminosity() / SOLAR_MASS),
            new Entry(RHO_C, e -> e.standard().centralDensity()),
            new Entry(T_C, e -> e.standard().centralTemperature()),
            new Entry(P_C, e -> e.standard().centralPressure()),
            new Entry(GAMMA1_MEAN, e -> e.standard().stability().meanGamma1()),
            new Entry(NEWTONIAN_MARGIN, e -> e.standard().stability().newtonianMargin()),
            new Entry(GR_MARGIN, e -> e.standard().stability().relativisticMargin()),
            new Entry(MU, e -> e.standard().composition().mu()),
            new Entry(X, e -> e.standard().composition().X()),
            new Entry(Z, e -> e.standard().composition().Z()));

    private static final List<SpreadEntry> SPREADS = List.of(
            new SpreadEntry(GAMMA_E, SpreadQuantity.GAMMA_E, 1.0),
            new SpreadEntry(R, SpreadQuantity.RADIUS, 1.0 / SOLAR_RADIUS),
            new SpreadEntry(LOG_G, SpreadQuantity.LOG_G, 1.0),
            new SpreadEntry(M, SpreadQuantity.MASS, 1.0 / SOLAR_MASS),
            new SpreadEntry(BETA_STANDARD, SpreadQuantity.BETA, 1.0),
            new SpreadEntry(ONE_MINUS_BETA_STANDARD, SpreadQuantity.ONE_MINUS_BETA, 1.0),
            new SpreadEntry(GAMMA_E_OVER_ONE_MINUS_BETA, SpreadQuantity.GAMMA_E_OVER_ONE_MINUS_BETA, 1.0),
            new SpreadEntry(RHO_C, SpreadQuantity.RHO_C, 1.0),
            new SpreadEntry(T_C, SpreadQuantity.T_C, 1.0),
            new SpreadEntry(P_C, SpreadQuantity.P_C, 1.0),
            new SpreadEntry(GAMMA1_MEAN, SpreadQuantity.GAMMA1_MEAN, 1.0),
            new SpreadEntry(NEWTONIAN_MARGIN, SpreadQuantity.NEWTONIAN_MARGIN, 1.0),
            new SpreadEntry(GR_MARGIN, SpreadQuantity.GR_MARGIN, 1.0));

    private static final String[] SUFFIXES = {"_p16", "_median", "_p84"};

    private ObservedSchema() {
    }

    /**
     * One row per star with an estimate, in catalogue order.
     *
     * @param name the table's name
     * @param metadata what and from where
     * @param outcomes every row's outcome (rows without an estimate are left out)
     * @return the table
     */
    public static Table table(String name, Metadata metadata, List<StarOutcome> outcomes) {
        List<StarOutcome> good = outcomes.stream().filter(StarOutcome::estimated).toList();
        Table.Builder b = new Table.Builder(name, metadata);
        b.text(NAME, "the star's identifier from the catalogue", good.stream().map(o -> o.star().name()).toList());
        b.number(ROW, good.stream().mapToDouble(o -> o.star().row()).toArray());
        for (Entry e : ENTRIES) {
            b.number(e.quantity(), good.stream().mapToDouble(o -> e.value().applyAsDouble(o.estimate().orElseThrow())).toArray());
        }
        b.text(MASS_SOURCE, "where M came from: catalogue, log_g (M = g R^2/G) or standard_model_L (M_from_L)",
                good.stream().map(o -> o.estimate().orElseThrow().massSource().name()).toList());
        if (good.stream().anyMatch(o -> o.spread().isPresent())) {
            for (SpreadEntry s : SPREADS) {
                for (int k = 0; k < 3; k++) {
                    int which = k;
                    b.number(spreadQuantity(s, which), good.stream().mapToDouble(o -> spreadValue(o, s, which)).toArray());
                }
            }
        }
        return b.build();
    }

    /**
     * Every row as one object under {@code stars}, with the counts.
     *
     * @param name the summary's name
     * @param metadata what and from where
     * @param outcomes every row's outcome
     * @return the summary
     */
    public static Summary summary(String name, Metadata metadata, List<StarOutcome> outcomes) {
        List<Summary> stars = new ArrayList<>();
        for (StarOutcome o : outcomes) {
            stars.add(star(o, metadata));
        }
        long estimated = outcomes.stream().filter(StarOutcome::estimated).count();
        return new Summary.Builder(name, metadata)
                .integer("rows", outcomes.size(), "catalogue rows read")
                .integer("estimated", estimated, "rows with an estimate")
                .integer("bad_rows", outcomes.size() - estimated, "rows without an estimate (see each star's errors)")
                .summaries(STARS, stars, "one object per catalogue row")
                .build();
    }

    private static Summary star(StarOutcome o, Metadata metadata) {
        Summary.Builder b = new Summary.Builder("star", metadata)
                .text(NAME, o.star().name(), "the star's identifier from the catalogue")
                .integer(ROW.name(), o.star().row(), ROW.description());
        o.estimate().ifPresent(e -> {
            for (Entry entry : ENTRIES) {
                b.number(entry.quantity(), entry.value().applyAsDouble(e));
            }
            b.text(MASS_SOURCE, e.massSource().name(), "where M came from");
        });
        o.spread().ifPresent(s -> {
            Summary.Builder u = new Summary.Builder("uncertainty", metadata)
                    .integer("samples", s.samples(), "Monte Carlo draws (fixed seed)")
                    .integer("failed_samples", s.failedSamples(), "draws without an estimate, left out");
            for (SpreadEntry entry : SPREADS) {
                for (int k = 0; k < 3; k++) {
                    u.number(spreadQuantity(entry, k), spreadValue(o, entry, k));
                }
            }
            b.nested("uncertainty", u.build(), "median and 16th/84th percentiles of the Monte Carlo draws");
        });
        List<Summary> errors = new ArrayList<>();
        for (StarProblem p : o.problems()) {
            errors.add(new Summary.Builder("error", metadata).text("code", p.kind().name(), "kind of problem")
                    .text("message", p.message(), "what is wrong and what is allowed").build());
        }
        b.summaries(ERRORS, errors, "why the row has no estimate (empty when it has one)");
        return b.build();
    }

    private static Quantity spreadQuantity(SpreadEntry s, int which) {
        String[] words = {"16th percentile", "median", "84th percentile"};
        return new Quantity(s.quantity().name() + SUFFIXES[which], s.quantity().unit(),
                words[which] + " of " + s.quantity().name() + " over the Monte Carlo draws (the value itself without errors)");
    }

    private static double spreadValue(StarOutcome o, SpreadEntry s, int which) {
        if (o.spread().isEmpty()) {
            return s.spread().of(o.estimate().orElseThrow()) * s.scale();
        }
        Percentiles p = o.spread().get().of(s.spread());
        double v = which == 0 ? p.p16() : which == 1 ? p.median() : p.p84();
        return v * s.scale();
    }
}
