package org.stellabar.eos.fermi;

import static org.stellabar.physics.Constants.RADIATION_DENSITY;

import java.util.Locale;
import org.stellabar.eos.EosState;
import org.stellabar.eos.Inversions;
import org.stellabar.numerics.BracketedNewton;
import org.stellabar.physics.BadInputException;

/**
 * States of {@link FermiGasRadiationEos} given by other pairs of variables: (P, T) → ρ, (ρ, P) → T,
 * (ρ, s) → T, (P, s) → (ρ, T). Each is one bracketed Newton iteration ({@link BracketedNewton}) in a
 * logarithmic variable on a function that is monotone for an ideal gas with radiation (χ_ρ, χ_T,
 * c_V, c_P &gt; 0), with the analytic derivative of the equation of state as the Newton slope.
 * The search covers ρ ∈ [{@value #RHO_MIN}, {@value #RHO_MAX}] g/cm3 and T ∈ [{@value #T_MIN},
 * {@value #T_MAX}] K; a request whose answer lies outside is refused as bad input.
 */
public final class FermiEosInversion implements Inversions {

    /** Lowest density searched [g/cm3]. */
    public static final double RHO_MIN = 1e-14;
    /** Highest density searched [g/cm3]. */
    public static final double RHO_MAX = 1e11;
    /** Lowest temperature searched [K]. */
    public static final double T_MIN = 1e4;
    /** Highest temperature searched [K]. */
    public static final double T_MAX = 1e12;

    private static final double TOLERANCE = 1e-15;

    private final FermiGasRadiationEos eos;

    /** @param eos the equation of state to invert */
    public FermiEosInversion(FermiGasRadiationEos eos) {
        this.eos = eos;
    }

    @Override
    public FermiGasRadiationEos eos() {
        return eos;
    }

    @Override
    public double temperature(double rho, double P) {
        return atDensityPressure(rho, P).T();
    }

    @Override
    public double temperatureOnIsobar(double P, double s) {
        return Math.log(atPressureEntropy(P, s).T());
    }

    /**
     * @param P pressure [dyn/cm2], above the radiation pressure aT⁴/3
     * @param T temperature [K]
     * @return the state at that pressure and temperature
     */
    public EosState atPressureTemperature(double P, double T) {
        return eos.state(density(P, T), T);
    }

    /**
     * @param P pressure [dyn/cm2]
     * @param T temperature [K]
     * @return ρ [g/cm3] with P(ρ, T) = P
     */
    @Override
    public double density(double P, double T) {
        requirePositive("pressure", P, "dyn/cm2");
        requireInside("temperature", T, "K", T_MIN * (1 - 1e-12), T_MAX * (1 + 1e-12));
        double pRad = RADIATION_DENSITY * T * T * T * T / 3.0;
        if (!(P > pRad)) {
            throw new BadInputException(String.format(Locale.US,
                    "pressure %.6g dyn/cm2 is not above the radiation pressure %.6g dyn/cm2 at T = %.6g K", P, pRad, T));
        }
        double target = Math.log(P);
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double lnRho) {
                return Math.log(eos.state(Math.exp(lnRho), T).P()) - target;
            }

