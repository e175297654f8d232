package org.stellabar.output;

import com.fasterxml.jackson.core.io.NumberOutput;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.nio.charset.StandardCharsets;

/**
 * The shortest decimal that reads back to the same double, written straight into a byte buffer:
 * the text of {@link NumberOutput#toString(double, boolean)} (Jackson's Schubfach formatter;
 * R. Giulietti, "The Schubfach way to render doubles", 2020), without its two new objects and two
 * copies per number.
 *
 * <p>Why: Jackson offers the formatter only as a call that makes a new formatter object and a new
 * string for every number, which the table writer then copied into its buffer; for the 17 million
 * numbers of a 10^6-point grid that was ~1.7 GB of garbage and a fifth of the formatting time on
 * the first JIT tier (src/bench/README.md, "Ninth pass"). One instance here keeps one Jackson
 * formatter and calls the routine that fills the formatter's own digit buffer, reached through
 * method handles (Jackson is on the class path, whose packages are open to us), then copies those
 * digits out: the same code forms the same digits. If a later Jackson lacks those members, every
 * number goes through the public call instead, with the same text, as it does if a few numbers
 * checked when this class is loaded do not come out as the public call writes them;
 * {@code ShortestDecimalTest.reusesJacksonsFormatter} then fails, so that the loss is noticed.
 *
 * <p>Not thread-safe: one instance per thread (a table block's formatting makes its own).
 */
final class ShortestDecimal {

    /** Longest text: a sign, 17 digits, a point, "E", an exponent sign and three digits. */
    static final int MAX_LENGTH = 24;

    private static final String FORMATTER = "com.fasterxml.jackson.core.io.schubfach.DoubleToDecimal";
    /** The value {@code toDecimal} returns for a finite non-zero number (its digits in the buffer). */
    private static final int NON_SPECIAL = 0;

    /** The texts of 0.0 and −0.0, as the public call writes them. */
    private static final byte[] ZERO = NumberOutput.toString(0.0, true).getBytes(StandardCharsets.ISO_8859_1);
    private static final byte[] MINUS_ZERO = NumberOutput.toString(-0.0, true).getBytes(StandardCharsets.ISO_8859_1);

    /**
     * Whether numbers go through the reused formatter: its members were found, and a few numbers
     * of every shape give the public call's text (members that kept their names but changed
     * their meaning in a later Jackson would otherwise write wrong digits).
     */
    private static final boolean REUSED;

    // static final, so that the first JIT tier treats the handles as constants and inlines them
    private static final MethodHandle CREATE;
    private static final MethodHandle TO_DECIMAL;
    private static final MethodHandle DIGITS;
    private static final MethodHandle LAST_INDEX;

    static {
        MethodHandle create = null;
        MethodHandle toDecimal = null;
        MethodHandle digits = null;
        MethodHandle lastIndex = null;
        try {
            Class<?> formatter = Class.forName(FORMATTER, false, ShortestDecimal.class.getClassLoader());
            MethodHandles.Lookup lookup = MethodHandles.privateLookupIn(formatter, MethodHandles.lookup());
            create = lookup.findConstructor(formatter, MethodType.methodType(void.class))
                    .asType(MethodType.methodType(Object.class));
            toDecimal = lookup.findVirtual(formatter, "toDecimal", MethodType.methodType(int.class, double.class))
                    .asType(MethodType.methodType(int.class, Object.class, double.class));
            digits = lookup.findGetter(formatter, "bytes", byte[].class)
                    .asType(MethodType.methodType(byte[].class, Object.class));
            lastIndex = lookup.findGetter(formatter, "index", int.class)
                    .asType(MethodType.methodType(int.class, Object.class));
        } catch (ReflectiveOperationException | RuntimeException e) {
            // a Jackson without these members (or a module layer that closes them): the public call
            create = null;
        }
        CREATE = create;
        TO_DECIMAL = create == null ? null : toDecimal;
        DIGITS = create == null ? null : digits;
        LAST_INDEX = create == null ? null : lastIndex;
        boolean reused;
        try {
            reused = create != null && sameTextAsThePublicCall();
        } catch (RuntimeException e) {
            reused = false;
        }
        REUSED = reused;
    }

    /** Jackson's formatter, or null when every number goes through the public call. */
    private final Object formatter;
    /** The formatter's digit buffer (the same array for its whole life). */
    private final byte[] digits;

    ShortestDecimal() {
        this(REUSED);
    }

    /** @return an instance that takes every number through the public call (the fallback, for tests) */
    static ShortestDecimal publicCallOnly() {
        return new ShortestDecimal(false);
    }

    private ShortestDecimal(boolean reuse) {
        Object f = null;
        byte[] d = null;
        if (reuse) {
            try {
                f = (Object) CREATE.invokeExact();
                d = (byte[]) DIGITS.invokeExact(f);
            } catch (RuntimeException | Error e) {
                throw e;
            } catch (Throwable e) {
                throw new IllegalStateException("Jackson's number formatter cannot be made", e);
            }
        }
        formatter = f;
        digits = d;
    }

    private static boolean sameTextAsThePublicCall() {
        ShortestDecimal probe = new ShortestDecimal(true);
        byte[] buffer = new byte[MAX_LENGTH];
        for (double v : new double[] {1.0, -2.5e-300, Math.PI, 1e23, 123456.0, -Double.MIN_VALUE, Double.MAX_VALUE}) {
            int end = probe.write(v, buffer, 0);
            if (!new String(buffer, 0, end, StandardCharsets.ISO_8859_1).equals(NumberOutput.toString(v, true))) {
                return false;
            }
        }
        return true;
    }

    /** @return whether numbers are formatted by a reused Jackson formatter (else by its public call) */
    static boolean reusesJacksonsFormatter() {
        return REUSED;
    }

    /**
     * Writes the text of {@code value} at {@code at}.
     *
     * @param value a finite double
     * @param into a buffer with at least {@link #MAX_LENGTH} bytes free from {@code at}
     * @param at where the text starts
     * @return where it ends (exclusive)
     */
    int write(double value, byte[] into, int at) {
        if (formatter != null) {
            int kind;
            int last;
            try {
                kind = (int) TO_DECIMAL.invokeExact(formatter, value);
                last = (int) LAST_INDEX.invokeExact(formatter);
            } catch (RuntimeException | Error e) {
                throw e;
            } catch (Throwable e) {
                throw new IllegalStateException("Jackson's number formatter failed on " + value, e);
            }
            if (kind == NON_SPECIAL) {
                int length = last + 1;
                System.arraycopy(digits, 0, into, at, length);
                return at + length;
            }
        }
        // zeros (a grid has a few hundred thousand) as the public call spells them, kept;
        // infinities and NaN, never in our tables, through the call itself
        byte[] text = value == 0 ? (Double.doubleToRawLongBits(value) == 0 ? ZERO : MINUS_ZERO)
                : NumberOutput.toString(value, true).getBytes(StandardCharsets.ISO_8859_1);
        System.arraycopy(text, 0, into, at, text.length);
        return at + text.length;
    }
}
