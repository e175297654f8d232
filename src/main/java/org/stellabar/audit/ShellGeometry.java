package org.stellabar.audit;

/**
 * Radius and enclosed mass at every shell: as read, or one integrated from the other and the
 * density ({@link ProfileIntegrals}) when the profile gives only one. Internal to the audit.
 *
 * @param r radius [cm], or null without radius and mass
 * @param m enclosed mass [g], or null without radius and mass
 * @param massDerived true if m was integrated from r and ρ
 * @param radiusDerived true if r was integrated from m and ρ
 */
record ShellGeometry(double[] r, double[] m, boolean massDerived, boolean radiusDerived) {

    /**
     * @param p the profile
     * @return its radii and masses
     */
    static ShellGeometry of(Profile p) {
        double[] r = p.r();
        double[] m = p.m();
        if (r != null && m == null) {
            return new ShellGeometry(r, ProfileIntegrals.massFromRadius(r, p.rho()), true, false);
        }
        if (m != null && r == null) {
            return new ShellGeometry(ProfileIntegrals.radiusFromMass(m, p.rho()), m, false, true);
        }
        return new ShellGeometry(r, m, false, false);
    }
}
