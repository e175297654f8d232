package org.stellabar.structure;

/**
 * The kinds of physical star model. The constant names are the words the command line and
 * scenario files accept; each kind has one request record ({@link StarRequest}) and one builder
 * ({@link StarModelBuilder}), registered in {@link StarBuilder}.
 */
public enum StarKind {
    /** Eddington's standard model: an n = 3 polytrope whose β is constant and set by M and μ. */
    standard,
    /** A Lane-Emden polytrope of any index 0 ≤ n &lt; 5 scaled to a given mass and radius. */
    polytrope,
    /** Hydrostatic equilibrium on one adiabat of the gas + radiation mixture. */
    isentropic;

    /** @return the word written on the command line and in scenario files */
    public String word() {
        return name();
    }
}
