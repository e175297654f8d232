package org.stellabar.audit;

import java.util.Objects;
import org.stellabar.eos.Composition;

/**
 * Where a shell's composition comes from. With composition columns in the profile (X, Y, Z, any
 * of them) and no composition given for the whole star, each shell uses its own; fractions the
 * profile lacks are completed from the fallback (see {@link ShellComposition}). A composition
 * given for the whole star overrides any columns.
 *
 * @param composition the whole-star composition (given, or the default)
 * @param overridesColumns true if it was given explicitly and must be used even where the
 *     profile has composition columns
 * @param origin where a composition not given explicitly comes from, for the report: "default"
 *     or "recorded in the profile's metadata"
 */
public record CompositionPolicy(Composition composition, boolean overridesColumns, String origin) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param composition the whole-star composition (given, or the default)
     * @param overridesColumns true if it was given explicitly and must be used even where the
     *        profile has composition columns
     * @param origin where a composition not given explicitly comes from, for the report: "default"
     *        or "recorded in the profile's metadata"
     */
    public CompositionPolicy {
        Objects.requireNonNull(composition, "composition");
        Objects.requireNonNull(origin, "origin");
    }

    /**
     * @param composition given for the whole star
     * @return a policy that ignores composition columns
     */
    public static CompositionPolicy wholeStar(Composition composition) {
        return new CompositionPolicy(composition, true, "given");
    }

    /**
     * @param fallback used where the profile has no composition columns, and to complete them
     * @return a policy that prefers the profile's columns
     */
    public static CompositionPolicy columnsFirst(Composition fallback) {
        return new CompositionPolicy(fallback, false, "default");
    }

    /**
     * @param recorded the composition a stellabar profile records in its metadata
     * @return a policy that prefers the profile's columns and falls back to the recorded composition
     */
    public static CompositionPolicy recordedInProfile(Composition recorded) {
        return new CompositionPolicy(recorded, false, "recorded in the profile's metadata");
    }
}
