package org.stellabar.table;

/**
 * One named value of a {@link Summary}. The kinds are closed: a finite number with its unit
 * ({@link NumberField}), an integer ({@link IntegerField}), text ({@link TextField}), a flag
 * ({@link FlagField}), a nested summary ({@link NestedField}), a list of summaries
 * ({@link SummaryListField}), a list of integers such as row numbers ({@link IntegerListField}) or a
 * table ({@link TableField}). Writers tell them apart with {@code instanceof} patterns, so no caller
 * ever casts a value.
 */
public sealed interface Field permits NumberField, IntegerField, TextField, FlagField, NestedField, SummaryListField,
        IntegerListField, TableField {

    /** @return ASCII identifier, the JSON key */
    String name();

    /** @return one line saying what the value means */
    String description();

    /** @return the unit string; "" for everything but a number with a unit */
    default String unit() {
        return "";
    }

    /** @return whether the value is one scalar (number, integer, text or flag) */
    default boolean scalar() {
        return false;
    }
}
