package org.stellabar.audit;

import java.util.Objects;
import org.stellabar.eos.Electrons;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.EddingtonStandardModel;

/**
 * Audits a profile against the fully ionized ideal gas + black-body radiation equation of state
 * and against hydrostatic equilibrium and mass continuity.
 *
 * <p>Per shell: our P, P_gas, P_rad, β, 1 − β, Γ1, ∇_ad and c_s at the profile's (ρ, T,
 * composition), with the validity warnings; P_profile/P_ours − 1 and Γ1_profile − Γ1_ours where
 * the profile gives them; and, with radius and mass, the hydrostatic residual
 * (dP/dr + Gmρ/r²)/(Gmρ/r²) and the mass-continuity residual (dm/dr)/(4πr²ρ) − 1. The derivatives
 * are three-point Lagrange differences on the profile's own non-uniform grid
 * ({@link EquilibriumResiduals}). The pressure
 * in the hydrostatic residual, the virial ratio and the weights of ⟨Γ1⟩ is the profile's where it
 * gives one, else ours.
 *
 * <p>For the star: ⟨Γ1⟩ = ∫Γ1 P dV/∫P dV, the virial ratio 3∫P dV/|Ω| with Ω = −∫Gm/r dm (and the
 * surface term 4πR³P(R)/|Ω|), the mass-averaged μ, the mass fraction with β &lt; 1/2, the
 * largest pressure mismatch and the rows beyond the tolerance, and the zones where the validity
 * checks fail. Integrals are piecewise parabolas where the abscissae increase strictly, else
 * trapezoids ({@link ProfileIntegrals}).
 */
public final class ProfileAuditor {

    /** Default tolerance on |P_profile/P_ours − 1| before a row is flagged. */
    public static final double DEFAULT_TOLERANCE = 1e-3;

    private final double tolerance;
    private final EddingtonStandardModel standardModel;
    private final Electrons electrons;

    /** An auditor with the default tolerance and its own standard model. */
    public ProfileAuditor() {
        this(DEFAULT_TOLERANCE);
    }

    /**
     * An auditor that builds the Eddington standard model it compares with (one n = 3 Lane-Emden
     * solution, solved here once for this auditor).
     *
     * @param tolerance |P_profile/P_ours − 1| above which a row is flagged, positive
     * @throws BadInputException if the tolerance is not positive and finite
     */
    public ProfileAuditor(double tolerance) {
        this(checked(tolerance), EddingtonStandardModel.create());
    }

    /**
     * @param tolerance |P_profile/P_ours − 1| above which a row is flagged, positive
     * @param standardModel the Eddington standard model whose β the audit reports for the star's
     *     M and μ (immutable; may be shared with other users)
     * @throws BadInputException if the tolerance is not positive and finite
     */
    public ProfileAuditor(double tolerance, EddingtonStandardModel standardModel) {
        this(tolerance, standardModel, Electrons.classical);
    }

    private ProfileAuditor(double tolerance, EddingtonStandardModel standardModel, Electrons electrons) {
        this.tolerance = checked(tolerance);
        this.standardModel = Objects.requireNonNull(standardModel, "standardModel");
        this.electrons = Objects.requireNonNull(electrons, "electrons");
    }

    /**
     * @param treatment which equation of state computes our state of every shell
     * @return an auditor like this one with that equation of state
     */
    public ProfileAuditor withElectrons(Electrons treatment) {
        return new ProfileAuditor(tolerance, standardModel, treatment);
    }

    private static double checked(double tolerance) {
        if (!(tolerance > 0.0) || !Double.isFinite(tolerance)) {
            throw new BadInputException("--tolerance " + tolerance + " is not allowed; it must be positive and finite");
        }
        return tolerance;
    }

    /** @return the tolerance for flagging rows */
    public double tolerance() {
        return tolerance;
    }

    /**
     * @param input a profile as read
     * @return the audit
     */
    public ProfileAudit audit(LoadedProfile input) {
        Profile p = input.profile();
        ShellStates ours = ShellStates.evaluate(p, electrons);
        Comparison comparison = Comparison.of(p, ours, tolerance);
        // the profile's pressure where it gives one: the residuals and integrals test its structure
        double[] pressure = p.hasPressure() ? p.P() : ours.P();
        ShellGeometry g = ShellGeometry.of(p);
        EquilibriumResiduals residuals = EquilibriumResiduals.of(p.rows(), g, p.rho(), pressure);
        StarTotals totals = StarTotals.of(ClosedStar.of(p, g, pressure, ours), standardModel);
        boolean integrated = totals.mass().isPresent();
        double M = integrated ? totals.mass().getAsDouble() : Double.NaN;
        double R = integrated ? totals.radius().getAsDouble() : Double.NaN;
        double[] m = integrated ? g.m() : null;
        ShellAudit shells = new ShellAudit(ours, comparison, residuals, g.r(), m, M, R);
        StarAudit star = new StarAudit(p.size(), g.massDerived(), g.radiusDerived(), ours.beta()[0],
                ours.oneMinusBeta()[0], totals, comparison.maxPressureMismatch(), comparison.maxPressureMismatchRow(),
                comparison.flaggedRows(), tolerance, comparison.maxGamma1Difference(), residuals.maxHydrostatic(),
                residuals.maxHydrostaticRow(), residuals.rmsHydrostatic(), residuals.maxContinuity(),
                FailureZones.find(p.rows(), ours, m, M));
        return new ProfileAudit(input, shells, star, electrons);
    }
}
