package org.stellabar.table;

import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A column's name and, where the file states it, its unit. {@code CsvWriter} writes header cells
 * as {@code name [unit]}; FITS tables carry the unit in TUNITn.
 *
 * @param name the column name
 * @param unit the unit as written, or {@code null} when the file states none ("" for a column
 *     the file marks as dimensionless with {@code []})
 */
public record ColumnHeading(String name, String unit) {

    private static final Pattern NAME_AND_UNIT = Pattern.compile("(.*?)\\s*\\[([^\\[\\]]*)\\]\\s*");

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name the column name
     * @param unit the unit as written, or {@code null} when the file states none ("" for a column
     *        the file marks as dimensionless with {@code []})
     */
    public ColumnHeading {
        Objects.requireNonNull(name, "name");
        if (unit != null) {
            unit = unit.strip();
        }
    }

    /**
     * Splits a header cell {@code name [unit]} into name and unit; a cell without brackets is a
     * name with no stated unit.
     *
     * @param cell the header cell
     * @return the heading
     */
    public static ColumnHeading parse(String cell) {
        String text = cell.strip();
        Matcher m = NAME_AND_UNIT.matcher(text);
        if (m.matches() && !m.group(1).isEmpty()) {
            return new ColumnHeading(m.group(1), m.group(2));
        }
        return new ColumnHeading(text, null);
    }

    /** @return {@code name [unit]}, or the name alone when no unit is stated */
    @Override
    public String toString() {
        return unit == null ? name : name + " [" + unit + "]";
    }
}
