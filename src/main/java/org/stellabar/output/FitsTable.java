package org.stellabar.output;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * What {@link FitsTableReader} read from one BINTABLE extension.
 *
 * @param extensionName EXTNAME, "" when the extension has none
 * @param hduIndex the HDU's position in the file (0 is the primary HDU)
 * @param rowCount the number of rows (NAXIS2)
 * @param columns the numeric scalar columns, in file order, names unique
 * @param textColumns the character columns (trailing blanks removed, as FITS defines them)
 * @param skipped columns not read, name → why (vectors, complex numbers, logicals, variable-length
 *     arrays, a repeated name)
 * @param keywords the extension header's valued cards other than the table structure, key →
 *     value as written (strings without quotes), in file order; HIERARCH keys without that word
 *     and with spaces ("STELLABAR INPUT MASS")
 */
public record FitsTable(String extensionName, int hduIndex, int rowCount, List<FitsColumn> columns,
        Map<String, List<String>> textColumns, Map<String, String> skipped, Map<String, String> keywords) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param extensionName EXTNAME, "" when the extension has none
     * @param hduIndex the HDU's position in the file (0 is the primary HDU)
     * @param rowCount the number of rows (NAXIS2)
     * @param columns the numeric scalar columns, in file order, names unique
     * @param textColumns the character columns (trailing blanks removed, as FITS defines them)
     * @param skipped columns not read, name → why (vectors, complex numbers, logicals, variable-length
     *        arrays, a repeated name)
     * @param keywords the extension header's valued cards other than the table structure, key →
     *        value as written (strings without quotes), in file order; HIERARCH keys without that word
     *        and with spaces ("STELLABAR INPUT MASS")
     */
    public FitsTable {
        Objects.requireNonNull(extensionName, "extensionName");
        columns = List.copyOf(columns);
        textColumns = Collections.unmodifiableMap(new LinkedHashMap<>(textColumns));
        skipped = Collections.unmodifiableMap(new LinkedHashMap<>(skipped));
        keywords = Collections.unmodifiableMap(new LinkedHashMap<>(keywords));
    }

    /**
     * @param name the column name
     * @return the numeric column with this name (exact match first, then ignoring case)
     */
    public Optional<FitsColumn> column(String name) {
        Optional<FitsColumn> exact = columns.stream().filter(c -> c.name().equals(name)).findFirst();
        return exact.isPresent() ? exact : columns.stream().filter(c -> c.name().equalsIgnoreCase(name)).findFirst();
    }

    /**
     * @param name a column name
     * @return its values
     * @throws IllegalArgumentException when there is no numeric column of that name
     */
    public double[] values(String name) {
        return column(name).orElseThrow(() -> new IllegalArgumentException("no numeric column " + name
                + " in FITS table " + extensionName + "; columns: "
                + String.join(", ", columns.stream().map(FitsColumn::name).toList()))).values();
    }
}
