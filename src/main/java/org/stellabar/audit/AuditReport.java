package org.stellabar.audit;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StabilityResult;
import org.stellabar.table.Metadata;

/**
 * A short Markdown report of an audit: the findings first, then the columns read, the zones
 * where the physics fails, flagged and skipped rows, and every assumption. Text only; the caller
 * writes it.
 */
public final class AuditReport {

    private AuditReport() {
    }

    /**
     * @param audit the audit
     * @param metadata its metadata (version, constants, inputs, assumptions as notes)
     * @param files the files written beside the report (names relative to it), to link
     * @return the report in Markdown
     */
    public static String markdown(ProfileAudit audit, Metadata metadata, List<String> files) {
        StarAudit s = audit.star();
        LoadedProfile in = audit.input();
        StringBuilder md = new StringBuilder();
        md.append("# Audit of `").append(audit.profile().source()).append("`\n\n");
        md.append("Checked against a fully ionized ideal gas plus black-body radiation, hydrostatic equilibrium and"
                + " mass continuity by stellabar ").append(metadata.toolVersion()).append(" (constants: ")
                .append(metadata.constants()).append(").\n\n");
        findingsOfTheProfile(md, audit);
        findingsOfTheChecks(md, s);
        findingsOfTheStar(md, s);
        md.append("\n");
        columnsRead(md, in);
        failureZones(md, s);
        closing(md, in, metadata, files);
        return md.toString();
    }

    private static void findingsOfTheProfile(StringBuilder md, ProfileAudit audit) {
        StarAudit s = audit.star();
        LoadedProfile in = audit.input();
        md.append("## Findings\n\n");
        md.append("- Shells audited: ").append(s.shells());
        if (!in.skipped().isEmpty()) {
            md.append(" (").append(in.skipped().size()).append(" bad rows skipped)");
        }
        md.append("; ").append(in.orderedBy()).append(".\n");
        if (audit.profile().hasSurface()) {
            md.append("- Surface: ").append(audit.profile().surface().where())
                    .append(" is the vacuum surface; not audited as a shell, it closes the star.\n");
        }
        if (s.totals().mass().isPresent()) {
            md.append("- M = ").append(num(s.totals().mass().getAsDouble() / Constants.SOLAR_MASS))
                    .append(" Msun, R = ")
                    .append(num(s.totals().radius().getAsDouble() / Constants.SOLAR_RADIUS)).append(" Rsun")
                    .append(s.massDerived() ? " (M integrated from r and rho)" : "")
                    .append(s.radiusDerived() ? " (R integrated from m and rho)" : "").append(".\n");
        }
    }

    private static void findingsOfTheChecks(StringBuilder md, StarAudit s) {
        if (s.maxPressureMismatch().isPresent()) {
            md.append("- Pressure: largest |P_profile/P_ours - 1| = ").append(num(s.maxPressureMismatch().getAsDouble()))
                    .append(" (row ").append(s.maxPressureMismatchRow()).append("); ")
                    .append(s.flaggedRows().isEmpty() ? "no row" : s.flaggedRows().size() + " rows")
                    .append(" beyond the tolerance ").append(num(s.tolerance()))
                    .append(s.flaggedRows().isEmpty() ? "" : ": " + AuditSummary.ranges(s.flaggedRows())).append(".\n");
        } else {
            md.append("- Pressure: the profile gives none, so nothing is compared.\n");
        }
        if (s.maxGamma1Difference().isPresent()) {
            md.append("- Gamma1: largest |Gamma1_profile - Gamma1_ours| = ").append(num(s.maxGamma1Difference().getAsDouble()))
                    .append(".\n");
        }
        if (s.maxHydrostaticResidual().isPresent()) {
            md.append("- Hydrostatic equilibrium: residual ").append(num(s.rmsHydrostaticResidual().orElse(0.0)))
                    .append(" (mass-weighted rms), largest ").append(num(s.maxHydrostaticResidual().getAsDouble()))
                    .append(" at row ").append(s.maxHydrostaticResidualRow()).append(".\n");
        }
        if (s.maxMassContinuityResidual().isPresent()) {
            md.append("- Mass continuity: largest |(dm/dr)/(4 pi r^2 rho) - 1| = ")
                    .append(num(s.maxMassContinuityResidual().getAsDouble())).append(".\n");
        }
        if (s.totals().virialRatio().isPresent()) {
            md.append("- Virial ratio 3 int P dV/|Omega| = ").append(precise(s.totals().virialRatio().getAsDouble()))
                    .append("; the equilibrium value with this surface pressure is ")
                    .append(precise(1.0 + s.totals().surfacePressureTerm().getAsDouble())).append(".\n");
        }
    }

