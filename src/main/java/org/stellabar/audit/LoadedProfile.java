package org.stellabar.audit;

import java.util.List;
import java.util.Objects;
import org.stellabar.table.Column;

/**
 * A profile as read, with what the reading decided.
 *
 * @param profile the usable shells, centre first, in CGS
 * @param mapped the file's columns chosen for each quantity found, in quantity order
 * @param inputColumns every column of the file for the usable rows, in file order and file row
 *     order, values as written (not converted), named as in the file (blank names become
 *     column_N, repeated names get _2, _3)
 * @param skipped rows left out under {@code --skip-bad-rows}, in file order
 * @param orderedBy how the order of the shells was decided, e.g. "radius increases down the file"
 * @param compositionSource where the shells' composition came from, one line
 */
public record LoadedProfile(Profile profile, List<MappedColumn> mapped, List<Column> inputColumns,
        List<BadRow> skipped, String orderedBy, String compositionSource) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param profile the usable shells, centre first, in CGS
     * @param mapped the file's columns chosen for each quantity found, in quantity order
     * @param inputColumns every column of the file for the usable rows, in file order and file row
     *        order, values as written (not converted), named as in the file (blank names become
     *        column_N, repeated names get _2, _3)
     * @param skipped rows left out under {@code --skip-bad-rows}, in file order
     * @param orderedBy how the order of the shells was decided, e.g. "radius increases down the file"
     * @param compositionSource where the shells' composition came from, one line
     */
    public LoadedProfile {
        Objects.requireNonNull(profile, "profile");
        mapped = List.copyOf(mapped);
        inputColumns = List.copyOf(inputColumns);
        skipped = List.copyOf(skipped);
        Objects.requireNonNull(orderedBy, "orderedBy");
        Objects.requireNonNull(compositionSource, "compositionSource");
    }

    /**
     * @param quantity a quantity
     * @return the column chosen for it, or null
     */
    public MappedColumn column(ProfileQuantity quantity) {
        return mapped.stream().filter(c -> c.quantity() == quantity).findFirst().orElse(null);
    }
}
