package org.stellabar.audit;

import java.util.Objects;
import org.stellabar.eos.ValidityWarning.Regime;

/**
 * A run of neighbouring shells where the ideal gas + radiation description fails in one way.
 *
 * @param regime what fails
 * @param firstRow the smallest data-row number of the run, as in the file
 * @param lastRow the largest data-row number of the run
 * @param shells the number of shells in the run
 * @param innerMassFraction m/M at the run's inner edge, or NaN without masses
 * @param outerMassFraction m/M at the run's outer edge, or NaN without masses
 * @param message the warning at the run's innermost shell, quoting its number
 */
public record FailureZone(Regime regime, int firstRow, int lastRow, int shells, double innerMassFraction,
        double outerMassFraction, String message) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param regime what fails
     * @param firstRow the smallest data-row number of the run, as in the file
     * @param lastRow the largest data-row number of the run
     * @param shells the number of shells in the run
     * @param innerMassFraction m/M at the run's inner edge, or NaN without masses
     * @param outerMassFraction m/M at the run's outer edge, or NaN without masses
     * @param message the warning at the run's innermost shell, quoting its number
     */
    public FailureZone {
        Objects.requireNonNull(regime, "regime");
        Objects.requireNonNull(message, "message");
    }

    /** @return true if masses were available to place the zone */
    public boolean hasMassFractions() {
        return !Double.isNaN(innerMassFraction);
    }
}
