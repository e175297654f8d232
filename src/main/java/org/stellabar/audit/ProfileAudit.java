package org.stellabar.audit;

import java.util.Objects;
import org.stellabar.eos.Electrons;

/**
 * The audit of one profile: what was read, each shell, and the star.
 *
 * @param input the profile as read, with its column choices and skipped rows
 * @param shells the per-shell results, centre first
 * @param star the whole-star results
 * @param electrons the equation of state the shells were computed with
 */
public record ProfileAudit(LoadedProfile input, ShellAudit shells, StarAudit star, Electrons electrons) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param input the profile as read, with its column choices and skipped rows
     * @param shells the per-shell results, centre first
     * @param star the whole-star results
     * @param electrons which equation of state the shells were judged with
     */
    public ProfileAudit {
        Objects.requireNonNull(electrons, "electrons");
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(shells, "shells");
        Objects.requireNonNull(star, "star");
    }

    /** @return the profile audited */
    public Profile profile() {
        return input.profile();
    }
}
