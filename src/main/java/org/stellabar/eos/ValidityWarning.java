package org.stellabar.eos;

import java.util.Objects;

/**
 * A warning that the idealized physics is doubtful at a state: a stable code for scripts and one
 * line for people, which quotes the number that triggered it.
 *
 * @param code the regime flagged
 * @param message one line, e.g. "electron degeneracy n_e λ_e³/2 = 0.31 (> 0.1) ..."
 */
public record ValidityWarning(Regime code, String message) {

    public ValidityWarning {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(message, "message");
    }

    /**
     * The regimes where a fully ionized classical ideal gas plus black-body radiation stops being
     * a good description (or, for {@link #RADIATION_DOMINATED}, where a reader should know that
     * radiation carries most of the pressure). Each has a bit for the array path.
     */
    public enum Regime {
        ELECTRON_DEGENERACY,
        RELATIVISTIC_ELECTRONS,
        PAIR_CREATION,
        COULOMB_COUPLING,
        PARTIAL_IONIZATION,
        RADIATION_DOMINATED;

        /** @return the bit of this regime in a warning mask */
        public int bit() {
            return 1 << ordinal();
        }

        /** @return the stable code, e.g. "electron_degeneracy" */
        public String code() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
