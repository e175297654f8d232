package org.stellabar.table;

/**
 * One input of a computation, as {@link Metadata} records it: a number with its unit
 * ({@link NumberInput}), a whole number ({@link IntegerInput}) or text ({@link TextInput}). Writers
 * put numbers where their format holds numbers (a FITS number card with its unit, a JSON number)
 * and never parse text back into numbers.
 */
public sealed interface Input permits NumberInput, IntegerInput, TextInput {

    /** @return the input's name as the user would recognise it, e.g. "M", "points", "kind" */
    String name();

    /** @return the value as a reader sees it on one line: "40.0 Msun", "600", "standard" */
    String text();
}
