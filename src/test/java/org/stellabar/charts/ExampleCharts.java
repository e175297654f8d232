package org.stellabar.charts;

import java.util.List;
import org.stellabar.physics.Constants;

/**
 * Charts of the kinds later commands draw, built here from closed forms so the tests exercise
 * real shapes: lines that span decades, labelled markers, reference lines, two y axes.
 */
final class ExampleCharts {

    /** Mean molecular weight of fully ionized X = 0.70, Z = 0.02 gas: 1/μ = 2X + 3Y/4 + Z/2. */
    static final double MU = 1 / (2 * 0.70 + 0.75 * 0.28 + 0.5 * 0.02);
    /** Electrons per baryon for the same mixture: 1/μ_e = X + Y/2 + Z/2. */
    static final double MU_E = 1 / (0.70 + 0.5 * 0.28 + 0.5 * 0.02);

    private ExampleCharts() {
    }

    /**
     * T on the contour of constant β: P_rad/P_gas = (1 − β)/β gives
     * aT³/3 = ((1 − β)/β) kρ/(μ m_u).
     */
    static double contourTemperature(double beta, double rho) {
        double gas = Constants.BOLTZMANN / (MU * Constants.ATOMIC_MASS_UNIT);
        return Math.cbrt(3 * gas * rho * (1 - beta) / (beta * Constants.RADIATION_DENSITY));
    }

    /**
     * T where n_e λ_e³ / 2 = 1, λ_e = h / √(2π m_e k T): the onset of electron degeneracy.
     */
    static double degeneracyTemperature(double rho) {
        double ne = rho / (MU_E * Constants.ATOMIC_MASS_UNIT);
        double h2 = Constants.PLANCK * Constants.PLANCK;
        return h2 / (2 * Math.PI * Constants.ELECTRON_MASS * Constants.BOLTZMANN) * Math.pow(ne / 2, 2.0 / 3.0);
    }

    static double[] logSpace(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from * Math.pow(to / from, i / (double) (n - 1));
        }
        return v;
    }

    /** A ρ–T plane: β contours, P_rad = P_gas, degeneracy, the pair threshold, labelled points. */
    static ChartSpec densityTemperaturePlane() {
        double[] rho = logSpace(1e-9, 1e7, 60);
        ChartSpec spec = ChartSpec.of(Axis.log("ρ", "g/cm3"), Axis.log("T", "K").withRange(1e3, 3e10))
                .withLegend(LegendPosition.BELOW);
        double[] betas = {0.1, 0.5, 0.9, 0.99};
        for (double beta : betas) {
            double[] t = new double[rho.length];
            for (int i = 0; i < rho.length; i++) {
                t[i] = contourTemperature(beta, rho[i]);
            }
            String label = beta == 0.5 ? "β = 0.5 (P_{rad} = P_{gas})" : "β = " + beta;
            spec = spec.withSeries(Series.line(label, rho, t));
        }
        double[] tDeg = new double[rho.length];
        for (int i = 0; i < rho.length; i++) {
            tDeg[i] = degeneracyTemperature(rho[i]);
        }
        spec = spec.withSeries(Series.line("degeneracy, n_e λ_e^3/2 = 1", rho, tDeg));
        // Test fixture: three points placed on the computed contours, not data of any star.
        double[] pr = {1e-3, 1.0, 1e3};
        double[] pt = {contourTemperature(0.5, 1e-3), contourTemperature(0.9, 1.0), contourTemperature(0.99, 1e3)};
        spec = spec.withSeries(Series.points("sample centres", pr, pt).withPointLabels(List.of("A", "B", "C")));
        return spec.withReferenceLine(ReferenceLine.horizontal(1e9, "pair creation, T ≈ 10^9 K"));
    }

    /** A profile with two y quantities: β and Γ1 against m/M, with Γ1 = 4/3 marked. */
    static ChartSpec twoAxisProfile() {
        int n = 80;
        double[] m = new double[n];
        double[] beta = new double[n];
        double[] gamma1 = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = i / (double) (n - 1);
            beta[i] = 0.55 + 0.4 * m[i] * m[i];
            double b = beta[i];
            // Γ1 of a gas + radiation mixture with γ = 5/3 (Chandrasekhar 1939, ch. II):
            // Γ1 = (32 − 24β − 3β²)/(24 − 21β)
            gamma1[i] = (32 - 24 * b - 3 * b * b) / (24 - 21 * b);
        }
        return ChartSpec.of(Axis.linear("m/M", ""), Axis.linear("β", ""))
                .withSecondaryYAxis(Axis.linear("Γ_1", ""))
                .withSeries(Series.line("β", m, beta))
                .withSeries(Series.line("Γ_1", m, gamma1).onSecondaryAxis())
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "Γ_1 = 4/3").onSecondaryAxis())
                .withLegend(LegendPosition.INSIDE_TOP_LEFT);
    }

    /**
     * ∇_ad of the gas + radiation mixture beside the polytropic gradient 1/(n + 1), n = 3:
     * letter subscripts that need an attributed string in axis title and legend.
     */
    static ChartSpec gradientProfile() {
        int n = 60;
        double[] r = new double[n];
        double[] nablaAd = new double[n];
        double[] poly = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = i / (double) (n - 1);
            double b = 0.55 + 0.4 * r[i] * r[i];
            // for γ = 5/3: ∇_ad = (8 − 6β)/(32 − 24β − 3β²) (Chandrasekhar 1939, ch. II)
            nablaAd[i] = (8 - 6 * b) / (32 - 24 * b - 3 * b * b);
            poly[i] = 1.0 / (3 + 1);
        }
        return ChartSpec.of(Axis.linear("r/R", ""), Axis.linear("∇", ""))
                .withTitle("Adiabatic and polytropic gradients, n = 3")
                .withSeries(Series.line("∇_{ad}", r, nablaAd))
                .withSeries(Series.line("∇_{poly} = 1/(n + 1)", r, poly))
                .withReferenceLine(ReferenceLine.vertical(0.5, "r = R/2"))
                .withLegend(LegendPosition.INSIDE_TOP_LEFT);
    }
}
