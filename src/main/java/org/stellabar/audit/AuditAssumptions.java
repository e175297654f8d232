package org.stellabar.audit;

import java.util.ArrayList;
import java.util.List;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.fermi.FermiEosSummary;

/**
 * Every assumption an audit makes, one line each, for the report and the tables' metadata.
 */
public final class AuditAssumptions {

    private AuditAssumptions() {
    }

    /**
     * @param audit an audit
     * @return the assumptions in reading order
     */
    public static List<String> of(ProfileAudit audit) {
        List<String> lines = new ArrayList<>();
        reading(lines, audit.input(), audit.electrons());
        checks(lines, audit);
        integrals(lines, audit.star());
        return lines;
    }

    /** The physics, the composition, the columns, the order, the surface and skipped rows. */
    private static void reading(List<String> lines, LoadedProfile in, Electrons electrons) {
        Profile p = in.profile();
        if (electrons == Electrons.fermi) {
            lines.add("Equation of state: fermi: classical ions, electrons of any degeneracy and relativity with"
                    + " electron-positron pairs in equilibrium (Fermi-Dirac integrals), black-body radiation at the"
                    + " local temperature; " + FermiEosSummary.ENERGY_CONVENTION + "; no Coulomb or"
                    + " partial-ionization corrections (shells where these matter are listed as zones).");
        } else {
            lines.add("Equation of state: fully ionized classical ideal gas of ions and electrons plus black-body"
                    + " radiation at the local temperature; no electron degeneracy, pair, Coulomb or partial-ionization"
                    + " corrections (shells where these matter are listed as zones, but their numbers are still those of"
                    + " the ideal model).");
        }
        lines.add("Composition: " + in.compositionSource() + "; 1/mu = 2X + 3Y/4 + Z/2"
                + " (metal ions neglected unless a metal mass number is given).");
        for (MappedColumn c : in.mapped()) {
            lines.add("Column: " + c.describe() + ".");
        }
        lines.add("Order of the shells: " + in.orderedBy() + "; row numbers are data rows of the file counted"
                + " from 1 after the header, comment lines not counted.");
        if (p.hasSurface()) {
            lines.add("Surface: " + p.surface().where() + " is the vacuum surface (rho or T = 0, P = 0); our equation"
                    + " of state says nothing there, so it is not audited as a shell, but it closes the integrals"
                    + " (with P = 0) and gives M and R.");
        }
        if (!in.skipped().isEmpty()) {
            lines.add("Skipped rows (--skip-bad-rows): " + in.skipped().size() + ", listed in the report.");
        }
    }

    /** The pressure comparison and the differences of the residuals. */
    private static void checks(List<String> lines, ProfileAudit audit) {
        Profile p = audit.profile();
        StarAudit s = audit.star();
        lines.add(p.hasPressure()
                ? "Pressure compared: P_profile/P_ours - 1 at the profile's (rho, T, composition); rows beyond "
                        + AuditReport.num(s.tolerance()) + " in absolute value are flagged."
                : "The profile gives no pressure: nothing is compared, and our pressure stands in wherever a"
                        + " pressure is needed.");
        if (p.hasPressure()) {
            lines.add("The hydrostatic residual, the virial ratio and the weights of <Gamma1> use the profile's"
                    + " own pressure.");
        }
        if (audit.shells().hydrostaticResidual() != null) {
            lines.add("Hydrostatic residual (dP/dr + Gm rho/r^2)/(Gm rho/r^2): dP/dr by three-point Lagrange"
                    + " differences on the profile's own non-uniform grid (second order in the spacing, one-sided"
                    + " at the first and last shell); at r = 0 the limit (2 dP/d(r^2) + (4 pi/3)G rho^2)/((4 pi/3)"
                    + "G rho^2). Near a surface where P and rho fall to zero the relative residual of the last"
                    + " shells is only first order: judge it inside the star. The summary's rms is mass-weighted over the shells between the first and"
                    + " the last.");
        }
        if (audit.shells().massContinuityResidual() != null) {
            lines.add("Mass continuity (dm/dr)/(4 pi r^2 rho) - 1: written as dm/d(r^3) against (4 pi/3)rho, three-"
                    + "point differences in r^3 (second order; a difference in r would be wrong by a third at the"
                    + " first shell, since m grows as r^3).");
        }
    }

    /** Derived radii or masses, the integrals, stability, the standard model and the central beta. */
    private static void integrals(List<String> lines, StarAudit s) {
        if (s.massDerived()) {
            lines.add("The profile gives no mass: m is integrated from r and rho by the trapezoidal rule.");
        }
        if (s.radiusDerived()) {
            lines.add("The profile gives no radius: r^3 is integrated from m and rho (dV = dm/rho) by the"
                    + " trapezoidal rule; no hydrostatic residual is computed from derived radii.");
        }
        if (s.totals().mass().isPresent()) {
            lines.add("Integrals (int P dV, Omega = -int G m/r dm, the mass average of 1/mu): piecewise parabolas"
                    + " (fourth order inside, third at the ends) over r, and over m where the masses increase"
                    + " strictly, else the trapezoidal rule over the shells"
                    + (s.totals().reachesCentre() ? "." : "; the profile does not reach the centre, and the core inside"
                            + " the innermost shell is counted as a uniform sphere with that shell's values."));
            lines.add("Virial ratio 3 int P dV/|Omega|: 1 in hydrostatic equilibrium when the surface pressure"
                    + " vanishes; with a pressure P(R) at the outermost shell the equilibrium value is"
                    + " 1 + 4 pi R^3 P(R)/|Omega| (reported as the surface term).");
            lines.add("Mean mu: 1/<1/mu>, the mass average of 1/mu (the mu of the star's mixed composition).");
            lines.add("Stability: <Gamma1> = int Gamma1 P dV / int P dV against 4/3 (Newtonian) and against"
                    + " 4/3 + K 2GM/(Rc^2) (post-Newtonian, Chandrasekhar 1964, ApJ 140, 417) with K evaluated from the"
                    + " profile itself; both for a homologous trial motion. These integrals use the structure"
                    + " package's quadrature from the innermost shell outwards (no core term).");
            lines.add("Standard model: beta of the Eddington standard model (n = 3, uniform beta) with the profile's"
                    + " M and mean mu, to set beside the profile's central beta.");
            lines.add("Radiation-dominated mass: the mass where beta < 1/2, beta taken linear in m between shells.");
        } else {
            lines.add("Without radius or mass the profile cannot be integrated: no virial ratio, <Gamma1>, mass"
                    + " fractions or stability margins.");
        }
        lines.add("Central beta: beta of the innermost shell" + (s.totals().reachesCentre() ? " (at the centre)."
                : ", which is not at the centre."));
    }
}
