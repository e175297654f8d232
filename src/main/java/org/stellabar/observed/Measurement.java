package org.stellabar.observed;

/**
 * One catalogue value with its 1σ error, in CGS.
 *
 * @param value the value [CGS unit of the quantity: erg/s, K, cm, g, cm/s²], finite (its sign is
 *     checked by the estimate, where a non-positive value is a problem of the row)
 * @param error the 1σ error, ≥ 0 (0: none given); in the value's unit, or in dex when
 *     {@code errorInDex}
 * @param errorInDex true if the error is of log10 of the value (a catalogue's log columns)
 */
public record Measurement(double value, double error, boolean errorInDex) {

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param value the value [CGS unit of the quantity: erg/s, K, cm, g, cm/s²], finite (its sign is
     *        checked by the estimate, where a non-positive value is a problem of the row)
     * @param error the 1σ error, ≥ 0 (0: none given); in the value's unit, or in dex when
     *        {@code errorInDex}
     * @param errorInDex true if the error is of log10 of the value (a catalogue's log columns)
     */
    public Measurement {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("measurement value " + value + " must be finite");
        }
        if (!(error >= 0.0 && Double.isFinite(error))) {
            throw new IllegalArgumentException("measurement error " + error + " must be finite and >= 0");
        }
    }

    /**
     * @param value the value
     * @return the value without an error
     */
    public static Measurement exact(double value) {
        return new Measurement(value, 0.0, false);
    }

    /** @return true if an error was given */
    public boolean hasError() {
        return error > 0.0;
    }

    /**
     * One Monte Carlo draw: value + σz for a linear error, value·10^(σz) for an error in dex.
     *
     * @param z a standard normal deviate
     * @return the drawn value
     */
    public double draw(double z) {
        return errorInDex ? value * Math.pow(10.0, error * z) : value + error * z;
    }
}
