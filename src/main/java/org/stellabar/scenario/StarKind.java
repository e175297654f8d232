package org.stellabar.scenario;

/**
 * Which model a star of a scenario is built with, and which keys fix its scale.
 *
 * <ul>
 *   <li>{@link #STANDARD}: the Eddington standard model (n = 3, β constant); fixed by mass,
 *       radius and composition.</li>
 *   <li>{@link #POLYTROPE}: a polytrope of index n in [0, 5) scaled to mass and radius, with T
 *       and β from the gas + radiation equation of state at each point.</li>
 *   <li>{@link #ISENTROPIC}: hydrostatic equilibrium on one adiabat of the gas + radiation
 *       mixture; fixed by the mass and exactly one of radius, central temperature or entropy
 *       per baryon.</li>
 * </ul>
 */
public enum StarKind implements Keyword {
    STANDARD("standard"),
    POLYTROPE("polytrope"),
    ISENTROPIC("isentropic");

    private final String word;

    StarKind(String word) {
        this.word = word;
    }

    @Override
    public String word() {
        return word;
    }

    /** @return true if the kind needs a polytropic index (and accepts one) */
    public boolean takesIndex() {
        return this == POLYTROPE;
    }

    /**
     * @return true if the radius is the only way to fix the scale (standard and polytrope);
     *     false if one of radius, central temperature or entropy per baryon does it (isentropic)
     */
    public boolean needsRadius() {
        return this != ISENTROPIC;
    }
}
