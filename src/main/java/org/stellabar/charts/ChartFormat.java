package org.stellabar.charts;

/**
 * The file formats a chart is exported in. The extension is also the word a user writes to choose
 * the format, on the command line and in scenario files.
 */
public enum ChartFormat {
    /** Raster at 300 dots per inch, the resolution recorded in the file. */
    PNG("png"),
    /** Vector; byte-identical output for identical charts. */
    SVG("svg"),
    /** Vector, with the chart font embedded (subset). */
    PDF("pdf");

    private final String extension;

    ChartFormat(String extension) {
        this.extension = extension;
    }

    /** @return the file name extension, without the dot; also the word that chooses the format */
    public String extension() {
        return extension;
    }

    ChartWriter writer() {
        return switch (this) {
            case PNG -> Writers.PNG;
            case SVG -> Writers.SVG;
            case PDF -> Writers.PDF;
        };
    }

    /**
     * The writers, made when a chart is first written: the formats are also words on the command
     * line, and setting up the SVG and PDF libraries' classes cost every command ~4 ms at start.
     */
    private static final class Writers {
        static final ChartWriter PNG = new PngChartWriter();
        static final ChartWriter SVG = new SvgChartWriter();
        static final ChartWriter PDF = new PdfChartWriter();
    }
}
