package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
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
        FileTasks tasks = new FileTasks();
        tasks.addAll(tasks(spec, folder, baseName, formats));
        return tasks.runAll();
    }

    /**
     * The same files as {@link #bothWidths}, as one task per width and format, to be run in
     * parallel with other work.
     */
    static List<FileTasks.Planned> tasks(ChartSpec spec, Path folder, String baseName, Set<ChartFormat> formats) {
        List<FileTasks.Planned> tasks = new ArrayList<>();
        for (FigureSize size : List.of(FigureSize.ONE_COLUMN, FigureSize.TWO_COLUMN)) {
            String name = baseName + (size == FigureSize.ONE_COLUMN ? "-1col" : "-2col");
            for (ChartFormat format : EnumSet.copyOf(formats)) {
                tasks.add(new FileTasks.Planned(folder.resolve(name + "." + format.extension()),
                        () -> new ChartExporter(size).write(spec, folder, name, EnumSet.of(format))));
            }
        }
        return tasks;
    }
}
