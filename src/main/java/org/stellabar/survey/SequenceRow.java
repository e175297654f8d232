package org.stellabar.survey;

/**
 * One Eddington standard model of a mass sequence. CGS.
 *
 * @param mass M [g]
 * @param beta P_gas/P
 * @param oneMinusBeta P_rad/P
 * @param gamma1 Γ1 (uniform in the model)
 * @param gamma1Excess Γ1 − 4/3, without cancellation
 * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es [erg/s]
 * @param luminosity (1 − β) L_Edd [erg/s]
 * @param criticalRadius radius at the onset of the relativistic instability [cm]
 * @param criticalCentralDensity ρ_c at that radius [g/cm3]
 * @param criticalCentralTemperature T_c at that radius [K]
 */
public record SequenceRow(double mass, double beta, double oneMinusBeta, double gamma1, double gamma1Excess,
        double eddingtonLuminosity, double luminosity, double criticalRadius, double criticalCentralDensity,
        double criticalCentralTemperature) {
}
