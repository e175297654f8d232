package org.stellabar.scenario;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * "Did you mean ...?" for mistyped keys and words: the closest candidate by Levenshtein edit
 * distance, ignoring case, when it is close enough to be a likely typing slip; or a candidate that
 * contains the word, or is contained in it (e.g. "temperature" for "central_temperature").
 */
final class Suggestions {

    private Suggestions() {
    }

    /**
     * @param word what the user wrote
     * @param candidates the allowed spellings
     * @return the most likely intended candidate, if one is close enough
     */
    static Optional<String> closest(String word, Collection<String> candidates) {
        String w = word.toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : candidates) {
            int d = distance(w, candidate.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = candidate;
                bestDistance = d;
            }
        }
        if (best != null && bestDistance <= tolerance(w.length())) {
            return Optional.of(best);
        }
        if (w.length() >= 4) {
            for (String candidate : candidates) {
                String c = candidate.toLowerCase(Locale.ROOT);
                if (c.length() >= 4 && (c.contains(w) || w.contains(c))) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    /** @return how many edits still count as a slip for a word of this length */
    private static int tolerance(int length) {
        if (length <= 4) {
            return 1;
        }
        return length <= 8 ? 2 : 3;
    }

    /** Levenshtein distance (insertions, deletions, substitutions each cost 1). */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j] + 1, current[j - 1] + 1));
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
