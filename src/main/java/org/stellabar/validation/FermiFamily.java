package org.stellabar.validation;

import java.util.List;
import org.stellabar.eos.Composition;
import org.stellabar.eos.fermi.FermiGasRadiationEos;
import org.stellabar.survey.EosGrid;
import org.stellabar.survey.SofteningBoundary;

/**
 * The equation of state with electrons of any degeneracy and pairs ({@link FermiGasRadiationEos})
 * for pure oxygen-16: P, Γ1, η and n₊ at degenerate, relativistic, pair-rich and classical states
 * against an independent 30-digit mpmath computation; the upper edge of the region where Γ1 &lt; 4/3
 * ({@link SofteningBoundary}) against an mpmath root of Γ1 = 4/3; and the region's densest point
 * against the shape of the pair-instability region as the literature draws it (from memory).
 */
public final class FermiFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "fermi";
    /** Its reference tables. */
    public static final List<String> FILES = List.of("fermi-eos.csv", "fermi-boundary-computed.csv",
            "fermi-boundary-published.csv");
    /** Pure oxygen-16, as the reference scripts assume (μ_e = 2, μ_i = 16). */
    static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);
    /** Densities scanned for the edge [g/cm3], and how many. */
    static final double SCAN_RHO_MIN = 1.0;
    static final double SCAN_RHO_MAX = 1e8;
    static final int SCAN_POINTS = 200;
    /** Temperatures scanned for the densest point of the region [K], and how many. */
    static final double TIP_T_MIN = 1e9;
    static final double TIP_T_MAX = 5e9;
    static final int TIP_TEMPERATURES = 81;

    private static final String KNOWN = "P, Gamma1, eta, n_positron, rho_gamma1_four_thirds_high, "
            + "log10_rho_max_region, log10_T_at_rho_max_region";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        FermiGasRadiationEos eos = new FermiGasRadiationEos(OXYGEN);
        SofteningBoundary region = new SofteningBoundary(OXYGEN);
        return TableChecks.run(ID, "Electrons of any degeneracy with pairs (fermi)", source, FILES, tables -> {
            double[] tip = densestPoint(region);
            return row -> ours(row, eos, region, tip);
        }, TableChecks.NO_CHARTS,
                "Our values from `FermiGasRadiationEos` (pure oxygen-16: X = Y = 0, Z = 1, A = 16) at each reference"
                        + " state; the edge of Γ1 < 4/3 from `SofteningBoundary` (scan of " + SCAN_POINTS
                        + " densities in [1, 1e8] g/cm3, bisection in ln ρ to 1e-12); the densest point of the region"
                        + " over " + TIP_TEMPERATURES + " temperatures log-spaced in [1e9, 5e9] K.");
    }

    private static double ours(ReferenceValue row, FermiGasRadiationEos eos, SofteningBoundary region, double[] tip) {
        return switch (row.quantity()) {
            case "P" -> eos.state(row.number("rho"), row.number("T")).P();
            case "Gamma1" -> eos.state(row.number("rho"), row.number("T")).Gamma1();
            case "eta" -> eos.fermiState(row.number("rho"), row.number("T")).eta();
            case "n_positron" -> eos.fermiState(row.number("rho"), row.number("T")).nPositron();
            case "rho_gamma1_four_thirds_high" -> region.at(row.number("T"), SCAN_RHO_MIN, SCAN_RHO_MAX, SCAN_POINTS)
                    .rhoHigh();
            case "log10_rho_max_region" -> Math.log10(tip[1]);
            case "log10_T_at_rho_max_region" -> Math.log10(tip[0]);
            default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
        };
    }

    /** {T, ρ} of the region's highest upper edge over the scanned temperatures. */
    private static double[] densestPoint(SofteningBoundary region) {
        double[] best = {Double.NaN, 0.0};
        for (double t : EosGrid.logSpaced(TIP_T_MIN, TIP_T_MAX, TIP_TEMPERATURES)) {
            SofteningBoundary.Span s = region.at(t, SCAN_RHO_MIN, SCAN_RHO_MAX, SCAN_POINTS);
            if (s != null && s.rhoHigh() > best[1]) {
                best[0] = t;
                best[1] = s.rhoHigh();
            }
        }
        return best;
    }
}
