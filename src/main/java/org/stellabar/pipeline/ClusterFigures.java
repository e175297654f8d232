package org.stellabar.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.Series;
import org.stellabar.physics.Constants;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StarModel;
import org.stellabar.survey.EosGrid;

/** The figures of a whole scenario: radiation support and stability against mass. */
public final class ClusterFigures {

    /** Points along the standard-model curves. */
    static final int CURVE_POINTS = 120;

    private ClusterFigures() {
    }

    /**
     * @param models the stars
     * @param standardModel the Eddington standard model for the curves
     * @return chart specs by name ("cluster-support", "cluster-stability")
     */
    public static Map<String, ChartSpec> of(List<StarModel> models, EddingtonStandardModel standardModel) {
        double lo = Double.MAX_VALUE;
        double hi = 0;
        TreeSet<Double> mus = new TreeSet<>();
        List<String> names = new ArrayList<>();
        double[] mass = new double[models.size()];
        double[] oneMinusBeta = new double[models.size()];
        double[] margin = new double[models.size()];
        double[] threshold = new double[models.size()];
        for (int i = 0; i < models.size(); i++) {
            var s = models.get(i).headline();
            names.add(s.name());
            mass[i] = s.mass() / Constants.SOLAR_MASS;
            oneMinusBeta[i] = s.centre().oneMinusBeta();
            margin[i] = s.stability().newtonianMargin();
            threshold[i] = s.stability().relativisticThreshold();
            lo = Math.min(lo, mass[i]);
            hi = Math.max(hi, mass[i]);
            mus.add(s.composition().mu());
        }
        double curveLo = Math.max(0.1, lo / 3.0);
        double curveHi = Math.min(1e8, hi * 3.0);
        double[] curveMass = EosGrid.logSpaced(curveLo, curveHi, CURVE_POINTS);
        ChartSpec support = ChartSpec.of(Axis.log("M", "Msun"), Axis.log("1 − β", ""));
        ChartSpec stability = ChartSpec.of(Axis.log("M", "Msun"), Axis.log("⟨Γ_1⟩ − 4/3", ""));
        int slot = 0;
        for (double mu : curveMus(mus)) {
            double[] omb = new double[CURVE_POINTS];
            double[] excess = new double[CURVE_POINTS];
            for (int i = 0; i < CURVE_POINTS; i++) {
                BetaSolution b = standardModel.beta(curveMass[i] * Constants.SOLAR_MASS, mu);
                omb[i] = b.oneMinusBeta();
                excess[i] = EddingtonStandardModel.gamma1Excess(b);
            }
            String label = String.format(Locale.ROOT, "standard model, μ = %.3f", mu);
            support = support.withSeries(Series.line(label, curveMass, omb).withStyleSlot(slot));
            stability = stability.withSeries(Series.line(label, curveMass, excess).withStyleSlot(slot));
            slot++;
        }
        support = support.withSeries(Series.points("stars (centre)", mass, oneMinusBeta).withPointLabels(names)
                        .withStyleSlot(slot))
                .withLegend(LegendPosition.INSIDE_BOTTOM_RIGHT);
        // names are on the support chart; here they would crowd the points
        stability = stability.withSeries(Series.points("stars: ⟨Γ_1⟩ − 4/3", mass, margin).withStyleSlot(slot))
                .withSeries(Series.points("GR threshold K·2GM/(Rc²) of each star", mass, threshold)
                        .withStyleSlot(slot + 1))
                .withLegend(LegendPosition.INSIDE_TOP_RIGHT);
        Map<String, ChartSpec> charts = new LinkedHashMap<>();
        charts.put("cluster-support", support);
        charts.put("cluster-stability", stability);
        return charts;
    }

    /** At most three curves: the smallest, the median and the largest μ of the stars. */
    private static List<Double> curveMus(TreeSet<Double> mus) {
        List<Double> all = new ArrayList<>(mus);
        if (all.size() <= 3) {
            return all;
        }
        return List.of(all.get(0), all.get(all.size() / 2), all.get(all.size() - 1));
    }
}
