package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LabelLayout;
import org.stellabar.charts.Series;
import org.stellabar.observed.ObservedSchema;
import org.stellabar.structure.EddingtonStandardModel;

class ObservedFiguresTest {

    private static final EddingtonStandardModel MODEL = EddingtonStandardModel.create();

    @TempDir
    Path dir;

    @Test
    void figuresOfTheDemoCatalogue() {
        ObservedRun.Result demo = DemoCatalogue.run(dir, MODEL).getKey();
        Map<String, ChartSpec> charts = ObservedFigures.of(demo.table(), MODEL);
        ChartSpec hr = charts.get("observed-hr");
        assertTrue(hr.xAxis().reversed(), "log Teff increases to the left");
        assertEquals(LabelLayout.APART, hr.labelLayout());
        List<String> labels = new ArrayList<>();
        for (Series s : hr.series()) {
            labels.addAll(s.pointLabels());
        }
        assertEquals(demo.table().rowCount(), labels.size(), "every star named once");
        // the standard-model curve is 1 - beta(M) of the structure package at each mass (identity)
        ChartSpec eddington = charts.get("observed-eddington");
        Series curve = eddington.series().get(0);
        double mu = Arrays.stream(demo.table().numbers(ObservedSchema.MU).values()).min().orElseThrow();
        for (int i = 0; i < curve.size(); i += 17) {
            assertEquals(MODEL.beta(curve.x()[i] * SOLAR_MASS, mu).oneMinusBeta(), curve.y()[i], 0.0);
        }
    }
}
