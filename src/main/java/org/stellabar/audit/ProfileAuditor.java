package org.stellabar.audit;

import static org.stellabar.physics.Constants.GRAVITATION;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityWarning.Regime;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.numerics.ThreePointDerivative;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.RadialProfile;
import org.stellabar.structure.StabilityAnalysis;
import org.stellabar.structure.StabilityResult;

/**
 * Audits a profile against the fully ionized ideal gas + black-body radiation equation of state
 * and against hydrostatic equilibrium and mass continuity.
 *
 * <p>Per shell: our P, P_gas, P_rad, β, 1 − β, Γ1, ∇_ad and c_s at the profile's (ρ, T,
 * composition), with the validity warnings; P_profile/P_ours − 1 and Γ1_profile − Γ1_ours where
 * the profile gives them; and, with radius and mass, the hydrostatic residual
 * (dP/dr + Gmρ/r²)/(Gmρ/r²) and the mass-continuity residual (dm/dr)/(4πr²ρ) − 1. The derivatives
 * are three-point Lagrange differences on the profile's own non-uniform grid
 * ({@link ThreePointDerivative}, second order; one-sided at the ends): dP/dr in r, dm/dr as
 * 3r² dm/d(r³) in r³ (m ∝ r³ near the centre). At r = 0 the hydrostatic ratio is 0/0 and is
 * taken to its limit with the derivative in r² (P is even in r):
 * (2 dP/d(r²) + (4π/3)Gρ²)/((4π/3)Gρ²). The pressure
 * in the hydrostatic residual, the virial ratio and the weights of ⟨Γ1⟩ is the profile's where it
 * gives one, else ours.
 *
 * <p>For the star: ⟨Γ1⟩ = ∫Γ1 P dV/∫P dV, the virial ratio 3∫P dV/|Ω| with Ω = −∫Gm/r dm (and the
 * surface term 4πR³P(R)/|Ω|), the mass-averaged μ, the mass fraction with β &lt; 1/2, the
 * largest pressure mismatch and the rows beyond the tolerance, and the zones where the validity
 * checks fail. Integrals are piecewise parabolas where the abscissae increase strictly, else
 * trapezoids ({@link ProfileIntegrals}).
 */
public final class ProfileAuditor {

    /** Default tolerance on |P_profile/P_ours − 1| before a row is flagged. */
    public static final double DEFAULT_TOLERANCE = 1e-3;

    /** The regimes listed as failures of the description (radiation dominance is not one). */
    static final List<Regime> FAILURES = List.of(Regime.ELECTRON_DEGENERACY, Regime.RELATIVISTIC_ELECTRONS,
            Regime.PAIR_CREATION, Regime.COULOMB_COUPLING, Regime.PARTIAL_IONIZATION);

    private final double tolerance;

    /** An auditor with the default tolerance. */
    public ProfileAuditor() {
        this(DEFAULT_TOLERANCE);
    }

    /**
     * @param tolerance |P_profile/P_ours − 1| above which a row is flagged, positive
     * @throws BadInputException if the tolerance is not positive and finite
     */
    public ProfileAuditor(double tolerance) {
        if (!(tolerance > 0.0) || !Double.isFinite(tolerance)) {
            throw new BadInputException("--tolerance " + tolerance + " is not allowed; it must be positive and finite");
        }
        this.tolerance = tolerance;
    }

    /** @return the tolerance for flagging rows */
    public double tolerance() {
        return tolerance;
    }

