package org.stellabar.validation;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.Series;
import org.stellabar.structure.LaneEmdenSolver;

/**
 * The structure constant K_n of the post-Newtonian stability criterion ⟨Γ1⟩ − 4/3 &gt;
 * K_n·2GM/(Rc²) (Chandrasekhar 1964, ApJ 140, 417) against the recalled published values and an
 * independent 50-digit evaluation.
 */
public final class StabilityConstantFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "gr-stability";
    /** Its reference tables. */
    public static final List<String> FILES = List.of("gr-stability-published.csv", "gr-stability-computed.csv");

    private final LaneEmdenSolver solver = new LaneEmdenSolver();

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        return TableChecks.run(ID, "Post-Newtonian stability constant K_n", source, FILES, tables -> row -> {
            if (!row.quantity().equals("K_n")) {
                throw TableChecks.unknownQuantity(row, ID, "K_n");
            }
            return solver.solve(row.number("n")).relativisticCoefficient();
        }, (tables, checks) -> List.of(chart(tables)),
                "Our values: `LaneEmdenSolution.relativisticCoefficient()`, integrals over stellabar's dense "
                        + "Lane-Emden solution. The integral form of K_n was written for this project without "
                        + "the paper at hand, by stellabar's code and by the reference script alike; the evidence "
                        + "that it is Chandrasekhar's K_n is its agreement with the two recalled published values.");
    }

    private ReportChart chart(List<ReferenceTable> tables) {
        int points = 36;
        double[] n = new double[points];
        double[] k = new double[points];
        for (int i = 0; i < points; i++) {
            n[i] = 1.0 + 0.1 * i;
            k[i] = solver.solve(n[i]).relativisticCoefficient();
        }
        ChartSpec spec = ChartSpec.of(Axis.linear("n", ""), Axis.linear("K_n", ""))
                .withSeries(Series.line("K_n, stellabar", n, k).withStyleSlot(0))
                .withLegend(LegendPosition.INSIDE_TOP_LEFT);
        int slot = 1;
        for (Provenance p : List.of(Provenance.COMPUTED, Provenance.FROM_MEMORY)) {
            Map<Double, Double> refs = new LinkedHashMap<>();
            TableChecks.rows(tables).filter(row -> row.provenance() == p).forEach(row -> refs.put(row.number("n"),
                    row.value()));
            if (!refs.isEmpty()) {
                String label = p == Provenance.COMPUTED ? "50-digit integration" : "published (from memory)";
                spec = spec.withSeries(Series.points(label, refs.keySet().stream().mapToDouble(Double::doubleValue)
                        .toArray(), refs.values().stream().mapToDouble(Double::doubleValue).toArray())
                        .withStyleSlot(slot++));
            }
        }
        return new ReportChart("gr-stability-constant",
                "K_n of the post-Newtonian stability criterion against the polytropic index: stellabar (line), the "
                        + "independent 50-digit evaluation and the recalled published values (markers).",
                spec);
    }
}
