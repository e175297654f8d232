package org.stellabar.eos;

import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.ELECTRONVOLT;
import static org.stellabar.physics.Constants.ELECTRON_MASS;
import static org.stellabar.physics.Constants.ELEMENTARY_CHARGE;
import static org.stellabar.physics.Constants.HBAR;
import static org.stellabar.physics.Constants.PLANCK;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.stellabar.eos.ValidityWarning.Regime;

/**
 * Decides where the fully ionized, classical, non-relativistic ideal gas plus radiation stops
 * being a fair description. Thresholds and their grounds:
 *
 * <ul>
 *   <li><b>Electron degeneracy</b>: D = n_e λ_e³/2 &gt; 1, λ_e = h/√(2π m_e kT). In the
 *       classical limit D = e^ψ, ψ the electron degeneracy parameter μ_e/kT, so D = 1 is ψ = 0,
 *       the usual boundary between the non-degenerate and the degenerate regime (Kippenhahn,
 *       Weigert &amp; Weiss 2012, §15, from memory). The first quantum correction to the electron
 *       pressure is P = n_e kT (1 + D/2^{5/2}) (Landau &amp; Lifshitz, <i>Statistical Physics</i>
 *       Part 1, §56, from memory); evaluated with the full Fermi–Dirac integrals, the classical
 *       electron pressure is about 15 % too low at D = 1 and about 4 % too low at the solar centre
 *       (D ≈ 0.26), which is deliberately not flagged: the ideal gas is the standard description
 *       there.</li>
 *   <li><b>Relativistic electrons</b>: kT &gt; 0.1 m_e c² (thermal, T ≳ 5.9 × 10⁸ K) or a Fermi
 *       momentum p_F = ħ(3π² n_e)^{1/3} above 0.1 m_e c while degenerate (D &gt; 0.1). Common
 *       practice, no source.</li>
 *   <li><b>Pair creation</b>: T &gt; 10⁹ K, where e⁺e⁻ pairs carry a noticeable part of the
 *       pressure (kT ≈ 0.17 m_e c²); common practice, no source.</li>
 *   <li><b>Coulomb coupling</b>: Γ_C = ⟨Z²⟩e²/(a_i kT) &gt; 1, a_i = (3/(4π n_i))^{1/3}; above 1
 *       the plasma is strongly coupled and the ideal-gas pressure is no longer a fair
 *       approximation (common practice, no source).</li>
 *   <li><b>Partial ionization</b>: the Saha equation for H⁰ ⇄ H⁺ (13.598 eV) and He⁺ ⇄ He²⁺
 *       (54.418 eV), with the electron density of full ionization, gives a non-ionized fraction
 *       above 1 % (Saha equation as in Kippenhahn, Weigert &amp; Weiss 2012, §14.1). Only below
 *       10⁶ K: above it kT exceeds both ionization energies and any recombination Saha predicts is
 *       an artefact of high density, where pressure ionization (outside Saha) keeps the gas
 *       ionized. Threshold: common practice, no source.</li>
 *   <li><b>Radiation dominance</b>: β &lt; 1/2, i.e. P_rad &gt; P_gas; not a failure of the model but
 *       a regime a reader should know of.</li>
 * </ul>
 */
public final class ValidityCheck {

    /** Degeneracy parameter n_e λ_e³/2 above which electrons are flagged as degenerate (ψ &gt; 0). */
    public static final double DEGENERACY_LIMIT = 1.0;
    /** kT/(m_e c²) and p_F/(m_e c) above which electrons are flagged as relativistic. */
    public static final double RELATIVISTIC_LIMIT = 0.1;
    /** Temperature above which pair creation is flagged [K]. */
    public static final double PAIR_TEMPERATURE = 1e9;
    /** Coulomb coupling parameter above which the plasma is flagged as strongly coupled. */
    public static final double COULOMB_LIMIT = 1.0;
    /** Saha non-ionized fraction above which ionization is flagged as incomplete. */
    public static final double NEUTRAL_FRACTION_LIMIT = 0.01;
    /** Temperature above which the Saha check is not applied [K]. */
    public static final double SAHA_MAX_TEMPERATURE = 1e6;
    /** Hydrogen ionization energy [erg] (13.598 eV; NIST Atomic Spectra Database, from memory). */
    public static final double HYDROGEN_IONIZATION = 13.598434 * ELECTRONVOLT;
    /** He⁺ ionization energy [erg] (54.418 eV; NIST Atomic Spectra Database, from memory). */
    public static final double HELIUM_II_IONIZATION = 54.417765 * ELECTRONVOLT;

