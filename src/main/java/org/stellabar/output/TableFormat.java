package org.stellabar.output;

/**
 * The file formats a table is written in (open standards). The extension is also the word a
 * user writes to choose the format, on the command line and in scenario files.
 */
public enum TableFormat {
    /** comma-separated values with a commented header carrying units */
    CSV("csv"),
    /** FITS binary table with TUNITn */
    FITS("fits"),
    /** one JSON document */
    JSON("json"),
    /** astropy's Enhanced CSV: units, datatypes, descriptions and metadata in a YAML header */
    ECSV("ecsv");

    private final String extension;

    TableFormat(String extension) {
        this.extension = extension;
    }

    /** @return the file name extension, without the dot; also the word that chooses the format */
    public String extension() {
        return extension;
    }
}
