package org.stellabar.pipeline;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartExporter;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.FigureSize;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.MapChart;
import org.stellabar.charts.MapSpec;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.structure.StabilityVerdict;
import org.stellabar.structure.StarSchema;
import org.stellabar.survey.AxisSpacing;
import org.stellabar.survey.ContourSegments;
import org.stellabar.survey.SurveyAxis;
import org.stellabar.survey.SurveyOutcome;
import org.stellabar.survey.SurveyPlan;
import org.stellabar.survey.SurveyTable;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * The figures of a survey, from its table: for two axes, maps over the plane of ⟨Γ1⟩ − 4/3, the
 * post-Newtonian margin, β_c, log T_c and the verdict, each with the stability boundary (the
 * zero contour of the margin it shows, else of the post-Newtonian margin) in black; for one
 * axis, the same quantities as curves against the axis. Failed points are grey on the maps and
 * left out of the curves. Logarithmic axes are plotted as log10 of the value.
 */
final class SurveyMaps {

    /** One figure: file name suffix, quantity, colour-bar label, whether it is a signed margin. */
    private record Figure(String suffix, Quantity quantity, String label, boolean margin, boolean logValue) {
    }

    private static final List<Figure> FIGURES = List.of(
            new Figure("newtonian-margin", StarSchema.NEWTONIAN_MARGIN, "⟨Γ_1⟩ − 4/3", true, false),
            new Figure("gr-margin", StarSchema.GR_MARGIN, "post-Newtonian margin", true, false),
            new Figure("beta-c", StarSchema.BETA_C, "β_c", false, false),
            new Figure("T-c", StarSchema.T_C, "log_{10} T_c [K]", false, true));

    /**
     * Most points drawn: a map of more cells than a printed figure has dots across is no clearer,
     * and its vector files would run to hundreds of megabytes. Larger surveys get their table only.
     */
    static final int MAX_MAP_POINTS = 100_000;

    private SurveyMaps() {
    }

    /**
     * Plans the figure files, one task per figure, width and format.
     *
     * @param plan the survey
     * @param table its table
     * @param folder where to write
     * @param stem the survey's file stem
     * @param formats image formats
     * @return the tasks
     */
    static List<FileTasks.Planned> tasks(SurveyPlan plan, Table table, Path folder, String stem,
            Set<ChartFormat> formats) {
        List<FileTasks.Planned> tasks = new ArrayList<>();
        if (formats.isEmpty() || plan.size() > MAX_MAP_POINTS) {
            return tasks;
        }
        boolean[] ok = okRows(table);
        boolean any = false;
        for (boolean b : ok) {
            any |= b;
        }
        if (!any) {
            return tasks; // nothing to draw: every point failed, and the table says why
        }
        for (Figure f : figures(plan)) {
            for (FigureSize size : List.of(FigureSize.ONE_COLUMN, FigureSize.TWO_COLUMN)) {
                String name = stem + "-" + f.suffix() + (size == FigureSize.ONE_COLUMN ? "-1col" : "-2col");
                for (ChartFormat format : EnumSet.copyOf(formats)) {
                    Path target = folder.resolve(name + "." + format.extension());
                    tasks.add(new FileTasks.Planned(target, () -> {
                        if (plan.axes().size() == 2) {
                            new MapChart(size).write(map(plan, table, ok, f), format, target);
                        } else {
                            new ChartExporter(size).write(curve(plan, table, ok, f), format, target);
                        }
                        return List.of(target);
                    }));
                }
            }
        }
        return tasks;
    }

    private static List<Figure> figures(SurveyPlan plan) {
        List<Figure> all = new ArrayList<>(FIGURES);
        if (plan.axes().size() == 2) {
            all.add(new Figure("verdict", null, "verdict: −1 unstable, +1 stable", true, false));
        }
        return all;
    }

