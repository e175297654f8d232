package org.stellabar.pipeline;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.charts.SeriesKind;
import org.stellabar.output.OutputFolder;
import org.stellabar.structure.StarSchema;
import org.stellabar.survey.PairInstabilitySequence;
import org.stellabar.table.Table;

/**
 * The {@code pair-instability} job: sequences of isentropic cores on the fermi equation of state
 * ({@link PairInstabilitySequence}) written as tables, and the chart of the post-Newtonian margin
 * against central temperature, one line per core mass.
 */
public final class PairInstabilityRun {

    /**
     * @param result the sequences
     * @param files the files written
     */
    public record Result(PairInstabilitySequence.Result result, List<Path> files) {
        /**
         * Canonical constructor: copies the list in.
         *
         * @param result the sequences
         * @param files the files written
         */
        public Result {
            files = List.copyOf(files);
        }
    }

    private PairInstabilityRun() {
    }

    /**
     * @param sequence the calculation for one composition
     * @param masses core masses [g]
     * @param tMin lowest central temperature [K]
     * @param tMax highest central temperature [K]
     * @param temperatures central temperatures per core
     * @param folder where to write, or null for nothing
     * @param chartFormats image formats of the chart
     * @return the sequences and the files written
     * @throws IOException when a file cannot be written
     */
    public static Result run(PairInstabilitySequence sequence, List<Double> masses, double tMin, double tMax,
            int temperatures, Path folder, Set<ChartFormat> chartFormats) throws IOException {
        PairInstabilitySequence.Result result = sequence.run(masses, tMin, tMax, temperatures);
        List<Path> files = new ArrayList<>();
        if (folder != null) {
            OutputFolder out = new OutputFolder(folder);
            files.add(out.csv("pair-instability.csv", result.table()));
            files.add(out.json("pair-instability.json", result.table()));
            files.add(out.csv("pair-instability-onset.csv", result.onsetTable()));
            files.addAll(FigureExport.bothWidths(marginChart(result), folder, "pair-instability-margin",
                    chartFormats));
        }
        return new Result(result, files);
    }

    /**
     * The post-Newtonian margin ⟨Γ1⟩ − 4/3 − K·2GM/(Rc²) against T_c, one line with markers per
     * core mass, the zero line, and each onset marked.
     *
     * @param result the sequences
     * @return the chart
     */
    public static ChartSpec marginChart(PairInstabilitySequence.Result result) {
        Table t = result.table();
        double[] m = t.numbers(StarSchema.M).values();
        double[] tc = t.numbers(StarSchema.T_C).values();
        double[] margin = t.numbers(StarSchema.GR_MARGIN).values();
        ChartSpec spec = ChartSpec.of(Axis.log("T_c", "K"), Axis.linear("mean Γ_1 − 4/3 − K 2GM/(Rc²)", ""));
        int start = 0;
        while (start < m.length) {
            int end = start;
            while (end < m.length && m[end] == m[start]) {
                end++;
            }
            spec = spec.withSeries(Series.line(solar(m[start]) + " Msun",
                    java.util.Arrays.copyOfRange(tc, start, end), java.util.Arrays.copyOfRange(margin, start, end))
                    .withKind(SeriesKind.LINE_AND_POINTS));
            start = end;
        }
        List<String> labels = new ArrayList<>();
        List<Double> onsetT = new ArrayList<>();
        for (PairInstabilitySequence.Onset o : result.onsets()) {
            if (o.temperature().isPresent()) {
                onsetT.add(o.temperature().getAsDouble());
                labels.add("onset " + solar(o.mass() / SOLAR_MASS) + " Msun");
            }
        }
        if (!onsetT.isEmpty()) {
            spec = spec.withSeries(Series.points("onset of instability",
                    onsetT.stream().mapToDouble(Double::doubleValue).toArray(), new double[onsetT.size()])
                    .withPointLabels(labels));
        }
        spec = spec.withLegend(LegendPosition.INSIDE_BOTTOM_LEFT);
        return spec.withReferenceLine(ReferenceLine.horizontal(0.0, "marginal"));
    }

    /** A mass in solar units to 6 significant digits, trailing zeros dropped: "40", "62.5". */
    private static String solar(double massSolar) {
        return new java.math.BigDecimal(massSolar).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString();
    }
}
