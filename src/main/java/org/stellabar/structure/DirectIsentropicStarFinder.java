package org.stellabar.structure;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.Locale;
import java.util.Objects;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.Inversions;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.structure.StarRequestException.Component;

/**
 * Finds the isentropic star of a given mass and radius, central temperature or entropy per baryon
 * on any equation of state, without the homology that {@link IsentropicStarFinder} relies on (with
 * degenerate electrons or pairs the adiabats no longer map onto each other under T → λT,
 * ρ → λ³ρ).
 *
 * <p>Shooting. The central state is one point (ρ_c, T_c); each trial integrates the star outwards
 * ({@link IsentropicStructureSolver}, density and temperature carried along the adiabat) and
 * compares its mass with M:
 * <ul>
 *   <li>T_c given: solve ln M(ρ_c; T_c) = ln M for ln ρ_c;</li>
 *   <li>entropy given: solve ln M(ρ_c; T_c(ρ_c, s)) = ln M for ln ρ_c, the centre on the adiabat;</li>
 *   <li>R given: an outer solve of ln R(T_c) = ln R for ln T_c around the first.</li>
 * </ul>
 * Every solve is Brent's bracketed method (Hipparchus {@link BracketingNthOrderBrentSolver}) with a
 * bounded count. The first guess is the classical mixture's star for the same request
 * ({@link IsentropicStarFinder}); the bracket around it is widened step by step, bounded.
 */
public final class DirectIsentropicStarFinder {

    /** Largest relative mismatch of the final model's M (and R) with the request. */
    public static final double MATCH_TOLERANCE = IsentropicStarFinder.MATCH_TOLERANCE;
    /** Bound on the integrations of one mass solve. */
    public static final int MAX_SHOOTING_INTEGRATIONS = 80;
    /** Bound on the radius solve's mass solves. */
    public static final int MAX_RADIUS_SOLVES = 60;
    /** Bound on the widenings of a bracket, one e-fold each. */
    static final int MAX_BRACKET_WIDENINGS = 30;
    /** The densities a centre may have [g/cm3]: the search range of the Fermi–Dirac inversions. */
    static final double RHO_C_MIN = 1e-14;
    static final double RHO_C_MAX = 1e11;

    private final IsentropicStructureSolver solver;
    private final Inversions inversion;
    private final IsentropicStarFinder classical;

    /**
     * @param inversion the equation of state and its inversions
     */
    public DirectIsentropicStarFinder(Inversions inversion) {
        this.inversion = Objects.requireNonNull(inversion, "inversion");
        this.solver = new IsentropicStructureSolver(inversion);
        this.classical = new IsentropicStarFinder(new GasRadiationEos(inversion.eos().composition()));
    }

    /**
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @return the star
     */
    public IsentropicStar withCentralTemperature(double mass, double centralTemperature) {
        String given = String.format(Locale.US, "central temperature T_c = %.6g K", centralTemperature);
        double guess = classicalGuess(() -> classical.withCentralTemperature(mass, centralTemperature));
        IsentropicStar star = massAtTemperature(mass, centralTemperature, guess, Component.centralTemperature, given);
        check(star, mass, Double.NaN, Component.centralTemperature, given);
        return star;
    }

    /**
     * As {@link #withCentralTemperature(double, double)} from a given first guess of the centre's
     * density (a neighbour in a sequence), without the classical star as a guess.
     *
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @param densityGuess ρ_c to start from [g/cm3]
     * @return the star
     */
    public IsentropicStar withCentralTemperature(double mass, double centralTemperature, double densityGuess) {
        String given = String.format(Locale.US, "central temperature T_c = %.6g K", centralTemperature);
        IsentropicStar star = massAtTemperature(mass, centralTemperature, Math.log(densityGuess),
                Component.centralTemperature, given);
        check(star, mass, Double.NaN, Component.centralTemperature, given);
        return star;
    }

