package org.stellabar.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.stellabar.structure.ProfileTable;
import org.stellabar.eos.EosQuantities;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.scenario.ChartGroup;
import org.stellabar.structure.StarModel;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/** The per-star figures, built from a star's profile table. */
public final class StarFigures {

    /** Lower end of the structure chart's axis, relative to the central values. */
    static final double STRUCTURE_FLOOR = 1e-6;

    private StarFigures() {
    }

    /**
     * @param model the star
     * @param groups which figures to make
     * @return chart specs by figure name ("structure", "support", "exponents", "gradients")
     */
    public static Map<String, ChartSpec> of(StarModel model, Set<ChartGroup> groups) {
        Table p = model.profile();
        Map<String, ChartSpec> charts = new LinkedHashMap<>();
        if (groups.contains(ChartGroup.STRUCTURE)) {
            charts.put("structure", structure(p));
        }
        if (groups.contains(ChartGroup.SUPPORT)) {
            charts.put("support", support(p));
        }
        if (groups.contains(ChartGroup.EXPONENTS)) {
            charts.put("exponents", exponents(p, model.headline().stability().meanGamma1()));
        }
        if (groups.contains(ChartGroup.GRADIENTS)) {
            charts.put("gradients", gradients(p));
        }
        return charts;
    }

    /** ρ/ρ_c, P/P_c and T/T_c against r/R on a log axis. */
    static ChartSpec structure(Table p) {
        double[] r = p.numbers(ProfileTable.R_OVER_R).values();
        // six decades: the surface values of ρ and P (down to 10⁻¹² of the centre's) would
        // squeeze the interior, where the structure is, into the top of the panel
        return ChartSpec.of(Axis.linear("r/R", "").withRange(0.0, 1.0),
                        Axis.log("ρ/ρ_c, P/P_c, T/T_c", "").withRange(STRUCTURE_FLOOR, 2.0))
                .withSeries(Series.line("ρ/ρ_c", r, normalized(p.numbers(EosQuantities.RHO))))
                .withSeries(Series.line("P/P_c", r, normalized(p.numbers(EosQuantities.P))))
                .withSeries(Series.line("T/T_c", r, normalized(p.numbers(EosQuantities.T))))
                .withLegend(LegendPosition.INSIDE_BOTTOM_LEFT);
    }

    /** β and 1 − β against m/M. */
    static ChartSpec support(Table p) {
        double[] m = p.numbers(ProfileTable.M_OVER_M).values();
        return ChartSpec.of(Axis.linear("m/M", "").withRange(0.0, 1.0), Axis.linear("pressure fraction", "")
                        .withRange(0.0, 1.0))
                .withSeries(Series.line("β = P_{gas}/P", m, p.numbers(EosQuantities.BETA).values()))
                .withSeries(Series.line("1 − β = P_{rad}/P", m, p.numbers(EosQuantities.ONE_MINUS_BETA).values()))
                .withLegend(LegendPosition.INSIDE_TOP_RIGHT);
    }

    /** β on the left, Γ1 on the right with the 4/3 line and the pressure-weighted mean. */
    static ChartSpec exponents(Table p, double meanGamma1) {
        double[] m = p.numbers(ProfileTable.M_OVER_M).values();
        return ChartSpec.of(Axis.linear("m/M", "").withRange(0.0, 1.0), Axis.linear("β", ""))
                .withSecondaryYAxis(Axis.linear("Γ_1", ""))
                .withSeries(Series.line("β", m, p.numbers(EosQuantities.BETA).values()))
                .withSeries(Series.line("Γ_1", m, p.numbers(ProfileTable.GAMMA1).values()).onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "Γ_1 = 4/3").onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(meanGamma1,
                        String.format(Locale.US, "⟨Γ_1⟩ = %.3f", meanGamma1)).onSecondaryAxis());
    }

    /**
     * ∇_ad against r/R, with its limits 2/5 (β = 1) and 1/4 (β = 0) where the data come near
     * them, and the polytrope's own gradient 1/(n+1) where the profile has it. That gradient is
     * one number, so it is drawn as a line across the plot; where it equals a limit (n = 3/2
     * gives 2/5, n = 3 gives 1/4) the two share one line and one label, rather than two lines
     * drawn on top of each other.
     */
    static ChartSpec gradients(Table p) {
        double[] r = p.numbers(ProfileTable.R_OVER_R).values();
        ReferenceLine upper = ReferenceLine.horizontal(0.4, "∇_{ad} = 2/5 (β = 1)").ifInRange();
        ReferenceLine lower = ReferenceLine.horizontal(0.25, "∇_{ad} = 1/4 (β = 0)").ifInRange();
        List<ReferenceLine> lines = new ArrayList<>();
        Series polySeries = null;
        if (p.column(ProfileTable.NABLA_POLY.name()).isPresent()) {
            double[] poly = p.numbers(ProfileTable.NABLA_POLY).values();
            double first = poly[0];
            boolean constant = java.util.Arrays.stream(poly).allMatch(v -> v == first);
            // 1/(n+1) computed in double: equal to 2/5 or 1/4 within a few ulps; the polytrope's
            // gradient is what the chart compares with, so its line always stays in view
            if (constant && Math.abs(first - 0.4) < 1e-12) {
                upper = ReferenceLine.horizontal(0.4, "∇_{poly} = ∇_{ad}(β = 1) = 2/5");
            } else if (constant && Math.abs(first - 0.25) < 1e-12) {
                lower = ReferenceLine.horizontal(0.25, "∇_{poly} = ∇_{ad}(β = 0) = 1/4");
            } else if (constant) {
                lines.add(ReferenceLine.horizontal(first, String.format(Locale.US, "∇_{poly} = 1/(n+1) = %.3f", first)));
            } else {
                polySeries = Series.line("∇_{poly}", r, poly);
            }
        }
        lines.add(upper);
        lines.add(lower);
        // one curve: the axis names it, a legend of one entry would add nothing
        ChartSpec spec = ChartSpec.of(Axis.linear("r/R", "").withRange(0.0, 1.0),
                Axis.linear(polySeries == null ? "∇_{ad}" : "∇", ""));
        if (polySeries != null) {
            spec = spec.withSeries(polySeries);
        }
        spec = spec.withSeries(Series.line(polySeries == null ? "" : "∇_{ad}", r,
                p.numbers(ProfileTable.NABLA_AD).values()));
        for (ReferenceLine line : lines) {
            spec = spec.withReferenceLine(line);
        }
        return spec;
    }

    private static double[] normalized(NumberColumn c) {
        double[] v = c.values();
        double centre = v[0];
        for (int i = 0; i < v.length; i++) {
            v[i] /= centre;
        }
        return v;
    }
}
