package org.stellabar.structure;

import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * A Lane-Emden function sampled at chosen radii, with the dimensionless structure it implies.
 *
 * @param n polytropic index
 * @param xi1 surface radius ξ₁
 * @param omega ω_n = −ξ₁²θ'(ξ₁)
 * @param xi the radii ξ (copied in and out)
 * @param theta θ at each radius, ≥ 0
 * @param dthetaDxi dθ/dξ at each radius
 */
public record LaneEmdenProfile(double n, double xi1, double omega, double[] xi, double[] theta,
        double[] dthetaDxi) {

    // The columns of the dimensionless profile table, all without a unit.
    /** {@code xi}: dimensionless radius xi, dimensionless. */
    public static final Quantity XI = Quantity.dimensionless("xi", "dimensionless radius xi");
    /** {@code r_over_R}: fractional radius xi/xi1, dimensionless. */
    public static final Quantity R_OVER_R = Quantity.dimensionless("r_over_R", "fractional radius xi/xi1");
    /** {@code theta}: Lane-Emden function theta, dimensionless. */
    public static final Quantity THETA = Quantity.dimensionless("theta", "Lane-Emden function theta");
    /** {@code dtheta_dxi}: slope dtheta/dxi, dimensionless. */
    public static final Quantity DTHETA_DXI = Quantity.dimensionless("dtheta_dxi", "slope dtheta/dxi");
    /** {@code rho_over_rho_c}: density over central density, theta^n, dimensionless. */
    public static final Quantity RHO_OVER_RHO_C =
            Quantity.dimensionless("rho_over_rho_c", "density over central density, theta^n");
    /** {@code P_over_P_c}: pressure over central pressure, theta^(n+1), dimensionless. */
    public static final Quantity P_OVER_P_C =
            Quantity.dimensionless("P_over_P_c", "pressure over central pressure, theta^(n+1)");
    /** {@code m_over_M}: enclosed mass fraction, xi^2 theta'/(xi1^2 theta'(xi1)), dimensionless. */
    public static final Quantity M_OVER_M =
            Quantity.dimensionless("m_over_M", "enclosed mass fraction, xi^2 theta'/(xi1^2 theta'(xi1))");

    /**
     * Canonical constructor: checks ranges and consistency; copies arrays in.
     *
     * @param n polytropic index
     * @param xi1 surface radius ξ₁
     * @param omega ω_n = −ξ₁²θ'(ξ₁)
     * @param xi the radii ξ (copied in and out)
     * @param theta θ at each radius, ≥ 0
     * @param dthetaDxi dθ/dξ at each radius
     */
    public LaneEmdenProfile {
        xi = xi.clone();
        theta = theta.clone();
        dthetaDxi = dthetaDxi.clone();
        if (theta.length != xi.length || dthetaDxi.length != xi.length) {
            throw new IllegalArgumentException("profile arrays differ in length");
        }
    }

    /** @return a copy of the {@code xi} component, so that this record stays unchanged */
    @Override
    public double[] xi() {
        return xi.clone();
    }

    /** @return a copy of the {@code theta} component, so that this record stays unchanged */
    @Override
    public double[] theta() {
        return theta.clone();
    }

    /** @return a copy of the {@code dthetaDxi} component, so that this record stays unchanged */
    @Override
    public double[] dthetaDxi() {
        return dthetaDxi.clone();
    }

    /** @return the number of radii */
    public int size() {
        return xi.length;
    }

    /** @return ρ/ρ_c = θⁿ at each radius */
    public double[] densityRatio() {
        double[] out = new double[xi.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.pow(theta[i], n);
        }
        return out;
    }

    /** @return P/P_c = θⁿ⁺¹ at each radius */
    public double[] pressureRatio() {
        double[] out = new double[xi.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.pow(theta[i], n + 1.0);
        }
        return out;
    }

    /**
     * @return m/M = −ξ²θ'/ω_n at each radius, clamped into [m/M of the row inside, 1]: near the
     *     surface of a polytrope close to n = 5 the true increase per row falls below the
     *     interpolation error, which must not carry m/M above 1 or make it decrease
     */
    public double[] massFraction() {
        double[] out = new double[xi.length];
        double previous = 0.0;
        for (int i = 0; i < out.length; i++) {
            double raw = 0.0 - xi[i] * xi[i] * dthetaDxi[i] / omega; // 0.0 − x: no −0.0 at the centre
            out[i] = Math.min(1.0, Math.max(previous, raw));
            previous = out[i];
        }
        return out;
    }

    /** @return r/R = ξ/ξ₁ at each radius */
    public double[] radiusFraction() {
        double[] out = new double[xi.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = xi[i] / xi1;
        }
        return out;
    }

    /**
     * @param metadata what the table is
     * @return the profile as a table named "profile" (all columns dimensionless)
     */
    public Table toTable(Metadata metadata) {
        // this profile's own arrays are copied; the ones made here are handed over
        return new Table.Builder("profile", metadata)
                .number(XI, xi)
                .numberTaking(R_OVER_R, radiusFraction())
                .number(THETA, theta)
                .number(DTHETA_DXI, dthetaDxi)
                .numberTaking(RHO_OVER_RHO_C, densityRatio())
                .numberTaking(P_OVER_P_C, pressureRatio())
                .numberTaking(M_OVER_M, massFraction())
                .build();
    }
}