    /**
     * @param input a profile as read
     * @return the audit
     */
    public ProfileAudit audit(LoadedProfile input) {
        Profile p = input.profile();
        int n = p.size();
        double[] rho = p.rho();
        double[] T = p.T();
        double[] P = new double[n];
        double[] Pgas = new double[n];
        double[] Prad = new double[n];
        double[] beta = new double[n];
        double[] oneMinusBeta = new double[n];
        double[] gamma1 = new double[n];
        double[] nablaAd = new double[n];
        double[] soundSpeed = new double[n];
        double[] inverseMu = new double[n];
        int[] warnings = new int[n];
        List<List<ValidityWarning>> messages = new ArrayList<>(n);
        Map<Composition, GasRadiationEos> eosByComposition = new HashMap<>();
        for (int i = 0; i < n; i++) {
            Composition c = p.compositions().get(i);
            GasRadiationEos eos = eosByComposition.computeIfAbsent(c, GasRadiationEos::new);
            EosState s;
            try {
                s = eos.state(rho[i], T[i]);
            } catch (BadInputException e) {
                // e.g. a state beyond the range of doubles: name the row it came from
                throw new BadInputException(p.source() + ": row " + p.rows()[i] + ": " + e.getMessage());
            }
            P[i] = s.P();
            Pgas[i] = s.Pgas();
            Prad[i] = s.Prad();
            beta[i] = s.beta();
            oneMinusBeta[i] = s.oneMinusBeta();
            gamma1[i] = s.Gamma1();
            nablaAd[i] = s.nablaAd();
            soundSpeed[i] = s.soundSpeed();
            inverseMu[i] = 1.0 / c.mu();
            for (ValidityWarning w : s.warnings()) {
                warnings[i] |= w.code().bit();
            }
            messages.add(s.warnings());
        }

        int[] rows = p.rows();
        double[] mismatch = null;
        double maxMismatch = 0.0;
        int maxMismatchRow = 0;
        List<Integer> flagged = new ArrayList<>();
        if (p.hasPressure()) {
            double[] given = p.P();
            mismatch = new double[n];
            for (int i = 0; i < n; i++) {
                // (P_profile − P_ours)/P_ours: the same number as P_profile/P_ours − 1, without the cancellation
                mismatch[i] = (given[i] - P[i]) / P[i];
                if (Math.abs(mismatch[i]) > maxMismatch) {
                    maxMismatch = Math.abs(mismatch[i]);
                    maxMismatchRow = rows[i];
                }
                if (Math.abs(mismatch[i]) > tolerance) {
                    flagged.add(rows[i]);
                }
            }
            flagged.sort(null);
        }
        double[] gamma1Difference = null;
        OptionalDouble maxGamma1Difference = OptionalDouble.empty();
        if (p.hasGamma1()) {
            double[] given = p.gamma1();
            gamma1Difference = new double[n];
            double worst = 0.0;
            for (int i = 0; i < n; i++) {
                gamma1Difference[i] = given[i] - gamma1[i];
                worst = Math.max(worst, Math.abs(gamma1Difference[i]));
            }
            maxGamma1Difference = OptionalDouble.of(worst);
        }

        double[] pressure = p.hasPressure() ? p.P() : P;
        double[] r = p.r();
        double[] m = p.m();
        boolean massDerived = false;
        boolean radiusDerived = false;
        if (r != null && m == null) {
            m = ProfileIntegrals.massFromRadius(r, rho);
            massDerived = true;
        } else if (m != null && r == null) {
            r = ProfileIntegrals.radiusFromMass(m, rho);
            radiusDerived = true;
        }

        double[] hydrostatic = null;
        double[] continuity = null;
        OptionalDouble maxHydrostatic = OptionalDouble.empty();
        OptionalDouble rmsHydrostatic = OptionalDouble.empty();
        int maxHydrostaticRow = 0;
        OptionalDouble maxContinuity = OptionalDouble.empty();
        if (r != null && !radiusDerived) {
            hydrostatic = hydrostaticResidual(r, m, rho, pressure);
            double worst = 0.0;
            for (int i = 0; i < n; i++) {
                if (Math.abs(hydrostatic[i]) >= worst) {
                    worst = Math.abs(hydrostatic[i]);
                    maxHydrostaticRow = rows[i];
                }
            }
            maxHydrostatic = OptionalDouble.of(worst);
            rmsHydrostatic = interiorRms(m, hydrostatic);
            if (!massDerived) {
                continuity = massContinuityResidual(r, m, rho);
                double w = 0.0;
                for (double v : continuity) {
                    w = Math.max(w, Math.abs(v));
                }
                maxContinuity = OptionalDouble.of(w);
            }
        }

        StarIntegrals whole = closedStar(p, r, m, rho, pressure, beta, inverseMu, gamma1, massDerived, radiusDerived);
        OptionalDouble mass = OptionalDouble.empty();
        OptionalDouble radius = OptionalDouble.empty();
        OptionalDouble meanMu = OptionalDouble.empty();
        OptionalDouble radiationFraction = OptionalDouble.empty();
        OptionalDouble pressureIntegral = OptionalDouble.empty();
        OptionalDouble omega = OptionalDouble.empty();
        OptionalDouble virial = OptionalDouble.empty();
        OptionalDouble surfaceTerm = OptionalDouble.empty();
        Optional<StabilityResult> stability = Optional.empty();
        Optional<StabilityResult> stabilityProfileGamma1 = Optional.empty();
        OptionalDouble standardBeta = OptionalDouble.empty();
        OptionalDouble standardOneMinusBeta = OptionalDouble.empty();
        boolean reachesCentre = false;
        if (whole != null) {
            double M = whole.m[whole.m.length - 1];
            double R = whole.r[whole.r.length - 1];
            mass = OptionalDouble.of(M);
            radius = OptionalDouble.of(R);
            reachesCentre = whole.r[0] == 0.0 || whole.m[0] == 0.0;
            meanMu = OptionalDouble.of(1.0 / ProfileIntegrals.massAverage(whole.m, whole.inverseMu));
            radiationFraction = OptionalDouble.of(ProfileIntegrals.massFractionBelow(whole.m, whole.beta, 0.5));
            double pv = ProfileIntegrals.pressureVolume(whole.r, whole.P);
            double w = ProfileIntegrals.gravitationalEnergy(whole.r, whole.m, GRAVITATION);
            pressureIntegral = OptionalDouble.of(pv);
            omega = OptionalDouble.of(w);
            if (w < 0.0) {
                virial = OptionalDouble.of(3.0 * pv / -w);
                surfaceTerm = OptionalDouble.of(4.0 * Math.PI * R * R * R * whole.P[whole.P.length - 1] / -w);
            }
            stability = Optional.of(StabilityAnalysis.analyze(
                    new RadialProfile(whole.r, whole.m, whole.rho, whole.P, whole.gamma1)));
            if (p.hasGamma1()) {
                double[] given = extend(p.gamma1(), whole.r.length);
                stabilityProfileGamma1 = Optional.of(StabilityAnalysis.analyze(
                        new RadialProfile(whole.r, whole.m, whole.rho, whole.P, given)));
            }
            try {
                BetaSolution b = standardModel().beta(M, meanMu.getAsDouble());
                standardBeta = OptionalDouble.of(b.beta());
                standardOneMinusBeta = OptionalDouble.of(b.oneMinusBeta());
            } catch (BadInputException e) {
                // a mass beyond the quartic's range: no standard-model comparison, the rest stands
            }
        }
        double[] massForZones = mass.isPresent() ? m : null;
        List<FailureZone> zones = zones(rows, warnings, messages, massForZones,
                mass.isPresent() ? mass.getAsDouble() : Double.NaN);
        ShellAudit shells = new ShellAudit(P, Pgas, Prad, beta, oneMinusBeta, gamma1, nablaAd, soundSpeed, warnings,
                mismatch, gamma1Difference, hydrostatic, continuity, r, mass.isPresent() ? m : null,
                mass.isPresent() ? mass.getAsDouble() : Double.NaN,
                radius.isPresent() ? radius.getAsDouble() : Double.NaN);
        StarAudit star = new StarAudit(n, mass, radius, massDerived, radiusDerived, reachesCentre,
                whole != null && whole.closedBySurface, beta[0], oneMinusBeta[0], meanMu, radiationFraction,
                pressureIntegral, omega, virial, surfaceTerm, stability, stabilityProfileGamma1, standardBeta,
                standardOneMinusBeta, p.hasPressure() ? OptionalDouble.of(maxMismatch) : OptionalDouble.empty(),
                maxMismatchRow, flagged, tolerance, maxGamma1Difference, maxHydrostatic, maxHydrostaticRow,
                rmsHydrostatic, maxContinuity, zones);
        return new ProfileAudit(input, shells, star);
    }

