package org.stellabar.structure;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.Locale;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.numerics.BracketedNewton;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.structure.StarRequestException.Component;

/**
 * Finds the isentropic star of a given mass whose radius, central temperature or entropy per
 * baryon is also given.
 *
 * <p>Shooting variable. With this equation of state an isentropic star's shape depends on its
 * central β_c alone, its mass on β_c and μ alone, and its size on the temperature scale (the
 * homology of {@link IsentropicStructureSolver}: T → λT, ρ → λ³ρ leaves M fixed and sends
 * R → R/λ). So the one free parameter to shoot on is x = ln((1 − β_c)/β_c), which spans
 * gas-dominated (x → −∞) to radiation-dominated (x → +∞) centres without losing digits at
 * either end: x is found so that the integrated mass equals M (a bracketed Brent solve, Hipparchus
 * {@link BracketingNthOrderBrentSolver}), then the temperature scale is set by the second input:
 * T_c directly; R through T_c ∝ 1/R; the entropy through s(ρ_c(x, T_c), T_c) = s. A last
 * integration at the final centre checks M and R against the request.
 *
 * <p>Bracket. Writing the central EOS as P_c³/ρ_c⁴ and the mass as M = μ_tot 4πα³ρ_c gives
 * Eddington's quartic in another guise, (1 − β_c)/β_c⁴ = 4πaG³M²/(3 (k/μm_u)⁴ μ_tot²), where
 * the dimensionless mass μ_tot is (n + 1)^{3/2} ω_n for a polytrope: 10.7 for n = 3/2 (β → 1) and
 * 16.1 for n = 3 (β → 0). Solving the quartic for μ_tot = 20 and 8 brackets x with a margin; the
 * bracket is widened step by step (bounded) if ever needed.
 *
 * <p>With this ideal equation of state every mass has one β_c and every radius is reachable in
 * principle; the requests refused as having no solution ({@link StarRequestException}) are those
 * whose centre falls outside the temperature range of the EOS inversions
 * ([{@link EosInversion#T_SEARCH_MIN}, {@link EosInversion#T_SEARCH_MAX}] K), whose centre would be
 * so dense that the classical entropy is negative (degenerate matter, where the adiabat of this
 * model means nothing), or whose star would be more compact than Buchdahl's bound.
 */
public final class IsentropicStarFinder {

    /**
     * Temperature scale at which the mass equation is solved [K], unless the centre would have an
     * entropy per baryon below {@link #REFERENCE_ENTROPY} there (see {@link #referenceTemperature}).
     */
    public static final double REFERENCE_TEMPERATURE = 1e7;
    /** Least entropy per baryon [k_B] of the reference centre: safely positive and classical. */
    public static final double REFERENCE_ENTROPY = 20.0;
    /** Largest relative mismatch of the final model's M and R with the request. */
    public static final double MATCH_TOLERANCE = 1e-8;
    /** Bound on the integrations of the mass equation's root search. */
    public static final int MAX_SHOOTING_INTEGRATIONS = 80;
    /** Bound on the widenings of the initial bracket. */
    static final int MAX_BRACKET_WIDENINGS = 40;

    private final IsentropicStructureSolver solver;
    private final GasRadiationEos eos;

    /**
     * @param eos the equation of state
     */
    public IsentropicStarFinder(GasRadiationEos eos) {
        this(new IsentropicStructureSolver(new EosInversion(eos)));
    }

