package org.stellabar.observed;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.Objects;
import org.stellabar.structure.StandardModelState;

/**
 * The estimate for one observed star, CGS.
 *
 * @param luminosity L [erg/s]
 * @param temperature T_eff [K]
 * @param radius R [cm]
 * @param mass M [g], from {@code massSource}
 * @param massSource where M came from
 * @param massFromLuminosity the standard model's mass for this L [g] (model-dependent)
 * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es [erg/s]
 * @param eddingtonFactor Γ_e = L/L_Edd
 * @param standard the standard model of mass M and μ scaled to R: β, centre, ⟨Γ1⟩, margins
 */
public record ObservedEstimate(double luminosity, double temperature, double radius, double mass,
        MassSource massSource, double massFromLuminosity, double eddingtonLuminosity, double eddingtonFactor,
        StandardModelState standard) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param luminosity L [erg/s]
     * @param temperature T_eff [K]
     * @param radius R [cm]
     * @param mass M [g], from {@code massSource}
     * @param massSource where M came from
     * @param massFromLuminosity the standard model's mass for this L [g] (model-dependent)
     * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es [erg/s]
     * @param eddingtonFactor Γ_e = L/L_Edd
     * @param standard the standard model of mass M and μ scaled to R: β, centre, ⟨Γ1⟩, margins
     */
    public ObservedEstimate {
        Objects.requireNonNull(massSource, "massSource");
        Objects.requireNonNull(standard, "standard");
    }

    /** @return log10 of g = GM/R² [cm/s²] */
    public double logGravity() {
        return Math.log10(GRAVITATION * mass / (radius * radius));
    }

    /** @return Γ_e/(1 − β): the observed Eddington factor over the standard model's L/L_Edd */
    public double eddingtonFactorOverModel() {
        return eddingtonFactor / standard.oneMinusBeta();
    }
}
