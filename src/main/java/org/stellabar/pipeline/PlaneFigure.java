package org.stellabar.pipeline;

import java.util.List;
import java.util.Locale;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.charts.SeriesKind;
import org.stellabar.charts.YAxisSide;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.survey.RegimeLines;
import org.stellabar.survey.SofteningBoundary;
import org.stellabar.table.Table;

/**
 * The ρ–T plane: lines of constant β (β = 1/2 being P_rad = P_gas), the electron-degeneracy
 * line, the pair-creation temperature, and optionally the centres of stars.
 */
public final class PlaneFigure {

    private PlaneFigure() {
    }

    /** A labelled point on the plane, e.g. a star's centre. */
    public record Marker(String label, double rho, double T) {
    }

    /**
     * @param lines the boundaries from {@link RegimeLines#table}
     * @param betas the β values of the constant-β columns to draw
     * @param rhoMin lower end of the density axis [g/cm3]
     * @param rhoMax upper end of the density axis [g/cm3]
     * @param markers star centres to mark (may be empty)
     * @return the chart spec
     */
    public static ChartSpec of(Table lines, List<Double> betas, double rhoMin, double rhoMax, List<Marker> markers) {
        return of(lines, betas, rhoMin, rhoMax, markers, Double.NaN);
    }

    /**
     * The same chart, its legend headed by the mean molecular weight the lines hold for.
     *
     * @param lines the regime lines table
     * @param betas the β values of the constant-β columns to draw
     * @param rhoMin lower end of the density axis [g/cm3]
     * @param rhoMax upper end of the density axis [g/cm3]
     * @param markers star centres to mark (may be empty)
     * @param mu the lines' μ, or NaN to leave it unsaid
     * @return the chart spec
     */
    public static ChartSpec of(Table lines, List<Double> betas, double rhoMin, double rhoMax, List<Marker> markers,
            double mu) {
        double[] t = lines.numbers(EosQuantities.T).values();
        ChartSpec spec = ChartSpec.of(Axis.log("ρ", "g/cm3").withRange(rhoMin, rhoMax),
                Axis.log("T", "K").withRange(t[0], t[t.length - 1]));
        for (double beta : betas) {
            String label = beta == 0.5 ? "P_{rad} = P_{gas} (β = 0.5)" : String.format(Locale.US, "β = %s", beta);
            spec = spec.withSeries(Series.line(label, lines.numbers(RegimeLines.columnName(beta)).values(), t));
        }
        spec = spec.withSeries(Series.line("electron degeneracy n_eλ_e^3/2 = 1",
                lines.numbers("rho_degenerate").values(), t));
        if (ValidityCheck.PAIR_TEMPERATURE < t[t.length - 1]) {
            spec = spec.withReferenceLine(ReferenceLine.horizontal(ValidityCheck.PAIR_TEMPERATURE,
                    "pair creation (10^9 K)"));
        }
        if (!markers.isEmpty()) {
            double[] rho = new double[markers.size()];
            double[] temp = new double[markers.size()];
            for (int i = 0; i < markers.size(); i++) {
                rho[i] = markers.get(i).rho();
                temp[i] = markers.get(i).T();
            }
            spec = spec.withSeries(Series.points("star centres", rho, temp)
                    .withPointLabels(markers.stream().map(Marker::label).toList()));
        }
        if (!Double.isNaN(mu)) {
            spec = spec.withLegendNote(String.format(Locale.US, "lines for μ = %.3f", mu));
        }
        return spec.withLegend(LegendPosition.INSIDE_TOP_LEFT);
    }

    /**
     * The plane with the region where Γ1 &lt; 4/3 on the fermi equation of state shaded and its
     * boundary drawn: the outline runs up the region's high-density edge and back down its
     * low-density edge ({@link SofteningBoundary}).
     *
     * @param plane the chart of {@link #of}
     * @param region columns T, rho_low, rho_high
     * @return the chart with the region
     */
    public static ChartSpec withSofteningRegion(ChartSpec plane, Table region) {
        double[] t = region.numbers(EosQuantities.T).values();
        if (t.length < 2) {
            return plane;
        }
        double[] low = region.numbers(SofteningBoundary.RHO_LOW).values();
        double[] high = region.numbers(SofteningBoundary.RHO_HIGH).values();
        int n = t.length;
        double[] x = new double[2 * n + 1];
        double[] y = new double[2 * n + 1];
        for (int i = 0; i < n; i++) {
            x[i] = high[i];
            y[i] = t[i];
            x[2 * n - 1 - i] = low[i];
            y[2 * n - 1 - i] = t[i];
        }
        x[2 * n] = x[0];
        y[2 * n] = y[0];
        return plane.withSeries(new Series("Γ_1 < 4/3 (pairs)", x, y, SeriesKind.REGION, YAxisSide.PRIMARY,
                List.of(), -1));
    }
}
