package org.stellabar.audit;

import java.util.List;
import java.util.OptionalDouble;
import org.stellabar.eos.EosQuantities;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StabilityResult;
import org.stellabar.structure.StarSchema;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * The star's audit as a {@link Summary}, with the field names of the command-line contract. Its
 * number fields are declared here once; the ones whose meaning depends on the profile (M and R
 * at the surface row or the outermost shell, β at the centre or not) get their description at
 * run time.
 */
public final class AuditSummary {

    /** The same column as {@link StarSchema#M}. */
    public static final Quantity M = StarSchema.M;
    /** The same column as {@link StarSchema#R}. */
    public static final Quantity R = StarSchema.R;
    /** {@code mu_mean}: 1/&lt;1/mu&gt; over mass; unit as {@link EosQuantities#MU}. */
    public static final Quantity MU_MEAN = EosQuantities.MU.withName("mu_mean").withDescription("1/<1/mu> over mass");
    /** {@code beta_centre}: {@link EosQuantities#BETA} under this name. */
    public static final Quantity BETA_CENTRE = EosQuantities.BETA.withName("beta_centre");
    /** {@code one_minus_beta_centre}: 1 - beta there, as P_rad/P, dimensionless. */
    public static final Quantity ONE_MINUS_BETA_CENTRE = Quantity.dimensionless("one_minus_beta_centre",
            "1 - beta there, as P_rad/P");
    /** {@code radiation_dominated_mass_fraction}: fraction of the mass where beta &lt; 1/2, dimensionless. */
    public static final Quantity RADIATION_DOMINATED_MASS_FRACTION = Quantity.dimensionless(
            "radiation_dominated_mass_fraction", "fraction of the mass where beta < 1/2");
    /** {@code beta_standard_model}: beta of the Eddington standard model with this M and mu_mean, dimensionless. */
    public static final Quantity BETA_STANDARD_MODEL = Quantity.dimensionless("beta_standard_model",
            "beta of the Eddington standard model with this M and mu_mean");
    /** {@code one_minus_beta_standard_model}: its 1 - beta, dimensionless. */
    public static final Quantity ONE_MINUS_BETA_STANDARD_MODEL =
            Quantity.dimensionless("one_minus_beta_standard_model", "its 1 - beta");
    /**
     * {@code Gamma1_mean}: pressure-weighted &lt;Gamma1&gt; = int Gamma1 P dV/int P dV, our Gamma1,
     * dimensionless.
     */
    public static final Quantity GAMMA1_MEAN = Quantity.dimensionless("Gamma1_mean",
            "pressure-weighted <Gamma1> = int Gamma1 P dV/int P dV, our Gamma1");
    /** {@code newtonian_margin}: &lt;Gamma1&gt; - 4/3 (negative: unstable), dimensionless. */
    public static final Quantity NEWTONIAN_MARGIN =
            Quantity.dimensionless("newtonian_margin", "<Gamma1> - 4/3 (negative: unstable)");
    /** {@code gr_margin}: &lt;Gamma1&gt; - 4/3 - K 2GM/(Rc^2), post-Newtonian (negative: unstable), dimensionless. */
    public static final Quantity GR_MARGIN = Quantity.dimensionless("gr_margin",
            "<Gamma1> - 4/3 - K 2GM/(Rc^2), post-Newtonian (negative: unstable)");
    /** {@code K}: structure constant K of the relativistic criterion, from the profile, dimensionless. */
    public static final Quantity K = Quantity.dimensionless("K",
            "structure constant K of the relativistic criterion, from the profile");
    /** {@code compactness}: 2GM/(Rc^2), dimensionless. */
    public static final Quantity COMPACTNESS = Quantity.dimensionless("compactness", "2GM/(Rc^2)");
    /** {@code R_over_R_crit}: R over the radius where homologous contraction turns unstable, dimensionless. */
    public static final Quantity R_OVER_R_CRIT = Quantity.dimensionless("R_over_R_crit",
            "R over the radius where homologous contraction turns unstable");
    /** {@code Gamma1_mean_profile}: pressure-weighted &lt;Gamma1&gt; with the profile's Gamma1, dimensionless. */
    public static final Quantity GAMMA1_MEAN_PROFILE = Quantity.dimensionless("Gamma1_mean_profile",
            "pressure-weighted <Gamma1> with the profile's Gamma1");
    /** {@code gr_margin_profile}: the post-Newtonian margin with the profile's Gamma1, dimensionless. */
    public static final Quantity GR_MARGIN_PROFILE = Quantity.dimensionless("gr_margin_profile",
            "the post-Newtonian margin with the profile's Gamma1");
    /** {@code virial_ratio}: 3 int P dV/|Omega|, Omega = -int G m/r dm, dimensionless. */
    public static final Quantity VIRIAL_RATIO =
            Quantity.dimensionless("virial_ratio", "3 int P dV/|Omega|, Omega = -int G m/r dm");
    /**
     * {@code virial_surface_term}: 4 pi R^3 P(R)/|Omega|: the virial ratio in equilibrium is 1 plus this,
     * dimensionless.
     */
    public static final Quantity VIRIAL_SURFACE_TERM = Quantity.dimensionless("virial_surface_term",
            "4 pi R^3 P(R)/|Omega|: the virial ratio in equilibrium is 1 plus this");
    /** {@code max_pressure_mismatch}: largest |P_profile/P_eos - 1|, dimensionless. */
    public static final Quantity MAX_PRESSURE_MISMATCH =
            Quantity.dimensionless("max_pressure_mismatch", "largest |P_profile/P_eos - 1|");
    /** {@code max_Gamma1_diff}: largest |Gamma1_profile - Gamma1_eos|, dimensionless. */
    public static final Quantity MAX_GAMMA1_DIFF =
            Quantity.dimensionless("max_Gamma1_diff", "largest |Gamma1_profile - Gamma1_eos|");
    /** {@code max_hydrostatic_residual}: largest |hydrostatic residual| (often at the surface), dimensionless. */
    public static final Quantity MAX_HYDROSTATIC_RESIDUAL = Quantity.dimensionless("max_hydrostatic_residual",
            "largest |hydrostatic residual| (often at the surface)");
    /**
     * {@code rms_hydrostatic_residual}: mass-weighted root-mean-square hydrostatic residual, first and last
     * shell left out, dimensionless.
     */
    public static final Quantity RMS_HYDROSTATIC_RESIDUAL = Quantity.dimensionless("rms_hydrostatic_residual",
            "mass-weighted root-mean-square hydrostatic residual, first and last shell left out");
    /** {@code max_mass_continuity_residual}: largest |(dm/dr)/(4 pi r^2 rho) - 1|, dimensionless. */
    public static final Quantity MAX_MASS_CONTINUITY_RESIDUAL = Quantity.dimensionless(
            "max_mass_continuity_residual", "largest |(dm/dr)/(4 pi r^2 rho) - 1|");

