package org.stellabar.output;

import java.util.Arrays;
import java.util.Optional;

/**
 * The file formats a table is written in (open standards). The word is what a user writes to
 * choose the format, on the command line ({@code --table-formats}) and in scenario files
 * ({@code table_formats}, {@code outputs}); the extension ends the file's name.
 */
public enum TableFormat {
    /** comma-separated values with a commented header carrying units */
    CSV("csv", "csv"),
    /** FITS binary table with TUNITn */
    FITS("fits", "fits"),
    /** one JSON document */
    JSON("json", "json"),
    /** astropy's Enhanced CSV: units, datatypes, descriptions and metadata in a YAML header */
    ECSV("ecsv", "ecsv"),
    /** the IVOA VOTable: units, UCDs, descriptions, metadata as PARAMs and INFOs */
    VOTABLE("votable", "vot");

    private final String word;
    private final String extension;

    TableFormat(String word, String extension) {
        this.word = word;
        this.extension = extension;
    }

    /** @return the word that chooses the format: "csv", "ecsv", "fits", "votable", "json" */
    public String word() {
        return word;
    }

    /** @return the file name extension, without the dot: "csv", "ecsv", "fits", "vot", "json" */
    public String extension() {
        return extension;
    }

    /**
     * @param word a format's word, as a user writes it (case ignored)
     * @return the format, if any has this word
     */
    public static Optional<TableFormat> ofWord(String word) {
        return Arrays.stream(values()).filter(f -> f.word.equalsIgnoreCase(word.strip())).findFirst();
    }
}
