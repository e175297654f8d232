package org.stellabar.charts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.jfree.chart.JFreeChart;
import org.stellabar.output.AtomicFiles;

/**
 * Writes a chart to files at one printed size. Every file is written through
 * {@link AtomicFiles}: a failure leaves no half-written chart.
 */
public final class ChartExporter {

    private final FigureSize size;
    private final ChartRenderer renderer;

    /** @param size the printed size of every chart this exporter writes */
    public ChartExporter(FigureSize size) {
        this.size = size;
        this.renderer = new ChartRenderer(size);
    }

    /** @return the printed size */
    public FigureSize size() {
        return size;
    }

    /**
     * Writes one file.
     *
     * @param spec the chart
     * @param format the format
     * @param target the file to create or replace
     * @throws IOException if writing fails (the target is then unchanged)
     */
    public void write(ChartSpec spec, ChartFormat format, Path target) throws IOException {
        JFreeChart chart = renderer.render(spec);
        String title = ScriptedText.parse(spec.title()).flat();
        AtomicFiles.write(target, out -> format.writer().write(chart, size, title, out));
    }

    /**
     * Writes the chart in several formats as {@code folder/baseName.ext}.
     *
     * @param spec the chart
     * @param folder the folder (created if missing)
     * @param baseName the file name without extension, a plain name without folders
     * @param formats the formats
     * @return the files written, in the formats' order
     * @throws IOException if writing fails
     */
    public List<Path> write(ChartSpec spec, Path folder, String baseName, Set<ChartFormat> formats)
            throws IOException {
        if (baseName.isBlank() || baseName.contains("/") || baseName.contains("\\") || baseName.startsWith(".")) {
            throw new IllegalArgumentException("chart file name \"" + baseName
                    + "\" must be a plain name without folders or a leading dot");
        }
        List<Path> written = new ArrayList<>();
        for (ChartFormat format : EnumSet.copyOf(formats)) {
            Path target = folder.resolve(baseName + "." + format.extension());
            write(spec, format, target);
            written.add(target);
        }
        return written;
    }
}
