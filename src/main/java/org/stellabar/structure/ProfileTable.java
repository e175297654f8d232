package org.stellabar.structure;

import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * Presents a {@link StarProfile} as a {@link Table} named "profile": one row per radius, ASCII
 * column names, a unit on every column. For a polytrope two more columns compare the adiabatic
 * gradient with the polytrope's own.
 */
public final class ProfileTable {

    /** Name of the profile table. */
    public static final String NAME = "profile";

    /** Radius of a shell. */
    public static final Quantity R = new Quantity("r", "cm", "radius");
    /** Fractional radius. */
    public static final Quantity R_OVER_R = Quantity.dimensionless("r_over_R", "fractional radius r/R");
    /** Mass inside a shell. */
    public static final Quantity M = new Quantity("m", "g", "mass inside r");
    /** Fractional mass. */
    public static final Quantity M_OVER_M = Quantity.dimensionless("m_over_M", "fractional mass m/M");
    /** Γ1, named as in every profile. */
    public static final Quantity GAMMA1 = EosQuantities.GAMMA1.withDescription("first adiabatic exponent (dlnP/dlnrho)_s");
    /** ∇_ad, named as in every profile. */
    public static final Quantity NABLA_AD = EosQuantities.NABLA_AD.withDescription("adiabatic gradient (dlnT/dlnP)_s");
    /** The sound speed under the short name profiles use. */
    public static final Quantity SOUND_SPEED = EosQuantities.SOUND_SPEED.withName("c_s");
    /** Validity warnings of each row as bits. */
    public static final Quantity WARNING_MASK = EosQuantities.WARNING_MASK.withDescription(
            "validity warnings of the row as bits: " + ValidityCheck.maskLegend());
    /** A polytrope's own gradient. */
    public static final Quantity NABLA_POLY = Quantity.dimensionless("nabla_poly",
            "the polytrope's gradient dln(P/rho)/dlnP = 1/(n+1)");
    /** 1 where a polytrope's layer would convect. */
    public static final Quantity CONVECTIVE = Quantity.integer("convective",
            "1 where nabla_ad < nabla_poly (Schwarzschild: such a layer convects), else 0");

    private ProfileTable() {
    }

    /**
     * @param profile the structure
     * @param mass total mass M [g], the denominator of m/M
     * @param radius radius R [cm], the denominator of r/R
     * @param polytropeIndex n for a polytrope, or NaN for a structure that is not one
     * @param metadata what and from where
     * @return the table
     */
    public static Table of(StarProfile profile, double mass, double radius, double polytropeIndex, Metadata metadata) {
        RadialProfile radial = profile.radial();
        double[] r = radial.r();
        double[] m = radial.m();
        Table.Builder b = new Table.Builder(NAME, metadata)
                .number(R, r)
                .number(R_OVER_R, divide(r, radius))
                .number(M, m)
                .number(M_OVER_M, divide(m, mass))
                .number(EosQuantities.RHO, radial.rho())
                .number(EosQuantities.P, radial.P())
                .number(EosQuantities.P_GAS, profile.Pgas())
                .number(EosQuantities.P_RAD, profile.Prad())
                .number(EosQuantities.T, profile.T())
                .number(EosQuantities.BETA, profile.beta())
                .number(EosQuantities.ONE_MINUS_BETA, profile.oneMinusBeta())
                .number(GAMMA1, radial.gamma1())
                .number(NABLA_AD, profile.nablaAd())
                .number(SOUND_SPEED, profile.soundSpeed())
                .number(WARNING_MASK, toDouble(profile.warnings()));
        if (!Double.isNaN(polytropeIndex)) {
            double nablaPoly = 1.0 / (polytropeIndex + 1.0);
            double[] nablaAd = profile.nablaAd();
            double[] poly = new double[r.length];
            double[] convective = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                poly[i] = nablaPoly;
                convective[i] = nablaAd[i] < nablaPoly ? 1.0 : 0.0;
            }
            b.number(NABLA_POLY, poly).number(CONVECTIVE, convective);
        }
        return b.build();
    }

    private static double[] toDouble(int[] values) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i];
        }
        return out;
    }

    private static double[] divide(double[] values, double by) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] / by;
        }
        return out;
    }
}