    private static final String WHERE_IT_OCCURS = "data row where it occurs";

    private AuditSummary() {
    }

    /**
     * @param audit an audit
     * @param metadata metadata
     * @param shells the per-shell table to include under "shells", or null to leave it out
     * @param forReading true to give flagged rows as compact ranges ("41-50, 63") and zones as
     *     one line each for people, false to give numbers and lists of integers for scripts
     * @return the summary
     */
    public static Summary of(ProfileAudit audit, Metadata metadata, Table shells, boolean forReading) {
        Summary.Builder b = new Summary.Builder("audit", metadata);
        profile(b, audit);
        star(b, audit.star());
        stability(b, audit.star());
        checks(b, audit.star(), forReading);
        b.summaries("zones", audit.star().zones().stream().map(z -> zone(z, metadata, forReading)).toList(),
                "runs of shells where the ideal gas + radiation description fails");
        b.summaries("skipped", audit.input().skipped().stream().map(r -> new Summary.Builder("skipped_row", metadata)
                .integer("row", r.row(), "data row").text("reason", r.where() + ": " + r.reason(),
                        "why it was left out").build()).toList(), "bad rows left out");
        if (shells != null) {
            b.table("shells", shells, "per-shell audit");
        }
        return b.build();
    }

    private static void profile(Summary.Builder b, ProfileAudit audit) {
        Profile p = audit.profile();
        b.text("source", p.source(), "the profile audited")
                .integer("shells_audited", audit.star().shells(), "shells audited")
                .integer("skipped_rows", audit.input().skipped().size(), "bad rows left out (--skip-bad-rows)")
                .integer("surface_row", p.hasSurface() ? p.surface().row() : 0,
                        "data row of the vacuum surface (rho or T = 0, P = 0), kept out of the shells; 0 if none")
                .text("order", p.surfaceFirst() ? "surface first" : "centre first", "order of the rows in the file");
    }

    private static void star(Summary.Builder b, StarAudit s) {
        String where = s.totals().closedBySurface() ? "at the surface row" : "at the outermost shell";
        put(b, M.withDescription("the star's mass, " + where + (s.massDerived() ? " (integrated from r and rho)" : "")),
                s.totals().mass(), Constants.SOLAR_MASS);
        put(b, R.withDescription("the star's radius, " + where
                + (s.radiusDerived() ? " (integrated from m and rho)" : "")), s.totals().radius(),
                Constants.SOLAR_RADIUS);
        put(b, MU_MEAN, s.totals().meanMu(), 1.0);
        b.number(BETA_CENTRE.withDescription(s.totals().reachesCentre() ? "beta at the centre"
                : "beta at the innermost shell"),
                s.centralBeta());
        b.number(ONE_MINUS_BETA_CENTRE, s.centralOneMinusBeta());
        put(b, RADIATION_DOMINATED_MASS_FRACTION, s.totals().radiationDominatedMassFraction(), 1.0);
        put(b, BETA_STANDARD_MODEL, s.totals().standardModelBeta(), 1.0);
        put(b, ONE_MINUS_BETA_STANDARD_MODEL, s.totals().standardModelOneMinusBeta(), 1.0);
    }

