package org.stellabar.eos;

/**
 * An equation of state: the full thermodynamic state of a mixture at density and temperature.
 * Implemented by {@link GasRadiationEos} (classical electrons, the default) and by
 * {@link org.stellabar.eos.fermi.FermiGasRadiationEos} (electrons of any degeneracy with pairs).
 */
public interface EquationOfState {

    /** @return the mixture */
    Composition composition();

    /**
     * @param rho density [g/cm3], positive and finite
     * @param T temperature [K], positive and finite
     * @return the state with its validity warnings
     */
    EosState state(double rho, double T);
}
