package org.stellabar.charts;

/**
 * The file formats a chart is exported in. The extension is also the word a user writes to choose
 * the format, on the command line and in scenario files.
 */
public enum ChartFormat {
    /** Raster at 300 dots per inch, the resolution recorded in the file. */
    PNG("png", new PngChartWriter()),
    /** Vector; byte-identical output for identical charts. */
    SVG("svg", new SvgChartWriter()),
    /** Vector, with the chart font embedded (subset). */
    PDF("pdf", new PdfChartWriter());

    private final String extension;
    private final ChartWriter writer;

    ChartFormat(String extension, ChartWriter writer) {
        this.extension = extension;
        this.writer = writer;
    }

    /** @return the file name extension, without the dot; also the word that chooses the format */
    public String extension() {
        return extension;
    }

    ChartWriter writer() {
        return writer;
    }
}