    private static final Regime[] REGIMES = Regime.values();
    private static final double ELECTRON_REST_ENERGY = ELECTRON_MASS * SPEED_OF_LIGHT * SPEED_OF_LIGHT;

    private final Composition composition;
    private final double electronsPerGram;
    private final double ionsPerGram;
    private final double meanSquareCharge;

    ValidityCheck(Composition composition) {
        this.composition = composition;
        this.electronsPerGram = composition.electronsPerGram();
        this.ionsPerGram = composition.ionsPerGram();
        this.meanSquareCharge = composition.meanSquareIonCharge();
    }

    /**
     * Electron degeneracy parameter D = n_e λ_e³/2.
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @return D (dimensionless)
     */
    public double degeneracyParameter(double rho, double T) {
        double lambda = PLANCK / Math.sqrt(2.0 * Math.PI * ELECTRON_MASS * BOLTZMANN * T);
        return 0.5 * rho * electronsPerGram * lambda * lambda * lambda;
    }

    /**
     * Density [g/cm3] at which D = n_e λ_e³/2 reaches {@code level} at temperature T.
     *
     * @param T temperature [K]
     * @param level the value of D
     * @return ρ
     */
    public double degeneracyDensity(double T, double level) {
        return level * rho1(T);
    }

    private double rho1(double T) {
        return 1.0 / degeneracyParameter(1.0, T);
    }

    /**
     * Fermi momentum over m_e c for the electron density at ρ.
     *
     * @param rho density [g/cm3]
     * @return x_F
     */
    public double fermiMomentumRatio(double rho) {
        double pF = HBAR * Math.cbrt(3.0 * Math.PI * Math.PI * rho * electronsPerGram);
        return pF / (ELECTRON_MASS * SPEED_OF_LIGHT);
    }

    /**
     * Coulomb coupling parameter Γ_C = ⟨Z²⟩e²/(a_i kT).
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @return Γ_C
     */
    public double coulombCoupling(double rho, double T) {
        double ionSpacing = Math.cbrt(3.0 / (4.0 * Math.PI * rho * ionsPerGram));
        return meanSquareCharge * ELEMENTARY_CHARGE * ELEMENTARY_CHARGE / (ionSpacing * BOLTZMANN * T);
    }

    /**
     * Largest non-ionized fraction among H and He⁺ by the Saha equation (statistical-weight
     * factors are 1 for both), using the electron density of full ionization.
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @return the fraction in [0, 1]
     */
    public double sahaNeutralFraction(double rho, double T) {
        double lnTwoD = Math.log(2.0 * degeneracyParameter(rho, T));
        double kT = BOLTZMANN * T;
        double worst = 0.0;
        // n_{i+1}/n_i = (1/(n_e λ_e³)) exp(−χ/kT) = exp(−χ/kT)/(2D), formed as one exponential so
        // that an underflowing exp(−χ/kT) and a vanishing D cannot meet as 0/0
        if (composition.X() > 0) {
            worst = Math.max(worst, 1.0 / (1.0 + Math.exp(-HYDROGEN_IONIZATION / kT - lnTwoD)));
        }
        if (composition.Y() > 0) {
            worst = Math.max(worst, 1.0 / (1.0 + Math.exp(-HELIUM_II_IONIZATION / kT - lnTwoD)));
        }
        return worst;
    }

