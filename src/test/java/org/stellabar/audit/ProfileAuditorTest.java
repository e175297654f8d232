package org.stellabar.audit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.numerics.ThreePointDerivative;
import org.stellabar.structure.RadialProfile;
import org.stellabar.structure.StabilityAnalysis;

class ProfileAuditorTest {

    private static ProfileAudit audit(PolytropeOneProfile star) {
        return new ProfileAuditor().audit(star.load());
    }

    /** Largest |value| over the shells with r/R at most {@code limit} (away from the surface). */
    private static double maxInside(double[] values, double[] r, double limit) {
        double R = r[r.length - 1];
        double worst = 0.0;
        for (int i = 0; i < values.length; i++) {
            if (r[i] <= limit * R) {
                worst = Math.max(worst, Math.abs(values[i]));
            }
        }
        return worst;
    }

    @Test
    void pressuresOfAProfileBuiltWithOurEquationOfStateAgree() {
        ProfileAudit a = audit(PolytropeOneProfile.standard(200));
        // T was solved from (rho, P) by our own quartic and printed with all 17 digits: only the
        // rounding of the inversion remains (a few ulp of T, times chi_T <= 4)
        assertTrue(a.star().maxPressureMismatch().getAsDouble() < 1e-13, "" + a.star().maxPressureMismatch());
        assertTrue(a.star().flaggedRows().isEmpty());
        for (double d : a.shells().pressureMismatch()) {
            assertTrue(Math.abs(d) < 1e-13);
        }
    }

    /**
     * The hydrostatic and mass-continuity residuals of an exact profile are the truncation error of
     * the three-point differences: halving the spacing divides them by 4 (second order). Measured
     * away from the surface, where θ ~ (π − ξ) makes the relative error of the last shells first
     * order in the spacing.
     */
    @Test
    void residualsFallAtSecondOrder() {
        int[] points = {101, 201, 401, 801};
        double[] hse = new double[points.length];
        double[] mass = new double[points.length];
        for (int k = 0; k < points.length; k++) {
            ProfileAudit a = audit(PolytropeOneProfile.standard(points[k]));
            double[] r = a.shells().radius();
            hse[k] = maxInside(a.shells().hydrostaticResidual(), r, 0.9);
            mass[k] = maxInside(a.shells().massContinuityResidual(), r, 0.9);
        }
        for (int k = 1; k < points.length; k++) {
            double hseOrder = Math.log(hse[k - 1] / hse[k]) / Math.log(2.0);
            double massOrder = Math.log(mass[k - 1] / mass[k]) / Math.log(2.0);
            // the points double (spacing halves, up to the (N-1) vs (N-1)/2 factor); an order within
            // 0.1 of 2 is unambiguous against first (1) or fourth (4) order
            assertEquals(2.0, hseOrder, 0.1, "hydrostatic order at N = " + points[k]);
            assertEquals(2.0, massOrder, 0.1, "mass continuity order at N = " + points[k]);
        }
        assertTrue(hse[points.length - 1] < 1e-5, "hydrostatic residual at N = 801: " + hse[points.length - 1]);
    }

    @Test
    void centreLimitOfTheResidualsConverges() {
        // at r = 0 the residuals come from the limits in r^2 and r^3; for the exact profile they must
        // vanish as the grid is refined (the one-sided formula is second order in r^2)
        double coarse = Math.abs(audit(PolytropeOneProfile.standard(101)).shells().hydrostaticResidual()[0]);
        double fine = Math.abs(audit(PolytropeOneProfile.standard(401)).shells().hydrostaticResidual()[0]);
        assertTrue(coarse < 1e-3 && fine < coarse / 10.0, coarse + " -> " + fine);
        double massCoarse = Math.abs(audit(PolytropeOneProfile.standard(101)).shells().massContinuityResidual()[0]);
        double massFine = Math.abs(audit(PolytropeOneProfile.standard(401)).shells().massContinuityResidual()[0]);
        assertTrue(massCoarse < 1e-3 && massFine < massCoarse / 10.0, massCoarse + " -> " + massFine);
    }

