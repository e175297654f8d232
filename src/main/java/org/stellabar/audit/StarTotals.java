package org.stellabar.audit;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.RadialProfile;
import org.stellabar.structure.StabilityAnalysis;
import org.stellabar.structure.StabilityResult;

/**
 * The whole-star quantities of an audit, integrated over a {@link ClosedStar}: M, R, the
 * mass-averaged μ, the mass fraction with β &lt; 1/2, ∫P dV, Ω = −∫Gm/r dm, the virial ratio
 * 3∫P dV/|Ω| and its surface term 4πR³P(R)/|Ω|, the stability estimate (through
 * {@link StabilityAnalysis}, with our Γ1 and with the profile's) and the Eddington standard
 * model's β for M and μ. Each is empty when the profile does not allow it: anything integrated
 * over mass needs a radius or a mass column; the virial ratio needs both (one may be derived from
 * the other).
 *
 * @param mass the outermost enclosed mass [g]
 * @param radius the outermost radius [cm]
 * @param reachesCentre true if the innermost shell is at r = 0 (or m = 0)
 * @param closedBySurface true if the profile's vacuum surface row closes the integrals and gives
 *     M and R
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
 */
public record StarTotals(OptionalDouble mass, OptionalDouble radius, boolean reachesCentre, boolean closedBySurface,
        OptionalDouble meanMu, OptionalDouble radiationDominatedMassFraction, OptionalDouble pressureIntegral,
        OptionalDouble gravitationalEnergy, OptionalDouble virialRatio, OptionalDouble surfacePressureTerm,
        Optional<StabilityResult> stability, Optional<StabilityResult> stabilityProfileGamma1,
        OptionalDouble standardModelBeta, OptionalDouble standardModelOneMinusBeta) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param mass the outermost enclosed mass [g]
     * @param radius the outermost radius [cm]
     * @param reachesCentre true if the innermost shell is at r = 0 (or m = 0)
     * @param closedBySurface true if the profile's vacuum surface row closes the integrals and gives
     *        M and R
     * @param meanMu 1/⟨1/μ⟩ averaged over mass (the μ of the mixed-up star)
     * @param radiationDominatedMassFraction the fraction of the mass where β &lt; 1/2
     * @param pressureIntegral ∫P dV [erg]
     * @param gravitationalEnergy Ω = −∫Gm/r dm [erg], negative
     * @param virialRatio 3∫P dV/|Ω|
     * @param surfacePressureTerm 4πR³P(R)/|Ω|, the surface term of the virial theorem (virial ratio
     *        minus this is 1 in equilibrium)
     * @param stability the stability estimate with our Γ1 (⟨Γ1⟩, Newtonian and post-Newtonian margins)
     * @param stabilityProfileGamma1 the same with the profile's Γ1
     * @param standardModelBeta β of the Eddington standard model of mass M and μ = meanMu
     * @param standardModelOneMinusBeta its 1 − β
     */
    public StarTotals {
        Objects.requireNonNull(mass, "mass");
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(stabilityProfileGamma1, "stabilityProfileGamma1");
    }

    /** Nothing can be integrated (no radius or mass, or a zero total mass). */
    static final StarTotals NONE = new StarTotals(OptionalDouble.empty(), OptionalDouble.empty(), false, false,
            OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty(), OptionalDouble.empty(), Optional.empty(), Optional.empty(), OptionalDouble.empty(),
            OptionalDouble.empty());

    /**
     * @param whole the shells closed by the surface, or null
     * @param standardModel the Eddington standard model to compare with
     * @return the totals, {@link #NONE} if whole is null
     */
    static StarTotals of(ClosedStar whole, EddingtonStandardModel standardModel) {
        if (whole == null) {
            return NONE;
        }
        double M = whole.mass();
        double R = whole.radius();
        double meanMu = 1.0 / ProfileIntegrals.massAverage(whole.m(), whole.inverseMu());
        double pv = ProfileIntegrals.pressureVolume(whole.r(), whole.P());
        double w = ProfileIntegrals.gravitationalEnergy(whole.r(), whole.m(), GRAVITATION);
        OptionalDouble virial = w < 0.0 ? OptionalDouble.of(3.0 * pv / -w) : OptionalDouble.empty();
        OptionalDouble surfaceTerm = w < 0.0
                ? OptionalDouble.of(4.0 * Math.PI * R * R * R * whole.P()[whole.P().length - 1] / -w)
                : OptionalDouble.empty();
        Optional<StabilityResult> withProfileGamma1 = whole.profileGamma1() == null ? Optional.empty()
                : Optional.of(stability(whole, whole.profileGamma1()));
        Optional<BetaSolution> standard = standardBeta(standardModel, M, meanMu);
        return new StarTotals(OptionalDouble.of(M), OptionalDouble.of(R), whole.r()[0] == 0.0 || whole.m()[0] == 0.0,
                whole.closedBySurface(), OptionalDouble.of(meanMu),
                OptionalDouble.of(ProfileIntegrals.massFractionBelow(whole.m(), whole.beta(), 0.5)),
                OptionalDouble.of(pv), OptionalDouble.of(w), virial, surfaceTerm,
                Optional.of(stability(whole, whole.gamma1())), withProfileGamma1,
                standard.map(b -> OptionalDouble.of(b.beta())).orElse(OptionalDouble.empty()),
                standard.map(b -> OptionalDouble.of(b.oneMinusBeta())).orElse(OptionalDouble.empty()));
    }

    private static StabilityResult stability(ClosedStar whole, double[] gamma1) {
        return StabilityAnalysis.analyze(new RadialProfile(whole.r(), whole.m(), whole.rho(), whole.P(), gamma1));
    }

    private static Optional<BetaSolution> standardBeta(EddingtonStandardModel model, double mass, double mu) {
        try {
            return Optional.of(model.beta(mass, mu));
        } catch (BadInputException e) {
            // a mass beyond the quartic's range: no standard-model comparison, the rest stands
            return Optional.empty();
        }
    }
}
