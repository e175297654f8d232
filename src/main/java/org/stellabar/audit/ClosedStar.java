package org.stellabar.audit;

import java.util.Arrays;

/**
 * The arrays the whole-star integrals run over: the shells, closed by the profile's vacuum
 * surface row when it gives the surface's radius (P = 0 there; β, μ and Γ1 of the outermost
 * shell, which carry no weight where P = 0). Internal to the audit; arrays shared.
 *
 * @param r radius [cm], strictly increasing
 * @param m enclosed mass [g]
 * @param rho density [g/cm3]
 * @param P pressure [dyn/cm2]
 * @param beta our β
 * @param inverseMu 1/μ
 * @param gamma1 our Γ1
 * @param profileGamma1 the profile's Γ1, or null if it gives none
 * @param closedBySurface true if the surface row closes the arrays
 */
record ClosedStar(double[] r, double[] m, double[] rho, double[] P, double[] beta, double[] inverseMu,
        double[] gamma1, double[] profileGamma1, boolean closedBySurface) {

    /**
     * @param p the profile
     * @param g its radii and masses
     * @param pressure the pressure of each shell [dyn/cm2], the profile's where it gives one
     * @param ours our states
     * @return the closed star, or null without radii and masses or with a zero total mass
     */
    static ClosedStar of(Profile p, ShellGeometry g, double[] pressure, ShellStates ours) {
        double[] r = g.r();
        if (r == null) {
            return null;
        }
        SurfacePoint s = p.surface();
        boolean close = s != null && !Double.isNaN(s.r()) && !g.radiusDerived()
                && (g.massDerived() || !Double.isNaN(s.m()));
        int n = r.length;
        int k = close ? n + 1 : n;
        double[] rr = extend(r, k);
        double[] rh = extend(p.rho(), k);
        double[] mm = extend(g.m(), k);
        double[] pp = extend(pressure, k);
        if (close) {
            rr[n] = s.r();
            rh[n] = s.rho();
            mm[n] = g.massDerived() ? ProfileIntegrals.massFromRadius(rr, rh)[n] : s.m();
            pp[n] = 0.0;
        }
        if (!(mm[k - 1] > 0.0)) {
            return null;
        }
        ClosedStar all = new ClosedStar(rr, mm, rh, pp, extend(ours.beta(), k), extend(ours.inverseMu(), k),
                extend(ours.gamma1(), k), p.hasGamma1() ? extend(p.gamma1(), k) : null, close);
        return g.radiusDerived() ? all.distinctRadii() : all;
    }

    /** @return the outermost enclosed mass M [g] */
    double mass() {
        return m[m.length - 1];
    }

    /** @return the outermost radius R [cm] */
    double radius() {
        return r[r.length - 1];
    }

    /**
     * Radii integrated from masses repeat where the masses do (printed with few digits near the
     * surface); such shells add no volume, and the stability integrals over r need distinct radii,
     * so all but the first of equal radii are dropped.
     */
    private ClosedStar distinctRadii() {
        int n = r.length;
        boolean[] keep = new boolean[n];
        int kept = 0;
        int last = 0;
        for (int i = 0; i < n; i++) {
            keep[i] = i == 0 || r[i] > r[last];
            if (keep[i]) {
                kept++;
                last = i;
            }
        }
        if (kept == n) {
            return this;
        }
        return new ClosedStar(pick(r, keep, kept), pick(m, keep, kept), pick(rho, keep, kept), pick(P, keep, kept),
                pick(beta, keep, kept), pick(inverseMu, keep, kept), pick(gamma1, keep, kept),
                profileGamma1 == null ? null : pick(profileGamma1, keep, kept), closedBySurface);
    }

    private static double[] pick(double[] a, boolean[] keep, int count) {
        double[] out = new double[count];
        int k = 0;
        for (int i = 0; i < a.length; i++) {
            if (keep[i]) {
                out[k++] = a[i];
            }
        }
        return out;
    }

    /** A copy lengthened to k by repeating the last value. */
    private static double[] extend(double[] a, int k) {
        double[] out = Arrays.copyOf(a, k);
        for (int i = a.length; i < k; i++) {
            out[i] = a[a.length - 1];
        }
        return out;
    }
}
