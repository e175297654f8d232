package org.stellabar.validation;

import java.util.Objects;

/**
 * One comparison of our value with a reference value.
 *
 * @param family the family's identifier
 * @param quantity what is compared
 * @param parameters the parameters as written, "" for none
 * @param unit the unit of both values, "" if dimensionless
 * @param reference the reference value as printed
 * @param referenceValue the reference value
 * @param ours our value (may be non-finite only if the computation failed, which fails the check)
 * @param deviation |ours − reference|, relative or absolute as the tolerance is
 * @param tolerance the tolerance
 * @param provenance where the reference value comes from
 * @param source the short citation, or the script that computed the value
 * @param origin where the row is: "file.csv line N", or a description for computed checks
 */
public record CheckResult(String family, String quantity, String parameters, String unit, String reference,
        double referenceValue, double ours, double deviation, Tolerance tolerance, Provenance provenance,
        String source, String origin) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param family the family's identifier
     * @param quantity what is compared
     * @param parameters the parameters as written, "" for none
     * @param unit the unit of both values, "" if dimensionless
     * @param reference the reference value as printed
     * @param referenceValue the reference value
     * @param ours our value (may be non-finite only if the computation failed, which fails the check)
     * @param deviation |ours − reference|, relative or absolute as the tolerance is
     * @param tolerance the tolerance
     * @param provenance where the reference value comes from
     * @param source the short citation, or the script that computed the value
     * @param origin where the row is: "file.csv line N", or a description for computed checks
     */
    public CheckResult {
        Objects.requireNonNull(family, "family");
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(parameters, "parameters");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(reference, "reference");
        Objects.requireNonNull(tolerance, "tolerance");
        Objects.requireNonNull(provenance, "provenance");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(origin, "origin");
    }

    /**
     * Compares our value with one reference row.
     *
     * @param family the family's identifier
     * @param row the reference row
     * @param ours our value
     * @return the result
     */
    public static CheckResult compare(String family, ReferenceValue row, double ours) {
        return new CheckResult(family, row.quantity(), row.parameterText(), row.unit(), row.printed(), row.value(),
                ours, row.tolerance().deviation(row.value(), ours), row.tolerance(), row.provenance(), row.source(),
                row.where());
    }

    /** @return deviation / tolerance: at most 1 passes; +∞ when our value is not finite */
    public double ratio() {
        return deviation / tolerance.amount();
    }

    /** @return true if the deviation is within the tolerance */
    public boolean passed() {
        return deviation <= tolerance.amount();
    }

    /** @return "quantity (parameters)" */
    public String label() {
        return parameters.isEmpty() ? quantity : quantity + " (" + parameters + ")";
    }
}