    /**
     * @param solver the structure integrator
     */
    public IsentropicStarFinder(IsentropicStructureSolver solver) {
        this.solver = solver;
        if (!(solver.inversion() instanceof EosInversion classical)) {
            throw new IllegalArgumentException("the homology this finder shoots on holds for the classical mixture only;"
                    + " use DirectIsentropicStarFinder for another equation of state");
        }
        this.eos = classical.eos();
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return the star
     */
    public IsentropicStar withRadius(double mass, double radius) {
        MassRoot root = massRoot(mass);
        double x = root.x();
        double tRef = referenceTemperature(x);
        IsentropicStar reference = root.reference();
        double tc = tRef * reference.radius() / radius;
        if (!(tc >= EosInversion.T_SEARCH_MIN && tc <= EosInversion.T_SEARCH_MAX)) {
            throw new StarRequestException(Component.radius, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "radius R = %.6g Rsun needs a central temperature T_c = %.6g K for an isentropic star of"
                            + " %.6g Msun, outside the EOS range [%.0e, %.0e] K", radius / SOLAR_RADIUS, tc,
                    mass / SOLAR_MASS, EosInversion.T_SEARCH_MIN, EosInversion.T_SEARCH_MAX));
        }
        String given = String.format(Locale.US, "radius R = %.6g Rsun", radius / SOLAR_RADIUS);
        IsentropicStar star = solveChecked(x, tc, reference, tRef, Component.radius, given);
        check(star, mass, radius);
        return star;
    }

    /**
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @return the star
     */
    public IsentropicStar withCentralTemperature(double mass, double centralTemperature) {
        MassRoot root = massRoot(mass);
        double x = root.x();
        String given = String.format(Locale.US, "central temperature T_c = %.6g K", centralTemperature);
        double tRef = referenceTemperature(x);
        IsentropicStar star = solveChecked(x, centralTemperature, root.reference(), tRef,
                Component.centralTemperature, given);
        check(star, mass, Double.NaN);
        return star;
    }

    /**
     * @param mass M [g]
     * @param entropyPerBaryon s m_u/k_B
     * @return the star
     */
    public IsentropicStar withEntropy(double mass, double entropyPerBaryon) {
        MassRoot root = massRoot(mass);
        double x = root.x();
        double s = entropyPerBaryon * BOLTZMANN / ATOMIC_MASS_UNIT;
        double tc = centralTemperature(x, s, entropyPerBaryon, mass);
        String given = String.format(Locale.US, "entropy per baryon %.6g k_B", entropyPerBaryon);
        double tRef = referenceTemperature(x);
        IsentropicStar star = solveChecked(x, tc, root.reference(), tRef, Component.entropy, given);
        check(star, mass, Double.NaN);
        return star;
    }

    /**
     * The shooting variable of the star of mass M: x = ln((1 − β_c)/β_c) such that the integrated
     * mass is M.
     *
     * @param mass M [g]
     * @return x
     * @throws ConvergenceException if no bracket is found or the root search exhausts its bound
     */
    public double radiationRatioLog(double mass) {
        return massRoot(mass).x();
    }

    /**
     * The root x of the mass equation and the star integrated there at T_ref(x), which the
     * search has already integrated ({@link ShootingTrials}).
     *
     * @param x ln((1 − β_c)/β_c)
     * @param reference the star at (x, T_ref(x))
     */
    private record MassRoot(double x, IsentropicStar reference) {
    }

