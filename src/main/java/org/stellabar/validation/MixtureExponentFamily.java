package org.stellabar.validation;

import java.util.List;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.ReferenceLine;
import org.stellabar.charts.Series;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;

/**
 * Γ1, Γ2, Γ3 and ∇_ad of the gas + radiation mixture against their closed forms in β. For
 * 0 &lt; β &lt; 1 our values come from full equation-of-state states found by inverting (β, P);
 * the limits β = 0 and β = 1 have no state (ρ = 0 or T = 0) and use the exponent functions of
 * {@link GasRadiationEos} directly.
 */
public final class MixtureExponentFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "mixture-exponents";
    /** Its reference table. */
    public static final List<String> FILES = List.of("mixture-exponents.csv");
    /** Total pressure of the states [dyn/cm2]; the exponents depend on β alone. */
    static final double PRESSURE = 1e17;

    private static final String KNOWN = "Gamma1, Gamma2, Gamma3, nabla_ad";
    private final EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.70, 0.28, 0.02)));

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        return TableChecks.run(ID, "Adiabatic exponents of the gas + radiation mixture", source, FILES,
                tables -> this::ours, (tables, checks) -> List.of(chart(tables)),
                "Our values: for 0 < β < 1 the full state of `GasRadiationEos` (X = 0.70, Z = 0.02) at P = 1e17 "
                        + "dyn/cm2 and the β asked for, found by `EosInversion.atBetaPressure`; at β = 0 and β = 1, "
                        + "where no state exists, the exponent functions `GasRadiationEos.gamma3MinusOne`, "
                        + "`gamma1`, `gamma2` directly. The exponents depend on β alone, so composition and "
                        + "pressure are immaterial.");
    }

    private double ours(ReferenceValue row) {
        double beta = row.number("beta");
        Exponents e = exponents(beta);
        return switch (row.quantity()) {
            case "Gamma1" -> e.gamma1;
            case "Gamma2" -> e.gamma2;
            case "Gamma3" -> e.gamma3;
            case "nabla_ad" -> e.nablaAd;
            default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
        };
    }

    private record Exponents(double gamma1, double gamma2, double gamma3, double nablaAd) {
    }

    private Exponents exponents(double beta) {
        if (beta > 0.0 && beta < 1.0) {
            EosState s = inversion.atBetaPressure(beta, PRESSURE);
            return new Exponents(s.Gamma1(), s.Gamma2(), s.Gamma3(), s.nablaAd());
        }
        double g3m1 = GasRadiationEos.gamma3MinusOne(beta, 1.0 - beta);
        double g1 = GasRadiationEos.gamma1(beta, 1.0 - beta, g3m1);
        return new Exponents(g1, GasRadiationEos.gamma2(g1, g3m1), 1.0 + g3m1, g3m1 / g1);
    }

    private ReportChart chart(List<ReferenceTable> tables) {
        int points = 201;
        double[] beta = new double[points];
        double[] g1 = new double[points];
        double[] g3 = new double[points];
        double[] nabla = new double[points];
        for (int i = 0; i < points; i++) {
            beta[i] = i / (double) (points - 1);
            Exponents e = exponents(beta[i]);
            g1[i] = e.gamma1;
            g3[i] = e.gamma3;
            nabla[i] = e.nablaAd;
        }
        ChartSpec spec = ChartSpec.of(Axis.linear("β", "").withRange(0.0, 1.0), Axis.linear("Γ", ""))
                .withSecondaryYAxis(Axis.linear("∇_{ad}", ""))
                .withSeries(Series.line("Γ_1", beta, g1).withStyleSlot(0))
                .withSeries(closedForm(tables, "Gamma1", "Γ_1 closed form").withStyleSlot(0))
                .withSeries(Series.line("Γ_3", beta, g3).withStyleSlot(1))
                .withSeries(closedForm(tables, "Gamma3", "Γ_3 closed form").withStyleSlot(1))
                .withSeries(Series.line("∇_{ad}", beta, nabla).withStyleSlot(2).onSecondaryAxis())
                .withSeries(closedForm(tables, "nabla_ad", "∇_{ad} closed form").withStyleSlot(2).onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "4/3"))
                .withLegend(LegendPosition.INSIDE_TOP_LEFT);
        return new ReportChart("mixture-exponents",
                "Γ1, Γ3 (left axis) and ∇_ad (right axis) from stellabar's equation of state (lines) against the "
                        + "closed forms of Chandrasekhar (1939, ch. II) at β = 0, 0.1, …, 1 (markers).",
                spec);
    }

    private static Series closedForm(List<ReferenceTable> tables, String quantity, String label) {
        List<ReferenceValue> rows = TableChecks.rows(tables).filter(row -> row.quantity().equals(quantity)).toList();
        return Series.points(label, rows.stream().mapToDouble(row -> row.number("beta")).toArray(),
                rows.stream().mapToDouble(ReferenceValue::value).toArray());
    }
}
