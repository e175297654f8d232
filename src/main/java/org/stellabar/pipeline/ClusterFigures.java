package org.stellabar.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.Series;
import org.stellabar.physics.Constants;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StarModel;
import org.stellabar.survey.EosGrid;

/**
 * The figures of a whole scenario: radiation support and stability against mass. Each star is
 * drawn with the marker and colour of the standard-model curve of its μ (the nearest of at most
 * three), and named on both charts.
 */
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
        List<Double> curves = curveMus(mus);
        for (int slot = 0; slot < curves.size(); slot++) {
            double mu = curves.get(slot);
            double[] omb = new double[CURVE_POINTS];
            double[] excess = new double[CURVE_POINTS];
            for (int i = 0; i < CURVE_POINTS; i++) {
                BetaSolution b = standardModel.beta(curveMass[i] * Constants.SOLAR_MASS, mu);
                omb[i] = b.oneMinusBeta();
                excess[i] = EddingtonStandardModel.gamma1Excess(b);
            }
            // the stars drawn with a curve's marker are those whose μ is nearest to the curve's
            boolean exact = mus.size() <= curves.size();
            String label = String.format(Locale.US, "model and stars, μ %s %.3f", exact ? "=" : "≈", mu);
            support = support.withSeries(Series.line(label, curveMass, omb).withStyleSlot(slot));
            stability = stability.withSeries(Series.line(label, curveMass, excess).withStyleSlot(slot));
        }
        // each star in the style of the curve of its μ, named on both charts
        for (int slot = 0; slot < curves.size(); slot++) {
            List<Integer> members = new ArrayList<>();
            for (int i = 0; i < models.size(); i++) {
                if (nearest(curves, models.get(i).headline().composition().mu()) == slot) {
                    members.add(i);
                }
            }
            if (members.isEmpty()) {
                continue;
            }
            double[] m = new double[members.size()];
            double[] omb = new double[members.size()];
            double[] excess = new double[members.size()];
            List<String> labels = new ArrayList<>();
            for (int k = 0; k < members.size(); k++) {
                int i = members.get(k);
                m[k] = mass[i];
                omb[k] = oneMinusBeta[i];
                excess[k] = margin[i];
                labels.add(names.get(i));
            }
            support = support.withSeries(Series.points("", m, omb).withPointLabels(labels).withStyleSlot(slot));
            stability = stability.withSeries(Series.points("", m, excess).withPointLabels(labels).withStyleSlot(slot));
        }
        stability = stability.withSeries(Series.points("GR threshold K_n·2GM/(Rc^2)", mass, threshold)
                .withStyleSlot(curves.size()));
        Map<String, ChartSpec> charts = new LinkedHashMap<>();
        charts.put("cluster-support", support);
        charts.put("cluster-stability", stability);
        return charts;
    }

    /** @return the index of the curve μ nearest to mu (the first of equals) */
    private static int nearest(List<Double> curves, double mu) {
        int best = 0;
        for (int k = 1; k < curves.size(); k++) {
            if (Math.abs(curves.get(k) - mu) < Math.abs(curves.get(best) - mu)) {
                best = k;
            }
        }
        return best;
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
