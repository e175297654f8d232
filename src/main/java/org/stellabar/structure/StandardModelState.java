package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.eos.Composition;

/**
 * One Eddington standard model (n = 3 polytrope with constant β) scaled to mass M and radius R.
 * CGS.
 *
 * @param mass M [g]
 * @param radius R [cm]
 * @param composition the mixture (μ sets β, X sets κ_es)
 * @param beta P_gas/P, the same everywhere
 * @param oneMinusBeta P_rad/P, the same everywhere
 * @param centralDensity ρ_c [g/cm3]
 * @param centralPressure P_c [dyn/cm2]
 * @param centralTemperature T_c [K]
 * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es [erg/s]
 * @param luminosity L = (1 − β) L_Edd under the model's assumptions [erg/s]
 * @param gamma1 Γ1 of the mixture at this β, the same everywhere, so also ⟨Γ1⟩
 * @param stability the stability estimate at this radius
 */
public record StandardModelState(double mass, double radius, Composition composition, double beta,
        double oneMinusBeta, double centralDensity, double centralPressure, double centralTemperature,
        double eddingtonLuminosity, double luminosity, double gamma1, StabilityResult stability) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture (μ sets β, X sets κ_es)
     * @param beta P_gas/P, the same everywhere
     * @param oneMinusBeta P_rad/P, the same everywhere
     * @param centralDensity ρ_c [g/cm3]
     * @param centralPressure P_c [dyn/cm2]
     * @param centralTemperature T_c [K]
     * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es [erg/s]
     * @param luminosity L = (1 − β) L_Edd under the model's assumptions [erg/s]
     * @param gamma1 Γ1 of the mixture at this β, the same everywhere, so also ⟨Γ1⟩
     * @param stability the stability estimate at this radius
     */
    public StandardModelState {
        Objects.requireNonNull(composition, "composition");
        Objects.requireNonNull(stability, "stability");
    }
}
