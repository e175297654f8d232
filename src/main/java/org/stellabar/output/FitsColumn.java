package org.stellabar.output;

import java.util.Objects;

/**
 * One numeric column read from a FITS binary table.
 *
 * @param name the TTYPEn value
 * @param unit our unit string when the TUNITn value is one we know ("g/cm3", "dyn/cm2",
 *     "Msun" ...), otherwise the TUNITn value as written; "" when there is none
 * @param fitsUnit the TUNITn value as written, "" when there is none
 * @param description TCOMMn, else the comment of TTYPEn, else ""
 * @param values the values with TSCALn/TZEROn applied; an integer column's TNULLn entries and a
 *     float column's blanks are NaN (unlike our own tables, a foreign file may hold them)
 */
public record FitsColumn(String name, String unit, String fitsUnit, String description, double[] values) {

    /**
     * Canonical constructor: no component may be null; copies arrays in.
     *
     * @param name the TTYPEn value
     * @param unit our unit string when the TUNITn value is one we know ("g/cm3", "dyn/cm2",
     *        "Msun" ...), otherwise the TUNITn value as written; "" when there is none
     * @param fitsUnit the TUNITn value as written, "" when there is none
     * @param description TCOMMn, else the comment of TTYPEn, else ""
     * @param values the values with TSCALn/TZEROn applied; an integer column's TNULLn entries and a
     *        float column's blanks are NaN (unlike our own tables, a foreign file may hold them)
     */
    public FitsColumn {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(fitsUnit, "fitsUnit");
        Objects.requireNonNull(description, "description");
        values = values.clone();
    }

    /** @return a copy of the {@code values} component, so that this record stays unchanged */
    @Override
    public double[] values() {
        return values.clone();
    }

    /**
     * @param i row, 0-based
     * @return the value in row i (0-based), without copying
     */
    public double get(int i) {
        return values[i];
    }

    /** @return the number of rows */
    public int size() {
        return values.length;
    }

    /** @return whether the unit is one of ours (or the column is dimensionless) */
    public boolean unitKnown() {
        return FitsUnits.fromFits(fitsUnit).isPresent();
    }
}
