package org.stellabar.validation;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.stellabar.charts.Axis;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.LegendPosition;
import org.stellabar.charts.Series;
import org.stellabar.physics.Dimension;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;

/**
 * Eddington's standard model: the quartic's coefficient C and the numbers derived from it, β and
 * 1 − β at chosen masses and μ, the supermassive limit, and the Sun as an n = 3 polytrope.
 */
public final class StandardModelFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "standard-model";
    /** Its reference tables. */
    public static final List<String> FILES = List.of("standard-model-published.csv", "standard-model-computed.csv");

    private static final String KNOWN = "quartic_coefficient, mass_coefficient, supermassive_limit_coefficient, "
            + "supermassive_beta_coefficient, beta, one_minus_beta, sun_central_density, sun_central_pressure";

    private final EddingtonStandardModel model = EddingtonStandardModel.create();

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        return TableChecks.run(ID, "Eddington standard model", source, FILES, tables -> this::ours,
                (tables, checks) -> List.of(chart(tables)),
                "Our values: `EddingtonStandardModel` on its own n = 3 Lane-Emden solution: C from "
                        + "`quarticCoefficient()`, C^(-1/2) and C^(-1/4) from it; β and 1 − β from `beta(M, μ)`; "
                        + "β μ (M/M☉)^(1/2) from the same at the mass given; the Sun's ρ_c and P_c from "
                        + "`centralDensity` and `centralPressure` at M☉, R☉ (IAU 2015 nominal).");
    }

    private double ours(ReferenceValue row) {
        double c = model.quarticCoefficient();
        return switch (row.quantity()) {
            case "quartic_coefficient" -> c;
            case "mass_coefficient" -> 1.0 / Math.sqrt(c);
            case "supermassive_limit_coefficient" -> Math.pow(c, -0.25);
            case "supermassive_beta_coefficient" -> {
                double mass = row.quantityParameter("M", Dimension.MASS);
                double mu = row.number("mu");
                yield model.beta(mass, mu).beta() * mu * Math.sqrt(mass / SOLAR_MASS);
            }
            case "beta", "one_minus_beta" -> {
                BetaSolution b = model.beta(row.quantityParameter("M", Dimension.MASS), row.number("mu"));
                yield row.quantity().equals("beta") ? b.beta() : b.oneMinusBeta();
            }
            case "sun_central_density" -> model.centralDensity(row.quantityParameter("M", Dimension.MASS),
                    row.quantityParameter("R", Dimension.LENGTH));
            case "sun_central_pressure" -> model.centralPressure(row.quantityParameter("M", Dimension.MASS),
                    row.quantityParameter("R", Dimension.LENGTH));
            default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
        };
    }

    private ReportChart chart(List<ReferenceTable> tables) {
        Map<Double, List<double[]>> references = new TreeMap<>();
        TableChecks.rows(tables).filter(row -> row.quantity().equals("beta")).forEach(row -> references
                .computeIfAbsent(row.number("mu"), k -> new ArrayList<>())
                .add(new double[] {row.quantityParameter("M", Dimension.MASS) / SOLAR_MASS, row.value()}));
        ChartSpec spec = ChartSpec.of(Axis.log("M", "Msun"), Axis.log("β", ""))
                .withLegend(LegendPosition.INSIDE_BOTTOM_LEFT);
        int points = 201;
        int slot = 0;
        for (Map.Entry<Double, List<double[]>> e : references.entrySet()) {
            double mu = e.getKey();
            double[] m = new double[points];
            double[] beta = new double[points];
            for (int i = 0; i < points; i++) {
                m[i] = Math.pow(10.0, -1.0 + 9.0 * i / (points - 1));
                beta[i] = model.beta(m[i] * SOLAR_MASS, mu).beta();
            }
            String name = "μ = " + Numbers.compact(mu);
            spec = spec.withSeries(Series.line(name, m, beta).withStyleSlot(slot))
                    .withSeries(Series.points(name + " (40-digit)", e.getValue().stream().mapToDouble(p -> p[0]).toArray(),
                            e.getValue().stream().mapToDouble(p -> p[1]).toArray()).withStyleSlot(slot));
            slot++;
        }
        return new ReportChart("standard-model-beta",
                "Gas-pressure fraction β of the standard model against mass for three μ: stellabar (lines) and the "
                        + "40-digit solution of Eddington's quartic (markers).",
                spec);
    }
}
