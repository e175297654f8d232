package org.stellabar.structure;

import java.util.List;
import java.util.OptionalDouble;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * The Lane-Emden function of one index n &lt; 5 out to its first zero ξ₁, with the constants that
 * scale it to a star of mass M and radius R (Chandrasekhar 1939, ch. IV; Kippenhahn, Weigert &amp;
 * Weiss 2012, <i>Stellar Structure and Evolution</i>, 2nd ed., §19):
 *
 * <ul>
 * <li>r = αξ with α = R/ξ₁; ρ = ρ_c θⁿ; P = P_c θⁿ⁺¹; m(r) = 4πα³ρ_c(−ξ²θ');</li>
 * <li>ω_n = −ξ₁²θ'(ξ₁), so M = 4πα³ρ_c ω_n;</li>
 * <li>ρ_c/ρ̄ = ξ₁³/(3ω_n);</li>
 * <li>P_c = W_n GM²/R⁴ with W_n = 1/(4π(n+1)θ'(ξ₁)²);</li>
 * <li>K = N_n G M^((n−1)/n) R^((3−n)/n) for P = Kρ^(1+1/n), with
 *     N_n = (4π)^(1/n)/(n+1) · ω_n^((1−n)/n) · ξ₁^((n−3)/n) (n &gt; 0);</li>
 * <li>gravitational energy Ω = −(3/(5−n)) GM²/R.</li>
 * </ul>
 *
 * <p>Immutable and thread-safe. Dimensionless throughout.
 */
public final class LaneEmdenSolution {

    private final LaneEmdenCurve curve;
    private final double tolerance;
    private final double xi1;
    private final double dthetaXi1;
    /** Computed on first use; a race only computes the same value twice. */
    private volatile double relativisticCoefficient;

    LaneEmdenSolution(LaneEmdenCurve curve, double tolerance) {
        this.curve = curve;
        this.tolerance = tolerance;
        this.xi1 = curve.xiEnd();
        this.dthetaXi1 = curve.dthetaDxi(xi1);
    }

    /** @return the polytropic index n */
    public double n() {
        return curve.n();
    }

    /** @return the relative tolerance the solution was integrated with */
    public double tolerance() {
        return tolerance;
    }

    /** @return ξ₁, the first zero of θ (the surface) */
    public double xi1() {
        return xi1;
    }

    /** @return θ'(ξ₁) = dθ/dξ at the surface (negative) */
    public double dthetaXi1() {
        return dthetaXi1;
    }

    /** @return ω_n = −ξ₁²θ'(ξ₁), the dimensionless mass */
    public double omega() {
        return -xi1 * xi1 * dthetaXi1;
    }

    /** @return ρ_c/ρ̄ = ξ₁³/(3ω_n), central over mean density */
    public double centralToMeanDensity() {
        return xi1 * xi1 * xi1 / (3.0 * omega());
    }

    /** @return W_n = 1/(4π(n+1)θ'(ξ₁)²), so that P_c = W_n GM²/R⁴ */
    public double centralPressureCoefficient() {
        return 1.0 / (4.0 * Math.PI * (n() + 1.0) * dthetaXi1 * dthetaXi1);
    }

    /**
     * The mass–radius constant N_n of K = N_n G M^((n−1)/n) R^((3−n)/n), for P = Kρ^(1+1/n).
     *
     * @return N_n, or empty for n = 0 (an incompressible sphere has no finite K) and for n so
     *     small (below about 0.006) that N_n, which grows like e^(4.1/n), exceeds the double range
     */
    public OptionalDouble massRadiusConstant() {
        double n = n();
        if (n == 0.0) {
            return OptionalDouble.empty();
        }
        double direct = Math.pow(4.0 * Math.PI, 1.0 / n) / (n + 1.0) * Math.pow(omega(), (1.0 - n) / n)
                * Math.pow(xi1, (n - 3.0) / n);
        if (Double.isFinite(direct) && direct > 0.0) {
            return OptionalDouble.of(direct);
        }
        // small n: a factor alone overflows (or two meet as Infinity × 0) before the product does
        double logN = (Math.log(4.0 * Math.PI) + (1.0 - n) * Math.log(omega()) + (n - 3.0) * Math.log(xi1)) / n
                - Math.log(n + 1.0);
        double value = Math.exp(logN);
        return Double.isFinite(value) && value > 0.0 ? OptionalDouble.of(value) : OptionalDouble.empty();
    }

    /** @return 3/(5−n), so that the gravitational energy is Ω = −(3/(5−n)) GM²/R */
    public double bindingEnergyCoefficient() {
        return 3.0 / (5.0 - n());
    }

    /**
     * The structure constant K_n of the post-Newtonian stability criterion
     * ⟨Γ1⟩ − 4/3 &gt; K_n·2GM/(Rc²) (Chandrasekhar 1964, ApJ 140, 417) for this structure:
     * K_n = (5−n)ξ₁²/(9ω_n³) · [ (3/2)∫φ²θⁿ dξ + (2/(n+1))∫φξθⁿ⁺¹ dξ ], φ = −ξ²θ', the
     * dimensionless form of the integrals in {@link StabilityAnalysis}. K₃ = 1.1245 and
     * K₁.₅ = 0.6451 (Chandrasekhar 1965, ApJ 142, 1519).
     *
     * @return K_n
     */
    public double relativisticCoefficient() {
        double k = relativisticCoefficient;
        if (k == 0.0) {
            double n = n();
            double[] integrals = curve.integrate((xi, theta, dtheta) -> {
                double phi = -xi * xi * dtheta;
                return phi * phi * Math.pow(theta, n);
            }, (xi, theta, dtheta) -> {
                double phi = -xi * xi * dtheta;
                return phi * xi * Math.pow(theta, n + 1.0);
            });
            double potentialSquared = integrals[0];
            double potentialPressure = integrals[1];
            double w = omega();
            k = (5.0 - n) * xi1 * xi1 / (9.0 * w * w * w) * (1.5 * potentialSquared + 2.0 / (n + 1.0) * potentialPressure);
            relativisticCoefficient = k;
        }
        return k;
    }

    /**
     * Notes on the accuracy of this solution, for table metadata: empty except for n within 10⁻³
     * of 5. There ξ₁ ≈ 17.64/(5 − n) (our computation) is set by a departure of order 5 − n from
     * the n = 5 solution, so its relative error grows as about 0.5·tolerance/(5 − n) (measured:
     * 5·10⁻¹¹ at n = 4.999, 5·10⁻⁹ at n = 4.99999 with the default tolerance); ω_n stays
     * better than 10⁻⁹ down to 5 − n = 10⁻⁸.
     *
     * @return zero or one line
     */
    public List<String> accuracyNotes() {
        double gap = 5.0 - n();
        if (gap >= 1e-3) {
            return List.of();
        }
        return List.of(String.format(java.util.Locale.US,
                "n is within %.1e of 5: xi1 is set by a departure of order 5-n from the n = 5 solution; "
                        + "its relative accuracy is only about %.0e", gap, 0.5 * tolerance / gap));
    }

    /** @return the dense θ(ξ) on [0, ξ₁] */
    public LaneEmdenCurve curve() {
        return curve;
    }

    /**
     * @param xi dimensionless radius in [0, ξ₁]
     * @return θ(ξ) ≥ 0
     * @throws BadInputException outside [0, ξ₁]
     */
    public double theta(double xi) {
        return curve.theta(xi);
    }

    /**
     * @param xi dimensionless radius in [0, ξ₁]
     * @return dθ/dξ
     * @throws BadInputException outside [0, ξ₁]
     */
    public double dthetaDxi(double xi) {
        return curve.dthetaDxi(xi);
    }

    /**
     * The profile at chosen radii.
     *
     * @param xi radii in [0, ξ₁], any order
     * @return the profile at those radii
     * @throws BadInputException if a radius is outside [0, ξ₁]
     */
    public LaneEmdenProfile sample(double[] xi) {
        int k = xi.length;
        double[] theta = new double[k];
        double[] dtheta = new double[k];
        for (int i = 0; i < k; i++) {
            LaneEmdenPoint p = curve.at(xi[i]);
            theta[i] = p.theta();
            dtheta[i] = p.dthetaDxi();
        }
        return new LaneEmdenProfile(n(), xi1, omega(), xi, theta, dtheta);
    }

    /**
     * The profile at {@code points} radii evenly spaced in ξ from the centre to ξ₁, both included
     * (the last radius is exactly ξ₁, where θ = 0).
     *
     * @param points number of radii, ≥ 2
     * @return the profile
     * @throws BadInputException if points &lt; 2
     */
    public LaneEmdenProfile sample(int points) {
        if (points < 2) {
            throw new BadInputException("number of profile points " + points + " is below 2");
        }
        double[] xi = new double[points];
        for (int i = 0; i < points; i++) {
            xi[i] = xi1 * i / (points - 1);
        }
        xi[points - 1] = xi1;
        return sample(xi);
    }

    /**
     * The dimensionless profile as a table: ξ, r/R, θ, dθ/dξ, ρ/ρ_c = θⁿ, P/P_c = θⁿ⁺¹,
     * m/M = ξ²θ'/(ξ₁²θ'(ξ₁)).
     *
     * @param points number of radii evenly spaced in ξ, ≥ 2
     * @return the table named "profile"
     * @throws BadInputException if points &lt; 2
     */
    public Table profileTable(int points) {
        return sample(points).toTable(metadata(points));
    }

    private Metadata metadata(int points) {
        Inputs inputs = Inputs.builder().number(LaneEmdenSummary.N, n())
                .integer("points", points, "profile radii, evenly spaced in xi")
                .number("tolerance", tolerance, "", "relative tolerance of the integration").build();
        List<String> notes = new java.util.ArrayList<>(List.of(
                "theta'' + (2/xi) theta' + theta^n = 0, theta(0) = 1, theta'(0) = 0; surface at the first zero xi1",
                "radii evenly spaced in xi from the centre to xi1; r/R = xi/xi1",
                "rho/rho_c = theta^n, P/P_c = theta^(n+1), m/M = xi^2 theta'/(xi1^2 theta'(xi1))"));
        notes.addAll(accuracyNotes());
        return Metadata.of("Lane-Emden polytrope n = " + n() + ": dimensionless profile", inputs, notes);
    }
}
