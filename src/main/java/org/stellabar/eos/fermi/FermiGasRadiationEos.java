package org.stellabar.eos.fermi;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.PLANCK;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.EquationOfState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.physics.BadInputException;

/**
 * Classical ideal ions, electrons of any degeneracy and relativity with electron–positron pairs in
 * equilibrium ({@link ElectronPositronGas}), and black-body radiation at one temperature.
 *
 * <p>Energy convention: u counts the kinetic energy of electrons and positrons, the rest-mass energy
 * of the pairs (2 m_e c² n₊/ρ) and the ions' and radiation's energy; the rest mass of the net
 * electrons (constant at fixed composition) is not counted. The pair gas's entropy equals
 * ρTs = E + P − μ₋(n₋ − n₊) with μ₊ = −μ₋ (Cox &amp; Giuli 1968, ch. 24), i.e. ρTs_e = E + P − kTη n₀
 * in our convention. Where a species has η ≥ 0 its entropy is the integral of the entropy per state
 * over the states ({@link FermiDiracIntegrals.Values#entropy()}), which equals that in exact
 * arithmetic but keeps the digits of a degenerate gas, whose small entropy the difference would
 * lose; where η &lt; 0 (every term of E + P − μn positive, no cancellation) it is that identity per
 * species, the positrons' μ₊ − m_e c² being −μ₋ − m_e c², i.e. η₊ = −η − 2/θ; ions carry the
 * Sackur–Tetrode entropy (spin weight 1) as in {@link GasRadiationEos}.
 *
 * <p>Response functions are analytic in the Fermi–Dirac integrals: at fixed T, dη/dρ = (n₀/ρ)/N_η;
 * at fixed ρ, dη/dθ = −N_θ/N_η, from implicit differentiation of neutrality N(η, θ) = n₋ − n₊ = n₀.
 * Then χ_ρ, χ_T, c_V and, by the general relations of Cox &amp; Giuli (1968, §9.13),
 * Γ3 − 1 = Pχ_T/(ρTc_V), Γ1 = χ_ρ + χ_T(Γ3 − 1), ∇_ad = (Γ3 − 1)/Γ1, Γ2 = 1/(1 − ∇_ad),
 * c_P = c_V Γ1/χ_ρ.
 *
 * <p>Validity warnings: degeneracy, relativistic electrons and pair creation are physics of this
 * model and are not raised; Coulomb coupling, partial ionization and radiation dominance stay.
 */
public final class FermiGasRadiationEos implements EquationOfState {

    private static final Set<ValidityWarning.Regime> COVERED = Set.of(ValidityWarning.Regime.ELECTRON_DEGENERACY,
            ValidityWarning.Regime.RELATIVISTIC_ELECTRONS, ValidityWarning.Regime.PAIR_CREATION);
    private static final int COVERED_BITS = COVERED.stream().mapToInt(ValidityWarning.Regime::bit).reduce(0, (a, b) -> a | b);

    private final Composition composition;
    private final double ionGasConstant;
    private final double ionEntropyConstant;
    private final ValidityCheck validity;

    /**
     * The pair-gas details of a state, beside the common record.
     *
     * @param common the state as every equation of state reports it
     * @param eta η, the electrons' degeneracy parameter (μ₋ − m_e c²)/kT
     * @param nElectron n₋ [cm⁻³]
     * @param nPositron n₊ [cm⁻³]
     * @param pElectrons P of electrons and positrons [dyn/cm²]
     * @param pIon P of the ions [dyn/cm²]
     */
    public record FermiState(EosState common, double eta, double nElectron, double nPositron, double pElectrons,
                             double pIon) {
    }

    /** @param composition the mixture */
    public FermiGasRadiationEos(Composition composition) {
        this.composition = Objects.requireNonNull(composition, "composition");
        this.ionGasConstant = BOLTZMANN * composition.ionsPerGram();
        this.ionEntropyConstant = ionEntropyConstant(composition);
        this.validity = new GasRadiationEos(composition).validity();
    }

    @Override
    public Composition composition() {
        return composition;
    }

    @Override
    public EosState state(double rho, double T) {
        return fermiState(rho, T).common();
    }

