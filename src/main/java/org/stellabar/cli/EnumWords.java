package org.stellabar.cli;

import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Reads an enum constant from the word a user types ("png", "fits"), for picocli: the converter
 * of an option and, as an {@link Iterable}, its completion candidates. Case and surrounding
 * spaces are ignored. A word outside the allowed ones is refused through picocli's own
 * conversion error, which the command line prints as one line naming the option and the value,
 * followed here by the allowed words. One subclass with a no-argument constructor per option,
 * because picocli instantiates converters from their class. Each subclass names its constants'
 * words by overriding {@link #word} (a method reference passed in would be a lambda class made at
 * every start: it cannot be kept in the start-up archive next to picocli's interfaces).
 *
 * @param <E> the enum
 */
abstract class EnumWords<E extends Enum<E>> implements ITypeConverter<E>, Iterable<String> {

    private final List<E> allowed;

    /** @param allowed the constants an option accepts, in the order they are listed */
    EnumWords(List<E> allowed) {
        this.allowed = List.copyOf(allowed);
    }

    /**
     * @param constant one of the allowed constants
     * @return the word a user types for it
     */
    abstract String word(E constant);

    @Override
    public E convert(String text) {
        String word = text.strip().toLowerCase(Locale.ROOT);
        for (E e : allowed) {
            if (word(e).equals(word)) {
                return e;
            }
        }
        throw new TypeConversionException("'" + text + "' is not allowed; choose from " + String.join(", ", this));
    }

    @Override
    public Iterator<String> iterator() {
        List<String> words = new java.util.ArrayList<>(allowed.size());
        for (E e : allowed) {
            words.add(word(e));
        }
        return words.iterator();
    }
}
