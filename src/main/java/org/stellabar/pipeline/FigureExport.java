package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.ChartExporter;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.FigureSize;

/** Exports a figure in the two journal widths, as {@code <base>-1col.<ext>} and {@code <base>-2col.<ext>}. */
public final class FigureExport {

    private FigureExport() {
    }

    /**
     * @param spec the figure
     * @param folder where to write
     * @param baseName file name before the width suffix and extension
     * @param formats image formats
     * @return the files written, one-column first
     * @throws IOException when a file cannot be written
     */
    public static List<Path> bothWidths(ChartSpec spec, Path folder, String baseName, Set<ChartFormat> formats)
            throws IOException {
        List<Path> written = new ArrayList<>();
        written.addAll(new ChartExporter(FigureSize.ONE_COLUMN).write(spec, folder, baseName + "-1col", formats));
        written.addAll(new ChartExporter(FigureSize.TWO_COLUMN).write(spec, folder, baseName + "-2col", formats));
        return written;
    }
}