    /**
     * The full state with the pair-gas details.
     *
     * @param rho density [g/cm3]
     * @param T temperature [K]
     * @return the state
     */
    public FermiState fermiState(double rho, double T) {
        requirePositive("density", rho, "g/cm3");
        requirePositive("temperature", T, "K");
        double n0 = rho * composition.electronsPerGram();
        double theta = BOLTZMANN * T / ElectronPositronGas.REST_ENERGY;
        double eta = ElectronPositronGas.solveEta(n0, theta);
        PairTerms pairs = PairTerms.at(eta, theta);

        double pIon = ionGasConstant * rho * T;
        double pRad = RADIATION_DENSITY * T * T * T * T / 3.0;
        double pGas = pairs.p + pIon;
        double p = pGas + pRad;
        double beta = pGas / p;
        double oneMinusBeta = pRad / p;

        // implicit differentiation of neutrality N(η, θ) = n₀ = ρ/(μ_e m_u)
        double dEtaDLnRho = n0 / pairs.nEta;
        double dEtaDTheta = -pairs.nTheta / pairs.nEta;
        double dThetaDT = theta / T;
        double dPeDRho = pairs.pEta * dEtaDLnRho / rho;
        double dPeDT = (pairs.pTheta + pairs.pEta * dEtaDTheta) * dThetaDT;
        double dEeDT = (pairs.eTheta + pairs.eEta * dEtaDTheta) * dThetaDT;

        double chiRho = (rho * dPeDRho + pIon) / p;
        double chiT = (T * dPeDT + pIon + 4.0 * pRad) / p;
        double cV = dEeDT / rho + 1.5 * ionGasConstant + 12.0 * pRad / (rho * T);
        double gamma3m1 = p * chiT / (rho * T * cV);
        double gamma1 = chiRho + chiT * gamma3m1;
        double nablaAd = gamma3m1 / gamma1;
        double cP = cV * gamma1 / chiRho;

        double u = pairs.e / rho + 1.5 * pIon / rho + 3.0 * pRad / rho;
        double sPairs = BOLTZMANN * pairs.entropy / rho;
        double s = sPairs + ionEntropy(rho, T) + 4.0 * pRad / (rho * T);
        double f = u - T * s;
        double g = f + p / rho;
        double photonDensity = GasRadiationEos.photonDensity(T);
        double photonsPerBaryon = photonDensity * ATOMIC_MASS_UNIT / rho;
        double soundSpeed = Math.sqrt(gamma1 * p / rho);
        double[] all = {p, u, s, f, g, cV, cP, chiRho, chiT, gamma1, soundSpeed, photonsPerBaryon};
        for (double value : all) {
            if (!Double.isFinite(value)) {
                throw new BadInputException(String.format(Locale.US,
                        "the state at density %.6g g/cm3 and temperature %.6g K is outside the range of double"
                                + " precision; give a density and temperature nearer to stellar conditions", rho, T));
            }
        }
        // most states raise only warnings this model covers: their mask first, the list only when needed
        List<ValidityWarning> warnings = (validity.mask(rho, T, beta) & ~COVERED_BITS) == 0 ? List.of()
                : validity.warnings(rho, T, beta).stream().filter(w -> !COVERED.contains(w.code())).toList();
        EosState common = new EosState(composition, rho, T, p, pGas, pRad, beta, oneMinusBeta, u, s,
                s * ATOMIC_MASS_UNIT / BOLTZMANN, f, g, chiRho, chiT, chiT / chiRho, cV, cP, gamma1,
                1.0 / (1.0 - nablaAd), 1.0 + gamma3m1, nablaAd, soundSpeed, photonDensity,
                GasRadiationEos.meanPhotonEnergy(T), photonsPerBaryon, warnings);
        return new FermiState(common, eta, pairs.nMinus, pairs.nPlus, pairs.p, pIon);
    }

    private double ionEntropy(double rho, double T) {
        return ionEntropyConstant + ionGasConstant * (1.5 * Math.log(T) - Math.log(rho));
    }

    private static double ionEntropyConstant(Composition c) {
        // as GasRadiationEos: k ν_j [5/2 + ln(g_j/ν_j) + 1.5 ln(2π m_j k/h²)] per ion species, g_j = 1
        double sum = speciesTerm(c.X() / ATOMIC_MASS_UNIT, ATOMIC_MASS_UNIT)
                + speciesTerm(c.Y() / (4.0 * ATOMIC_MASS_UNIT), 4.0 * ATOMIC_MASS_UNIT);
        if (c.metalMassNumber() > 0) {
            double a = c.metalMassNumber();
            sum += speciesTerm(c.Z() / (a * ATOMIC_MASS_UNIT), a * ATOMIC_MASS_UNIT);
        }
        return BOLTZMANN * sum;
    }

