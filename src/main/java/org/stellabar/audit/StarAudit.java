package org.stellabar.audit;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.stellabar.structure.StabilityResult;

/**
 * What the audit says of the star as a whole. Quantities the profile does not allow are empty:
 * anything integrated over mass needs a radius or a mass column; the virial ratio needs both
 * (one may be derived from the other); pressure comparisons need a pressure column.
 *
 * @param shells the number of shells audited
 * @param mass the outermost enclosed mass [g]
 * @param radius the outermost radius [cm]
 * @param massDerived true if masses were integrated from r and ρ, not read
 * @param radiusDerived true if radii were integrated from m and ρ, not read
 * @param reachesCentre true if the innermost shell is at r = 0 (or m = 0)
 * @param closedBySurface true if the profile's vacuum surface row closes the integrals and gives
 *     M and R
 * @param centralBeta β of the innermost shell
 * @param centralOneMinusBeta 1 − β of the innermost shell
 * @param meanMu 1/⟨1/μ⟩ averaged over mass (the μ of the mixed-up star)
 * @param radiationDominatedMassFraction the fraction of the mass where β &lt; 1/2
 * @param pressureIntegral ∫P dV [erg]
 * @param gravitationalEnergy Ω = −∫Gm/r dm [erg], negative
 * @param virialRatio 3∫P dV/|Ω|
 * @param surfacePressureTerm 4πR³P(R)/|Ω|, the surface term of the virial theorem (virial ratio
 *     minus this is 1 in equilibrium)
 * @param stability the stability estimate with our Γ1 (⟨Γ1⟩, Newtonian and post-Newtonian margins)
 * @param stabilityProfileGamma1 the same with the profile's Γ1
 * @param standardModelBeta β of the Eddington standard model of mass M and μ = meanMu
 * @param standardModelOneMinusBeta its 1 − β
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
public record StarAudit(int shells, OptionalDouble mass, OptionalDouble radius, boolean massDerived,
        boolean radiusDerived, boolean reachesCentre, boolean closedBySurface, double centralBeta,
        double centralOneMinusBeta, OptionalDouble meanMu, OptionalDouble radiationDominatedMassFraction,
        OptionalDouble pressureIntegral, OptionalDouble gravitationalEnergy, OptionalDouble virialRatio,
        OptionalDouble surfacePressureTerm, Optional<StabilityResult> stability,
        Optional<StabilityResult> stabilityProfileGamma1, OptionalDouble standardModelBeta,
        OptionalDouble standardModelOneMinusBeta, OptionalDouble maxPressureMismatch,
        int maxPressureMismatchRow, List<Integer> flaggedRows, double tolerance, OptionalDouble maxGamma1Difference,
        OptionalDouble maxHydrostaticResidual, int maxHydrostaticResidualRow, OptionalDouble rmsHydrostaticResidual,
        OptionalDouble maxMassContinuityResidual, List<FailureZone> zones) {

    public StarAudit {
        Objects.requireNonNull(mass, "mass");
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(stabilityProfileGamma1, "stabilityProfileGamma1");
        flaggedRows = List.copyOf(flaggedRows);
        zones = List.copyOf(zones);
    }

    /** @return ⟨Γ1⟩ = ∫Γ1 P dV/∫P dV with our Γ1, if the star could be integrated */
    public OptionalDouble gamma1Mean() {
        return stability.map(s -> OptionalDouble.of(s.meanGamma1())).orElse(OptionalDouble.empty());
    }
}
