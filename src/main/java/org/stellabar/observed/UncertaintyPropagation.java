package org.stellabar.observed;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.SplittableRandom;

/**
 * Monte Carlo propagation of a catalogue's errors to the estimate. Each value with an error is
 * drawn independently from a normal distribution — of the value itself for a linear error, of
 * its log10 for an error in dex (log columns) — and the whole estimate
 * ({@link ObservedStarAnalysis}) is recomputed for each draw; we report the median and the 16th
 * and 84th percentiles of every {@link SpreadQuantity}. Draws that give no estimate (a drawn
 * value ≤ 0, L above L_Edd) are counted and left out. Errors are taken as uncorrelated.
 *
 * <p>Reproducible: the generator is a {@link SplittableRandom} seeded with {@link #SEED} mixed with
 * the row number, so a star's spread depends on its row and values only, not on the other rows
 * or their order. {@link #SAMPLES} draws put the sampling error of a percentile at about
 * 1.5 % of σ (the standard error of the 16th percentile of a normal sample is
 * ≈ 1.8σ/√n·0.55 for n draws; common practice, no source).
 */
public final class UncertaintyPropagation {

    /** Seed of the generator (the date the method was written, 2026-12-04). */
    public static final long SEED = 20261204L;

    /** Draws per star. */
    public static final int SAMPLES = 4000;

    private final ObservedStarAnalysis analysis;
    private final long seed;
    private final int samples;

    /**
     * @param analysis the estimate to repeat
     * @param seed generator seed
     * @param samples draws per star, ≥ 2
     */
    public UncertaintyPropagation(ObservedStarAnalysis analysis, long seed, int samples) {
        this.analysis = Objects.requireNonNull(analysis, "analysis");
        if (samples < 2) {
            throw new IllegalArgumentException("at least 2 Monte Carlo samples, not " + samples);
        }
        this.seed = seed;
        this.samples = samples;
    }

    /** @param analysis the estimate to repeat, with {@link #SEED} and {@link #SAMPLES} */
    public UncertaintyPropagation(ObservedStarAnalysis analysis) {
        this(analysis, SEED, SAMPLES);
    }

    /**
     * @param star a catalogue row
     * @return its spread; empty when the row has no errors or no draw gives an estimate
     */
    public Optional<EstimateSpread> spread(ObservedStar star) {
        if (!star.hasErrors()) {
            return Optional.empty();
        }
        SplittableRandom random = new SplittableRandom(seed ^ (0x9E3779B97F4A7C15L * (star.row() + 1L)));
        Map<SpreadQuantity, double[]> values = new EnumMap<>(SpreadQuantity.class);
        for (SpreadQuantity q : SpreadQuantity.values()) {
            values.put(q, new double[samples]);
        }
        int good = 0;
        List<StarProblem> problems = new ArrayList<>();
        for (int i = 0; i < samples; i++) {
            // every measurement is drawn in every sample, so the stream stays aligned across rows
            double l = draw(star.luminosity(), random);
            double t = draw(star.temperature(), random);
            double r = draw(star.radius(), random);
            double m = draw(star.mass(), random);
            double g = draw(star.gravity(), random);
            problems.clear();
            Optional<ObservedEstimate> e = analysis.estimate(star.row(), l, t, r, m, g, star.composition(), problems);
            if (e.isPresent()) {
                for (SpreadQuantity q : SpreadQuantity.values()) {
                    values.get(q)[good] = q.of(e.get());
                }
                good++;
            }
        }
        if (good == 0) {
            return Optional.empty();
        }
        Map<SpreadQuantity, Percentiles> percentiles = new EnumMap<>(SpreadQuantity.class);
        for (SpreadQuantity q : SpreadQuantity.values()) {
            percentiles.put(q, Percentiles.of(Arrays.copyOf(values.get(q), good)));
        }
        return Optional.of(new EstimateSpread(percentiles, samples, samples - good));
    }

    private static double draw(Optional<Measurement> m, SplittableRandom random) {
        double z = random.nextGaussian();
        return m.map(x -> x.draw(z)).orElse(Double.NaN);
    }
}
