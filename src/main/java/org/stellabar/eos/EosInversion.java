package org.stellabar.eos;

import static org.stellabar.physics.Constants.RADIATION_DENSITY;

import java.util.Locale;
import org.stellabar.numerics.BracketedNewton;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;

/**
 * States of the gas + radiation mixture given by pairs other than (ρ, T).
 *
 * <ul>
 *   <li>(P, T) → ρ: closed form ρ = (P − aT⁴/3) μ m_u/(kT); no solution when P ≤ aT⁴/3.</li>
 *   <li>(ρ, P) → T: the unique positive root of aT⁴/3 + (kρ/μm_u) T − P = 0. Newton's method
 *       started at the smaller of the two one-term solutions P/(kρ/μm_u) and (3P/a)^{1/4}, both
 *       upper bounds of the root; the quartic is convex and increasing for T &gt; 0, so the
 *       iterates decrease monotonically onto the root for any β.</li>
 *   <li>(ρ, s) → T: bracketed Newton in ln T on s, whose derivative c_V is positive, so the root
 *       is unique.</li>
 *   <li>(P, s) → (ρ, T): bracketed Newton on the isobar in x = ln((1 − β)/β), on which s increases
 *       strictly (ds/dx = c_V Γ1/4), so the root is unique and accurate for any β.</li>
 *   <li>(β, P) → (ρ, T): closed form T = (3(1−β)P/a)^{1/4}, ρ = βP μ m_u/(kT).</li>
 * </ul>
 *
 * Every iteration has a convergence test and a bounded count; exhausting it throws
 * {@link ConvergenceException}, while a request with no solution throws
 * {@link BadInputException}.
 */
public final class EosInversion implements Inversions {

    /** Iteration bound for the quartic; from an upper bound Newton needs fewer than 60 steps. */
    public static final int MAX_QUARTIC_ITERATIONS = 200;
    /** Lowest temperature searched by the (ρ, s) inversion [K]. */
    public static final double T_SEARCH_MIN = 1e-2;
    /** Highest temperature searched by the (ρ, s) inversion [K]. */
    public static final double T_SEARCH_MAX = 1e14;
    /** Bound on |ln((1 − β)/β)| searched by the (P, s) inversion: β and 1 − β down to about 1e-260. */
    private static final double RADIATION_LOGIT_LIMIT = 600.0;

    private final GasRadiationEos eos;

    /** @param eos the forward equation of state */
    public EosInversion(GasRadiationEos eos) {
        this.eos = eos;
    }

    /** @return the forward equation of state */
    @Override
    public GasRadiationEos eos() {
        return eos;
    }

    /**
     * Density from total pressure and temperature.
     *
     * @param P total pressure [dyn/cm2]
     * @param T temperature [K]
     * @return ρ [g/cm3]
     * @throws BadInputException if P ≤ aT⁴/3
     */
    @Override
    public double density(double P, double T) {
        GasRadiationEos.requirePositive("pressure", P, "dyn/cm2");
        GasRadiationEos.requirePositive("temperature", T, "K");
        double pRad = RADIATION_DENSITY * T * T * T * T / 3.0;
        if (P <= pRad) {
            throw new BadInputException(String.format(Locale.US,
                    "pressure %.6g dyn/cm2 is at or below the radiation pressure aT^4/3 = %.6g dyn/cm2 at T = %.6g K;"
                            + " no gas density can give it (raise P or lower T)", P, pRad, T));
        }
        return (P - pRad) / (eos.gasConstant() * T);
    }

    /**
     * The state at total pressure and temperature.
     *
     * @param P total pressure [dyn/cm2]
     * @param T temperature [K]
     * @return the state
     */
    public EosState atPressureTemperature(double P, double T) {
        return eos.state(density(P, T), T);
    }

    /**
     * Temperature from density and total pressure: the positive root of aT⁴/3 + bT − P = 0,
     * b = kρ/(μ m_u). Allocation-free; structure models call it at every point.
     *
     * @param rho density [g/cm3]
     * @param P total pressure [dyn/cm2]
     * @return T [K]
     */
    @Override
    public double temperature(double rho, double P) {
        GasRadiationEos.requirePositive("density", rho, "g/cm3");
        GasRadiationEos.requirePositive("pressure", P, "dyn/cm2");
        double b = eos.gasConstant() * rho;
        double a3 = RADIATION_DENSITY / 3.0;
        double t = Math.min(P / b, Math.sqrt(Math.sqrt(P / a3)));
        for (int i = 0; i < MAX_QUARTIC_ITERATIONS; i++) {
            double t3 = t * t * t;
            double residual = a3 * t3 * t + b * t - P;
            double step = residual / (4.0 * a3 * t3 + b);
            double next = t - step;
            if (!(next < t) || Math.abs(step) <= 2e-16 * t) {
                return next < t && next > 0 ? next : t;
            }
            t = next;
        }
        throw new ConvergenceException(String.format(Locale.US,
                "(rho, P) -> T: Newton did not converge in %d steps at rho = %.6g g/cm3, P = %.6g dyn/cm2",
                MAX_QUARTIC_ITERATIONS, rho, P));
    }

