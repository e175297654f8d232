package org.stellabar.eos;

import java.util.List;

/**
 * One thermodynamic state of the gas + radiation mixture. All values CGS, per unit mass where
 * specific.
 *
 * @param composition the mixture
 * @param rho density [g/cm3]
 * @param T temperature [K]
 * @param P total pressure [dyn/cm2]
 * @param Pgas ion + electron pressure ρkT/(μ m_u) [dyn/cm2]
 * @param Prad radiation pressure aT⁴/3 [dyn/cm2]
 * @param beta P_gas/P
 * @param oneMinusBeta P_rad/P, computed directly (no cancellation)
 * @param u specific internal energy [erg/g]
 * @param s specific entropy [erg/g/K]
 * @param sPerBaryon entropy per baryon in units of k_B, s m_u/k
 * @param f specific Helmholtz free energy u − Ts [erg/g]
 * @param g specific Gibbs free energy f + P/ρ [erg/g]
 * @param chiRho (∂ln P/∂ln ρ)_T
 * @param chiT (∂ln P/∂ln T)_ρ
 * @param delta −(∂ln ρ/∂ln T)_P = χ_T/χ_ρ
 * @param cV specific heat at constant volume [erg/g/K]
 * @param cP specific heat at constant pressure [erg/g/K]
 * @param Gamma1 (∂ln P/∂ln ρ)_s
 * @param Gamma2 Γ2, defined by Γ2/(Γ2−1) = (∂ln P/∂ln T)_s
 * @param Gamma3 Γ3, defined by Γ3 − 1 = (∂ln T/∂ln ρ)_s
 * @param nablaAd (∂ln T/∂ln P)_s
 * @param soundSpeed adiabatic sound speed √(Γ1 P/ρ) [cm/s]
 * @param photonDensity photon number density n_γ [1/cm3]
 * @param meanPhotonEnergy mean photon energy [erg]
 * @param photonsPerBaryon n_γ m_u/ρ
 * @param warnings the regimes where the idealized physics is doubtful at this state
 */
public record EosState(Composition composition, double rho, double T, double P, double Pgas, double Prad,
        double beta, double oneMinusBeta, double u, double s, double sPerBaryon, double f, double g,
        double chiRho, double chiT, double delta, double cV, double cP, double Gamma1, double Gamma2,
        double Gamma3, double nablaAd, double soundSpeed, double photonDensity, double meanPhotonEnergy,
        double photonsPerBaryon, List<ValidityWarning> warnings) {

    /**
     * Canonical constructor: copies collections in.
     *
     * @param composition the mixture
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @param P total pressure [dyn/cm2]
     * @param Pgas ion + electron pressure ρkT/(μ m_u) [dyn/cm2]
     * @param Prad radiation pressure aT⁴/3 [dyn/cm2]
     * @param beta P_gas/P
     * @param oneMinusBeta P_rad/P, computed directly (no cancellation)
     * @param u specific internal energy [erg/g]
     * @param s specific entropy [erg/g/K]
     * @param sPerBaryon entropy per baryon in units of k_B, s m_u/k
     * @param f specific Helmholtz free energy u − Ts [erg/g]
     * @param g specific Gibbs free energy f + P/ρ [erg/g]
     * @param chiRho (∂ln P/∂ln ρ)_T
     * @param chiT (∂ln P/∂ln T)_ρ
     * @param delta −(∂ln ρ/∂ln T)_P = χ_T/χ_ρ
     * @param cV specific heat at constant volume [erg/g/K]
     * @param cP specific heat at constant pressure [erg/g/K]
     * @param Gamma1 (∂ln P/∂ln ρ)_s
     * @param Gamma2 Γ2, defined by Γ2/(Γ2−1) = (∂ln P/∂ln T)_s
     * @param Gamma3 Γ3, defined by Γ3 − 1 = (∂ln T/∂ln ρ)_s
     * @param nablaAd (∂ln T/∂ln P)_s
     * @param soundSpeed adiabatic sound speed √(Γ1 P/ρ) [cm/s]
     * @param photonDensity photon number density n_γ [1/cm3]
     * @param meanPhotonEnergy mean photon energy [erg]
     * @param photonsPerBaryon n_γ m_u/ρ
     * @param warnings the regimes where the idealized physics is doubtful at this state
     */
    public EosState {
        warnings = List.copyOf(warnings);
    }

    /**
     * @param regime the regime
     * @return true if the named regime is flagged at this state
     */
    public boolean has(ValidityWarning.Regime regime) {
        return warnings.stream().anyMatch(w -> w.code() == regime);
    }
}
