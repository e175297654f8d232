package org.stellabar.structure;

/**
 * Gas and radiation shares of the pressure, each computed without cancellation.
 *
 * @param beta P_gas/P, in (0, 1]
 * @param oneMinusBeta P_rad/P, in [0, 1)
 */
public record BetaSolution(double beta, double oneMinusBeta) {
}
