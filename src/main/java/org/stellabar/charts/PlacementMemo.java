package org.stellabar.charts;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;

/**
 * Point-label placements already worked out in this process. The same chart is drawn once per
 * file format (PDF, SVG, PNG), usually at the same time on other threads, and its label search
 * (thousands of candidate boxes per label) is the costliest part of drawing it. The placement is
 * a pure function of its inputs — the markers, the label sizes, and everything already on the
 * plot — so those inputs, compared exactly, are the key, and a search with the same key returns
 * the same placements: a file is the same bytes whether its labels were searched or looked up.
 * A second caller with a key being searched waits for that search. The memo keeps at most
 * {@link #CAPACITY} results (emptied when full: the charts of one figure are drawn together).
 */
final class PlacementMemo {

    /** Results kept; a demo's figures in flight at once need a handful. */
    static final int CAPACITY = 64;

    private static final Map<Key, FutureTask<Outcome>> MEMO = new ConcurrentHashMap<>();

    /**
     * A search's result.
     *
     * @param placements one per label, in input order
     * @param after what is on the plot afterwards: the obstacles given, the labels' markers,
     *     the labels and their leaders (never queried, only copied from)
     */
    record Outcome(List<LabelPlacer.Placement> placements, DataObstacles after) {
    }

    /** Everything a placement depends on, as numbers compared bit for bit. */
    static final class Key {
        private final double[] inputs;
        private final int hash;

        /** @param inputs every input, in a fixed order with lengths, see {@link LabelPlacer} */
        Key(double[] inputs) {
            this.inputs = inputs;
            this.hash = Arrays.hashCode(inputs);
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof Key k && k.hash == hash && Arrays.equals(k.inputs, inputs);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }

    private PlacementMemo() {
    }

    /**
     * @param key the inputs
     * @param search the search, run once per key while the key is kept
     * @return the search's outcome for this key
     */
    static Outcome placed(Key key, Supplier<Outcome> search) {
        FutureTask<Outcome> task = new FutureTask<>(search::get);
        FutureTask<Outcome> earlier = MEMO.putIfAbsent(key, task);
        if (earlier == null) {
            if (MEMO.size() > CAPACITY) {
                MEMO.keySet().removeIf(k -> k != key);
            }
            task.run();
        } else {
            task = earlier;
        }
        try {
            return task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("label placement interrupted", e);
        } catch (ExecutionException e) {
            MEMO.remove(key, task);
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        }
    }
}
