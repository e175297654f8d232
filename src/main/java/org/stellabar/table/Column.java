package org.stellabar.table;

/**
 * A named column with a unit and a description: numbers ({@link NumberColumn}) or text
 * ({@link TextColumn}).
 */
public sealed interface Column permits NumberColumn, TextColumn {

    /** @return the column's name, an ASCII identifier such as "rho" or "one_minus_beta" */
    String name();

    /** @return the unit, e.g. "g/cm3"; "" for a dimensionless quantity or text */
    String unit();

    /** @return one line saying what the column holds */
    String description();

    /** @return the number of rows */
    int size();
}
