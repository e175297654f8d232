package org.stellabar.validation;

import java.util.Objects;
import org.stellabar.charts.ChartSpec;

/**
 * A chart of the validation report: what it shows and the file it goes to.
 *
 * @param fileStem the file name without extension, e.g. "lane-emden-constants"
 * @param caption one sentence saying what the chart shows
 * @param spec the chart
 */
public record ReportChart(String fileStem, String caption, ChartSpec spec) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency.
     *
     * @param fileStem the file name without extension, e.g. "lane-emden-constants"
     * @param caption one sentence saying what the chart shows
     * @param spec the chart
     */
    public ReportChart {
        Objects.requireNonNull(fileStem, "fileStem");
        Objects.requireNonNull(caption, "caption");
        Objects.requireNonNull(spec, "spec");
        if (!fileStem.matches("[a-z0-9-]+")) {
            throw new IllegalArgumentException("chart file stem \"" + fileStem + "\" must be lower-case letters, digits, -");
        }
    }
}
