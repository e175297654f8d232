package org.stellabar.observed;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What a catalogue row gave: an estimate, or the problems that prevented one (never both), and
 * the Monte Carlo spread when the row carries errors.
 *
 * @param star the row as read
 * @param estimate the estimate at the catalogue's values, empty when {@code problems} is not
 * @param problems why there is no estimate, in the order found
 * @param spread median and 16th/84th percentiles, present when the row has errors and an estimate
 */
public record StarOutcome(ObservedStar star, Optional<ObservedEstimate> estimate, List<StarProblem> problems,
        Optional<EstimateSpread> spread) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param star the row as read
     * @param estimate the estimate at the catalogue's values, empty when {@code problems} is not
     * @param problems why there is no estimate, in the order found
     * @param spread median and 16th/84th percentiles, present when the row has errors and an estimate
     */
    public StarOutcome {
        Objects.requireNonNull(star, "star");
        Objects.requireNonNull(estimate, "estimate");
        Objects.requireNonNull(spread, "spread");
        problems = List.copyOf(problems);
        if (estimate.isPresent() == !problems.isEmpty()) {
            throw new IllegalArgumentException("row " + star.row() + ": an outcome has an estimate or problems, not both");
        }
        if (spread.isPresent() && estimate.isEmpty()) {
            throw new IllegalArgumentException("row " + star.row() + ": a spread needs an estimate");
        }
    }

    /** @return true if the star has an estimate */
    public boolean estimated() {
        return estimate.isPresent();
    }

    /**
     * @param spread the Monte Carlo spread
     * @return this outcome with it
     */
    public StarOutcome withSpread(EstimateSpread spread) {
        return new StarOutcome(star, estimate, problems, Optional.of(spread));
    }
}
