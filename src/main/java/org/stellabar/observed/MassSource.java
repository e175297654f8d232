package org.stellabar.observed;

/** Where a star's mass came from. Each constant's name is the word in outputs. */
public enum MassSource {
    /** The catalogue's mass. */
    catalogue,
    /** M = gR²/G from the catalogue's log g and the radius. */
    log_g,
    /** The standard model's mass for the observed L: model-dependent. */
    standard_model_L
}
