package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SuggestionsTest {

    /** Textbook Levenshtein examples (common practice, no source): kitten→sitting 3, flaw→lawn 2. */
    @ParameterizedTest
    @CsvSource({"kitten, sitting, 3", "flaw, lawn, 2", "'', abc, 3", "same, same, 0", "radus, radius, 1"})
    void editDistance(String a, String b, int expected) {
        assertEquals(expected, Suggestions.distance(a, b));
        assertEquals(expected, Suggestions.distance(b, a));
    }

    @ParameterizedTest
    @CsvSource({
        "radus, radius",
        "Mass, mass",
        "raduis, radius",
        "centraltemperature, central_temperature",
        "temperature, central_temperature",
        "entropy, entropy_per_baryon",
        "output, outputs",
        "x, X"})
    void closeKeysAreSuggested(String typed, String expected) {
        assertEquals(Optional.of(expected), Suggestions.closest(typed, allKeys()));
    }

    @ParameterizedTest
    @CsvSource({"luminosity", "colour", "zzz", "ab"})
    void farKeysAreNotSuggested(String typed) {
        assertEquals(Optional.empty(), Suggestions.closest(typed, allKeys()));
    }

    private static List<String> allKeys() {
        List<String> keys = new ArrayList<>(StarReader.KEYS);
        keys.addAll(CompositionReader.KEYS);
        return keys;
    }
}
