package org.stellabar.survey;

import java.util.List;
import java.util.Locale;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.physics.Constants;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Boundaries on the ρ–T plane, as densities at each temperature of a log-spaced list.
 *
 * <ul>
 *   <li>Constant β: P_gas/P_rad = β/(1 − β) gives ρ = [β/(1 − β)] aT³ μ m_u/(3k), straight lines
 *       of slope 3 in log ρ–log T. β = 1/2 is the line P_rad = P_gas.</li>
 *   <li>Electron degeneracy: n_e λ_e³/2 = 1, i.e. ρ ∝ T^{3/2} (the line where the classical
 *       electron gas fails; see {@link ValidityCheck}).</li>
 * </ul>
 * The pair-creation temperature {@link ValidityCheck#PAIR_TEMPERATURE} is a constant T.
 */
public final class RegimeLines {

    /** β values drawn by default: from radiation-dominated to gas-dominated. */
    public static final List<Double> DEFAULT_BETAS = List.of(0.1, 0.5, 0.9, 0.99);

    private RegimeLines() {
    }

    /**
     * Density at which P_gas/P = β at temperature T.
     *
     * @param eos the equation of state
     * @param beta gas pressure fraction, in (0, 1)
     * @param T temperature [K]
     * @return ρ [g/cm3]
     */
    public static double densityAtBeta(GasRadiationEos eos, double beta, double T) {
        return beta / (1.0 - beta) * Constants.RADIATION_DENSITY * T * T * T / (3.0 * eos.gasConstant());
    }

    /**
     * The boundaries as a table: column {@code T} and one density column per line.
     *
     * @param composition the mixture
     * @param tMin lowest temperature [K]
     * @param tMax highest temperature [K]
     * @param points number of temperatures
     * @param betas β values for the constant-β lines
     * @return columns T, rho_beta_&lt;β&gt; for each β, rho_degenerate
     */
    public static Table table(Composition composition, double tMin, double tMax, int points, List<Double> betas) {
        GasRadiationEos eos = new GasRadiationEos(composition);
        double[] t = EosGrid.logSpaced(tMin, tMax, points);
        Inputs inputs = Inputs.builder().number("T_min", tMin, "K", "lowest temperature")
                .number("T_max", tMax, "K", "highest temperature").number(EosQuantities.MU, composition.mu()).build();
        Table.Builder b = new Table.Builder("regime_lines", Metadata.of("boundaries on the rho-T plane", inputs,
                List.of("constant beta: rho = beta/(1-beta) aT^3 mu m_u/(3k)",
                        "degeneracy: n_e lambda_e^3/2 = 1",
                        "pair creation from T = " + ValidityCheck.PAIR_TEMPERATURE + " K")))
                .number(EosQuantities.T, t);
        for (double beta : betas) {
            double[] rho = new double[points];
            for (int i = 0; i < points; i++) {
                rho[i] = densityAtBeta(eos, beta, t[i]);
            }
            b.number(columnName(beta), "g/cm3", "density where P_gas/P = " + beta, rho);
        }
        double[] degenerate = new double[points];
        for (int i = 0; i < points; i++) {
            degenerate[i] = eos.validity().degeneracyDensity(t[i], 1.0);
        }
        b.number("rho_degenerate", "g/cm3", "density where n_e lambda_e^3/2 = 1", degenerate);
        return b.build();
    }

    /**
     * @param beta β of the line, 0 &lt; β &lt; 1
     * @return the column name of a constant-β line, e.g. "rho_beta_0.99"
     */
    public static String columnName(double beta) {
        return "rho_beta_" + String.format(Locale.US, "%s", beta);
    }
}