    private static double speciesTerm(double perGram, double mass) {
        if (perGram <= 0.0) {
            return 0.0;
        }
        return perGram * (2.5 + Math.log(1.0 / perGram) + 1.5 * Math.log(2.0 * Math.PI * mass * BOLTZMANN / (PLANCK * PLANCK)));
    }

    private static void requirePositive(String name, double value, String unit) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw BadInputException.mustBePositive(name, value, unit);
        }
    }

    /**
     * n, P, E of electrons plus positrons as functions of (η, θ), with their partial derivatives;
     * N = n₋ − n₊ and its partials for the neutrality condition.
     */
    static final class PairTerms {
        double nMinus;
        double nPlus;
        double p;
        double e;
        double pEta;
        double pTheta;
        double eEta;
        double eTheta;
        double nEta;
        double nTheta;
        /** Entropy density over k [cm⁻³]. */
        double entropy;

        static PairTerms at(double eta, double theta) {
            PairTerms t = new PairTerms();
            double etaPlus = -eta - 2.0 / theta;
            double[] minus;
            double[] plus;
            if (etaPlus > -800.0) {
                // both species from one pass over the nodes where they share them
                FermiDiracIntegrals.Values[] both = new FermiDiracIntegrals.Values[2];
                FermiDiracIntegrals.evaluatePair(eta, etaPlus, theta, both);
                minus = species(both[0], theta, false);
                plus = species(both[1], theta, true);
            } else {
                minus = species(FermiDiracIntegrals.evaluate(eta, theta), theta, false);
                plus = new double[10];
            }
            double chain = 2.0 / (theta * theta); // ∂η₊/∂θ at fixed η
            t.nMinus = minus[0];
            t.nPlus = plus[0];
            t.p = minus[3] + plus[3];
            t.e = minus[6] + plus[6];
            t.nEta = minus[1] + plus[1];
            t.nTheta = minus[2] - plus[2] - plus[1] * chain;
            t.pEta = minus[4] - plus[4];
            t.pTheta = minus[5] + plus[5] + plus[4] * chain;
            t.eEta = minus[7] - plus[7];
            t.eTheta = minus[8] + plus[8] + plus[7] * chain;
            t.entropy = minus[9] + plus[9];
            return t;
        }

        /** {n, n_η, n_θ, P, P_η, P_θ, E, E_η, E_θ, S/k} of one species from its integrals at its own η. */
        private static double[] species(FermiDiracIntegrals.Values v, double theta, boolean positron) {
            double scale = Math.exp(v.logScale());
            // the record's own arrays (package-private accessors): no copies per state
            double[] f = {v.f(0), v.f(1), v.f(2)};
            double[] fe = {v.dEta(0), v.dEta(1), v.dEta(2)};
            double[] ft = {v.dTheta(0), v.dTheta(1), v.dTheta(2)};
            double n1 = ElectronPositronGas.DENSITY_SCALE * Math.pow(theta, 1.5) * scale;
            double p1 = n1 * ElectronPositronGas.REST_ENERGY * theta;
            double n = n1 * (f[0] + theta * f[1]);
            double nEta = n1 * (fe[0] + theta * fe[1]);
            double nTheta = 1.5 / theta * n + n1 * (ft[0] + f[1] + theta * ft[1]);
            double pressure = (2.0 / 3.0) * p1 * (f[1] + 0.5 * theta * f[2]);
            double pEta = (2.0 / 3.0) * p1 * (fe[1] + 0.5 * theta * fe[2]);
            double pTheta = 2.5 / theta * pressure + (2.0 / 3.0) * p1 * (ft[1] + 0.5 * f[2] + 0.5 * theta * ft[2]);
            double kinetic = p1 * (f[1] + theta * f[2]);
            double eEta = p1 * (fe[1] + theta * fe[2]);
            double eTheta = 2.5 / theta * kinetic + p1 * (ft[1] + f[2] + theta * ft[2]);
            if (positron) {
                double rest = 2.0 * ElectronPositronGas.REST_ENERGY;
                kinetic += rest * n;
                eEta += rest * nEta;
                eTheta += rest * nTheta;
            }
            return new double[] {n, nEta, nTheta, pressure, pEta, pTheta, kinetic, eEta, eTheta, n1 * v.entropy()};
        }
    }
}
