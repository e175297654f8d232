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
                .withSeries(Series.line("m/M", x, profile.numbers(LaneEmdenProfile.M_OVER_M).values()));
    }

    /**
     * 1 − β against M for a mass sequence. One curve: no legend; the curve is labelled on the
     * plot with the composition it was computed for.
     *
     * @param sequence the table of {@code stellabar sequence} (columns M, one_minus_beta; μ in its
     *     inputs)
     * @return the chart
     */
    public static ChartSpec radiationSupport(Table sequence) {
        double[] m = sequence.numbers(MassSequence.M).values();
        return ChartSpec.of(Axis.log("M", "Msun"), Axis.log("1 − β", ""))
                .withSeries(Series.line("", m, sequence.numbers(EosQuantities.ONE_MINUS_BETA).values())
                        .withPointLabels(oneLabel(m.length, mu(sequence).isEmpty() ? "standard model"
                                : "standard model, " + mu(sequence))))
                .withReferenceLine(ReferenceLine.horizontal(0.5, "P_{rad} = P_{gas}"))
                .withLegend(LegendPosition.NONE);
    }

    /**
     * Γ1 − 4/3 against M for a mass sequence, the margin against Newtonian instability (left), and
     * the radius below which each model is unstable by general relativity, R_crit (right): the
     * relativistic threshold K_3·2GM/(Rc²) reaches the margin at R = R_crit.
     *
     * @param sequence the table of {@code stellabar sequence} (columns M, Gamma1_minus_4_3, R_crit)
     * @return the chart
     */
    public static ChartSpec stabilityMargin(Table sequence) {
        double[] m = sequence.numbers(MassSequence.M).values();
        return ChartSpec.of(Axis.log("M", "Msun"), Axis.log("Γ_1 − 4/3", ""))
                .withSecondaryYAxis(Axis.log("R_{crit}", "Rsun"))
                .withSeries(Series.line(mu(sequence).isEmpty() ? "Γ_1 − 4/3" : "Γ_1 − 4/3 (" + mu(sequence) + ")", m,
                        sequence.numbers(MassSequence.GAMMA1_MINUS_4_3).values()))
                .withSeries(Series.line("R_{crit}, GR onset", m,
                        sequence.numbers(MassSequence.R_CRIT).values()).onSecondaryAxis());
    }

    /** @return "μ = 0.617" from the table's inputs, "" if it has none */
    private static String mu(Table t) {
        return t.metadata().inputs().get(EosQuantities.MU.name())
                .filter(org.stellabar.table.NumberInput.class::isInstance)
                .map(i -> String.format(java.util.Locale.US, "μ = %.3f", ((org.stellabar.table.NumberInput) i).value()))
                .orElse("");
    }

    /** @return n labels, all empty but one two thirds along, for a line labelled on the plot */
    private static java.util.List<String> oneLabel(int n, String text) {
        java.util.List<String> labels = new java.util.ArrayList<>(java.util.Collections.nCopies(n, ""));
        labels.set(Math.min(n - 1, 2 * n / 3), text);
        return labels;
    }
}
