package org.stellabar.audit;

import java.util.Objects;

/**
 * The audit of one profile: what was read, each shell, and the star.
 *
 * @param input the profile as read, with its column choices and skipped rows
 * @param shells the per-shell results, centre first
 * @param star the whole-star results
 */
public record ProfileAudit(LoadedProfile input, ShellAudit shells, StarAudit star) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param input the profile as read, with its column choices and skipped rows
     * @param shells the per-shell results, centre first
     * @param star the whole-star results
     */
    public ProfileAudit {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(shells, "shells");
        Objects.requireNonNull(star, "star");
    }

    /** @return the profile audited */
    public Profile profile() {
        return input.profile();
    }
}
