package org.stellabar.structure;

import org.stellabar.eos.ValidityCheck;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Presents a {@link StarProfile} as a {@link Table} named "profile": one row per radius, ASCII
 * column names, a unit on every column. For a polytrope two more columns compare the adiabatic
 * gradient with the polytrope's own.
 */
public final class ProfileTable {

    /** Name of the profile table. */
    public static final String NAME = "profile";

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
        double[] r = profile.r();
        double[] m = profile.m();
        Table.Builder b = new Table.Builder(NAME, metadata)
                .number("r", "cm", "radius", r)
                .number("r_over_R", "", "fractional radius r/R", divide(r, radius))
                .number("m", "g", "mass inside r", m)
                .number("m_over_M", "", "fractional mass m/M", divide(m, mass))
                .number("rho", "g/cm3", "density", profile.rho())
                .number("P", "dyn/cm2", "total pressure P_gas + P_rad", profile.P())
                .number("P_gas", "dyn/cm2", "ion + electron pressure", profile.Pgas())
                .number("P_rad", "dyn/cm2", "radiation pressure aT^4/3", profile.Prad())
                .number("T", "K", "temperature", profile.T())
                .number("beta", "", "gas pressure fraction P_gas/P", profile.beta())
                .number("one_minus_beta", "", "radiation pressure fraction P_rad/P", profile.oneMinusBeta())
                .number("Gamma1", "", "first adiabatic exponent (dlnP/dlnrho)_s", profile.Gamma1())
                .number("nabla_ad", "", "adiabatic gradient (dlnT/dlnP)_s", profile.nablaAd())
                .number("c_s", "cm/s", "adiabatic sound speed sqrt(Gamma1 P/rho)", profile.soundSpeed())
                .number("warning_mask", "", "validity warnings of the row as bits: " + ValidityCheck.maskLegend(),
                        toDouble(profile.warnings()));
        if (!Double.isNaN(polytropeIndex)) {
            double nablaPoly = 1.0 / (polytropeIndex + 1.0);
            double[] nablaAd = profile.nablaAd();
            double[] poly = new double[r.length];
            double[] convective = new double[r.length];
            for (int i = 0; i < r.length; i++) {
                poly[i] = nablaPoly;
                convective[i] = nablaAd[i] < nablaPoly ? 1.0 : 0.0;
            }
            b.number("nabla_poly", "", "the polytrope's gradient dln(P/rho)/dlnP = 1/(n+1)", poly)
                    .number("convective", "", "1 where nabla_ad < nabla_poly (Schwarzschild: such a layer convects),"
                            + " else 0", convective);
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
