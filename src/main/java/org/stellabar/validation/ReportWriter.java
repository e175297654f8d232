package org.stellabar.validation;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.stellabar.charts.ChartExporter;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.FigureSize;
import org.stellabar.output.AtomicFiles;

/**
 * Writes the report and its charts into a folder: {@code report.md} and {@code charts/*.svg}.
 * Every file is written atomically; the charts first, so the report never points at a chart that
 * is not there. SVG because it is byte-identical between runs.
 */
public final class ReportWriter {

    /** File name of the report. */
    public static final String REPORT_FILE = "report.md";

    private final ChartExporter exporter = new ChartExporter(FigureSize.TWO_COLUMN);

    /**
     * @param report the results
     * @param folder the folder to write into (created if missing)
     * @return the files written, the report last
     * @throws IOException if a file cannot be written
     */
    public List<Path> write(ValidationReport report, Path folder) throws IOException {
        List<Path> written = new ArrayList<>();
        Path charts = folder.resolve(MarkdownReport.CHART_FOLDER);
        for (FamilyResult f : report.families()) {
            for (ReportChart chart : f.charts()) {
                Path target = charts.resolve(chart.fileStem() + "." + ChartFormat.SVG.extension());
                exporter.write(chart.spec(), ChartFormat.SVG, target);
                written.add(target);
            }
        }
        String text = MarkdownReport.render(report);
        Path target = folder.resolve(REPORT_FILE);
        AtomicFiles.writeText(target, out -> out.write(text));
        written.add(target);
        return written;
    }
}
