package org.stellabar.scenario;

/** File formats a star's profile table can be written in (open standards). */
public enum ProfileFormat implements Keyword {
    /** comma-separated values with a commented header carrying units */
    CSV("csv"),
    /** FITS binary table with TUNITn */
    FITS("fits"),
    /** one JSON document */
    JSON("json");

    private final String word;

    ProfileFormat(String word) {
        this.word = word;
    }

    @Override
    public String word() {
        return word;
    }
}
