package org.stellabar.audit;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * What the audit says of the star as a whole. Quantities the profile does not allow are empty
 * (see {@link StarTotals}); pressure comparisons need a pressure column.
 *
 * @param shells the number of shells audited
 * @param massDerived true if masses were integrated from r and ρ, not read
 * @param radiusDerived true if radii were integrated from m and ρ, not read
 * @param centralBeta β of the innermost shell
 * @param centralOneMinusBeta 1 − β of the innermost shell
 * @param totals M, R, the integrals, the virial ratio, the stability estimates and the standard
 *     model's β
 * @param maxPressureMismatch largest |P_profile/P_ours − 1|
 * @param maxPressureMismatchRow the data row where it occurs (0 if no pressure column)
 * @param flaggedRows data rows where |P_profile/P_ours − 1| exceeds the tolerance, ascending
 * @param tolerance the tolerance for flagging rows
 * @param maxGamma1Difference largest |Γ1_profile − Γ1_ours|
 * @param maxHydrostaticResidual largest |hydrostatic residual|
 * @param maxHydrostaticResidualRow the data row where it occurs (0 if not computed)
 * @param rmsHydrostaticResidual mass-weighted root-mean-square hydrostatic residual over the
 *     shells between the first and the last (trapezoidal in m)
 * @param maxMassContinuityResidual largest |(dm/dr)/(4πr²ρ) − 1|
 * @param zones runs of shells where the ideal gas + radiation description fails
 */
public record StarAudit(int shells, boolean massDerived, boolean radiusDerived, double centralBeta,
        double centralOneMinusBeta, StarTotals totals, OptionalDouble maxPressureMismatch,
        int maxPressureMismatchRow, List<Integer> flaggedRows, double tolerance, OptionalDouble maxGamma1Difference,
        OptionalDouble maxHydrostaticResidual, int maxHydrostaticResidualRow, OptionalDouble rmsHydrostaticResidual,
        OptionalDouble maxMassContinuityResidual, List<FailureZone> zones) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param shells the number of shells audited
     * @param massDerived true if masses were integrated from r and ρ, not read
     * @param radiusDerived true if radii were integrated from m and ρ, not read
     * @param centralBeta β of the innermost shell
     * @param centralOneMinusBeta 1 − β of the innermost shell
     * @param totals M, R, the integrals, the virial ratio, the stability estimates and the standard
     *        model's β
     * @param maxPressureMismatch largest |P_profile/P_ours − 1|
     * @param maxPressureMismatchRow the data row where it occurs (0 if no pressure column)
     * @param flaggedRows data rows where |P_profile/P_ours − 1| exceeds the tolerance, ascending
     * @param tolerance the tolerance for flagging rows
     * @param maxGamma1Difference largest |Γ1_profile − Γ1_ours|
     * @param maxHydrostaticResidual largest |hydrostatic residual|
     * @param maxHydrostaticResidualRow the data row where it occurs (0 if not computed)
     * @param rmsHydrostaticResidual mass-weighted root-mean-square hydrostatic residual over the
     *        shells between the first and the last (trapezoidal in m)
     * @param maxMassContinuityResidual largest |(dm/dr)/(4πr²ρ) − 1|
     * @param zones runs of shells where the ideal gas + radiation description fails
     */
    public StarAudit {
        Objects.requireNonNull(totals, "totals");
        flaggedRows = List.copyOf(flaggedRows);
        zones = List.copyOf(zones);
    }

    /** @return ⟨Γ1⟩ = ∫Γ1 P dV/∫P dV with our Γ1, if the star could be integrated */
    public OptionalDouble gamma1Mean() {
        return totals.stability().map(s -> OptionalDouble.of(s.meanGamma1())).orElse(OptionalDouble.empty());
    }
}
