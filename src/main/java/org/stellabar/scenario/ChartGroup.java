package org.stellabar.scenario;

/** Groups of charts drawn for each star of a scenario. */
public enum ChartGroup implements Keyword {
    /** density, pressure, temperature and enclosed mass against radius */
    STRUCTURE("structure"),
    /** β and 1 − β (the gas and radiation shares of the pressure) against enclosed mass */
    SUPPORT("support"),
    /** Γ1 against enclosed mass, with the 4/3 line and the pressure-weighted mean */
    EXPONENTS("exponents"),
    /** ∇_ad against the model's own gradient d ln T / d ln P */
    GRADIENTS("gradients");

    private final String word;

    ChartGroup(String word) {
        this.word = word;
    }

    @Override
    public String word() {
        return word;
    }
}
