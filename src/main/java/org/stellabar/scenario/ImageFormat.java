package org.stellabar.scenario;

/** Image formats the charts of a scenario are exported in. */
public enum ImageFormat implements Keyword {
    /** raster, 300 dpi */
    PNG("png"),
    /** vector */
    SVG("svg"),
    /** vector, fonts embedded */
    PDF("pdf");

    private final String word;

    ImageFormat(String word) {
        this.word = word;
    }

    @Override
    public String word() {
        return word;
    }
}