    /**
     * Mass-weighted root-mean-square of a residual over the interior shells: the first and last
     * shell, where the differences are one-sided and (at a surface) the relative residual is not
     * small, are left out (their values stay in the table and in the maximum).
     */
    private static OptionalDouble interiorRms(double[] m, double[] residual) {
        int n = m.length;
        if (n < 4 || !(m[n - 2] > m[1])) {
            return OptionalDouble.empty();
        }
        double[] mass = java.util.Arrays.copyOfRange(m, 1, n - 1);
        double[] squares = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            squares[i - 1] = residual[i] * residual[i];
        }
        // trapezoids, as masses may repeat (see ProfileIntegrals)
        return OptionalDouble.of(Math.sqrt(TabulatedQuadrature.trapezoid(mass, squares) / (m[n - 2] - m[1])));
    }

    /** The arrays the whole-star integrals run over: the shells, closed by the surface row if any. */
    private record StarIntegrals(double[] r, double[] m, double[] rho, double[] P, double[] beta, double[] inverseMu,
            double[] gamma1, boolean closedBySurface) {
    }

    /**
     * The shells with the vacuum surface row appended (P = 0 there; β, μ and Γ1 of the outermost
     * shell, which carry no weight where P = 0), when the profile gives the surface's radius; null
     * without radii and masses or with a zero total mass.
     */
    private static StarIntegrals closedStar(Profile p, double[] r, double[] m, double[] rho, double[] pressure,
            double[] beta, double[] inverseMu, double[] gamma1, boolean massDerived, boolean radiusDerived) {
        if (r == null) {
            return null;
        }
        SurfacePoint s = p.surface();
        boolean close = s != null && !Double.isNaN(s.r()) && !radiusDerived && (massDerived || !Double.isNaN(s.m()));
        int n = r.length;
        int k = close ? n + 1 : n;
        double[] rr = extend(r, k);
        double[] rh = extend(rho, k);
        double[] mm = extend(m, k);
        if (close) {
            rr[n] = s.r();
            rh[n] = s.rho();
            mm[n] = massDerived ? ProfileIntegrals.massFromRadius(rr, rh)[n] : s.m();
        }
        double[] pp = extend(pressure, k);
        if (close) {
            pp[n] = 0.0;
        }
        if (!(mm[k - 1] > 0.0)) {
            return null;
        }
        StarIntegrals all = new StarIntegrals(rr, mm, rh, pp, extend(beta, k), extend(inverseMu, k), extend(gamma1, k),
                close);
        return radiusDerived ? distinctRadii(all) : all;
    }

    /**
     * Radii integrated from masses repeat where the masses do (printed with few digits near the
     * surface); such shells add no volume, and the stability integrals over r need distinct radii,
     * so all but the first of equal radii are dropped.
     */
    private static StarIntegrals distinctRadii(StarIntegrals s) {
        int n = s.r.length;
        boolean[] keep = new boolean[n];
        int kept = 0;
        int last = 0;
        for (int i = 0; i < n; i++) {
            keep[i] = i == 0 || s.r[i] > s.r[last];
            if (keep[i]) {
                kept++;
                last = i;
            }
        }
        if (kept == n) {
            return s;
        }
        return new StarIntegrals(pick(s.r, keep, kept), pick(s.m, keep, kept), pick(s.rho, keep, kept),
                pick(s.P, keep, kept), pick(s.beta, keep, kept), pick(s.inverseMu, keep, kept),
                pick(s.gamma1, keep, kept), s.closedBySurface);
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
        double[] out = java.util.Arrays.copyOf(a, k);
        for (int i = a.length; i < k; i++) {
            out[i] = a[a.length - 1];
        }
        return out;
    }

    private static EddingtonStandardModel standardModel() {
        return StandardModelHolder.MODEL;
    }

    /** Built on first use (it solves the n = 3 Lane-Emden equation), once per run; immutable. */
    private static final class StandardModelHolder {
        static final EddingtonStandardModel MODEL = EddingtonStandardModel.create();
    }

    /**
     * (dP/dr + Gmρ/r²)/(Gmρ/r²) at every shell, dP/dr by three-point differences; at r = 0 the
     * limit (2 dP/d(r²) + (4π/3)Gρ²)/((4π/3)Gρ²).
     */
    static double[] hydrostaticResidual(double[] r, double[] m, double[] rho, double[] P) {
        int n = r.length;
        double[] dPdr = ThreePointDerivative.of(r, P);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            if (r[i] > 0.0) {
                double weight = GRAVITATION * m[i] * rho[i] / (r[i] * r[i]);
                out[i] = (dPdr[i] + weight) / weight;
            } else {
                double dPdr2 = ThreePointDerivative.atStart(0.0, r[1] * r[1], r[2] * r[2], P[0], P[1], P[2]);
                double weight = 4.0 / 3.0 * Math.PI * GRAVITATION * rho[0] * rho[0];
                out[i] = (2.0 * dPdr2 + weight) / weight;
            }
        }
        return out;
    }

    /**
     * (dm/dr)/(4πr²ρ) − 1 at every shell, written as (dm/dy)/((4π/3)ρ) − 1 with y = r³ and dm/dy by
     * three-point differences in y. Near the centre m grows as r³, and a three-point difference in r
     * of r³ is wrong by h²/r² relative (a third at the first shell, at any resolution); in y the
     * leading term is linear and the error is second order everywhere, the centre included.
     */
    static double[] massContinuityResidual(double[] r, double[] m, double[] rho) {
        int n = r.length;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = r[i] * r[i] * r[i];
        }
        double[] dmdy = ThreePointDerivative.of(y, m);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = dmdy[i] / (4.0 / 3.0 * Math.PI * rho[i]) - 1.0;
        }
        return out;
    }

    private static List<FailureZone> zones(int[] rows, int[] warnings, List<List<ValidityWarning>> messages,
            double[] m, double M) {
        List<FailureZone> zones = new ArrayList<>();
        int n = rows.length;
        for (Regime regime : FAILURES) {
            int i = 0;
            while (i < n) {
                if ((warnings[i] & regime.bit()) == 0) {
                    i++;
                    continue;
                }
                int start = i;
                while (i < n && (warnings[i] & regime.bit()) != 0) {
                    i++;
                }
                int end = i - 1;
                int first = Math.min(rows[start], rows[end]);
                int last = Math.max(rows[start], rows[end]);
                String message = messages.get(start).stream().filter(w -> w.code() == regime).findFirst()
                        .map(ValidityWarning::message).orElse(regime.code());
                double inner = Double.NaN;
                double outer = Double.NaN;
                if (m != null) {
                    inner = m[start] / M;
                    outer = m[end] / M;
                }
                zones.add(new FailureZone(regime, first, last, end - start + 1, inner, outer, message));
            }
        }
        return zones;
    }
}