    /**
     * @param mass M [g]
     * @param entropyPerBaryon s m_u/k_B
     * @return the star
     */
    public IsentropicStar withEntropy(double mass, double entropyPerBaryon) {
        String given = String.format(Locale.US, "entropy per baryon %.6g k_B", entropyPerBaryon);
        double s = entropyPerBaryon * BOLTZMANN / ATOMIC_MASS_UNIT;
        double guess = classicalGuess(() -> classical.withEntropy(mass, entropyPerBaryon));
        ShootingTrials<IsentropicStar> trials = new ShootingTrials<>(lnRho -> {
            double rho = Math.exp(lnRho);
            return solver.solve(rho, inversion.atDensityEntropy(rho, s).T());
        }, trial -> Math.log(trial.mass() / mass));
        double lnRho = solve(trials, guess, Math.log(RHO_C_MIN), Math.log(RHO_C_MAX), Component.entropy, given, mass);
        IsentropicStar star = trials.star(lnRho);
        check(star, mass, Double.NaN, Component.entropy, given);
        return star;
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return the star
     */
    public IsentropicStar withRadius(double mass, double radius) {
        String given = String.format(Locale.US, "radius R = %.6g Rsun", radius / SOLAR_RADIUS);
        IsentropicStar first = classical.withRadius(mass, radius);
        double[] lastLnRho = {Math.log(first.centre().rho())};
        double[] lastLnT = {Math.log(first.centre().T())};
        UnivariateFunction misfit = lnT -> {
            // homology as the first guess of the centre at the new T_c: ρ ∝ T³
            double guess = lastLnRho[0] + 3.0 * (lnT - lastLnT[0]);
            IsentropicStar star = massAtTemperature(mass, Math.exp(lnT), guess, Component.radius, given);
            lastLnRho[0] = Math.log(star.centre().rho());
            lastLnT[0] = lnT;
            return Math.log(star.radius() / radius);
        };
        double lnT = solve(misfit, lastLnT[0], Math.log(FermiRange.T_MIN), Math.log(FermiRange.T_MAX),
                Component.radius, given, mass);
        IsentropicStar star = massAtTemperature(mass, Math.exp(lnT), lastLnRho[0], Component.radius, given);
        check(star, mass, radius, Component.radius, given);
        return star;
    }

    /**
     * ln ρ_c of the classical mixture's star for the same request, the first guess; where the
     * classical model has no such star (a centre so dense that its entropy is negative) the middle
     * of the density range, from which the bracket search widens.
     */
    private static double classicalGuess(java.util.function.Supplier<IsentropicStar> classicalStar) {
        try {
            return Math.log(classicalStar.get().centre().rho());
        } catch (BadInputException | ConvergenceException e) {
            return 0.5 * (Math.log(RHO_C_MIN) + Math.log(RHO_C_MAX));
        }
    }

    /** The temperatures a centre may have [K]: the search range of the Fermi–Dirac inversions. */
    private static final class FermiRange {
        static final double T_MIN = 1e4;
        static final double T_MAX = 1e12;
    }

    private IsentropicStar massAtTemperature(double mass, double tc, double guess, Component component, String given) {
        ShootingTrials<IsentropicStar> trials = new ShootingTrials<>(lnRho -> solver.solve(Math.exp(lnRho), tc),
                trial -> Math.log(trial.mass() / mass));
        double lnRho = solve(trials, guess, Math.log(RHO_C_MIN), Math.log(RHO_C_MAX), component, given, mass);
        return trials.star(lnRho);
    }

    /**
     * A root of a monotone-enough misfit near the guess: a bracket [guess − 1, guess + 1] widened
     * by one e-fold at a time (at most {@link #MAX_BRACKET_WIDENINGS}), clipped to [lo, hi], then Brent.
     */
    private static double solve(UnivariateFunction misfit, double guess, double lo, double hi, Component component,
            String given, double mass) {
        double a = Math.max(lo, guess - 1.0);
        double b = Math.min(hi, guess + 1.0);
        double fa = safe(misfit, a);
        double fb = safe(misfit, b);
        for (int i = 0; i < MAX_BRACKET_WIDENINGS && !(fa * fb <= 0.0); i++) {
            // widen on the side the values point to: towards the root if f is monotone
            boolean towardsLow = Math.abs(fa) < Math.abs(fb);
            if (towardsLow && a > lo) {
                a = Math.max(lo, a - 1.0);
                fa = safe(misfit, a);
            } else if (b < hi) {
                b = Math.min(hi, b + 1.0);
                fb = safe(misfit, b);
            } else if (a > lo) {
                a = Math.max(lo, a - 1.0);
                fa = safe(misfit, a);
            } else {
                break;
            }
        }
        if (!(fa * fb <= 0.0)) {
            throw new StarRequestException(component, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "%s: no isentropic star of %.6g Msun with a centre inside the fermi EOS range (rho_c in"
                            + " [%.0e, %.0e] g/cm3, T_c in [%.0e, %.0e] K) was found", given, mass / SOLAR_MASS,
                    RHO_C_MIN, RHO_C_MAX, FermiRange.T_MIN, FermiRange.T_MAX));
        }
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-13, 1e-12, 1e-15, 5);
        try {
            return brent.solve(MAX_SHOOTING_INTEGRATIONS, misfit, a, b, AllowedSolution.ANY_SIDE);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic star of %.6g Msun (%s): the shooting did not converge in %d integrations (%s)",
                    mass / SOLAR_MASS, given, MAX_SHOOTING_INTEGRATIONS, e.getMessage()));
        }
    }

    /**
     * The misfit, or NaN where the trial centre has no state or structure (outside the EOS range):
     * a NaN end never counts as a bracket, so the search moves on.
     */
    private static double safe(UnivariateFunction misfit, double x) {
        try {
            return misfit.value(x);
        } catch (BadInputException | ConvergenceException e) {
            return Double.NaN;
        }
    }

    private static void check(IsentropicStar star, double mass, double radius, Component component, String given) {
        double limit = StarRequestRules.buchdahlRadius(star.mass());
        if (star.radius() <= limit) {
            throw new StarRequestException(component, StarRequestException.Problem.OUT_OF_RANGE, String.format(Locale.US,
                    "%s gives an isentropic star of %.6g Msun with R = %.6g cm, inside the Buchdahl bound"
                            + " 9GM/(4c^2) = %.6g cm; no static star is that compact", given, mass / SOLAR_MASS,
                    star.radius(), limit));
        }
        double dm = Math.abs(star.mass() / mass - 1.0);
        double dr = Double.isNaN(radius) ? 0.0 : Math.abs(star.radius() / radius - 1.0);
        if (!(dm <= MATCH_TOLERANCE && dr <= MATCH_TOLERANCE)) {
            throw new ConvergenceException(String.format(Locale.US,
                    "isentropic star: the final model misses the request by %.3g in M and %.3g in R (allowed %.0e)",
                    dm, dr, MATCH_TOLERANCE));
        }
    }
}
