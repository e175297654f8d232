package org.stellabar.audit;

import java.util.Objects;

/**
 * A column of the input file chosen for a quantity, with the unit it is read in.
 *
 * @param quantity the quantity
 * @param index 0-based column index in the file
 * @param column the column's name in the file
 * @param unit the unit in our spelling ("" for a dimensionless quantity)
 * @param factor multiplies the file's numbers into CGS
 * @param unitOrigin where the unit came from: "--units", "header", or "none stated: CGS assumed"
 */
public record MappedColumn(ProfileQuantity quantity, int index, String column, String unit, double factor,
        String unitOrigin) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param quantity the quantity
     * @param index 0-based column index in the file
     * @param column the column's name in the file
     * @param unit the unit in our spelling ("" for a dimensionless quantity)
     * @param factor multiplies the file's numbers into CGS
     * @param unitOrigin where the unit came from: "--units", "header", or "none stated: CGS assumed"
     */
    public MappedColumn {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(unitOrigin, "unitOrigin");
    }

    /** @return e.g. "rho = column 'density' [kg/m3, from --units]" */
    public String describe() {
        String u = quantity.dimension() == null ? "dimensionless" : unit + ", " + unitOrigin;
        return quantity.key() + " = column '" + column + "' [" + u + "]";
    }
}
