package org.stellabar.eos;

import java.util.Objects;
import java.util.function.Supplier;

/**
 * A warning that the idealized physics is doubtful at a state: a stable code for scripts and one
 * line for people, which quotes the number that triggered it.
 *
 * <p>Immutable value with record-like {@code code()}, {@code message()}, equality and text. The
 * warnings that {@link ValidityCheck} attaches to every state write their line only when it is
 * first read: formatting costs some microseconds per warning, which loops over flagged states
 * (every state of a radiation-dominated star, say) would otherwise pay for lines nobody reads.
 */
public final class ValidityWarning {

    private final Regime code;
    private final Supplier<String> describer;
    /** The line, once formatted; a benign race at worst formats it twice, to the same text. */
    private String message;

    /**
     * @param code the regime flagged
     * @param message one line, e.g. "electron degeneracy n_e λ_e³/2 = 3.1 (> 1) ..."
     */
    public ValidityWarning(Regime code, String message) {
        this.code = Objects.requireNonNull(code, "code");
        this.message = Objects.requireNonNull(message, "message");
        this.describer = null;
    }

    /** A warning whose line is written on first use by {@code describer}. */
    ValidityWarning(Regime code, Supplier<String> describer) {
        this.code = Objects.requireNonNull(code, "code");
        this.describer = Objects.requireNonNull(describer, "describer");
    }

    /** @return the regime flagged */
    public Regime code() {
        return code;
    }

    /** @return one line for people, quoting the number that triggered the warning */
    public String message() {
        String m = message;
        if (m == null) {
            m = Objects.requireNonNull(describer.get(), "message");
            message = m;
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ValidityWarning w && code == w.code && message().equals(w.message());
    }

    @Override
    public int hashCode() {
        return 31 * code.hashCode() + message().hashCode();
    }

    @Override
    public String toString() {
        return "ValidityWarning[code=" + code + ", message=" + message() + "]";
    }

    /**
     * The regimes where a fully ionized classical ideal gas plus black-body radiation stops being
     * a good description (or, for {@link #RADIATION_DOMINATED}, where a reader should know that
     * radiation carries most of the pressure). Each has a bit for the array path.
     */
    public enum Regime {
        /** Electrons degenerate: n_e λ_e³/2 above {@link ValidityCheck#DEGENERACY_LIMIT}. */
        ELECTRON_DEGENERACY,
        /** Electrons relativistic: kT or p_F c above {@link ValidityCheck#RELATIVISTIC_LIMIT} m_e c². */
        RELATIVISTIC_ELECTRONS,
        /** Electron–positron pairs: T above {@link ValidityCheck#PAIR_TEMPERATURE}. */
        PAIR_CREATION,
        /** Strongly coupled plasma: Γ_C above {@link ValidityCheck#COULOMB_LIMIT}. */
        COULOMB_COUPLING,
        /** Ionization incomplete by the Saha equation (below {@link ValidityCheck#SAHA_MAX_TEMPERATURE}). */
        PARTIAL_IONIZATION,
        /** Radiation carries most of the pressure: β &lt; 1/2. */
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
