package org.stellabar.validation;

import java.util.List;
import java.util.Objects;

/**
 * One reference file: its '#' header (what the source is, how the values were obtained, what the
 * tolerance allows) and its rows.
 *
 * @param file the file name, e.g. "lane-emden-computed.csv"
 * @param family the family named by the header's "family:" line
 * @param header the header lines without the leading "# "
 * @param rows the rows in file order
 */
public record ReferenceTable(String file, String family, List<String> header, List<ReferenceValue> rows) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param file the file name, e.g. "lane-emden-computed.csv"
     * @param family the family named by the header's "family:" line
     * @param header the header lines without the leading "# "
     * @param rows the rows in file order
     */
    public ReferenceTable {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(family, "family");
        header = List.copyOf(header);
        rows = List.copyOf(rows);
    }
}
