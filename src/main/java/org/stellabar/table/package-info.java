/**
 * The one shape every computation ends in. A {@link org.stellabar.table.Table} is named columns,
 * each with a unit and a description, plus {@link org.stellabar.table.Metadata} (what was
 * computed, from which inputs, by which version with which constants). A
 * {@link org.stellabar.table.Summary} is the same for a single record of named values (a state,
 * a model's summary). Writers and charts read these and nothing else; they know no physics.
 *
 * <p>A summary's values are the closed kinds of {@link org.stellabar.table.Field} (number with
 * unit, integer, text, flag, nested summary, lists, table); writers match on the kind. A column or
 * number field is declared once as a {@link org.stellabar.table.Quantity} (name, unit,
 * description). Metadata inputs are typed {@link org.stellabar.table.Inputs}: a number keeps its
 * unit, so FITS writes a number card with the unit and CSV/JSON the same number.
 *
 * <p>Unit strings are plain ASCII in one spelling: "g/cm3", "dyn/cm2", "K", "cm", "g", "erg/g",
 * "erg/g/K", "cm/s", "erg/s", "1/cm3", "erg", "Msun", "Rsun", "Lsun", and "" for dimensionless.
 * Writers map them to their format's conventions (FITS: "g cm-3", "solMass", ...).
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.table;