    /**
     * The warning bit mask at a state.
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @param beta P_gas/P
     * @return OR of {@link Regime#bit()} for every flagged regime
     */
    public int mask(double rho, double T, double beta) {
        int mask = 0;
        double d = degeneracyParameter(rho, T);
        if (d > DEGENERACY_LIMIT) {
            mask |= Regime.ELECTRON_DEGENERACY.bit();
        }
        double thermal = BOLTZMANN * T / ELECTRON_REST_ENERGY;
        if (thermal > RELATIVISTIC_LIMIT || d > DEGENERACY_LIMIT && fermiMomentumRatio(rho) > RELATIVISTIC_LIMIT) {
            mask |= Regime.RELATIVISTIC_ELECTRONS.bit();
        }
        if (T > PAIR_TEMPERATURE) {
            mask |= Regime.PAIR_CREATION.bit();
        }
        if (coulombCoupling(rho, T) > COULOMB_LIMIT) {
            mask |= Regime.COULOMB_COUPLING.bit();
        }
        if (T < SAHA_MAX_TEMPERATURE && sahaNeutralFraction(rho, T) > NEUTRAL_FRACTION_LIMIT) {
            mask |= Regime.PARTIAL_IONIZATION.bit();
        }
        if (beta < 0.5) {
            mask |= Regime.RADIATION_DOMINATED.bit();
        }
        return mask;
    }

    /**
     * The warnings at a state, each with a line that quotes its number.
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @param beta P_gas/P
     * @return the warnings in {@link Regime} order
     */
    public List<ValidityWarning> warnings(double rho, double T, double beta) {
        int mask = mask(rho, T, beta);
        if (mask == 0) {
            return List.of();
        }
        List<ValidityWarning> list = new ArrayList<>();
        for (Regime r : REGIMES) {
            if ((mask & r.bit()) != 0) {
                list.add(new ValidityWarning(r, () -> describe(r, rho, T, beta)));
            }
        }
        return list;
    }

    /**
     * One line describing a flagged regime at a state.
     *
     * @param regime the regime
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @param beta P_gas/P
     * @return the message
     */
    public String describe(Regime regime, double rho, double T, double beta) {
        return switch (regime) {
            case ELECTRON_DEGENERACY -> fmt("electron degeneracy: n_e λ_e³/2 = %s > %.2g; the electrons are"
                    + " degenerate and the classical electron pressure is too low (by 15 %% or more)",
                    number(degeneracyParameter(rho, T)), DEGENERACY_LIMIT);
            case RELATIVISTIC_ELECTRONS -> fmt("relativistic electrons: kT/(m_e c²) = %s, p_F/(m_e c) = %s"
                    + " (limit %.1g); the non-relativistic gas is inaccurate",
                    number(BOLTZMANN * T / ELECTRON_REST_ENERGY), number(fermiMomentumRatio(rho)), RELATIVISTIC_LIMIT);
            case PAIR_CREATION -> fmt("pair creation: T = %s K > %.0e K; electron-positron pairs, absent"
                    + " from this model, change P, u and Γ1", number(T), PAIR_TEMPERATURE);
            case COULOMB_COUPLING -> fmt("Coulomb coupling: Γ_C = %s > %.0f; the plasma is strongly coupled"
                    + " and not an ideal gas", number(coulombCoupling(rho, T)), COULOMB_LIMIT);
            case PARTIAL_IONIZATION -> fmt("partial ionization: the Saha equation leaves %s of H or He⁺ not"
                    + " fully ionized (> %.0e); full ionization is assumed", number(sahaNeutralFraction(rho, T)),
                    NEUTRAL_FRACTION_LIMIT);
            case RADIATION_DOMINATED -> fmt("radiation dominated: β = %.4g < 0.5, P_rad exceeds P_gas", beta);
        };
    }

    /**
     * Three significant digits; at absurd inputs (T = 1e-300 K, say) D, Γ_C or p_F overflow, and
     * the message says so in words rather than printing "Infinity".
     */
    private static String number(double value) {
        return Double.isFinite(value) ? String.format(Locale.US, "%.3g", value) : "over 1e308";
    }

    private static String fmt(String format, Object... args) {
        return String.format(Locale.US, format, args);
    }

    /**
     * How a warning bit mask reads, for table metadata.
     *
     * @return "1=electron_degeneracy, 2=relativistic_electrons, ..."
     */
    public static String maskLegend() {
        List<String> parts = new ArrayList<>();
        for (Regime r : Regime.values()) {
            parts.add(r.bit() + "=" + r.code());
        }
        return String.join(", ", parts);
    }
}