    private static void stability(Summary.Builder b, StarAudit s) {
        if (s.totals().stability().isPresent()) {
            StabilityResult st = s.totals().stability().get();
            b.number(GAMMA1_MEAN, st.meanGamma1()).number(NEWTONIAN_MARGIN, st.newtonianMargin())
                    .number(GR_MARGIN, st.relativisticMargin()).number(K, st.relativisticCoefficient())
                    .number(COMPACTNESS, st.compactness());
            if (st.criticalRadius().isPresent()) {
                b.number(R_OVER_R_CRIT, st.radiusOverCritical().getAsDouble());
            }
            b.text("stability", st.verdict().word(), "verdict with our Gamma1 (marginal within "
                    + Math.round(100 * st.marginalBand()) + " % of the threshold)");
        }
        if (s.totals().stabilityProfileGamma1().isPresent()) {
            StabilityResult st = s.totals().stabilityProfileGamma1().get();
            b.number(GAMMA1_MEAN_PROFILE, st.meanGamma1()).number(GR_MARGIN_PROFILE, st.relativisticMargin())
                    .text("stability_profile", st.verdict().word(), "verdict with the profile's Gamma1");
        }
        put(b, VIRIAL_RATIO, s.totals().virialRatio(), 1.0);
        put(b, VIRIAL_SURFACE_TERM, s.totals().surfacePressureTerm(), 1.0);
    }

    private static void checks(Summary.Builder b, StarAudit s, boolean forReading) {
        if (s.maxPressureMismatch().isPresent()) {
            b.number(MAX_PRESSURE_MISMATCH, s.maxPressureMismatch().getAsDouble())
                    .integer("max_pressure_mismatch_row", s.maxPressureMismatchRow(), WHERE_IT_OCCURS)
                    .number(AuditMetadata.TOLERANCE, s.tolerance());
            String flaggedMeaning = "data rows where |P_profile/P_eos - 1| exceeds the tolerance";
            if (forReading) {
                b.text("flagged_rows", ranges(s.flaggedRows()), flaggedMeaning);
            } else {
                b.integers("flagged_rows", s.flaggedRows().stream().map(Integer::longValue).toList(), flaggedMeaning);
            }
        }
        put(b, MAX_GAMMA1_DIFF, s.maxGamma1Difference(), 1.0);
        if (s.maxHydrostaticResidual().isPresent()) {
            b.number(MAX_HYDROSTATIC_RESIDUAL, s.maxHydrostaticResidual().getAsDouble())
                    .integer("max_hydrostatic_residual_row", s.maxHydrostaticResidualRow(), WHERE_IT_OCCURS);
        }
        put(b, RMS_HYDROSTATIC_RESIDUAL, s.rmsHydrostaticResidual(), 1.0);
        put(b, MAX_MASS_CONTINUITY_RESIDUAL, s.maxMassContinuityResidual(), 1.0);
    }

    private static void put(Summary.Builder b, Quantity q, OptionalDouble value, double unitFactor) {
        if (value.isPresent()) {
            b.number(q, value.getAsDouble() / unitFactor);
        }
    }

    /**
     * A zone: for scripts its rows, shells and mass fractions as numbers; for a terminal one line
     * each, "code: rows a-b: m/M x-y: message".
     */
    private static Summary zone(FailureZone z, Metadata metadata, boolean forReading) {
        boolean one = z.firstRow() == z.lastRow();
        String rows = one ? String.valueOf(z.firstRow()) : z.firstRow() + "-" + z.lastRow();
        Summary.Builder b = new Summary.Builder("zone", metadata).text("code", z.regime().code(), "what fails")
                .text("rows", forReading ? (one ? "row " : "rows ") + rows : rows, "data rows of the run");
        if (forReading && z.hasMassFractions()) {
            String inner = AuditReport.num(z.innerMassFraction());
            String outer = AuditReport.num(z.outerMassFraction());
            b.text("mass", "m/M " + (inner.equals(outer) ? inner : inner + "-" + outer), "where in mass");
        } else if (!forReading) {
            b.integer("first_row", z.firstRow(), "smallest data row of the run")
                    .integer("last_row", z.lastRow(), "largest data row of the run")
                    .integer("shells", z.shells(), "shells in the run");
            if (z.hasMassFractions()) {
                b.number("m_over_M_inner", z.innerMassFraction(), "", "m/M at the run's inner edge")
                        .number("m_over_M_outer", z.outerMassFraction(), "", "m/M at the run's outer edge");
            }
        }
        return b.text("message", z.message(), "the warning at the run's innermost shell").build();
    }

    /**
     * Row numbers as compact ranges for reading, e.g. "41-50, 63".
     *
     * @param rows ascending row numbers
     * @return the ranges, or "none"
     */
    public static String ranges(List<Integer> rows) {
        if (rows.isEmpty()) {
            return "none";
        }
        StringBuilder s = new StringBuilder();
        int start = rows.get(0);
        int prev = start;
        for (int k = 1; k <= rows.size(); k++) {
            int next = k < rows.size() ? rows.get(k) : Integer.MIN_VALUE;
            if (next != prev + 1) {
                s.append(s.length() > 0 ? ", " : "").append(start == prev ? String.valueOf(start) : start + "-" + prev);
                start = next;
            }
            prev = next;
        }
        return s.toString();
    }
}
