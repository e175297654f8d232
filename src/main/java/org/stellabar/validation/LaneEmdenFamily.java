package org.stellabar.validation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.structure.LaneEmdenCurve;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;

/**
 * Lane-Emden constants ξ₁, θ'(ξ₁), ω_n, ρ_c/ρ̄, W_n and interior values θ(ξ) against the classic
 * tables (recalled), an independent 50-digit integration and the closed forms n = 0, 1, 5.
 */
public final class LaneEmdenFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "lane-emden";
    /** Its reference tables. */
    public static final List<String> FILES = List.of("lane-emden-published.csv", "lane-emden-computed.csv",
            "lane-emden-closed-forms.csv");

    private static final String KNOWN = "xi1, dtheta_xi1, omega_n, rho_c_over_mean, W_n, theta, dtheta";
    /** Indices of the chart's curves: 0 to 4.9 in steps of 0.05. */
    private static final int CURVE_POINTS = 99;
    private static final double CURVE_STEP = 0.05;

    private final LaneEmdenSolver solver = new LaneEmdenSolver();

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        Map<Double, LaneEmdenSolution> solutions = new TreeMap<>();
        return TableChecks.run(ID, "Lane-Emden constants and functions", source, FILES, tables -> {
            Map<Double, LaneEmdenCurve> unbounded = curvesWithoutSurface(tables);
            return row -> ours(row, solutions, unbounded);
        }, (tables, checks) -> List.of(constantsChart(tables), deviationChart(checks)),
                "Our values: `LaneEmdenSolver` at its default tolerance ("
                        + Numbers.compact(LaneEmdenSolver.DEFAULT_TOLERANCE) + " per step); n = 5 (no surface) "
                        + "through `LaneEmdenSolver.integrate(5, ξ)`.",
                "Three kinds of reference: the classic printed tables typed from memory (widened tolerance), "
                        + "an independent 50-digit Taylor-series integration (`scripts/lane_emden_mpmath.py`), "
                        + "and the closed forms for n = 0, 1 and 5 (`scripts/closed_forms.py`).");
    }

    private double ours(ReferenceValue row, Map<Double, LaneEmdenSolution> solutions,
            Map<Double, LaneEmdenCurve> unbounded) {
        double n = row.number("n");
        switch (row.quantity()) {
            case "theta", "dtheta" -> {
                double xi = row.number("xi");
                LaneEmdenCurve curve = unbounded.containsKey(n) ? unbounded.get(n)
                        : solutions.computeIfAbsent(n, solver::solve).curve();
                return row.quantity().equals("theta") ? curve.theta(xi) : curve.dthetaDxi(xi);
            }
            default -> {
                LaneEmdenSolution s = solutions.computeIfAbsent(n, solver::solve);
                return switch (row.quantity()) {
                    case "xi1" -> s.xi1();
                    case "dtheta_xi1" -> s.dthetaXi1();
                    case "omega_n" -> s.omega();
                    case "rho_c_over_mean" -> s.centralToMeanDensity();
                    case "W_n" -> s.centralPressureCoefficient();
                    default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
                };
            }
        }
    }

    /** Curves for indices with no finite radius (n ≥ 5), each out to the largest ξ asked for. */
    private Map<Double, LaneEmdenCurve> curvesWithoutSurface(List<ReferenceTable> tables) {
        Map<Double, Double> reach = new TreeMap<>();
        TableChecks.rows(tables).filter(row -> row.has("n") && row.number("n") >= LaneEmdenSolver.INDEX_LIMIT
                && row.has("xi")).forEach(row -> reach.merge(row.number("n"), row.number("xi"), Math::max));
        Map<Double, LaneEmdenCurve> curves = new TreeMap<>();
        reach.forEach((n, xi) -> curves.put(n, solver.integrate(n, xi)));
        return curves;
    }

    private ReportChart constantsChart(List<ReferenceTable> tables) {
        double[] n = new double[CURVE_POINTS];
        double[] xi1 = new double[CURVE_POINTS];
        double[] omega = new double[CURVE_POINTS];
        double[] density = new double[CURVE_POINTS];
        for (int i = 0; i < CURVE_POINTS; i++) {
            n[i] = i * CURVE_STEP;
            LaneEmdenSolution s = solver.solve(n[i]);
            xi1[i] = s.xi1();
            omega[i] = s.omega();
            density[i] = s.centralToMeanDensity();
        }
        ChartSpec spec = ChartSpec.of(Axis.linear("n", "").withRange(0.0, 5.0), Axis.log("constant", ""))
                .withSeries(Series.line("ξ_1", n, xi1).withStyleSlot(0))
                .withSeries(referencePoints(tables, "xi1", "ξ_1 tables").withStyleSlot(0))
                .withSeries(Series.line("ω_n", n, omega).withStyleSlot(1))
                .withSeries(referencePoints(tables, "omega_n", "ω_n tables").withStyleSlot(1))
                .withSeries(Series.line("ρ_c/⟨ρ⟩", n, density).withStyleSlot(2))
                .withSeries(referencePoints(tables, "rho_c_over_mean", "ρ_c/⟨ρ⟩ tables").withStyleSlot(2))
                .withLegend(LegendPosition.INSIDE_TOP_LEFT);
        return new ReportChart("lane-emden-constants",
                "Lane-Emden constants from stellabar's solver (lines) and every reference value of the tables "
                        + "(markers: recalled printed tables, 50-digit integration, closed forms).",
                spec);
    }

    private static Series referencePoints(List<ReferenceTable> tables, String quantity, String label) {
        Map<Double, Double> points = new LinkedHashMap<>();
        TableChecks.rows(tables).filter(row -> row.quantity().equals(quantity))
                .forEach(row -> points.putIfAbsent(row.number("n"), row.value()));
        double[] x = points.keySet().stream().mapToDouble(Double::doubleValue).toArray();
        double[] y = points.values().stream().mapToDouble(Double::doubleValue).toArray();
        return Series.points(label, x, y);
    }

    private static ReportChart deviationChart(List<CheckResult> checks) {
        ChartSpec spec = ChartSpec.of(Axis.linear("n", "").withRange(0.0, 5.0),
                Axis.log("|ours/reference − 1|", "").withRange(1e-17, 1e-6));
        int slot = 0;
        for (String quantity : List.of("xi1", "omega_n", "rho_c_over_mean", "W_n")) {
            List<double[]> points = new ArrayList<>();
            for (CheckResult c : checks) {
                if (c.quantity().equals(quantity) && c.provenance() == Provenance.COMPUTED) {
                    double n = Double.parseDouble(c.parameters().substring("n=".length()));
                    // a zero deviation cannot sit on a log axis: show it at the floor of double precision
                    points.add(new double[] {n, Math.max(c.deviation(), 1e-17)});
                }
            }
            double[] x = points.stream().mapToDouble(p -> p[0]).toArray();
            double[] y = points.stream().mapToDouble(p -> p[1]).toArray();
            spec = spec.withSeries(Series.points(symbol(quantity), x, y).withKind(
                    org.stellabar.charts.SeriesKind.LINE_AND_POINTS).withStyleSlot(slot++));
        }
        spec = spec.withReferenceLine(ReferenceLine.horizontal(1e-9, "tolerance of ξ_1, ω_n"))
                .withReferenceLine(ReferenceLine.horizontal(1e-8, "tolerance of ρ_c/⟨ρ⟩, W_n"))
                .withLegend(LegendPosition.INSIDE_BOTTOM_RIGHT);
        return new ReportChart("lane-emden-deviation",
                "Relative deviation of stellabar's Lane-Emden constants from the independent 50-digit integration "
                        + "(values below 1e-17 drawn at 1e-17), with the tolerances.",
                spec);
    }

    private static String symbol(String quantity) {
        return switch (quantity) {
            case "xi1" -> "ξ_1";
            case "omega_n" -> "ω_n";
            case "rho_c_over_mean" -> "ρ_c/⟨ρ⟩";
            case "W_n" -> "W_n";
            default -> quantity;
        };
    }
}
