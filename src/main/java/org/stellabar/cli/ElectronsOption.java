package org.stellabar.cli;

import org.stellabar.eos.Electrons;

/** {@code --electrons classical|fermi}: which equation of state treats the electrons. */
public final class ElectronsOption {

    Electrons electrons;

    /** @param m the command that takes {@code --electrons} */
    void describe(CommandModel m) {
        m.option("--electrons").label("MODEL").defaultValue("classical")
                .description("Electrons: classical (non-degenerate, non-relativistic; default) or fermi (any degeneracy"
                        + " and relativity, with electron-positron pairs).")
                .field(this, "electrons");
    }

    /** @return the choice */
    public Electrons electrons() {
        return electrons;
    }
}
