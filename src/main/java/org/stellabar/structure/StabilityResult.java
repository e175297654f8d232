package org.stellabar.structure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The dynamical stability estimate of one star: the pressure-weighted adiabatic exponent against
 * 4/3 (Newtonian gravity) and against 4/3 + K·2GM/(Rc²) (the post-Newtonian criterion of
 * Chandrasekhar 1964, ApJ 140, 417). See {@link StabilityAnalysis} for the definitions.
 *
 * @param mass total mass M [g]
 * @param radius radius R [cm]
 * @param meanGamma1 ⟨Γ1⟩ = ∫Γ1 P dV / ∫P dV
 * @param newtonianMargin ⟨Γ1⟩ − 4/3 (negative: unstable even in Newtonian gravity)
 * @param relativisticCoefficient K, the structure constant of the relativistic criterion
 * @param compactness 2GM/(Rc²)
 * @param relativisticThreshold K·2GM/(Rc²), the amount by which ⟨Γ1⟩ must exceed 4/3
 * @param relativisticMargin ⟨Γ1⟩ − 4/3 − K·2GM/(Rc²) (negative: unstable)
 * @param criticalRadius radius at the onset of instability for homologous contraction at fixed
 *        M, ⟨Γ1⟩ and K: R_crit = K·2GM/(c²(⟨Γ1⟩ − 4/3)) [cm]; empty when ⟨Γ1⟩ ≤ 4/3
 * @param criticalCentralDensity central density at that onset, ρ_c (R/R_crit)³ [g/cm3]; empty
 *        when ⟨Γ1⟩ ≤ 4/3
 * @param marginalBand the relative band of R/R_crit around 1 called marginal
 * @param verdict stable, marginal or unstable
 */
public record StabilityResult(double mass, double radius, double meanGamma1, double newtonianMargin,
        double relativisticCoefficient, double compactness, double relativisticThreshold, double relativisticMargin,
        OptionalDouble criticalRadius, OptionalDouble criticalCentralDensity, double marginalBand,
        StabilityVerdict verdict) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param mass total mass M [g]
     * @param radius radius R [cm]
     * @param meanGamma1 ⟨Γ1⟩ = ∫Γ1 P dV / ∫P dV
     * @param newtonianMargin ⟨Γ1⟩ − 4/3 (negative: unstable even in Newtonian gravity)
     * @param relativisticCoefficient K, the structure constant of the relativistic criterion
     * @param compactness 2GM/(Rc²)
     * @param relativisticThreshold K·2GM/(Rc²), the amount by which ⟨Γ1⟩ must exceed 4/3
     * @param relativisticMargin ⟨Γ1⟩ − 4/3 − K·2GM/(Rc²) (negative: unstable)
     * @param criticalRadius radius at the onset of instability for homologous contraction at fixed
     *        M, ⟨Γ1⟩ and K: R_crit = K·2GM/(c²(⟨Γ1⟩ − 4/3)) [cm]; empty when ⟨Γ1⟩ ≤ 4/3
     * @param criticalCentralDensity central density at that onset, ρ_c (R/R_crit)³ [g/cm3]; empty
     *        when ⟨Γ1⟩ ≤ 4/3
     * @param marginalBand the relative band of R/R_crit around 1 called marginal
     * @param verdict stable, marginal or unstable
     */
    public StabilityResult {
        Objects.requireNonNull(criticalRadius, "criticalRadius");
        Objects.requireNonNull(criticalCentralDensity, "criticalCentralDensity");
        Objects.requireNonNull(verdict, "verdict");
    }

    /**
     * @return R/R_crit = (⟨Γ1⟩ − 4/3)/(K·2GM/(Rc²)), above 1 when stable; empty when ⟨Γ1⟩ ≤ 4/3
     */
    public OptionalDouble radiusOverCritical() {
        return criticalRadius.isPresent() ? OptionalDouble.of(radius / criticalRadius.getAsDouble())
                : OptionalDouble.empty();
    }
}
