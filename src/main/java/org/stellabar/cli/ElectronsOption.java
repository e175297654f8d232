package org.stellabar.cli;

import org.stellabar.eos.Electrons;
import picocli.CommandLine.Option;

/** {@code --electrons classical|fermi}: which equation of state treats the electrons. */
public final class ElectronsOption {

    @Option(names = "--electrons", paramLabel = "MODEL", defaultValue = "classical",
            description = "Electrons: classical (non-degenerate, non-relativistic; default) or fermi (any degeneracy"
                    + " and relativity, with electron-positron pairs).")
    Electrons electrons;

    /** @return the choice */
    public Electrons electrons() {
        return electrons;
    }
}
