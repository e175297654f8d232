package org.stellabar.observed;

import java.util.List;
import java.util.Objects;

/**
 * One catalogue row as read: the star, and what was wrong with its cells (an unreadable number,
 * an impossible composition), which stops its estimate before it starts.
 *
 * @param star the star, with the values that could be read
 * @param readingProblems problems found while reading the row, empty for a clean row
 */
public record CatalogueEntry(ObservedStar star, List<StarProblem> readingProblems) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param star the star, with the values that could be read
     * @param readingProblems problems found while reading the row, empty for a clean row
     */
    public CatalogueEntry {
        Objects.requireNonNull(star, "star");
        readingProblems = List.copyOf(readingProblems);
    }
}
