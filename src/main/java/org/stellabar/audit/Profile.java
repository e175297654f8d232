package org.stellabar.audit;

import java.util.List;
import java.util.Objects;
import org.stellabar.eos.Composition;

/**
 * A profile ready to audit: the usable shells in CGS, ordered from the centre outwards, each with
 * its data-row number in the file. Radius, mass, pressure and Γ1 are optional (null when the
 * profile lacks them).
 *
 * @param source the file name
 * @param rows data-row numbers as in the file, centre first
 * @param r radius [cm], strictly increasing, or null
 * @param m enclosed mass [g], non-decreasing, or null
 * @param rho density [g/cm3], positive
 * @param T temperature [K], positive
 * @param P the profile's total pressure [dyn/cm2], positive, or null
 * @param gamma1 the profile's Γ1, or null
 * @param compositions each shell's composition
 * @param surfaceFirst true if the file lists the shells from the surface inwards
 * @param surface the vacuum surface row left out of the shells, or null
 */
public record Profile(String source, int[] rows, double[] r, double[] m, double[] rho, double[] T, double[] P,
        double[] gamma1, List<Composition> compositions, boolean surfaceFirst, SurfacePoint surface) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies arrays in; copies collections in; fills defaults for absent parts.
     *
     * @param source the file name
     * @param rows data-row numbers as in the file, centre first
     * @param r radius [cm], strictly increasing, or null
     * @param m enclosed mass [g], non-decreasing, or null
     * @param rho density [g/cm3], positive
     * @param T temperature [K], positive
     * @param P the profile's total pressure [dyn/cm2], positive, or null
     * @param gamma1 the profile's Γ1, or null
     * @param compositions each shell's composition
     * @param surfaceFirst true if the file lists the shells from the surface inwards
     * @param surface the vacuum surface row left out of the shells, or null
     */
    public Profile {
        Objects.requireNonNull(source, "source");
        rows = rows.clone();
        rho = rho.clone();
        T = T.clone();
        r = r == null ? null : r.clone();
        m = m == null ? null : m.clone();
        P = P == null ? null : P.clone();
        gamma1 = gamma1 == null ? null : gamma1.clone();
        compositions = List.copyOf(compositions);
        int n = rows.length;
        for (double[] a : new double[][] {rho, T, r, m, P, gamma1}) {
            if (a != null && a.length != n) {
                throw new IllegalArgumentException("profile arrays differ in length");
            }
        }
        if (compositions.size() != n) {
            throw new IllegalArgumentException("one composition per shell");
        }
    }

    /** @return the number of shells */
    public int size() {
        return rows.length;
    }

    /** @return true if the profile ends with a vacuum surface row (kept apart from the shells) */
    public boolean hasSurface() {
        return surface != null;
    }

    /** @return true if the profile gives radii */
    public boolean hasRadius() {
        return r != null;
    }

    /** @return true if the profile gives enclosed masses */
    public boolean hasMass() {
        return m != null;
    }

    /** @return true if the profile gives pressures */
    public boolean hasPressure() {
        return P != null;
    }

    /** @return true if the profile gives Γ1 */
    public boolean hasGamma1() {
        return gamma1 != null;
    }

    /** @return a copy of the {@code rows} component, so that this record stays unchanged */
    @Override
    public int[] rows() {
        return rows.clone();
    }

    /** @return a copy of the {@code r} component, so that this record stays unchanged */
    @Override
    public double[] r() {
        return r == null ? null : r.clone();
    }

    /** @return a copy of the {@code m} component, so that this record stays unchanged */
    @Override
    public double[] m() {
        return m == null ? null : m.clone();
    }

    /** @return a copy of the {@code rho} component, so that this record stays unchanged */
    @Override
    public double[] rho() {
        return rho.clone();
    }

    /** @return a copy of the {@code T} component, so that this record stays unchanged */
    @Override
    public double[] T() {
        return T.clone();
    }

    /** @return a copy of the {@code P} component, so that this record stays unchanged */
    @Override
    public double[] P() {
        return P == null ? null : P.clone();
    }

    /** @return a copy of the {@code gamma1} component, so that this record stays unchanged */
    @Override
    public double[] gamma1() {
        return gamma1 == null ? null : gamma1.clone();
    }
}
