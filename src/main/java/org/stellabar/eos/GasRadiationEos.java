package org.stellabar.eos;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.ELECTRON_MASS;
import static org.stellabar.physics.Constants.HBAR;
import static org.stellabar.physics.Constants.PLANCK;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;
import static org.stellabar.physics.Constants.ZETA_3;

import java.util.Locale;
import java.util.Objects;
import org.stellabar.physics.BadInputException;

/**
 * Fully ionized classical ideal gas plus black-body radiation at a common temperature.
 *
 * <p>P = ρkT/(μ m_u) + aT⁴/3; u = (3/2)P_gas/ρ + aT⁴/ρ; the gas entropy is the Sackur–Tetrode
 * entropy of each ion species (spin weight 1, mass A m_u) and of the electrons (weight 2), the
 * radiation entropy 4aT³/(3ρ). The response functions χ_ρ = β, χ_T = 4 − 3β and the exponents
 * Γ3 − 1 = (2/3)(4 − 3β)/(8 − 7β), Γ1 = β + (4 − 3β)(Γ3 − 1), ∇_ad = (Γ3 − 1)/Γ1 follow
 * Chandrasekhar (1939, ch. II) and Cox &amp; Giuli (1968, §9.13). Every formula is written in β and
 * 1 − β = P_rad/P separately (4 − 3β = β + 4(1 − β), 8 − 7β = β + 8(1 − β)) so that neither
 * limit loses digits to cancellation.
 *
 * <p>Immutable and thread-safe. {@link #state} builds a full record;
 * {@link #evaluate(double[], double[], int, int, EosArrays)} fills primitive arrays without
 * allocating, for grids and inner loops.
 */
public final class GasRadiationEos implements EquationOfState {

    /** π⁴/(30ζ(3)) ≈ 2.701: the mean black-body photon energy in units of kT. */
    private static final double MEAN_PHOTON_ENERGY_PER_KT = Math.pow(Math.PI, 4) / (30.0 * ZETA_3);

    private final Composition composition;
    /** k/(μ m_u) [erg/g/K]: gas pressure per ρT, also the gas particles per gram times k. */
    private final double gasConstant;
    /** k Σ_j ν_j c_j: the T- and ρ-independent part of the Sackur–Tetrode sum [erg/g/K]. */
    private final double entropyConstant;
    private final ValidityCheck validity;

    /**
     * @param composition the mixture
     */
    public GasRadiationEos(Composition composition) {
        this.composition = Objects.requireNonNull(composition, "composition");
        this.gasConstant = BOLTZMANN / (composition.mu() * ATOMIC_MASS_UNIT);
        this.entropyConstant = entropyConstant(composition);
        this.validity = new ValidityCheck(composition);
    }

    /** @return the mixture */
    @Override
    public Composition composition() {
        return composition;
    }

    /** @return k/(μ m_u) [erg/g/K] */
    public double gasConstant() {
        return gasConstant;
    }