    @Test
    void virialTheoremHoldsWithTheSurfaceTerm() {
        // 3 ∫P dV − 4πR³P(R) = −Ω for any star in hydrostatic equilibrium (Kippenhahn, Weigert &
        // Weiss 2012, §3.1, with the surface term of a truncated star). The integrals are piecewise
        // parabolas (TabulatedQuadrature, fourth order): the defect falls 16-fold per doubling
        double previous = Double.NaN;
        for (int n : new int[] {101, 201, 401}) {
            StarAudit s = audit(PolytropeOneProfile.standard(n)).star();
            double defect = Math.abs(s.totals().virialRatio().getAsDouble()
                    - s.totals().surfacePressureTerm().getAsDouble() - 1.0);
            if (!Double.isNaN(previous)) {
                // measured 4.0-4.1; ±0.3 separates fourth order from third and fifth
                assertEquals(4.0, Math.log(previous / defect) / Math.log(2.0), 0.3, "virial order at N = " + n);
            }
            previous = defect;
        }
        assertTrue(previous < 1e-8, "virial defect " + previous);
    }

    @Test
    void massAndRadiusAreTheOutermostShell() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(101);
        StarAudit s = audit(p).star();
        assertEquals(p.m[100], s.totals().mass().getAsDouble(), 0.0);
        assertEquals(p.r[100], s.totals().radius().getAsDouble(), 0.0);
        assertTrue(s.totals().reachesCentre());
        assertFalse(s.massDerived() || s.radiusDerived());
        // one composition throughout: the mass-averaged mu is that composition's mu
        assertEquals(p.composition.mu(), s.totals().meanMu().getAsDouble(), 1e-14);
    }

    @Test
    void pressureWeightedGamma1OfAGasDominatedStarLiesBetweenItsExtremes() {
        ProfileAudit a = audit(PolytropeOneProfile.standard(201));
        double[] g = a.shells().gamma1();
        double lo = IntStream.range(0, g.length).mapToDouble(i -> g[i]).min().getAsDouble();
        double hi = IntStream.range(0, g.length).mapToDouble(i -> g[i]).max().getAsDouble();
        double mean = a.star().gamma1Mean().getAsDouble();
        assertTrue(mean > lo && mean < hi && hi <= 5.0 / 3.0, lo + " < " + mean + " < " + hi);
    }

    @Test
    void aBandOfWrongPressuresIsFlaggedInExactlyThoseRows() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(120);
        // shells 40..49 (0-based, centre first) are data rows 41..50; off by 0.5 %, five times the tolerance
        List<String> lines = p.csv(i -> i >= 40 && i < 50, 1.005);
        ProfileAudit a = new ProfileAuditor().audit(PolytropeOneProfile.load(lines, ColumnMapping.ourNames(),
                p.composition, false));
        List<Integer> expected = new ArrayList<>();
        for (int row = 41; row <= 50; row++) {
            expected.add(row);
        }
        assertEquals(expected, a.star().flaggedRows());
        assertEquals(0.005, a.star().maxPressureMismatch().getAsDouble(), 1e-12);
        // a smaller error stays below the default tolerance and is not flagged
        List<String> slight = p.csv(i -> i == 60, 1.0005);
        assertTrue(new ProfileAuditor().audit(PolytropeOneProfile.load(slight, ColumnMapping.ourNames(),
                p.composition, false)).star().flaggedRows().isEmpty());
        // ... unless the tolerance is tighter
        assertEquals(List.of(61), new ProfileAuditor(1e-4).audit(PolytropeOneProfile.load(slight,
                ColumnMapping.ourNames(), p.composition, false)).star().flaggedRows());
    }

    @Test
    void siUnitsSurfaceFirstGiveTheSameAuditAsCgsCentreFirst() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(150);
        ProfileAudit cgs = audit(p);
        ColumnMapping mapping = ColumnMapping.of(Map.of("r", "radius_m", "m", "mass_kg", "rho", "dens", "T", "temp",
                "P", "pres")).withUnits(Map.of("r", "m", "m", "kg", "rho", "kg/m3", "P", "Pa"));
        ProfileAudit si = new ProfileAuditor().audit(PolytropeOneProfile.load(p.csvSurfaceFirstSi(), mapping,
                p.composition, false));
        assertTrue(si.profile().surfaceFirst());
        assertFalse(cgs.profile().surfaceFirst());
        // shells are compared centre first; the SI numbers went through a decimal print and a
        // factor of 10^k, so they agree to a few ulp, and the differences of the residual to a
        // few ulp of P over the spacing
        assertArrayEquals(cgs.shells().beta(), si.shells().beta(), 1e-14);
        assertArrayEquals(cgs.shells().gamma1(), si.shells().gamma1(), 1e-14);
        assertArrayEquals(cgs.shells().pressureMismatch(), si.shells().pressureMismatch(), 1e-13);
        assertArrayEquals(cgs.shells().hydrostaticResidual(), si.shells().hydrostaticResidual(), 1e-9);
        assertEquals(cgs.star().totals().virialRatio().getAsDouble(),
                si.star().totals().virialRatio().getAsDouble(), 1e-12);
        assertEquals(cgs.star().gamma1Mean().getAsDouble(), si.star().gamma1Mean().getAsDouble(), 1e-14);
        // rows keep their numbers in the file: shell k from the centre is row k+1 in one file and
        // row 150-k in the other
        int[] a = cgs.profile().rows();
        int[] b = si.profile().rows();
        for (int k = 0; k < a.length; k++) {
            assertEquals(k + 1, a[k]);
            assertEquals(150 - k, b[k]);
        }
    }

    @Test
    void withoutMassTheMassIsIntegratedFromTheRadius() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(401);
        List<String> lines = new ArrayList<>();
        lines.add("r [cm],rho [g/cm3],T [K],P [dyn/cm2]");
        for (int i = 0; i < p.points; i++) {
            lines.add(p.r[i] + "," + p.rho[i] + "," + p.T[i] + "," + p.P[i]);
        }
        ProfileAudit a = new ProfileAuditor().audit(PolytropeOneProfile.load(lines, ColumnMapping.ourNames(),
                p.composition, false));
        assertTrue(a.star().massDerived());
        // trapezoidal mass: relative error ~ h² ρ''/ρ ~ (π/400)² ≈ 6e-5 at most
        assertEquals(p.m[p.points - 1], a.star().totals().mass().getAsDouble(), 1e-4 * p.m[p.points - 1]);
        assertNull(a.shells().massContinuityResidual());
    }

    private static List<String> massOnly(PolytropeOneProfile p, String outerMassFormat) {
        List<String> lines = new ArrayList<>();
        lines.add("m [g],rho [g/cm3],T [K],P [dyn/cm2]");
        for (int i = 0; i < p.points; i++) {
            double m = i > 380 && outerMassFormat != null
                    ? Double.parseDouble(String.format(java.util.Locale.ROOT, outerMassFormat, p.m[i])) : p.m[i];
            lines.add(m + "," + p.rho[i] + "," + p.T[i] + "," + p.P[i]);
        }
        return lines;
    }

    @Test
    void withoutRadiusTheRadiusIsIntegratedFromTheMass() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(401);
        ProfileAudit a = new ProfileAuditor().audit(PolytropeOneProfile.load(massOnly(p, null),
                ColumnMapping.ourNames(), p.composition, false));
        assertTrue(a.star().radiusDerived());
        // r³ = ∫3/(4πρ) dm by piecewise parabolas; 1/ρ grows 100-fold towards ξ = 0.99π, so the
        // outermost intervals dominate the error: 1e-4 is ample at 401 rows
        assertEquals(p.r[p.points - 1], a.star().totals().radius().getAsDouble(), 1e-4 * p.r[p.points - 1]);
        assertTrue(a.star().totals().stability().isPresent());
        assertNull(a.shells().hydrostaticResidual());
    }

    @Test
    void repeatedMassesNearTheSurfaceDoNotBreakTheIntegrals() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(401);
        List<String> lines = massOnly(p, "%.3e");
        long repeats = IntStream.range(2, lines.size()).filter(i -> lines.get(i).split(",")[0]
                .equals(lines.get(i - 1).split(",")[0])).count();
        assertTrue(repeats >= 2, "the test needs repeated masses: " + repeats);
        ProfileAudit a = new ProfileAuditor().audit(PolytropeOneProfile.load(lines, ColumnMapping.ourNames(),
                p.composition, false));
        // the masses rounded to 4 digits (errors up to 5e-4 M) where 3/(4πρ) is ~30 times its mean
        // move R by up to ~(1/3)·30·5e-4 ≈ 5e-3 relative
        assertEquals(p.r[p.points - 1], a.star().totals().radius().getAsDouble(), 1e-2 * p.r[p.points - 1]);
        assertTrue(a.star().totals().stability().isPresent());
        assertTrue(a.star().totals().virialRatio().isPresent());
    }

    @Test
    void withoutPressureOnlyTheEquationOfStateIsReported() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(50);
        List<String> lines = new ArrayList<>();
        lines.add("rho,T");
        for (int i = 0; i < p.points; i++) {
            lines.add(p.rho[i] + "," + p.T[i]);
        }
        ProfileAudit a = new ProfileAuditor().audit(PolytropeOneProfile.load(lines, ColumnMapping.ourNames(),
                p.composition, false));
        assertNull(a.shells().pressureMismatch());
        assertNull(a.shells().hydrostaticResidual());
        assertTrue(a.star().maxPressureMismatch().isEmpty());
        assertTrue(a.star().totals().mass().isEmpty());
        // the order is read from the temperature, which falls outwards
        assertFalse(a.profile().surfaceFirst());
        assertArrayEquals(p.P, a.shells().P(), 1e-13 * p.P[0]);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -1e-3, Double.NaN})
    void nonPositiveToleranceIsBadInput(double tolerance) {
        org.junit.jupiter.api.Assertions.assertThrows(org.stellabar.physics.BadInputException.class,
                () -> new ProfileAuditor(tolerance));
    }

    @Test
    void compositionColumnsGiveEachShellItsOwnMixture() {
        PolytropeOneProfile p = PolytropeOneProfile.standard(40);
        List<String> lines = new ArrayList<>();
        lines.add("r,m,rho,T,X,Y");
        for (int i = 0; i < p.points; i++) {
            // hydrogen burnt to helium inwards (invented test values)
            double x = 0.3 + 0.4 * i / (p.points - 1.0);
            lines.add(p.r[i] + "," + p.m[i] + "," + p.rho[i] + "," + p.T[i] + "," + x + "," + (0.98 - x));
        }
        LoadedProfile loaded = new ProfileLoader(ColumnMapping.ourNames(),
                CompositionPolicy.columnsFirst(Composition.of(0.7, 0.28, 0.02)), false)
                .load(new CsvProfileSource(new org.stellabar.output.CsvTableReader().parse("x.csv", lines)));
        ProfileAudit a = new ProfileAuditor().audit(loaded);
        Composition centre = loaded.profile().compositions().get(0);
        assertEquals(0.3, centre.X(), 1e-15);
        assertEquals(0.02, centre.Z(), 1e-14);
        // beta at the centre follows from that shell's mu: P_gas = rho k T/(mu m_u)
        double pGas = org.stellabar.physics.Constants.BOLTZMANN * p.rho[0] * p.T[0]
                / (centre.mu() * org.stellabar.physics.Constants.ATOMIC_MASS_UNIT);
        assertEquals(pGas, a.shells().Pgas()[0], 1e-14 * pGas);
        // 1/<1/mu> lies between the innermost and outermost mu
        double mu = a.star().totals().meanMu().getAsDouble();
        assertTrue(mu < centre.mu() && mu > loaded.profile().compositions().get(p.points - 1).mu());
    }

    // A profile given by m instead of ρ: the density (3/4π) dm/d(r³) behind the mass-continuity
    // residual matches the polytrope's (second-order differences on 2001 shells of n = 1, where
    // ρ = ρ_c sin ξ/ξ: 1e-5 of ρ_c) and the stability estimate with it is unchanged (K to 1e-5).
    // Moved here from StabilityAnalysisTest with the differentiation (formerly also in
    // RadialProfile.fromMass).
    @Test
    void densityFromTheMassColumnMatchesThePolytrope() {
        double[][] p = ProfileIntegralsTest.scaled(ProfileIntegralsTest.SOLVER.solve(1.0), 2001);
        double[] r = p[0];
        double[] m = p[1];
        double[] rho = p[2];
        double[] cube = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            cube[i] = r[i] * r[i] * r[i];
        }
        // the derivative of the mass-continuity residual, dm/d(r³); clamped at 0 at the surface
        double[] dmdy = ThreePointDerivative.of(cube, m);
        double[] rhoFromMass = new double[rho.length];
        for (int i = 0; i < rho.length; i++) {
            rhoFromMass[i] = Math.max(0.0, 3.0 / (4.0 * Math.PI) * dmdy[i]);
            assertEquals(rho[i], rhoFromMass[i], 1e-5 * rho[0], "row " + i);
        }
        double[] g1 = new double[r.length];
        java.util.Arrays.fill(g1, 1.4);
        assertEquals(StabilityAnalysis.analyze(new RadialProfile(r, m, rho, p[3], g1)).relativisticCoefficient(),
                StabilityAnalysis.analyze(new RadialProfile(r, m, rhoFromMass, p[3], g1)).relativisticCoefficient(),
                1e-5);
    }
}
