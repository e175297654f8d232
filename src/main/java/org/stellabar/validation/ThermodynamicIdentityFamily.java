package org.stellabar.validation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
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
 * Thermodynamic identities of the equation of state checked by finite differences over the whole
 * ρ–T plane, from gas-dominated (β ≈ 1 − 10⁻¹⁷) to radiation-dominated (β ≈ 10⁻¹⁸) states.
 *
 * <p>Each identity sets a derivative, taken numerically from stellabar's P(ρ, T), s(ρ, T), u(ρ, T),
 * f(ρ, T) or its inversions, against another quantity stellabar returns. No closed form of the
 * derivatives is used on the finite-difference side, so a wrong response function, heat capacity,
 * exponent or entropy constant shows up as a residual.
 *
 * <p>Derivatives are fourth-order central differences in ln ρ, ln T or ln P with step h = 10⁻³
 * (Abramowitz &amp; Stegun 1964, 25.3.6). Truncation error ≈ h⁴|f⁽⁵⁾|/30: every function here is a
 * sum of a few exponentials of ln ρ, ln T with rates ≤ 4 (or a log), so |f⁽⁵⁾| ≤ 4⁵|f| and the
 * relative truncation is below 4⁵·10⁻¹²/30 ≈ 3·10⁻¹¹. Rounding contributes ≈ 1.5 ε |f|/(h |f'|)
 * ≈ 10⁻¹² for the ratios |f/f'| ≤ 30 met here (entropy and free energy carry a large constant).
 * The tolerance, 10⁻⁹ relative, is thirty times the larger of the two.
 */
public final class ThermodynamicIdentityFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "thermodynamic-identities";
    /** Relative tolerance of every identity (see the class comment). */
    public static final double TOLERANCE = 1e-9;
    /** Finite-difference step in the logarithm. */
    static final double STEP = 1e-3;
    /** Grid: log10 ρ from −12 to 6 and log10 T from 3.5 to 10, in steps of 0.75 and 0.25. */
    static final double LOG_RHO_MIN = -12.0;
    static final double LOG_RHO_STEP = 0.75;
    static final int RHO_POINTS = 25;
    static final double LOG_T_MIN = 3.5;
    static final double LOG_T_STEP = 0.25;
    static final int T_POINTS = 27;
    /** Below this β a step of 2h in ln T along an isobar would leave no gas at all. */
    static final double ISOBAR_MIN_BETA = 0.02;
    /**
     * Below this β the adiabat's temperature on an isobar lies within 10⁻¹² of the pure-radiation
     * temperature, where (P, s) → T stops its search (see {@link EosInversion#temperatureOnIsobar}).
     */
    static final double ADIABAT_MIN_BETA = 1e-8;

    /** One identity: its name, what it says, and which states it applies to. */
    enum Identity {
        MAXWELL("maxwell", "(∂s/∂ln ρ)_T = −(1/ρT)(∂P/∂ln T)_ρ", "Maxwell relation from f(ρ, T)"),
        ENERGY("energy", "(∂u/∂ln ρ)_T = (P − (∂P/∂ln T)_ρ)/ρ", "energy equation (first and second law)"),
        HEAT("heat", "(∂u/∂ln T)_ρ = T (∂s/∂ln T)_ρ", "u and s describe the same heat capacity"),
        C_V("c_V", "(∂u/∂ln T)_ρ = T c_V", "stellabar's c_V"),
        FREE_ENERGY("free_energy", "(∂f/∂ln ρ)_T = P/ρ", "f = u − Ts gives the pressure"),
        GAMMA1("Gamma1", "Γ1 = χ_ρ + χ_T(Γ3 − 1), all from differences of P and s", "stellabar's Γ1"),
        GAMMA3("Gamma3", "Γ3 − 1 = −(∂s/∂ln ρ)_T / (∂s/∂ln T)_ρ", "stellabar's Γ3"),
        C_P("c_P", "T (∂s/∂T)_P along the isobar through ρ(P, T) = c_P", "stellabar's c_P and (P, T) → ρ"),
        NABLA_AD("nabla_ad", "(∂ln T/∂ln P)_s along the adiabat through (P, s) → T = ∇_ad",
                "stellabar's ∇_ad and (P, s) → T");

        final String key;
        final String formula;
        final String meaning;

        Identity(String key, String formula, String meaning) {
            this.key = key;
            this.formula = formula;
            this.meaning = meaning;
        }
    }

    private final GasRadiationEos eos = new GasRadiationEos(Composition.of(0.70, 0.28, 0.02));
    private final EosInversion inversion = new EosInversion(eos);

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        List<CheckResult> checks = new ArrayList<>();
        for (int i = 0; i < RHO_POINTS; i++) {
            for (int j = 0; j < T_POINTS; j++) {
                double rho = Math.pow(10.0, LOG_RHO_MIN + LOG_RHO_STEP * i);
                double t = Math.pow(10.0, LOG_T_MIN + LOG_T_STEP * j);
                checks.addAll(checkPoint(rho, t));
            }
        }
        List<String> description = List.of(
                "Computed on a grid of " + RHO_POINTS + " × " + T_POINTS + " states: log10 ρ [g/cm3] = −12 … 6 "
                        + "(step 0.75), log10 T [K] = 3.5 … 10 (step 0.25), X = 0.70, Z = 0.02; β runs from "
                        + "1 − 10⁻¹⁷ to 10⁻¹⁸ across it. No reference table: each identity compares a derivative "
                        + "taken by fourth-order central differences (step 10⁻³ in the logarithm) with the "
                        + "quantity stellabar returns, as a relative residual; tolerance "
                        + Numbers.compact(TOLERANCE) + " (finite-difference truncation ≲ 3e-11, rounding ≲ 1e-12).",
                "c_P is checked where β ≥ " + ISOBAR_MIN_BETA + " (a step along the isobar must keep some gas); "
                        + "∇_ad where the classical specific entropy is positive (elsewhere the Sackur–Tetrode "
                        + "entropy of an ideal gas has no meaning and (P, s) → T refuses it) and β ≥ "
                        + Numbers.compact(ADIABAT_MIN_BETA) + " (below it (P, s) → T cannot reach the temperature: "
                        + "its search ends 1e-12 short of the pure-radiation value).");
        return new FamilyResult(ID, "Thermodynamic identities across the ρ–T plane", description, List.of(), checks,
                charts(checks));
    }

    private List<CheckResult> checkPoint(double rho, double t) {
        List<CheckResult> out = new ArrayList<>();
        EosState s = eos.state(rho, t);
        double lnRho = Math.log(rho);
        double lnT = Math.log(t);
        String where = String.format(Locale.US, "rho=%s g/cm3;T=%s K", Numbers.significant(rho, 3),
                Numbers.significant(t, 3));

        DoubleUnaryOperator pOfLnT = x -> eos.state(rho, Math.exp(x)).P();
        DoubleUnaryOperator pOfLnRho = x -> eos.state(Math.exp(x), t).P();
        DoubleUnaryOperator sOfLnT = x -> eos.entropy(rho, Math.exp(x));
        DoubleUnaryOperator sOfLnRho = x -> eos.entropy(Math.exp(x), t);
        DoubleUnaryOperator uOfLnT = x -> eos.state(rho, Math.exp(x)).u();
        DoubleUnaryOperator uOfLnRho = x -> eos.state(Math.exp(x), t).u();
        DoubleUnaryOperator fOfLnRho = x -> eos.state(Math.exp(x), t).f();

        double dPdLnT = derivative(pOfLnT, lnT);
        double dPdLnRho = derivative(pOfLnRho, lnRho);
        double dSdLnRho = derivative(sOfLnRho, lnRho);
        double dSdLnT = derivative(sOfLnT, lnT);
        double dUdLnT = derivative(uOfLnT, lnT);
        double dUdLnRho = derivative(uOfLnRho, lnRho);

        double maxwellRhs = -dPdLnT / (rho * t);
        out.add(result(Identity.MAXWELL, where, dSdLnRho, maxwellRhs, Math.abs(maxwellRhs)));
        double energyRhs = (s.P() - dPdLnT) / rho;
        out.add(result(Identity.ENERGY, where, dUdLnRho, energyRhs, (s.P() + Math.abs(dPdLnT)) / rho));
        out.add(result(Identity.HEAT, where, dUdLnT, t * dSdLnT, Math.abs(t * dSdLnT)));
        out.add(result(Identity.C_V, where, dUdLnT, t * s.cV(), t * s.cV()));
        out.add(result(Identity.FREE_ENERGY, where, derivative(fOfLnRho, lnRho), s.P() / rho, s.P() / rho));
        double chiRho = dPdLnRho / s.P();
        double chiT = dPdLnT / s.P();
        double gamma3m1 = -dSdLnRho / dSdLnT;
        out.add(result(Identity.GAMMA1, where, chiRho + chiT * gamma3m1, s.Gamma1(), s.Gamma1()));
        out.add(result(Identity.GAMMA3, where, gamma3m1, s.Gamma3() - 1.0, s.Gamma3() - 1.0));
        if (s.beta() >= ISOBAR_MIN_BETA) {
            double p = s.P();
            // along the isobar ln ρ changes with ln T at the rate 1 + 4(1 − β)/β: shrink the step by
            // that rate so the truncation error stays that of a gentle function
            double rate = 1.0 + 4.0 * s.oneMinusBeta() / s.beta();
            double cP = derivative(x -> eos.entropy(inversion.density(p, Math.exp(x)), Math.exp(x)), lnT,
                    STEP / rate);
            out.add(result(Identity.C_P, where, cP, s.cP(), s.cP()));
        }
        if (s.s() > 0.0 && s.beta() >= ADIABAT_MIN_BETA) {
            double entropy = s.s();
            double nabla = derivative(x -> inversion.temperatureOnIsobar(Math.exp(x), entropy), Math.log(s.P()));
            out.add(result(Identity.NABLA_AD, where, nabla, s.nablaAd(), s.nablaAd()));
        }
        return out;
    }

    /** Fourth-order central difference of f at x with step {@link #STEP}. */
    static double derivative(DoubleUnaryOperator f, double x) {
        return derivative(f, x, STEP);
    }

    /** Fourth-order central difference of f at x with step h. */
    static double derivative(DoubleUnaryOperator f, double x, double h) {
        return (f.applyAsDouble(x - 2 * h) - 8.0 * f.applyAsDouble(x - h) + 8.0 * f.applyAsDouble(x + h)
                - f.applyAsDouble(x + 2 * h)) / (12.0 * h);
    }

    private static CheckResult result(Identity identity, String where, double lhs, double rhs, double scale) {
        double residual = Double.isFinite(lhs) ? Math.abs(lhs - rhs) / scale : Double.POSITIVE_INFINITY;
        return new CheckResult(ID, identity.key, where, "", Numbers.significant(rhs, 12), rhs, lhs, residual,
                Tolerance.relativeTo(TOLERANCE), Provenance.IDENTITY, identity.formula, "ρ–T grid");
    }

    /** @return the identities in report order */
    static List<Identity> identities() {
        return List.of(Identity.values());
    }

    private static List<ReportChart> charts(List<CheckResult> checks) {
        ChartSpec byRho = ChartSpec.of(Axis.log("ρ", "g/cm3"), Axis.log("worst residual over T", ""))
                .withLegend(LegendPosition.RIGHT);
        ChartSpec byT = ChartSpec.of(Axis.log("T", "K"), Axis.log("worst residual over ρ", ""))
                .withLegend(LegendPosition.RIGHT);
        int slot = 0;
        for (Identity identity : Identity.values()) {
            double[] worstByRho = new double[RHO_POINTS];
            double[] worstByT = new double[T_POINTS];
            boolean[] seenRho = new boolean[RHO_POINTS];
            boolean[] seenT = new boolean[T_POINTS];
            for (CheckResult c : checks) {
                if (!c.quantity().equals(identity.key)) {
                    continue;
                }
                int[] ij = gridIndex(c.parameters());
                // a zero residual cannot sit on a log axis: show it at the floor of double precision
                double r = Math.max(Math.min(c.deviation(), 1.0), 1e-17);
                worstByRho[ij[0]] = Math.max(worstByRho[ij[0]], r);
                worstByT[ij[1]] = Math.max(worstByT[ij[1]], r);
                seenRho[ij[0]] = true;
                seenT[ij[1]] = true;
            }
            byRho = byRho.withSeries(series(identity.key, LOG_RHO_MIN, LOG_RHO_STEP, worstByRho, seenRho, slot));
            byT = byT.withSeries(series(identity.key, LOG_T_MIN, LOG_T_STEP, worstByT, seenT, slot));
            slot++;
        }
        ReferenceLine tolerance = ReferenceLine.horizontal(TOLERANCE, "tolerance");
        return List.of(
                new ReportChart("identities-by-density", "Worst relative residual of each thermodynamic identity "
                        + "over the temperatures of the grid, against density (residuals below 1e-17 drawn at 1e-17).",
                        byRho.withReferenceLine(tolerance)),
                new ReportChart("identities-by-temperature", "Worst relative residual of each thermodynamic identity "
                        + "over the densities of the grid, against temperature (residuals below 1e-17 drawn at 1e-17).",
                        byT.withReferenceLine(tolerance)));
    }

    private static Series series(String key, double logMin, double logStep, double[] worst, boolean[] seen, int slot) {
        List<double[]> points = new ArrayList<>();
        for (int k = 0; k < worst.length; k++) {
            if (seen[k]) {
                points.add(new double[] {Math.pow(10.0, logMin + logStep * k), worst[k]});
            }
        }
        return Series.points(label(key), points.stream().mapToDouble(p -> p[0]).toArray(),
                points.stream().mapToDouble(p -> p[1]).toArray())
                .withKind(org.stellabar.charts.SeriesKind.LINE_AND_POINTS).withStyleSlot(slot);
    }

    private static String label(String key) {
        return switch (key) {
            case "Gamma1" -> "Γ_1";
            case "Gamma3" -> "Γ_3";
            case "nabla_ad" -> "∇_{ad}";
            case "c_V" -> "c_V";
            case "c_P" -> "c_P";
            case "free_energy" -> "free energy";
            default -> key;
        };
    }

    /** Grid indices of a check from its parameter text, recomputed from the grid definition. */
    private static int[] gridIndex(String parameters) {
        String[] parts = parameters.split(";");
        double rho = Double.parseDouble(parts[0].substring("rho=".length(), parts[0].indexOf(' ')));
        double t = Double.parseDouble(parts[1].substring("T=".length(), parts[1].indexOf(' ')));
        int i = (int) Math.round((Math.log10(rho) - LOG_RHO_MIN) / LOG_RHO_STEP);
        int j = (int) Math.round((Math.log10(t) - LOG_T_MIN) / LOG_T_STEP);
        return new int[] {i, j};
    }
}