    private static MapSpec map(SurveyPlan plan, Table table, boolean[] ok, Figure f) {
        SurveyAxis outer = plan.axes().get(0);
        SurveyAxis inner = plan.axes().get(1);
        double[] x = nodes(outer);
        double[] y = nodes(inner);
        double[] column = f.quantity() == null ? verdicts(table) : table.numbers(f.quantity()).values();
        double[] gr = table.numbers(StarSchema.GR_MARGIN).values();
        double[][] values = new double[x.length][y.length];
        double[][] boundary = new double[x.length][y.length];
        for (int p = 0; p < column.length; p++) {
            int i = p / y.length;
            int j = p % y.length;
            // NaN marks a failed point inside the drawing only; it never reaches a file's numbers
            values[i][j] = ok[p] ? (f.logValue() ? Math.log10(column[p]) : column[p]) : Double.NaN;
            boundary[i][j] = ok[p] ? (f.quantity() == StarSchema.NEWTONIAN_MARGIN
                    ? column[p] : gr[p]) : Double.NaN;
        }
        return new MapSpec(label(outer), label(inner), x, y, values, f.label(), f.margin(),
                ContourSegments.at(x, y, boundary, 0.0));
    }

    private static ChartSpec curve(SurveyPlan plan, Table table, boolean[] ok, Figure f) {
        SurveyAxis axis = plan.axes().get(0);
        double[] xAll = table.numbers(axis.quantity().column()).values();
        double[] yAll = table.numbers(f.quantity()).values();
        int n = 0;
        for (boolean b : ok) {
            n += b ? 1 : 0;
        }
        double[] x = new double[n];
        double[] y = new double[n];
        int k = 0;
        for (int p = 0; p < ok.length; p++) {
            if (ok[p]) {
                x[k] = xAll[p];
                y[k++] = f.logValue() ? Math.log10(yAll[p]) : yAll[p];
            }
        }
        String unit = axis.quantity().column().unit();
        Axis xAxis = axis.spacing() == AxisSpacing.log ? Axis.log(axis.quantity().column().name().substring(6), unit)
                : Axis.linear(axis.quantity().column().name().substring(6), unit);
        ChartSpec spec = ChartSpec.of(xAxis, Axis.linear(f.label(), ""))
                .withSeries(Series.line(plan.kind().word() + " models", x, y))
                .withLegend(LegendPosition.NONE);
        return f.margin() ? spec.withReferenceLine(ReferenceLine.horizontal(0.0, "stability boundary")) : spec;
    }

    private static double[] nodes(SurveyAxis axis) {
        double[] v = new double[axis.count()];
        for (int k = 0; k < v.length; k++) {
            double d = axis.quantity().toDisplay(axis.value(k));
            v[k] = axis.spacing() == AxisSpacing.log ? Math.log10(d) : d;
        }
        return v;
    }

    private static String label(SurveyAxis axis) {
        String name = axis.quantity().column().name().substring("input_".length());
        String unit = axis.quantity().column().unit();
        String shown = unit.isEmpty() ? name : name + " [" + unit + "]";
        return axis.spacing() == AxisSpacing.log ? "log10 " + shown : shown;
    }

    private static boolean[] okRows(Table table) {
        List<String> status = texts(table, SurveyTable.STATUS);
        boolean[] ok = new boolean[status.size()];
        for (int p = 0; p < ok.length; p++) {
            ok[p] = SurveyOutcome.OK.equals(status.get(p));
        }
        return ok;
    }

    private static double[] verdicts(Table table) {
        List<String> words = texts(table, StarSchema.VERDICT);
        double[] v = new double[words.size()];
        for (int p = 0; p < v.length; p++) {
            String w = words.get(p);
            v[p] = w.equals(StabilityVerdict.STABLE.word()) ? 1.0 : w.equals(StabilityVerdict.MARGINAL.word()) ? 0.0
                    : -1.0;
        }
        return v;
    }

    private static List<String> texts(Table table, String name) {
        return ((TextColumn) table.column(name).orElseThrow()).values();
    }
}
