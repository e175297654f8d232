package org.stellabar.pipeline;

import org.stellabar.physics.BadInputException;

/**
 * The K-th of N equal parts of a job's outer axis (the masses of a sequence, the ρ or P values of
 * a grid), for one task of a cluster job array. One naming rule for every part: a part is always
 * {@code NAME-K-of-N}, also for 1/1, and never has charts (a chart of a part shows a fragment;
 * the parts are joined before plotting).
 *
 * @param part K, 1 to {@code parts}
 * @param parts N, at least 1
 */
public record Shard(int part, int parts) {

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param part K, 1 to {@code parts}
     * @param parts N, at least 1
     */
    public Shard {
        if (parts < 1 || part < 1 || part > parts) {
            throw new BadInputException("shard " + part + "/" + parts + " is not allowed; K/N needs 1 <= K <= N");
        }
    }

    /**
     * @param size values on the outer axis
     * @return the first index of this part
     */
    public int from(int size) {
        return (int) ((long) size * (part - 1) / parts);
    }

    /**
     * @param size values on the outer axis
     * @return one past the last index of this part
     */
    public int to(int size) {
        return (int) ((long) size * part / parts);
    }

    /**
     * @param name the whole job's file stem, e.g. "grid"
     * @return this part's file stem, {@code NAME-K-of-N}
     */
    public String stem(String name) {
        return name + "-" + part + "-of-" + parts;
    }
}
