package org.stellabar.pipeline;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LabelLayout;
import org.stellabar.charts.Series;
import org.stellabar.observed.ObservedSchema;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.survey.EosGrid;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * The figures of a catalogue of observed stars, from the observed table's declared columns:
 *
 * <ul>
 * <li>{@code observed-hr}: the Hertzsprung–Russell diagram, log T_eff increasing to the left
 *     against log L/L☉, stars in four classes of Γ_e, each class its own colour of the
 *     colour-blind-safe palette and its own marker shape, so the classes read without colour too;
 *     every star named, the names placed apart ({@link LabelLayout#APART}).</li>
 * <li>{@code observed-eddington}: Γ_e against M with the standard model's 1 − β(M) for the
 *     catalogue's μ (at most three curves: the smallest, median and largest), the line on which a
 *     star would sit if it were a standard model of its mass.</li>
 * </ul>
 */
public final class ObservedFigures {

    /** Upper bounds of the Γ_e classes of the HR diagram (the last class is open). */
    static final double[] GAMMA_E_CLASSES = {0.03, 0.1, 0.3};

    /** Points along the standard-model curves. */
    static final int CURVE_POINTS = 120;

    private ObservedFigures() {
    }

    /**
     * @param table the observed table (stars with an estimate), at least one row
     * @param model the standard model for the curves
     * @return chart specs by name
     */
    public static Map<String, ChartSpec> of(Table table, EddingtonStandardModel model) {
        double[] teff = table.numbers(ObservedSchema.TEFF).values();
        double[] lum = table.numbers(ObservedSchema.L).values();
        double[] gamma = table.numbers(ObservedSchema.GAMMA_E).values();
        double[] mass = table.numbers(ObservedSchema.M).values();
        double[] mu = table.numbers(ObservedSchema.MU).values();
        List<String> names = ((TextColumn) table.column(ObservedSchema.NAME).orElseThrow()).values();
        Map<String, ChartSpec> charts = new LinkedHashMap<>();
        charts.put("observed-hr", hr(teff, lum, gamma, names));
        charts.put("observed-eddington", eddington(mass, gamma, mu, names, model));
        return charts;
    }

    private static ChartSpec hr(double[] teff, double[] lum, double[] gamma, List<String> names) {
        ChartSpec hr = ChartSpec.of(Axis.linear("log_{10} T_{eff}/K", "").withReversed(),
                Axis.linear("log_{10} L/L_☉", ""));
        for (int c = 0; c <= GAMMA_E_CLASSES.length; c++) {
            double lower = c == 0 ? 0.0 : GAMMA_E_CLASSES[c - 1];
            double upper = c == GAMMA_E_CLASSES.length ? Double.POSITIVE_INFINITY : GAMMA_E_CLASSES[c];
            List<Double> x = new ArrayList<>();
            List<Double> y = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            for (int i = 0; i < teff.length; i++) {
                if (gamma[i] >= lower && gamma[i] < upper) {
                    x.add(Math.log10(teff[i]));
                    y.add(Math.log10(lum[i]));
                    labels.add(names.get(i));
                }
            }
            if (x.isEmpty()) {
                continue;
            }
            String label = c == 0 ? String.format(Locale.US, "Γ_e < %s", GAMMA_E_CLASSES[0])
                    : c == GAMMA_E_CLASSES.length ? String.format(Locale.US, "Γ_e ≥ %s", lower)
                    : String.format(Locale.US, "%s ≤ Γ_e < %s", lower, upper);
            hr = hr.withSeries(Series.points(label, toArray(x), toArray(y)).withPointLabels(labels).withStyleSlot(c));
        }
        return hr.withLabelLayout(LabelLayout.APART);
    }

    private static ChartSpec eddington(double[] mass, double[] gamma, double[] mu, List<String> names,
            EddingtonStandardModel model) {
        double lo = Double.MAX_VALUE;
        double hi = 0.0;
        TreeSet<Double> mus = new TreeSet<>();
        for (int i = 0; i < mass.length; i++) {
            lo = Math.min(lo, mass[i]);
            hi = Math.max(hi, mass[i]);
            mus.add(mu[i]);
        }
        double[] curveMass = EosGrid.logSpaced(Math.max(0.1, lo / 2.0), Math.min(1e8, hi * 2.0), CURVE_POINTS);
        ChartSpec chart = ChartSpec.of(Axis.log("M", "Msun"), Axis.log("Γ_e", ""));
        List<Double> all = new ArrayList<>(mus);
        List<Double> curveMus = all.size() <= 3 ? all : List.of(all.get(0), all.get(all.size() / 2), all.get(all.size() - 1));
        int slot = 0;
        for (double m : curveMus) {
            double[] omb = new double[CURVE_POINTS];
            for (int i = 0; i < CURVE_POINTS; i++) {
                omb[i] = model.beta(curveMass[i] * SOLAR_MASS, m).oneMinusBeta();
            }
            chart = chart.withSeries(Series.line(String.format(Locale.US, "standard model 1 − β, μ = %.3f", m),
                    curveMass, omb).withStyleSlot(slot++));
        }
        return chart.withSeries(Series.points("stars", mass, gamma).withPointLabels(names).withStyleSlot(slot))
                .withLabelLayout(LabelLayout.APART);
    }

    private static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
