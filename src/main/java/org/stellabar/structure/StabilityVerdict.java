package org.stellabar.structure;

/** The plain-language outcome of a dynamical stability estimate. */
public enum StabilityVerdict {
    /** The pressure-weighted Γ1 exceeds the relativistic threshold by more than the marginal band. */
    STABLE("stable"),
    /** Within the marginal band of the threshold: the estimate cannot tell. */
    MARGINAL("marginal"),
    /** Below the threshold by more than the band: dynamically unstable to radial collapse. */
    UNSTABLE("unstable");

    private final String word;

    StabilityVerdict(String word) {
        this.word = word;
    }

    /** @return the lower-case word used in tables and JSON */
    public String word() {
        return word;
    }
}
