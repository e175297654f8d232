package org.stellabar.cli;

import picocli.CommandLine.Option;

/** {@code --electrons classical|fermi}: which equation of state treats the electrons. */
public final class ElectronsOption {

    /** The two treatments of the electrons. */
    public enum Electrons {
        /** non-degenerate, non-relativistic electrons (the default; GasRadiationEos) */
        classical,
        /** electrons of any degeneracy and relativity with e+e- pairs (FermiGasRadiationEos) */
        fermi
    }

    @Option(names = "--electrons", paramLabel = "MODEL", defaultValue = "classical",
            description = "Electrons: classical (non-degenerate, non-relativistic; default) or fermi (any degeneracy"
                    + " and relativity, with electron-positron pairs).")
    Electrons electrons;

    /** @return the choice */
    public Electrons electrons() {
        return electrons;
    }
}
