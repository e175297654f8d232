package org.stellabar.observed;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Estimates every star of a catalogue: the estimate at the catalogue's values and, for rows with
 * errors, the Monte Carlo spread. Rows are independent: a bad row leaves the others untouched.
 */
public final class ObservedCatalogue {

    private final ObservedStarAnalysis analysis;
    private final UncertaintyPropagation propagation;

    /**
     * @param analysis the per-star estimate
     * @param propagation the error propagation
     */
    public ObservedCatalogue(ObservedStarAnalysis analysis, UncertaintyPropagation propagation) {
        this.analysis = Objects.requireNonNull(analysis, "analysis");
        this.propagation = Objects.requireNonNull(propagation, "propagation");
    }

    /** @param analysis the per-star estimate, with the default seed and sample count */
    public ObservedCatalogue(ObservedStarAnalysis analysis) {
        this(analysis, new UncertaintyPropagation(analysis));
    }

    /**
     * @param stars the catalogue's rows
     * @return one outcome per row, in row order
     */
    public List<StarOutcome> analyze(List<ObservedStar> stars) {
        return analyzeEntries(stars.stream().map(s -> new CatalogueEntry(s, List.of())).toList());
    }

    /**
     * @param entries the catalogue's rows as read; a row with reading problems gets no estimate
     * @return one outcome per row, in row order
     */
    public List<StarOutcome> analyzeEntries(List<CatalogueEntry> entries) {
        List<StarOutcome> outcomes = new ArrayList<>(entries.size());
        for (CatalogueEntry entry : entries) {
            ObservedStar star = entry.star();
            if (!entry.readingProblems().isEmpty()) {
                outcomes.add(new StarOutcome(star, java.util.Optional.empty(), entry.readingProblems(),
                        java.util.Optional.empty()));
                continue;
            }
            StarOutcome outcome = analysis.analyze(star);
            if (outcome.estimated()) {
                outcome = propagation.spread(star).map(outcome::withSpread).orElse(outcome);
            }
            outcomes.add(outcome);
        }
        return outcomes;
    }
}