    private MassRoot massRoot(double mass) {
        double lnMass = Math.log(mass);
        ShootingTrials<IsentropicStar> misfit = new ShootingTrials<>(x -> solve(x, referenceTemperature(x)),
                star -> Math.log(star.mass()) - lnMass);
        double lo = quarticRoot(mass, 20.0) - 0.5;
        double hi = quarticRoot(mass, 8.0) + 0.5;
        double fLo = misfit.value(lo);
        double fHi = misfit.value(hi);
        for (int i = 0; fLo > 0.0 && i < MAX_BRACKET_WIDENINGS; i++) {
            lo -= 1.0;
            fLo = misfit.value(lo);
        }
        for (int i = 0; fHi < 0.0 && i < MAX_BRACKET_WIDENINGS; i++) {
            hi += 1.0;
            fHi = misfit.value(hi);
        }
        if (fLo > 0.0 || fHi < 0.0) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic star of %.6g Msun: no bracket of ln((1-beta_c)/beta_c) found in [%.3g, %.3g]",
                    mass / SOLAR_MASS, lo, hi));
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-14, 1e-12, 1e-15, 5);
        double x;
        try {
            x = brent.solve(MAX_SHOOTING_INTEGRATIONS, misfit, lo, hi, AllowedSolution.ANY_SIDE);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic star of %.6g Msun: the mass equation did not converge in %d integrations (%s)",
                    mass / SOLAR_MASS, MAX_SHOOTING_INTEGRATIONS, e.getMessage()));
        }
        return new MassRoot(x, misfit.star(x));
    }

    /**
     * Integrates the star whose centre has ln((1 − β_c)/β_c) = x and temperature T_c.
     *
     * @param x ln((1 − β_c)/β_c)
     * @param centralTemperature T_c [K]
     * @return the structure
     */
    public IsentropicStar solve(double x, double centralTemperature) {
        return solver.solve(centralDensity(x, centralTemperature), centralTemperature);
    }

    /**
     * The temperature scale at which a centre with this x is integrated when the request does not
     * fix it. Any scale gives the same scaled structure (homology), but the adiabat inversion
     * needs a positive entropy, and at fixed β the classical entropy falls as T rises (s = const −
     * 1.5 (k/μm_u) ln T): very gas-dominated centres (low masses) at 10⁷ K would be far into the
     * degenerate regime. So: {@link #REFERENCE_TEMPERATURE}, or the lower T at which the entropy
     * per baryon is {@link #REFERENCE_ENTROPY} (bracketed Brent solve in ln T).
     *
     * @param x ln((1 − β_c)/β_c)
     * @return T_ref [K]
     */
    double referenceTemperature(double x) {
        double hi = Math.log(REFERENCE_TEMPERATURE);
        UnivariateFunction misfit = lnT -> centralEntropyPerBaryon(x, Math.exp(lnT)) - REFERENCE_ENTROPY;
        if (misfit.value(hi) >= 0.0) {
            return REFERENCE_TEMPERATURE;
        }
        // 150 e-folds below 1e7 K raise the entropy per baryon by 225/mu, enough for any x the
        // mass bracket reaches, and keep rho_c and P_c far from underflow
        double lo = hi - 150.0;
        if (misfit.value(lo) < 0.0) {
            throw new ConvergenceException("isentropic star: no classical reference centre found for"
                    + " ln((1-beta_c)/beta_c) = " + x);
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-12, 1e-10, 0.0, 5);
        try {
            return Math.exp(brent.solve(200, misfit, lo, hi, AllowedSolution.ANY_SIDE));
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException("isentropic star: reference temperature did not converge ("
                    + e.getMessage() + ")");
        }
    }

    private double centralEntropyPerBaryon(double x, double temperature) {
        return eos.entropy(centralDensity(x, temperature), temperature) * ATOMIC_MASS_UNIT / BOLTZMANN;
    }

    /**
     * ρ_c from β_c and T_c: P_rad/P_gas = aT³/(3ρk/μm_u) = (1 − β)/β = eˣ.
     *
     * @param x ln((1 − β_c)/β_c)
     * @param temperature T_c [K]
     * @return ρ_c [g/cm3]
     */
    double centralDensity(double x, double temperature) {
        return RADIATION_DENSITY * temperature * temperature * temperature * Math.exp(-x)
                / (3.0 * eos.gasConstant());
    }

    /** The root x of eˣ(1 + eˣ)³ = (1 − β)/β⁴ = 4πaG³M²/(3 (k/μm_u)⁴ μ_tot²). */
    private double quarticRoot(double mass, double dimensionlessMass) {
        double gas = eos.gasConstant();
        double lnQ = Math.log(4.0 * Math.PI * RADIATION_DENSITY / 3.0) + 3.0 * Math.log(GRAVITATION)
                + 2.0 * Math.log(mass) - 4.0 * Math.log(gas) - 2.0 * Math.log(dimensionlessMass);
        BracketedNewton.Function q = new BracketedNewton.Function() {
            @Override
            public double value(double x) {
                // x + 3 ln(1 + eˣ), written to stay finite for large |x|
                return x > 0 ? 4.0 * x + 3.0 * Math.log1p(Math.exp(-x)) - lnQ : x + 3.0 * Math.log1p(Math.exp(x)) - lnQ;
            }

            @Override
            public double derivative(double x) {
                // 1 + 3(1 − β), 1 − β = 1/(1 + e^−x)
                return 1.0 + 3.0 / (1.0 + Math.exp(-x));
            }
        };
        double lo = Math.min(lnQ - 3.0, (lnQ - 3.0) / 4.0);
        double hi = Math.max(lnQ, lnQ / 4.0) + 1.0;
        return BracketedNewton.solve("isentropic star: central beta bracket", q, lo, hi, 1e-14);
    }

    /** T_c at which the centre with this x has the entropy s. */
    private double centralTemperature(double x, double s, double entropyPerBaryon, double mass) {
        UnivariateFunction misfit = lnT -> {
            double t = Math.exp(lnT);
            return eos.entropy(centralDensity(x, t), t) - s;
        };
        double lo = Math.log(EosInversion.T_SEARCH_MIN);
        double hi = Math.log(EosInversion.T_SEARCH_MAX);
        // at fixed beta the entropy falls as T rises (s = const - 1.5 (k/mu m_u) ln T)
        if (misfit.value(lo) < 0.0 || misfit.value(hi) > 0.0) {
            throw new StarRequestException(Component.entropy, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "entropy per baryon %.6g k_B puts the centre of an isentropic star of %.6g Msun outside the EOS"
                            + " range T_c in [%.0e, %.0e] K", entropyPerBaryon, mass / SOLAR_MASS,
                    EosInversion.T_SEARCH_MIN, EosInversion.T_SEARCH_MAX));
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-15, 1e-14, 0.0, 5);
        try {
            return Math.exp(brent.solve(200, misfit, lo, hi, AllowedSolution.ANY_SIDE));
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException("isentropic star: central temperature from the entropy did not converge ("
                    + e.getMessage() + ")");
        }
    }

    /**
     * Integrates at (x, T_c) after checking, from the reference model (the same x at
     * its reference temperature) and the homology R ∝ 1/T_c,
     * that the star would be less compact than Buchdahl's bound, and that its centre has a positive
     * (classical) entropy: the Sackur–Tetrode entropy turns negative only deep in the degenerate
     * regime, where the ideal-gas adiabat is meaningless.
     */
    private IsentropicStar solveChecked(double x, double tc, IsentropicStar reference, double tRef,
            Component component, String given) {
        double mass = reference.mass();
        double radius = reference.radius() * tRef / tc;
        double limit = StarRequestRules.buchdahlRadius(mass);
        if (radius <= limit) {
            throw new StarRequestException(component, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "%s gives an isentropic star of %.6g Msun with R = %.6g cm, inside the Buchdahl bound"
                            + " 9GM/(4c^2) = %.6g cm; no static star is that compact", given, mass / SOLAR_MASS,
                    radius, limit));
        }
        double rhoC = centralDensity(x, tc);
        double s = eos.entropy(rhoC, tc);
        if (!(s > 0.0)) {
            throw new StarRequestException(component, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "%s puts the centre of an isentropic star of %.6g Msun at rho_c = %.6g g/cm3, T_c = %.6g K,"
                            + " where the classical gas entropy is negative (strongly degenerate electrons);"
                            + " the ideal gas + radiation model does not apply", given, mass / SOLAR_MASS, rhoC, tc));
        }
        return solve(x, tc);
    }

    private static void check(IsentropicStar star, double mass, double radius) {
        double dm = Math.abs(star.mass() / mass - 1.0);
        double dr = Double.isNaN(radius) ? 0.0 : Math.abs(star.radius() / radius - 1.0);
        if (!(dm <= MATCH_TOLERANCE && dr <= MATCH_TOLERANCE)) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic star: the final model misses the request by %.3g in M and %.3g in R (allowed %.0e)",
                    dm, dr, MATCH_TOLERANCE));
        }
    }
}
