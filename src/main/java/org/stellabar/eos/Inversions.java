package org.stellabar.eos;

/**
 * States of an {@link EquationOfState} given by pairs other than (ρ, T), as the structure models
 * need them: (ρ, P) → T along a polytrope and (P, s) → (ρ, T) along an adiabat. Implemented by
 * {@link EosInversion} (classical electrons) and
 * {@link org.stellabar.eos.fermi.FermiEosInversion} (electrons of any degeneracy with pairs);
 * each states its method and the range it searches. A request with no solution throws
 * {@link org.stellabar.physics.BadInputException}; an iteration that exhausts its bound throws
 * {@link org.stellabar.physics.ConvergenceException}.
 */
public interface Inversions {

    /** @return the forward equation of state */
    EquationOfState eos();

    /**
     * @param P total pressure [dyn/cm2]
     * @param T temperature [K]
     * @return ρ [g/cm3] with P(ρ, T) = P
     */
    double density(double P, double T);

    /**
     * @param rho density [g/cm3]
     * @param P total pressure [dyn/cm2]
     * @return T [K] with P(ρ, T) = P
     */
    double temperature(double rho, double P);

    /**
     * @param rho density [g/cm3]
     * @param P total pressure [dyn/cm2]
     * @return the state at (ρ, P)
     */
    EosState atDensityPressure(double rho, double P);

    /**
     * @param rho density [g/cm3]
     * @param s specific entropy [erg/g/K]
     * @return the state at (ρ, s)
     */
    EosState atDensityEntropy(double rho, double s);

    /**
     * @param P total pressure [dyn/cm2]
     * @param s specific entropy [erg/g/K]
     * @return the state on the isobar P with entropy s
     */
    EosState atPressureEntropy(double P, double s);

    /**
     * @param P total pressure [dyn/cm2]
     * @param s specific entropy [erg/g/K]
     * @return ln T of the state on the isobar P with entropy s (T in K)
     */
    double temperatureOnIsobar(double P, double s);
}
