package org.stellabar.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.fermi.FermiGasRadiationEos;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * The region of the ρ–T plane where the first adiabatic exponent of the Fermi–Dirac equation of
 * state ({@link FermiGasRadiationEos}) falls below 4/3: where creating e± pairs takes up the
 * energy of compression, the pair instability's region (Fowler &amp; Hoyle 1964, ApJS 9, 201;
 * Rakavy &amp; Shaviv 1967, ApJ 148, 803). At each temperature of a log-spaced list the density
 * axis is scanned in ln ρ; every sign change of Γ1 − 4/3 is refined by bisection in ln ρ to a
 * relative 1e-12 in ρ (at most {@link #MAX_BISECTIONS} halvings). The region at one temperature is
 * reported as its outer envelope: the lowest density where Γ1 &lt; 4/3 and the highest; a lower
 * edge equal to the scan's lowest density means the region reaches beyond it (towards ρ → 0 the
 * pair–photon gas alone has Γ1 &lt; 4/3 near kT ~ m_e c²).
 */
public final class SofteningBoundary {

    /** Γ1 below which the region lies. */
    public static final double CRITICAL_GAMMA1 = 4.0 / 3.0;
    /** Bound on the bisections of one crossing: 60 halve a factor e^{0.2} to below 1e-18. */
    public static final int MAX_BISECTIONS = 60;
    /** Lower density of the region at each temperature. */
    public static final Quantity RHO_LOW = new Quantity("rho_low", "g/cm3",
            "lowest density where Gamma1 < 4/3 at this T (the scan's lower end if the region reaches it)");
    /** Upper density of the region at each temperature. */
    public static final Quantity RHO_HIGH = new Quantity("rho_high", "g/cm3",
            "highest density where Gamma1 < 4/3 at this T");

    /**
     * The region's envelope at one temperature.
     *
     * @param T temperature [K]
     * @param rhoLow lowest density with Γ1 &lt; 4/3 [g/cm3]
     * @param rhoHigh highest density with Γ1 &lt; 4/3 [g/cm3]
     */
    public record Span(double T, double rhoLow, double rhoHigh) {
    }

    private final FermiGasRadiationEos eos;

    /** @param composition the mixture */
    public SofteningBoundary(Composition composition) {
        this.eos = new FermiGasRadiationEos(composition);
    }

    /**
     * @param T temperature [K]
     * @param rhoMin lowest density scanned [g/cm3]
     * @param rhoMax highest density scanned [g/cm3]
     * @param scanPoints densities scanned (log-spaced), at least 2
     * @return the region's envelope at T, or null if Γ1 ≥ 4/3 at every scanned density
     */
    public Span at(double T, double rhoMin, double rhoMax, int scanPoints) {
        double[] rho = EosGrid.logSpaced(rhoMin, rhoMax, scanPoints);
        double low = Double.NaN;
        double high = Double.NaN;
        double previous = excess(rho[0], T);
        if (previous < 0.0) {
            low = rho[0];
            high = rho[0];
        }
        for (int i = 1; i < rho.length; i++) {
            double current = excess(rho[i], T);
            if (previous >= 0.0 && current < 0.0) {
                double edge = crossing(rho[i - 1], rho[i], T);
                low = Double.isNaN(low) ? edge : low;
                high = rho[i];
            } else if (previous < 0.0 && current >= 0.0) {
                high = crossing(rho[i - 1], rho[i], T);
            } else if (current < 0.0) {
                high = rho[i];
            }
            previous = current;
        }
        return Double.isNaN(low) ? null : new Span(T, low, high);
    }

    /**
     * The envelopes over a log-spaced list of temperatures, as a table (temperatures where the
     * region is empty are left out).
     *
     * @param tMin lowest temperature [K]
     * @param tMax highest temperature [K]
     * @param tPoints temperatures
     * @param rhoMin lowest density scanned [g/cm3]
     * @param rhoMax highest density scanned [g/cm3]
     * @param scanPoints densities scanned per temperature
     * @return columns T, rho_low, rho_high
     */
    public Table table(double tMin, double tMax, int tPoints, double rhoMin, double rhoMax, int scanPoints) {
        List<Span> spans = new ArrayList<>();
        for (double t : EosGrid.logSpaced(tMin, tMax, tPoints)) {
            Span s = at(t, rhoMin, rhoMax, scanPoints);
            if (s != null) {
                spans.add(s);
            }
        }
        Inputs inputs = Inputs.builder().number("T_min", tMin, "K", "lowest temperature")
                .number("T_max", tMax, "K", "highest temperature")
                .number("rho_min", rhoMin, "g/cm3", "lowest density scanned")
                .number("rho_max", rhoMax, "g/cm3", "highest density scanned")
                .number(EosQuantities.MU, eos.composition().mu()).build();
        Metadata metadata = Metadata.of("where Gamma1 < 4/3 on the fermi equation of state", inputs, List.of(
                String.format(Locale.US, "scan of %d log-spaced densities per temperature, crossings of Gamma1 = 4/3"
                        + " by bisection in ln rho to 1e-12", scanPoints),
                "outer envelope of the region at each temperature; temperatures where it is empty are left out"));
        return new Table.Builder("softening_region", metadata)
                .number(EosQuantities.T, spans.stream().mapToDouble(Span::T).toArray())
                .number(RHO_LOW, spans.stream().mapToDouble(Span::rhoLow).toArray())
                .number(RHO_HIGH, spans.stream().mapToDouble(Span::rhoHigh).toArray())
                .build();
    }

    /** Γ1 − 4/3 at (ρ, T); a state the integrals cannot give counts as outside the region. */
    private double excess(double rho, double T) {
        try {
            return eos.state(rho, T).Gamma1() - CRITICAL_GAMMA1;
        } catch (BadInputException | ConvergenceException e) {
            return Double.POSITIVE_INFINITY;
        }
    }

    /** The density between lo and hi where Γ1 − 4/3 changes sign, by bisection in ln ρ. */
    private double crossing(double lo, double hi, double T) {
        double a = Math.log(lo);
        double b = Math.log(hi);
        double fa = excess(lo, T);
        for (int i = 0; i < MAX_BISECTIONS; i++) {
            double m = 0.5 * (a + b);
            double fm = excess(Math.exp(m), T);
            if ((fm < 0.0) == (fa < 0.0)) {
                a = m;
                fa = fm;
            } else {
                b = m;
            }
            if (b - a <= 1e-12) {
                return Math.exp(0.5 * (a + b));
            }
        }
        throw new ConvergenceException(String.format(Locale.US,
                "Gamma1 = 4/3 at T = %.6g K: bisection did not reach 1e-12 in %d steps", T, MAX_BISECTIONS));
    }
}
