package org.stellabar.cli;

import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Reads an enum constant from the word a user types ("png", "fits"), for picocli: the converter
 * of an option and, as an {@link Iterable}, its completion candidates. Case and surrounding
 * spaces are ignored. A word outside the allowed ones is refused through picocli's own
 * conversion error, which the command line prints as one line naming the option and the value,
 * followed here by the allowed words. One subclass with a no-argument constructor per option,
 * because picocli instantiates converters from their class.
 *
 * @param <E> the enum
 */
abstract class EnumWords<E extends Enum<E>> implements ITypeConverter<E>, Iterable<String> {

    private final List<E> allowed;
    private final Function<? super E, String> wordOf;

    /**
     * @param allowed the constants an option accepts, in the order they are listed
     * @param wordOf the word of each constant
     */
    EnumWords(List<E> allowed, Function<? super E, String> wordOf) {
        this.allowed = List.copyOf(allowed);
        this.wordOf = wordOf;
    }

    @Override
    public E convert(String text) {
        String word = text.strip().toLowerCase(Locale.ROOT);
        for (E e : allowed) {
            if (wordOf.apply(e).equals(word)) {
                return e;
            }
        }
        throw new TypeConversionException("'" + text + "' is not allowed; choose from " + String.join(", ", this));
    }

    @Override
    public Iterator<String> iterator() {
        return allowed.stream().<String>map(wordOf).iterator();
    }
}