            @Override
            public double derivative(double lnRho) {
                return eos.state(Math.exp(lnRho), T).chiRho();
            }
        };
        return Math.exp(solve("density at given pressure and temperature", f, Math.log(RHO_MIN), Math.log(RHO_MAX),
                "pressure", P, "dyn/cm2"));
    }

    /**
     * @param rho density [g/cm3]
     * @param P pressure [dyn/cm2]
     * @return the state with P(ρ, T) = P
     */
    @Override
    public EosState atDensityPressure(double rho, double P) {
        requirePositive("pressure", P, "dyn/cm2");
        requireInside("density", rho, "g/cm3", RHO_MIN, RHO_MAX);
        double target = Math.log(P);
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double lnT) {
                return Math.log(eos.state(rho, Math.exp(lnT)).P()) - target;
            }

            @Override
            public double derivative(double lnT) {
                return eos.state(rho, Math.exp(lnT)).chiT();
            }
        };
        double T = Math.exp(solve("temperature at given density and pressure", f, Math.log(T_MIN), Math.log(T_MAX),
                "pressure", P, "dyn/cm2"));
        return eos.state(rho, T);
    }

    /**
     * @param rho density [g/cm3]
     * @param s specific entropy [erg/g/K]
     * @return the state with s(ρ, T) = s
     */
    @Override
    public EosState atDensityEntropy(double rho, double s) {
        requireInside("density", rho, "g/cm3", RHO_MIN, RHO_MAX);
        if (!Double.isFinite(s)) {
            throw BadInputException.mustBePositive("entropy", s, "erg/g/K");
        }
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double lnT) {
                return eos.state(rho, Math.exp(lnT)).s() - s;
            }

            @Override
            public double derivative(double lnT) {
                return eos.state(rho, Math.exp(lnT)).cV();
            }
        };
        double T = Math.exp(solve("temperature at given density and entropy", f, Math.log(T_MIN), Math.log(T_MAX),
                "entropy", s, "erg/g/K"));
        return eos.state(rho, T);
    }

    /**
     * @param P pressure [dyn/cm2]
     * @param s specific entropy [erg/g/K]
     * @return the state on the isobar with entropy s
     */
    @Override
    public EosState atPressureEntropy(double P, double s) {
        requirePositive("pressure", P, "dyn/cm2");
        if (!Double.isFinite(s)) {
            throw BadInputException.mustBePositive("entropy", s, "erg/g/K");
        }
        // along the isobar ρ falls as T rises (towards the radiation-only limit (3P/a)^{1/4}); the ends of
        // the search are where the isobar leaves the density range, or the temperature range
        double lnTHigh = Math.log(T_MAX);
        if (eos.state(RHO_MIN, T_MAX).P() > P) {
            // a hair inside, where P − aT⁴/3 is still resolved in double precision
            lnTHigh = Math.log(atDensityPressure(RHO_MIN, P).T()) - 1e-9;
        }
        double lnTLow = Math.log(T_MIN);
        if (eos.state(RHO_MAX, T_MIN).P() < P) {
            lnTLow = Math.log(atDensityPressure(RHO_MAX, P).T()) + 1e-9;
        }
        BracketedNewton.Function f = new BracketedNewton.Function() {
            @Override
            public double value(double lnT) {
                double T = Math.exp(lnT);
                return eos.state(density(P, T), T).s() - s;
            }

            @Override
            public double derivative(double lnT) {
                double T = Math.exp(lnT);
                return eos.state(density(P, T), T).cP();
            }
        };
        double T = Math.exp(solve("temperature at given pressure and entropy", f, lnTLow, lnTHigh,
                "entropy", s, "erg/g/K"));
        return eos.state(density(P, T), T);
    }

    private static double solve(String what, BracketedNewton.Function f, double lo, double hi, String input,
                                double value, String unit) {
        double fLo = f.value(lo);
        double fHi = f.value(hi);
        if (Math.signum(fLo) == Math.signum(fHi) && fLo != 0.0) {
            throw new BadInputException(String.format(Locale.US,
                    "%s %.6g %s has no state of the Fermi-Dirac equation of state with density in [%.0e, %.0e] g/cm3"
                            + " and temperature in [%.0e, %.0e] K (%s)", input, value, unit, RHO_MIN, RHO_MAX, T_MIN,
                    T_MAX, what));
        }
        return BracketedNewton.solve(what, f, lo, hi, TOLERANCE);
    }

    private static void requirePositive(String name, double value, String unit) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw BadInputException.mustBePositive(name, value, unit);
        }
    }

    private static void requireInside(String name, double value, String unit, double lo, double hi) {
        if (!(value >= lo && value <= hi)) {
            throw BadInputException.notAllowed(name, value, unit, String.format(Locale.US, "%.0e to %.0e %s", lo, hi, unit));
        }
    }
}
