package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

/**
 * A choice written as a lower-case word in a scenario file ({@code "polytrope"}, {@code "csv"}).
 * Implemented by the enums of this package; enums of other packages (the table and chart formats,
 * which must not know this package) are read through a word function such as
 * {@code ChartFormat::extension}, so that one lookup and one error message serve all.
 */
public interface Keyword {

    /** @return the word as written in a scenario file */
    String word();

    /**
     * Finds the constant written as {@code word} (exact, case-sensitive match).
     *
     * @param type the enum class
     * @param word the word from the file
     * @param <E> the enum type
     * @return the constant, or empty when no constant is written so
     */
    static <E extends Enum<E> & Keyword> Optional<E> lookup(Class<E> type, String word) {
        return lookup(type, Keyword::word, word);
    }

    /**
     * Finds the constant written as {@code word} (exact, case-sensitive match).
     *
     * @param type the enum class
     * @param wordOf the word of each constant
     * @param word the word from the file
     * @param <E> the enum type
     * @return the constant, or empty when no constant is written so
     */
    static <E extends Enum<E>> Optional<E> lookup(Class<E> type, Function<? super E, String> wordOf, String word) {
        for (E e : type.getEnumConstants()) {
            if (wordOf.apply(e).equals(word)) {
                return Optional.of(e);
            }
        }
        return Optional.empty();
    }

    /**
     * @param type the enum class
     * @param <E> the enum type
     * @return every word of the enum, in declaration order
     */
    static <E extends Enum<E> & Keyword> List<String> words(Class<E> type) {
        return words(type, Keyword::word);
    }

    /**
     * @param type the enum class
     * @param wordOf the word of each constant
     * @param <E> the enum type
     * @return every word of the enum, in declaration order
     */
    static <E extends Enum<E>> List<String> words(Class<E> type, Function<? super E, String> wordOf) {
        List<String> words = new ArrayList<>();
        for (E e : type.getEnumConstants()) {
            words.add(wordOf.apply(e));
        }
        return words;
    }
}
