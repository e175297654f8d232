package org.stellabar.observed;

/** Why a star of a catalogue has no estimate. Each constant's name is the code in outputs. */
public enum ProblemKind {
    /** A value the estimate needs is absent or unreadable. */
    missing_value,
    /** The values cannot describe a star (non-positive, or L, T_eff and R disagree). */
    impossible_combination,
    /** L is at or above the Eddington luminosity: no hydrostatic electron-scattering star. */
    above_eddington,
    /** A value is outside the range the standard model is solved for (10⁻² to 10⁸ M☉). */
    out_of_range
}
