package org.stellabar.pipeline;

import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.eos.EosQuantities;
import org.stellabar.structure.LaneEmdenProfile;
import org.stellabar.survey.MassSequence;
import org.stellabar.table.Table;

/** Figures of the dimensionless polytrope profile and of a standard-model mass sequence. */
public final class SurveyFigures {

    private SurveyFigures() {
    }

    /**
     * θ, ρ/ρ_c, P/P_c and m/M against ξ/ξ₁ for a Lane-Emden profile table.
     *
     * @param profile the table of {@code stellabar polytrope} (columns r_over_R, theta, rho_over_rho_c,
     *     P_over_P_c, m_over_M)
     * @param index the polytropic index, for the legend title
     * @return the chart
     */
    public static ChartSpec polytrope(Table profile, double index) {
        double[] x = profile.numbers(LaneEmdenProfile.R_OVER_R).values();
        return ChartSpec.of(Axis.linear("ξ/ξ_1", "").withRange(0.0, 1.0), Axis.linear("n = " + index, "")
                        .withRange(0.0, 1.0))
                .withSeries(Series.line("θ", x, profile.numbers(LaneEmdenProfile.THETA).values()))
                .withSeries(Series.line("ρ/ρ_c = θ^n", x, profile.numbers(LaneEmdenProfile.RHO_OVER_RHO_C).values()))
                .withSeries(Series.line("P/P_c = θ^{n+1}", x, profile.numbers(LaneEmdenProfile.P_OVER_P_C).values()))
                .withSeries(Series.line("m/M", x, profile.numbers(LaneEmdenProfile.M_OVER_M).values()))
                .withLegend(LegendPosition.BELOW);
    }

    /**
     * 1 − β against M for a mass sequence.
     *
     * @param sequence the table of {@code stellabar sequence} (columns M, one_minus_beta)
     * @return the chart
     */
    public static ChartSpec radiationSupport(Table sequence) {
        return ChartSpec.of(Axis.log("M", "Msun"), Axis.log("1 − β", ""))
                .withSeries(Series.line("standard model", sequence.numbers(MassSequence.M).values(),
                        sequence.numbers(EosQuantities.ONE_MINUS_BETA).values()))
                .withReferenceLine(ReferenceLine.horizontal(0.5, "P_{rad} = P_{gas}"))
                .withLegend(LegendPosition.INSIDE_BOTTOM_RIGHT);
    }

    /**
     * Γ1 − 4/3 against M for a mass sequence, the margin against Newtonian instability.
     *
     * @param sequence the table of {@code stellabar sequence} (columns M, Gamma1_minus_4_3)
     * @return the chart
     */
    public static ChartSpec stabilityMargin(Table sequence) {
        return ChartSpec.of(Axis.log("M", "Msun"), Axis.log("Γ_1 − 4/3", ""))
                .withSeries(Series.line("standard model", sequence.numbers(MassSequence.M).values(),
                        sequence.numbers(MassSequence.GAMMA1_MINUS_4_3).values()))
                .withLegend(LegendPosition.INSIDE_BOTTOM_LEFT);
    }
}
