package org.stellabar.pipeline;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.stellabar.audit.AuditColumns;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * The audit's charts, read from its per-shell table (no physics here: which columns against
 * which, and the lines a reader needs to judge them).
 *
 * <ul>
 *   <li>{@code audit-beta-gamma1}: β (left) and our Γ1 (right, with Γ1 = 4/3 marked) against m/M.</li>
 *   <li>{@code audit-pressure}: P_profile/P_ours − 1 against m/M, the tolerance marked both ways.</li>
 *   <li>{@code audit-hydrostatic}: |hydrostatic residual| against r/R on a logarithmic axis, so
 *       that the interior's truncation error and a surface's large values show together (shells
 *       where it is exactly 0 are left out by the log axis).</li>
 * </ul>
 * Where the profile has no masses, r/R stands in for m/M, and the row number for both.
 */
public final class AuditFigures {

    private AuditFigures() {
    }

    /**
     * @param shells the audit's per-shell table
     * @param tolerance the flagging tolerance on |P_profile/P_ours − 1|
     * @return chart name → spec, for the charts the table allows
     */
    public static Map<String, ChartSpec> of(Table shells, double tolerance) {
        Map<String, ChartSpec> charts = new LinkedHashMap<>();
        Optional<NumberColumn> massFraction = column(shells, AuditColumns.M_OVER_M);
        Optional<NumberColumn> radiusFraction = column(shells, AuditColumns.R_OVER_R);
        NumberColumn row = shells.numbers(AuditColumns.ROW);
        NumberColumn x = massFraction.or(() -> radiusFraction).orElse(row);
        Axis xAxis = massFraction.isPresent() ? Axis.linear("m/M", "").withRange(0.0, 1.0)
                : radiusFraction.isPresent() ? Axis.linear("r/R", "").withRange(0.0, 1.0) : Axis.linear("row", "");
        charts.put("audit-beta-gamma1", ChartSpec.of(xAxis, Axis.linear("β", "").withRange(0.0, 1.0))
                .withSecondaryYAxis(Axis.linear("Γ_1", "").withRange(1.3, 5.0 / 3.0 + 0.01))
                .withSeries(Series.line("β", x, shells.numbers(AuditColumns.BETA)))
                .withSeries(Series.line("Γ_1", x, shells.numbers(AuditColumns.GAMMA1_EOS)).onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "Γ_1 = 4/3").onSecondaryAxis()));
        column(shells, AuditColumns.P_REL_DIFF).ifPresent(diff -> charts.put("audit-pressure",
                ChartSpec.of(xAxis, Axis.linear("P_{profile}/P_{ours} − 1", ""))
                        .withSeries(Series.line("", x, diff))
                        .withReferenceLine(ReferenceLine.horizontal(tolerance,
                                String.format(java.util.Locale.US, "tolerance ±%s", tolerance)))
                        .withReferenceLine(ReferenceLine.horizontal(-tolerance, ""))
                        .withLegend(LegendPosition.NONE)));
        Optional<NumberColumn> residual = column(shells, AuditColumns.HYDROSTATIC_RESIDUAL);
        if (residual.isPresent() && radiusFraction.isPresent()) {
            double[] v = residual.get().values();
            boolean anyPositive = false;
            for (int i = 0; i < v.length; i++) {
                v[i] = Math.abs(v[i]);
                anyPositive |= v[i] > 0.0;
            }
            if (anyPositive) {
                charts.put("audit-hydrostatic", ChartSpec.of(Axis.linear("r/R", "").withRange(0.0, 1.0),
                        Axis.log("|hydrostatic residual|", ""))
                        .withSeries(Series.line("", radiusFraction.get().values(), v))
                        .withLegend(LegendPosition.NONE));
            }
        }
        return charts;
    }

    private static Optional<NumberColumn> column(Table t, Quantity q) {
        return t.column(q.name()).filter(NumberColumn.class::isInstance).map(NumberColumn.class::cast);
    }
}
