package org.stellabar.structure;

import java.util.Objects;
import java.util.OptionalDouble;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;

/**
 * The headline numbers of one physical star model. CGS.
 *
 * @param name the request's label
 * @param kind the kind of model
 * @param index polytropic index n (3 for the standard model), empty for an isentropic star
 * @param mass total mass M [g]
 * @param radius radius R [cm]
 * @param composition the mixture
 * @param centre the state at the centre (ρ_c, T_c, P_c, β_c, Γ1, entropy, validity warnings)
 * @param stability the dynamical stability estimate
 * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es, κ_es = 0.2(1 + X) cm²/g [erg/s]
 * @param luminosityRatio L/L_Edd: 1 − β for the standard model; for the other kinds the
 *     standard-model value for this M and μ (see {@code luminosityRatioMeaning})
 * @param luminosityRatioMeaning one line saying which of the two {@code luminosityRatio} is
 * @param virialCheck 3∫P dV/(−Ω) − 1
 */
public record StarHeadline(String name, StarKind kind, OptionalDouble index, double mass, double radius,
        Composition composition, EosState centre, StabilityResult stability, double eddingtonLuminosity,
        double luminosityRatio, String luminosityRatioMeaning, double virialCheck) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name the request's label
     * @param kind the kind of model
     * @param index polytropic index n (3 for the standard model), empty for an isentropic star
     * @param mass total mass M [g]
     * @param radius radius R [cm]
     * @param composition the mixture
     * @param centre the state at the centre (ρ_c, T_c, P_c, β_c, Γ1, entropy, validity warnings)
     * @param stability the dynamical stability estimate
     * @param eddingtonLuminosity L_Edd = 4πGMc/κ_es, κ_es = 0.2(1 + X) cm²/g [erg/s]
     * @param luminosityRatio L/L_Edd: 1 − β for the standard model; for the other kinds the
     *        standard-model value for this M and μ (see {@code luminosityRatioMeaning})
     * @param luminosityRatioMeaning one line saying which of the two {@code luminosityRatio} is
     * @param virialCheck 3∫P dV/(−Ω) − 1
     */
    public StarHeadline {
        Objects.requireNonNull(index, "index");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(composition, "composition");
        Objects.requireNonNull(centre, "centre");
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(luminosityRatioMeaning, "luminosityRatioMeaning");
    }

    /** @return mean density 3M/(4πR³) [g/cm3] */
    public double meanDensity() {
        return 3.0 * mass / (4.0 * Math.PI * radius * radius * radius);
    }

    /** @return ρ_c/ρ̄ */
    public double centralToMeanDensity() {
        return centre.rho() / meanDensity();
    }
}
