package org.stellabar.audit;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.stellabar.eos.ValidityWarning.Regime;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StabilityResult;
import org.stellabar.table.Column;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * Presents an audit as a per-shell {@link Table} (in the file's row order, every input column
 * kept) and a {@link Summary} with the field names of the command-line contract.
 */
public final class AuditTables {

    /** Names of the audit's own per-shell columns; an input column of the same name gets "_profile". */
    static final List<String> OWN_COLUMNS = List.of("row", "m_over_M", "r_over_R", "P_eos", "P_gas", "P_rad", "beta",
            "one_minus_beta", "Gamma1_eos", "nabla_ad", "sound_speed", "P_rel_diff", "Gamma1_diff",
            "hydrostatic_residual", "mass_continuity_residual", "warnings");

    private AuditTables() {
    }

    /**
     * @param audit an audit
     * @param inputs how the audit was asked for
     * @return metadata with every assumption as a note
     */
    public static Metadata metadata(ProfileAudit audit, Map<String, String> inputs) {
        return Metadata.of("audit of " + audit.profile().source() + " against ideal gas + radiation physics", inputs,
                AuditAssumptions.of(audit));
    }

    /**
     * One row per audited shell, in the file's order: the data-row number, every input column as
     * written, then ours.
     *
     * @param audit an audit
     * @param metadata metadata for the table
     * @return the table
     */
    public static Table shells(ProfileAudit audit, Metadata metadata) {
        Profile p = audit.profile();
        ShellAudit s = audit.shells();
        int n = p.size();
        boolean flip = p.surfaceFirst();
        Table.Builder b = new Table.Builder("audit_shells", metadata);
        int[] rows = p.rows();
        double[] rowNumbers = new double[n];
        for (int i = 0; i < n; i++) {
            rowNumbers[i] = rows[i];
        }
        b.number("row", "", "data-row number in the input file (1 after the header, comments not counted)",
                order(rowNumbers, flip));
        Set<String> taken = new HashSet<>(OWN_COLUMNS);
        for (Column c : audit.input().inputColumns()) {
            String name = c.name();
            while (taken.contains(name)) {
                name = name + "_profile";
            }
            taken.add(name);
            if (c instanceof NumberColumn num) {
                // input columns are already in file order
                b.number(name, num.unit(), num.description(), num.values());
            } else {
                b.text(name, c.description(), ((TextColumn) c).values());
            }
        }
        double[] mass = s.massFraction();
        double[] radius = s.radiusFraction();
        if (mass != null) {
            b.number("m_over_M", "", "enclosed mass over the star's mass M"
                    + (audit.star().massDerived() ? " (integrated from r and rho)" : ""), order(mass, flip));
        }
        if (radius != null) {
            b.number("r_over_R", "", "radius over the star's radius R"
                    + (audit.star().radiusDerived() ? " (integrated from m and rho)" : ""), order(radius, flip));
        }
        b.number("P_eos", "dyn/cm2", "our total pressure P_gas + P_rad at the profile's rho, T, composition",
                order(s.P(), flip));
        b.number("P_gas", "dyn/cm2", "ion + electron pressure rho k T/(mu m_u)", order(s.Pgas(), flip));
        b.number("P_rad", "dyn/cm2", "radiation pressure aT^4/3", order(s.Prad(), flip));
        b.number("beta", "", "gas pressure fraction P_gas/P_eos", order(s.beta(), flip));
        b.number("one_minus_beta", "", "radiation pressure fraction P_rad/P_eos", order(s.oneMinusBeta(), flip));
        b.number("Gamma1_eos", "", "our first adiabatic exponent", order(s.gamma1(), flip));
        b.number("nabla_ad", "", "our adiabatic gradient (dlnT/dlnP)_s", order(s.nablaAd(), flip));
        b.number("sound_speed", "cm/s", "our adiabatic sound speed sqrt(Gamma1 P/rho)", order(s.soundSpeed(), flip));
        if (s.pressureMismatch() != null) {
            b.number("P_rel_diff", "", "P_profile/P_eos - 1", order(s.pressureMismatch(), flip));
        }
        if (s.gamma1Difference() != null) {
            b.number("Gamma1_diff", "", "Gamma1_profile - Gamma1_eos", order(s.gamma1Difference(), flip));
        }
        if (s.hydrostaticResidual() != null) {
            b.number("hydrostatic_residual", "", "(dP/dr + G m rho/r^2)/(G m rho/r^2), three-point differences",
                    order(s.hydrostaticResidual(), flip));
        }
        if (s.massContinuityResidual() != null) {
            b.number("mass_continuity_residual", "", "(dm/dr)/(4 pi r^2 rho) - 1, three-point differences in r^3",
                    order(s.massContinuityResidual(), flip));
        }
        int[] masks = s.warnings();
        List<String> codes = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            List<String> list = new ArrayList<>();
            for (Regime r : Regime.values()) {
                if ((masks[i] & r.bit()) != 0) {
                    list.add(r.code());
                }
            }
            codes.add(String.join(";", list));
        }
        if (flip) {
            java.util.Collections.reverse(codes);
        }
        b.text("warnings", "validity warning codes at this shell, ';'-separated", codes);
        return b.build();
    }

    /** Centre-first arrays back into the file's order. */
    private static double[] order(double[] centreFirst, boolean flip) {
        if (!flip) {
            return centreFirst;
        }
        double[] out = new double[centreFirst.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = centreFirst[out.length - 1 - i];
        }
        return out;
    }

    /**
     * The star's summary.
     *
     * @param audit an audit
     * @param metadata metadata
     * @param shells the per-shell table to include under "shells", or null to leave it out
     * @param forReading true to give flagged rows as compact ranges ("41-50, 63") for people,
     *     false to give them as a list of integers for scripts
     * @return the summary
     */
    public static Summary summary(ProfileAudit audit, Metadata metadata, Table shells, boolean forReading) {
        StarAudit s = audit.star();
        LoadedProfile in = audit.input();
        Summary.Builder b = new Summary.Builder("audit", metadata)
                .text("source", audit.profile().source(), "the profile audited")
                .integer("shells_audited", s.shells(), "shells audited")
                .integer("skipped_rows", in.skipped().size(), "bad rows left out (--skip-bad-rows)")
                .integer("surface_row", audit.profile().hasSurface() ? audit.profile().surface().row() : 0,
                        "data row of the vacuum surface (rho or T = 0, P = 0), kept out of the shells; 0 if none")
                .text("order", audit.profile().surfaceFirst() ? "surface first" : "centre first",
                        "order of the rows in the file");
        String where = s.closedBySurface() ? "at the surface row" : "at the outermost shell";
        put(b, "M", s.mass(), Constants.SOLAR_MASS, "Msun", "the star's mass, " + where
                + (s.massDerived() ? " (integrated from r and rho)" : ""));
        put(b, "R", s.radius(), Constants.SOLAR_RADIUS, "Rsun", "the star's radius, " + where
                + (s.radiusDerived() ? " (integrated from m and rho)" : ""));
        put(b, "mu_mean", s.meanMu(), 1.0, "", "1/<1/mu> over mass");
        b.number("beta_centre", s.centralBeta(), "", s.reachesCentre() ? "beta at the centre"
                : "beta at the innermost shell");
        b.number("one_minus_beta_centre", s.centralOneMinusBeta(), "", "1 - beta there, as P_rad/P");
        put(b, "radiation_dominated_mass_fraction", s.radiationDominatedMassFraction(), 1.0, "",
                "fraction of the mass where beta < 1/2");
        put(b, "beta_standard_model", s.standardModelBeta(), 1.0, "",
                "beta of the Eddington standard model with this M and mu_mean");
        put(b, "one_minus_beta_standard_model", s.standardModelOneMinusBeta(), 1.0, "", "its 1 - beta");
        if (s.stability().isPresent()) {
            StabilityResult st = s.stability().get();
            b.number("Gamma1_mean", st.meanGamma1(), "", "pressure-weighted <Gamma1> = int Gamma1 P dV/int P dV, our Gamma1");
            b.number("newtonian_margin", st.newtonianMargin(), "", "<Gamma1> - 4/3 (negative: unstable)");
            b.number("gr_margin", st.relativisticMargin(), "",
                    "<Gamma1> - 4/3 - K 2GM/(Rc^2), post-Newtonian (negative: unstable)");
            b.number("K", st.relativisticCoefficient(), "", "structure constant K of the relativistic criterion, from the profile");
            b.number("compactness", st.compactness(), "", "2GM/(Rc^2)");
            if (st.criticalRadius().isPresent()) {
                b.number("R_over_R_crit", st.radiusOverCritical().getAsDouble(), "",
                        "R over the radius where homologous contraction turns unstable");
            }
            b.text("stability", st.verdict().word(), "verdict with our Gamma1 (marginal within "
                    + Math.round(100 * st.marginalBand()) + " % of the threshold)");
        }
        if (s.stabilityProfileGamma1().isPresent()) {
            StabilityResult st = s.stabilityProfileGamma1().get();
            b.number("Gamma1_mean_profile", st.meanGamma1(), "", "pressure-weighted <Gamma1> with the profile's Gamma1");
            b.number("gr_margin_profile", st.relativisticMargin(), "", "the post-Newtonian margin with the profile's Gamma1");
            b.text("stability_profile", st.verdict().word(), "verdict with the profile's Gamma1");
        }
        put(b, "virial_ratio", s.virialRatio(), 1.0, "", "3 int P dV/|Omega|, Omega = -int G m/r dm");
        put(b, "virial_surface_term", s.surfacePressureTerm(), 1.0, "",
                "4 pi R^3 P(R)/|Omega|: the virial ratio in equilibrium is 1 plus this");
        if (s.maxPressureMismatch().isPresent()) {
            b.number("max_pressure_mismatch", s.maxPressureMismatch().getAsDouble(), "",
                    "largest |P_profile/P_eos - 1|");
            b.integer("max_pressure_mismatch_row", s.maxPressureMismatchRow(), "data row where it occurs");
            b.number("tolerance", s.tolerance(), "", "|P_profile/P_eos - 1| above which a row is flagged");
            String flaggedMeaning = "data rows where |P_profile/P_eos - 1| exceeds the tolerance";
            if (forReading) {
                b.text("flagged_rows", ranges(s.flaggedRows()), flaggedMeaning);
            } else {
                b.field("flagged_rows", s.flaggedRows().stream().map(Integer::longValue).toList(), "", flaggedMeaning);
            }
        }
        put(b, "max_Gamma1_diff", s.maxGamma1Difference(), 1.0, "", "largest |Gamma1_profile - Gamma1_eos|");
        if (s.maxHydrostaticResidual().isPresent()) {
            b.number("max_hydrostatic_residual", s.maxHydrostaticResidual().getAsDouble(), "",
                    "largest |hydrostatic residual| (often at the surface)");
            b.integer("max_hydrostatic_residual_row", s.maxHydrostaticResidualRow(), "data row where it occurs");
        }
        put(b, "rms_hydrostatic_residual", s.rmsHydrostaticResidual(), 1.0, "",
                "mass-weighted root-mean-square hydrostatic residual, first and last shell left out");
        put(b, "max_mass_continuity_residual", s.maxMassContinuityResidual(), 1.0, "",
                "largest |(dm/dr)/(4 pi r^2 rho) - 1|");
        b.field("zones", forReading ? zonesToRead(s.zones(), metadata) : zones(s.zones(), metadata), "",
                "runs of shells where the ideal gas + radiation description fails");
        b.field("skipped", skipped(in.skipped(), metadata), "", "bad rows left out");
        if (shells != null) {
            b.field("shells", shells, "", "per-shell audit");
        }
        return b.build();
    }

    private static void put(Summary.Builder b, String name, OptionalDouble value, double unitFactor, String unit,
            String description) {
        if (value.isPresent()) {
            b.number(name, value.getAsDouble() / unitFactor, unit, description);
        }
    }

    private static List<Summary> zones(List<FailureZone> zones, Metadata metadata) {
        List<Summary> out = new ArrayList<>();
        for (FailureZone z : zones) {
            Summary.Builder b = new Summary.Builder("zone", metadata)
                    .text("code", z.regime().code(), "what fails")
                    .text("rows", z.firstRow() == z.lastRow() ? String.valueOf(z.firstRow())
                            : z.firstRow() + "-" + z.lastRow(), "data rows of the run")
                    .integer("first_row", z.firstRow(), "smallest data row of the run")
                    .integer("last_row", z.lastRow(), "largest data row of the run")
                    .integer("shells", z.shells(), "shells in the run");
            if (z.hasMassFractions()) {
                b.number("m_over_M_inner", z.innerMassFraction(), "", "m/M at the run's inner edge");
                b.number("m_over_M_outer", z.outerMassFraction(), "", "m/M at the run's outer edge");
            }
            b.text("message", z.message(), "the warning at the run's innermost shell");
            out.add(b.build());
        }
        return out;
    }

    /** Zones for a terminal: one line each, "code: rows a-b: m/M x-y: message". */
    private static List<Summary> zonesToRead(List<FailureZone> zones, Metadata metadata) {
        List<Summary> out = new ArrayList<>();
        for (FailureZone z : zones) {
            Summary.Builder b = new Summary.Builder("zone", metadata)
                    .text("code", z.regime().code(), "what fails")
                    .text("rows", z.firstRow() == z.lastRow() ? "row " + z.firstRow()
                            : "rows " + z.firstRow() + "-" + z.lastRow(), "data rows of the run");
            if (z.hasMassFractions()) {
                String inner = AuditReport.num(z.innerMassFraction());
                String outer = AuditReport.num(z.outerMassFraction());
                b.text("mass", "m/M " + (inner.equals(outer) ? inner : inner + "-" + outer), "where in mass");
            }
            out.add(b.text("message", z.message(), "the warning at the run's innermost shell").build());
        }
        return out;
    }

    private static List<Summary> skipped(List<BadRow> rows, Metadata metadata) {
        List<Summary> out = new ArrayList<>();
        for (BadRow r : rows) {
            out.add(new Summary.Builder("skipped_row", metadata).integer("row", r.row(), "data row")
                    .text("reason", r.where() + ": " + r.reason(), "why it was left out").build());
        }
        return out;
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
                if (s.length() > 0) {
                    s.append(", ");
                }
                s.append(start == prev ? String.valueOf(start) : start + "-" + prev);
                start = next;
            }
            prev = next;
        }
        return s.toString();
    }

    /** @return input names in order, for metadata */
    static Map<String, String> describeColumns(LoadedProfile in) {
        Map<String, String> m = new LinkedHashMap<>();
        for (MappedColumn c : in.mapped()) {
            m.put(c.quantity().key(), c.column() + (c.unit().isEmpty() ? "" : " [" + c.unit() + "]"));
        }
        return m;
    }
}
