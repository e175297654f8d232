package org.stellabar.eos;

import org.stellabar.eos.fermi.FermiEosInversion;
import org.stellabar.eos.fermi.FermiGasRadiationEos;

/**
 * Which physics treats the electrons: the one choice that picks an {@link EquationOfState} for a
 * mixture. The word of each constant is what users write ({@code --electrons fermi},
 * {@code electrons = "fermi"}).
 */
public enum Electrons {
    /** Non-degenerate, non-relativistic electrons without pairs ({@link GasRadiationEos}; the default). */
    classical,
    /** Electrons of any degeneracy and relativity with e± pairs ({@link FermiGasRadiationEos}). */
    fermi;

    /**
     * @param composition the mixture
     * @return the equation of state of this treatment
     */
    public EquationOfState equationOfState(Composition composition) {
        return this == classical ? new GasRadiationEos(composition) : new FermiGasRadiationEos(composition);
    }

    /**
     * @param composition the mixture
     * @return the inversions of this treatment's equation of state
     */
    public Inversions inversions(Composition composition) {
        return this == classical ? new EosInversion(new GasRadiationEos(composition))
                : new FermiEosInversion(new FermiGasRadiationEos(composition));
    }
}
