package org.stellabar.observed;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * The Monte Carlo spread of one star's estimate.
 *
 * @param percentiles median, 16th and 84th percentile of every {@link SpreadQuantity}
 * @param samples draws made
 * @param failedSamples draws that gave no estimate (e.g. a drawn L above L_Edd, a non-positive
 *     drawn value); the percentiles are of the others
 */
public record EstimateSpread(Map<SpreadQuantity, Percentiles> percentiles, int samples, int failedSamples) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param percentiles median, 16th and 84th percentile of every {@link SpreadQuantity}
     * @param samples draws made
     * @param failedSamples draws that gave no estimate (e.g. a drawn L above L_Edd, a non-positive
     *        drawn value); the percentiles are of the others
     */
    public EstimateSpread {
        Objects.requireNonNull(percentiles, "percentiles");
        percentiles = Map.copyOf(new EnumMap<>(percentiles));
        if (percentiles.size() != SpreadQuantity.values().length) {
            throw new IllegalArgumentException("a spread needs every quantity");
        }
        if (failedSamples < 0 || failedSamples >= samples) {
            throw new IllegalArgumentException("failed samples " + failedSamples + " of " + samples);
        }
    }

    /**
     * @param quantity one quantity
     * @return its percentiles
     */
    public Percentiles of(SpreadQuantity quantity) {
        return percentiles.get(quantity);
    }
}