    /**
     * The state at density and total pressure.
     *
     * @param rho density [g/cm3]
     * @param P total pressure [dyn/cm2]
     * @return the state
     */
    @Override
    public EosState atDensityPressure(double rho, double P) {
        return eos.state(rho, temperature(rho, P));
    }

    /**
     * The state at density and specific entropy.
     *
     * @param rho density [g/cm3]
     * @param s specific entropy [erg/g/K], positive
     * @return the state
     * @throws BadInputException if no temperature in [1e-2, 1e14] K gives s at this density
     */
    @Override
    public EosState atDensityEntropy(double rho, double s) {
        GasRadiationEos.requirePositive("density", rho, "g/cm3");
        GasRadiationEos.requirePositive("specific entropy", s, "erg/g/K");
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double lnT) {
                return eos.entropy(rho, Math.exp(lnT)) - s;
            }

            @Override
            public double derivative(double lnT) {
                double t = Math.exp(lnT);
                return 1.5 * eos.gasConstant() + 4.0 * RADIATION_DENSITY * t * t * t / rho;
            }
        };
        double lo = Math.log(T_SEARCH_MIN);
        double hi = Math.log(T_SEARCH_MAX);
        requireBracket("specific entropy", s, "erg/g/K", "density", rho, "g/cm3", f, lo, hi,
                "T = " + T_SEARCH_MIN + " K", "T = " + T_SEARCH_MAX + " K");
        double lnT = BracketedNewton.solve("(rho, s) -> T", f, lo, hi, 1e-15);
        return eos.state(rho, Math.exp(lnT));
    }

    /**
     * The state at total pressure and specific entropy.
     *
     * @param P total pressure [dyn/cm2]
     * @param s specific entropy [erg/g/K], positive
     * @return the state
     * @throws BadInputException if no state on this isobar has entropy s
     */
    @Override
    public EosState atPressureEntropy(double P, double s) {
        double x = radiationLogitOnIsobar(P, s);
        double t = temperatureOnIsobarAt(x, P);
        return eos.state(betaOf(x) * P / (eos.gasConstant() * t), t);
    }

    /**
     * ln T on the isobar P where the specific entropy equals s; allocation-light path for
     * structure integrations.
     *
     * @param P total pressure [dyn/cm2]
     * @param s specific entropy [erg/g/K], positive
     * @return ln T
     * @throws BadInputException if no state on this isobar has entropy s
     */
    @Override
    public double temperatureOnIsobar(double P, double s) {
        return Math.log(temperatureOnIsobarAt(radiationLogitOnIsobar(P, s), P));
    }

    /**
     * Solves s = s(x; P) on the isobar for x = ln((1 − β)/β). Along an isobar every state is fixed
     * by β: T = (3(1 − β)P/a)^{1/4} and ρ = βP/(kT/μm_u). With x as the unknown, β = 1/(1 + e^x)
     * and 1 − β = 1/(1 + e^{−x}) both come without cancellation, so the density keeps its digits
     * even when β is far below the rounding error of P (where ρ = (P − aT⁴/3)μm_u/(kT) loses them
     * all), and ds/dx = c_P β/4 = c_V Γ1/4 is smooth and positive, so the root is unique.
     * x ∈ [−600, 600] reaches β and 1 − β down to about 1e-260: s runs from far below zero to
     * beyond any finite request, with ρ, T and s inside the double range for any finite P.
     */
    private double radiationLogitOnIsobar(double P, double s) {
        GasRadiationEos.requirePositive("pressure", P, "dyn/cm2");
        GasRadiationEos.requirePositive("specific entropy", s, "erg/g/K");
        double gas = eos.gasConstant();
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double x) {
                double t = temperatureOnIsobarAt(x, P);
                return eos.entropy(betaOf(x) * P / (gas * t), t) - s;
            }

            @Override
            public double derivative(double x) {
                // ds/dx = (ds/dln T)_P dln T/dx = c_P β/4 = c_V Γ1/4, as c_P = c_V Γ1/β
                double beta = betaOf(x);
                double oneMinusBeta = oneMinusBetaOf(x);
                double cV = 1.5 * gas + 12.0 * gas * oneMinusBeta / beta;
                double g3 = GasRadiationEos.gamma3MinusOne(beta, oneMinusBeta);
                return 0.25 * cV * GasRadiationEos.gamma1(beta, oneMinusBeta, g3);
            }
        };
        requireBracket("specific entropy", s, "erg/g/K", "pressure", P, "dyn/cm2", f, -RADIATION_LOGIT_LIMIT,
                RADIATION_LOGIT_LIMIT, "1 - beta = 1e-260", "beta = 1e-260");
        return BracketedNewton.solve("(P, s) -> (rho, T)", f, -RADIATION_LOGIT_LIMIT, RADIATION_LOGIT_LIMIT, 1e-15);
    }

    /** β = 1/(1 + e^x) for x = ln((1 − β)/β). */
    private static double betaOf(double x) {
        return 1.0 / (1.0 + Math.exp(x));
    }

    /** 1 − β = 1/(1 + e^{−x}) for x = ln((1 − β)/β). */
    private static double oneMinusBetaOf(double x) {
        return 1.0 / (1.0 + Math.exp(-x));
    }

    /** T = (3(1 − β)P/a)^{1/4} [K] on the isobar P, for x = ln((1 − β)/β). */
    private static double temperatureOnIsobarAt(double x, double P) {
        return Math.sqrt(Math.sqrt(3.0 * oneMinusBetaOf(x) * P / RADIATION_DENSITY));
    }

    /**
     * The state at a given β = P_gas/P and total pressure.
     *
     * @param beta P_gas/P, in (0, 1)
     * @param P total pressure [dyn/cm2]
     * @return the state
     */
    public EosState atBetaPressure(double beta, double P) {
        if (!(beta > 0.0 && beta < 1.0)) {
            throw new BadInputException("beta = " + beta + " is not allowed; the gas pressure fraction lies in (0, 1)");
        }
        // β itself goes into ρ: recovering it as 1 − (1 − β) would lose log10(1/β) digits
        return atFractions(beta, 1.0 - beta, P);
    }

    /**
     * The state at a given 1 − β = P_rad/P and total pressure; use this form when 1 − β is tiny.
     *
     * @param oneMinusBeta P_rad/P, in (0, 1)
     * @param P total pressure [dyn/cm2]
     * @return the state
     */
    public EosState atOneMinusBetaPressure(double oneMinusBeta, double P) {
        if (!(oneMinusBeta > 0.0 && oneMinusBeta < 1.0)) {
            throw new BadInputException("1 - beta = " + oneMinusBeta
                    + " is not allowed; the radiation pressure fraction lies in (0, 1)");
        }
        return atFractions(1.0 - oneMinusBeta, oneMinusBeta, P);
    }

    /**
     * T = (3(1 − β)P/a)^{1/4}, ρ = βP/(kT/μm_u), from β and 1 − β each passed as accurately as
     * the caller knows it (the one given exactly, the other as 1 minus it).
     */
    private EosState atFractions(double beta, double oneMinusBeta, double P) {
        GasRadiationEos.requirePositive("pressure", P, "dyn/cm2");
        double t = Math.sqrt(Math.sqrt(3.0 * oneMinusBeta * P / RADIATION_DENSITY));
        double rho = beta * P / (eos.gasConstant() * t);
        return eos.state(rho, t);
    }

    private static void requireBracket(String name, double value, String unit, String otherName, double other,
            String otherUnit, BracketedNewton.Function f, double lo, double hi, String loEnd, String hiEnd) {
        double fLo = f.value(lo);
        double fHi = f.value(hi);
        if (fLo > 0.0) {
            throw new BadInputException(String.format(Locale.US,
                    "%s %.6g %s is below what the classical gas allows at %s %.6g %s (%.6g %s at %s);"
                            + " such a state would be degenerate", name, value, unit, otherName, other,
                    otherUnit, value + fLo, unit, loEnd));
        }
        if (fHi < 0.0) {
            throw new BadInputException(String.format(Locale.US,
                    "%s %.6g %s is above what this model reaches at %s %.6g %s (%.6g %s at %s)",
                    name, value, unit, otherName, other, otherUnit, value + fHi, unit, hiEnd));
        }
    }
}