    private static void findingsOfTheStar(StringBuilder md, StarAudit s) {
        md.append("- Central beta = ").append(num(s.centralBeta())).append(", 1 - beta = ")
                .append(num(s.centralOneMinusBeta())).append(s.totals().reachesCentre() ? "" : " (innermost shell)")
                .append(".\n");
        line(md, "Mean mu (1/<1/mu> over mass)", s.totals().meanMu());
        line(md, "Mass fraction with beta < 1/2", s.totals().radiationDominatedMassFraction());
        if (s.totals().standardModelBeta().isPresent()) {
            md.append("- The Eddington standard model of this mass and mean mu has beta = ")
                    .append(num(s.totals().standardModelBeta().getAsDouble())).append(" (1 - beta = ")
                    .append(num(s.totals().standardModelOneMinusBeta().getAsDouble()))
                    .append("), against the profile's central ")
                    .append(num(s.centralBeta())).append(".\n");
        }
        if (s.totals().stability().isPresent()) {
            StabilityResult st = s.totals().stability().get();
            md.append("- Stability (our Gamma1): <Gamma1> = ").append(num(st.meanGamma1()))
                    .append(", Newtonian margin <Gamma1> - 4/3 = ").append(num(st.newtonianMargin()))
                    .append(", post-Newtonian margin = ").append(num(st.relativisticMargin())).append(" (K = ")
                    .append(num(st.relativisticCoefficient())).append(", 2GM/(Rc^2) = ").append(num(st.compactness()))
                    .append("): **").append(st.verdict().word()).append("**.\n");
        }
        if (s.totals().stabilityProfileGamma1().isPresent()) {
            StabilityResult st = s.totals().stabilityProfileGamma1().get();
            md.append("- With the profile's own Gamma1: <Gamma1> = ").append(num(st.meanGamma1()))
                    .append(", post-Newtonian margin = ").append(num(st.relativisticMargin())).append(": ")
                    .append(st.verdict().word()).append(".\n");
        }
    }

    private static void columnsRead(StringBuilder md, LoadedProfile in) {
        md.append("## Columns read\n\n| quantity | column | unit | unit from |\n| --- | --- | --- | --- |\n");
        for (MappedColumn c : in.mapped()) {
            md.append("| ").append(c.quantity().key()).append(" | `").append(c.column()).append("` | ")
                    .append(c.unit().isEmpty() ? "-" : c.unit()).append(" | ").append(c.unitOrigin()).append(" |\n");
        }
        md.append("\n");
    }

    private static void failureZones(StringBuilder md, StarAudit s) {
        md.append("## Where ideal gas + radiation fails\n\n");
        if (s.zones().isEmpty()) {
            md.append("No shell is flagged for degeneracy, relativistic electrons, pairs, Coulomb coupling or"
                    + " partial ionization.\n\n");
        } else {
            md.append("| what | rows | shells | m/M | first warning |\n| --- | --- | --- | --- | --- |\n");
            for (FailureZone z : s.zones()) {
                md.append("| ").append(z.regime().code()).append(" | ").append(z.firstRow())
                        .append(z.lastRow() != z.firstRow() ? "-" + z.lastRow() : "").append(" | ").append(z.shells())
                        .append(" | ").append(z.hasMassFractions() ? range(z.innerMassFraction(), z.outerMassFraction())
                                : "-")
                        .append(" | ").append(z.message().replace("|", "/")).append(" |\n");
            }
            md.append("\n");
        }
    }

    private static void closing(StringBuilder md, LoadedProfile in, Metadata metadata, List<String> files) {
        if (!in.skipped().isEmpty()) {
            md.append("## Skipped rows\n\n");
            for (BadRow r : in.skipped()) {
                md.append("- ").append(r).append("\n");
            }
            md.append("\n");
        }
        md.append("## Assumptions\n\n");
        for (String a : metadata.notes()) {
            md.append("- ").append(a).append("\n");
        }
        md.append("\n## Inputs\n\n");
        metadata.inputs().forEach((k, v) -> md.append("- ").append(k).append(": ").append(v).append("\n"));
        if (!files.isEmpty()) {
            md.append("\n## Files\n\n");
            for (String f : files) {
                md.append(f.endsWith(".png") ? "- ![" + f + "](" + f + ")\n" : "- [" + f + "](" + f + ")\n");
            }
        }
    }

    private static void line(StringBuilder md, String label, OptionalDouble value) {
        if (value.isPresent()) {
            md.append("- ").append(label).append(" = ").append(num(value.getAsDouble())).append(".\n");
        }
    }

    private static String range(double from, double to) {
        String a = num(from);
        String b = num(to);
        return a.equals(b) ? a : a + " - " + b;
    }

    /** Nine significant digits, for ratios whose distance from 1 matters. */
    private static String precise(double v) {
        return String.format(Locale.US, "%.9g", v);
    }

    static String num(double v) {
        if (v == 0.0) {
            return "0";
        }
        double a = Math.abs(v);
        return a >= 1e-3 && a < 1e6 ? String.format(Locale.US, "%.6g", v).replaceAll("(\\.\\d*?)0+$", "$1")
                .replaceAll("\\.$", "") : String.format(Locale.US, "%.4e", v);
    }
}