    /**
     * The full state at density and temperature.
     *
     * @param rho density [g/cm3], positive and finite
     * @param T temperature [K], positive and finite
     * @return the state with its validity warnings
     * @throws BadInputException if rho or T is not positive and finite, or if a quantity of the
     *     state overflows the double range (far outside stellar conditions)
     */
    @Override
    public EosState state(double rho, double T) {
        requirePositive("density", rho, "g/cm3");
        requirePositive("temperature", T, "K");
        double pGas = gasConstant * rho * T;
        double pRad = RADIATION_DENSITY * T * T * T * T / 3.0;
        double p = pGas + pRad;
        double beta = pGas / p;
        double oneMinusBeta = pRad / p;
        double u = 1.5 * pGas / rho + 3.0 * pRad / rho;
        double sGas = gasEntropy(rho, T);
        double s = sGas + 4.0 * pRad / (rho * T);
        // Photons have zero chemical potential: u_rad − T s_rad + P_rad/ρ = aT⁴/ρ − (4/3)aT⁴/ρ +
        // (1/3)aT⁴/ρ = 0, so g is the gas's alone, (5/2)(k/μm_u)T − T s_gas, and f = g − P/ρ
        // splits the same way. Written so, neither loses its digits to the radiation terms where
        // radiation dominates (u − Ts + P/ρ would cancel to nothing at β = 1e-17).
        double g = T * (2.5 * gasConstant - sGas);
        double f = T * (1.5 * gasConstant - sGas) - pRad / rho;
        double chiRho = beta;
        double chiT = beta + 4.0 * oneMinusBeta;
        double gamma3m1 = gamma3MinusOne(beta, oneMinusBeta);
        double gamma1 = gamma1(beta, oneMinusBeta, gamma3m1);
        double cV = 1.5 * gasConstant + 12.0 * pRad / (rho * T);
        double cP = cV * gamma1 / chiRho;
        double photonDensity = photonDensity(T);
        double photonsPerBaryon = photonDensity * ATOMIC_MASS_UNIT / rho;
        double soundSpeed = Math.sqrt(gamma1 * p / rho);
        // Far outside stellar conditions (say ρ = 1e-300 g/cm3 at 1e10 K, or T = 1e80 K) some
        // quantities overflow the double range; such a request has no finite answer and is
        // refused as bad input rather than handed on as Infinity or NaN.
        if (!(Double.isFinite(p) && Double.isFinite(u) && Double.isFinite(s) && Double.isFinite(g)
                && Double.isFinite(f) && Double.isFinite(cV) && Double.isFinite(cP)
                && Double.isFinite(soundSpeed) && Double.isFinite(photonDensity)
                && Double.isFinite(photonsPerBaryon))) {
            throw outOfRange(rho, T, new String[] {"P", "u", "s", "g", "f", "c_V", "c_P", "sound_speed",
                "n_photon", "photons_per_baryon"}, new double[] {p, u, s, g, f, cV, cP, soundSpeed,
                    photonDensity, photonsPerBaryon});
        }
        return new EosState(composition, rho, T, p, pGas, pRad, beta, oneMinusBeta, u, s,
                s * ATOMIC_MASS_UNIT / BOLTZMANN, f, g, chiRho, chiT, chiT / chiRho, cV, cP, gamma1,
                gamma2(gamma1, gamma3m1), 1.0 + gamma3m1, gamma3m1 / gamma1, soundSpeed,
                photonDensity, meanPhotonEnergy(T), photonsPerBaryon,
                validity.warnings(rho, T, beta));
    }

    private static BadInputException outOfRange(double rho, double T, String[] names, double[] values) {
        String first = "";
        for (int i = 0; i < names.length; i++) {
            if (!Double.isFinite(values[i])) {
                first = names[i];
                break;
            }
        }
        return new BadInputException(String.format(Locale.US,
                "the state at density %.6g g/cm3 and temperature %.6g K is outside the range of double precision"
                        + " (%s overflows); give a density and temperature nearer to stellar conditions", rho, T,
                first));
    }

    /**
     * Fills arrays for points {@code from} (inclusive) to {@code to} (exclusive) without
     * allocating. Inputs must be positive and finite (not checked per point: validate the grid
     * bounds before calling).
     *
     * @param rho densities [g/cm3]
     * @param T temperatures [K]
     * @param from first index
     * @param to one past the last index
     * @param out destination arrays, at least {@code to} long
     */
    public void evaluate(double[] rho, double[] T, int from, int to, EosArrays out) {
        for (int i = from; i < to; i++) {
            double r = rho[i];
            double t = T[i];
            double pGas = gasConstant * r * t;
            double pRad = RADIATION_DENSITY * t * t * t * t / 3.0;
            double p = pGas + pRad;
            double beta = pGas / p;
            double oneMinusBeta = pRad / p;
            double gamma3m1 = gamma3MinusOne(beta, oneMinusBeta);
            double gamma1 = gamma1(beta, oneMinusBeta, gamma3m1);
            out.P[i] = p;
            out.Pgas[i] = pGas;
            out.Prad[i] = pRad;
            out.beta[i] = beta;
            out.oneMinusBeta[i] = oneMinusBeta;
            out.u[i] = 1.5 * pGas / r + 3.0 * pRad / r;
            out.s[i] = entropy(r, t, pRad);
            out.Gamma1[i] = gamma1;
            out.Gamma3[i] = 1.0 + gamma3m1;
            out.nablaAd[i] = gamma3m1 / gamma1;
            out.soundSpeed[i] = Math.sqrt(gamma1 * p / r);
            out.warnings[i] = validity.mask(r, t, beta);
        }
    }

    /**
     * Specific entropy [erg/g/K] at (ρ, T).
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @return s
     */
    public double entropy(double rho, double T) {
        return entropy(rho, T, RADIATION_DENSITY * T * T * T * T / 3.0);
    }

