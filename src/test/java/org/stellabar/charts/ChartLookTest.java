package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Renders the example charts in both widths and all formats: the files a person looks at to
 * judge the style. Set -Dstellabar.charts.lookDir=/some/folder to keep them.
 */
class ChartLookTest {

    @TempDir
    Path temp;

    @Test
    void rendersExampleChartsInBothWidths() throws Exception {
        String keep = System.getProperty("stellabar.charts.lookDir");
        Path folder = keep == null ? temp : Path.of(keep);
        for (FigureSize size : List.of(FigureSize.ONE_COLUMN, FigureSize.TWO_COLUMN)) {
            String suffix = size == FigureSize.ONE_COLUMN ? "-1col" : "-2col";
            ChartExporter exporter = new ChartExporter(size);
            List<Path> a = exporter.write(ExampleCharts.densityTemperaturePlane(), folder, "rho-T" + suffix,
                    EnumSet.allOf(ChartFormat.class));
            List<Path> b = exporter.write(ExampleCharts.twoAxisProfile(), folder, "profile" + suffix,
                    EnumSet.allOf(ChartFormat.class));
            List<Path> c = exporter.write(ExampleCharts.gradientProfile(), folder, "gradient" + suffix,
                    EnumSet.allOf(ChartFormat.class));
            assertEquals(3, a.size());
            assertEquals(3, c.size());
            assertEquals(3, b.size());
            for (Path p : a) {
                assertEquals(true, Files.size(p) > 1000, p.toString());
            }
        }
    }
}