    private double entropy(double rho, double T, double pRad) {
        return gasEntropy(rho, T) + 4.0 * pRad / (rho * T);
    }

    private double gasEntropy(double rho, double T) {
        // Sackur–Tetrode summed over species: k Σ ν_j [5/2 + ln(g_j/(n_j λ_j³))]
        //   = entropyConstant + (k Σ ν_j)(1.5 ln T − ln ρ), with k Σ ν_j = k/(μ m_u).
        return entropyConstant + gasConstant * (1.5 * Math.log(T) - Math.log(rho));
    }

    /** @return the validity warnings at (ρ, T) */
    public ValidityCheck validity() {
        return validity;
    }

    /**
     * Γ3 − 1 = (2/3)(4 − 3β)/(8 − 7β), written in β and 1 − β.
     *
     * @param beta P_gas/P
     * @param oneMinusBeta P_rad/P
     * @return Γ3 − 1
     */
    public static double gamma3MinusOne(double beta, double oneMinusBeta) {
        return (2.0 / 3.0) * (beta + 4.0 * oneMinusBeta) / (beta + 8.0 * oneMinusBeta);
    }

    /**
     * Γ1 = χ_ρ + χ_T(Γ3 − 1) with χ_ρ = β, χ_T = 4 − 3β.
     *
     * @param beta P_gas/P
     * @param oneMinusBeta P_rad/P
     * @param gamma3MinusOne Γ3 − 1
     * @return Γ1
     */
    public static double gamma1(double beta, double oneMinusBeta, double gamma3MinusOne) {
        return beta + (beta + 4.0 * oneMinusBeta) * gamma3MinusOne;
    }

    /**
     * Γ2 from Γ2/(Γ2 − 1) = Γ1/(Γ3 − 1), i.e. Γ2 = 1/(1 − ∇_ad) = Γ1/(Γ1 − (Γ3 − 1)).
     *
     * @param gamma1 Γ1
     * @param gamma3MinusOne Γ3 − 1
     * @return Γ2
     */
    public static double gamma2(double gamma1, double gamma3MinusOne) {
        return gamma1 / (gamma1 - gamma3MinusOne);
    }

    /**
     * Black-body photon number density n_γ = (2ζ(3)/π²)(kT/ħc)³ [1/cm3].
     *
     * @param T temperature [K]
     * @return n_γ
     */
    public static double photonDensity(double T) {
        double x = BOLTZMANN * T / (HBAR * SPEED_OF_LIGHT);
        return 2.0 * ZETA_3 / (Math.PI * Math.PI) * x * x * x;
    }

    /**
     * Mean black-body photon energy π⁴kT/(30ζ(3)) ≈ 2.701 kT [erg].
     *
     * @param T temperature [K]
     * @return mean photon energy
     */
    public static double meanPhotonEnergy(double T) {
        return MEAN_PHOTON_ENERGY_PER_KT * BOLTZMANN * T;
    }

    private static double entropyConstant(Composition c) {
        // Each species j with ν_j particles per gram, statistical weight g_j and mass m_j contributes
        // k ν_j [5/2 + ln(g_j/ν_j) + 1.5 ln(2π m_j k/h²)] once ln T and ln ρ are split off.
        double sum = 0.0;
        sum += speciesTerm(c.electronsPerGram(), 2.0, ELECTRON_MASS);
        sum += speciesTerm(c.X() / ATOMIC_MASS_UNIT, 1.0, ATOMIC_MASS_UNIT);
        sum += speciesTerm(c.Y() / (4.0 * ATOMIC_MASS_UNIT), 1.0, 4.0 * ATOMIC_MASS_UNIT);
        if (c.metalMassNumber() > 0) {
            double a = c.metalMassNumber();
            sum += speciesTerm(c.Z() / (a * ATOMIC_MASS_UNIT), 1.0, a * ATOMIC_MASS_UNIT);
        }
        return BOLTZMANN * sum;
    }

    private static double speciesTerm(double perGram, double weight, double mass) {
        if (perGram <= 0.0) {
            return 0.0;
        }
        return perGram * (2.5 + Math.log(weight / perGram)
                + 1.5 * Math.log(2.0 * Math.PI * mass * BOLTZMANN / (PLANCK * PLANCK)));
    }

    static void requirePositive(String name, double value, String unit) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw BadInputException.mustBePositive(name, value, unit);
        }
    }
}
