package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.stellabar.eos.Samples.near;
import static org.stellabar.eos.Samples.relative;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.physics.Constants;

/**
 * The black-body part of the mixture. Its share of u, h, s and g is isolated by removing the
 * gas share computed independently ({@link ReferenceMixture}: u_gas = (3/2)P_gas/ρ,
 * h_gas = (5/2)P_gas/ρ, Sackur–Tetrode s_gas, g_gas = Σ μ_j n_j/ρ). Where gas dominates, that
 * subtraction cancels: the error is measured against the size of the whole quantity, i.e. a
 * tolerance of 1e-12 of the total, which a wrong radiation term (of relative size 1 − β) only
 * escapes where 1 − β &lt; 1e-12 — the states at the top of the list below are chosen with
 * 1 − β from 1e-6 to almost 1 so that every check bites.
 */
class PhotonGasTest {

    private static final Composition SOLAR = Composition.of(0.70, 0.28, 0.02);
    private static final GasRadiationEos EOS = new GasRadiationEos(SOLAR);
    private static final ReferenceMixture REFERENCE = ReferenceMixture.of(SOLAR);
    /** Roundings of a few terms of the whole quantity. */
    private static final double TOLERANCE = 1e-12;

    @ParameterizedTest(name = "rho={0}, T={1}")
    @CsvSource({"1e-10, 1e8", "1e-3, 1e8", "1, 1e7", "150, 1.57e7", "1e-6, 1e5", "1e-12, 1e10", "1e3, 1e9",
        "1e9, 1e3"})
    void radiationShareOfEachQuantity(double rho, double t) {
        EosState s = EOS.state(rho, t);
        ReferenceMixture.Point gas = REFERENCE.at(rho, t);
        double a = ReferenceMixture.A_RAD;
        // P_rad = aT⁴/3 with a = π²k⁴/(15ħ³c³) computed independently
        relative(a * Math.pow(t, 4) / 3.0, s.Prad(), 1e-14, "P_rad");
        // u_rad = aT⁴/ρ and P_rad = u_rad ρ/3
        double uRad = s.u() - 1.5 * gas.Pgas() / rho;
        near(3.0 * s.Prad() / rho, uRad, TOLERANCE, s.u(), "P_rad = u_rad rho/3");
        // radiation enthalpy h_rad = u_rad + P_rad/ρ = (4/3) u_rad
        double hRad = s.u() + s.P() / rho - 2.5 * gas.Pgas() / rho;
        near(4.0 / 3.0 * uRad, hRad, TOLERANCE, s.u() + s.P() / rho, "h_rad = 4/3 u_rad");
        // s_rad = 4 u_rad/(3T) = 4aT³/(3ρ)
        double sRad = s.s() - gas.sGas();
        double scaleS = Math.abs(s.s()) + gas.particlesPerGramTimesK() * 100;
        near(4.0 * uRad / (3.0 * t), sRad, TOLERANCE, scaleS, "s_rad = 4 u_rad/(3T)");
        near(4.0 * a * t * t * t / (3.0 * rho), sRad, TOLERANCE, scaleS, "s_rad = 4aT^3/(3 rho)");
        // zero photon chemical potential: the radiation part of g = f + P/ρ vanishes,
        // u_rad − T s_rad + P_rad/ρ = 0, so g is the gas's g alone
        double scaleG = s.u() + t * scaleS + s.P() / rho;
        near(gas.gGas(), s.g(), TOLERANCE, scaleG, "g = g_gas (photon chemical potential 0)");
        near(0.0, uRad - t * sRad + s.Prad() / rho, TOLERANCE, scaleG, "u_rad - T s_rad + P_rad/rho");
        // c_V,rad = 4aT³/ρ
        near(4.0 * a * t * t * t / rho, s.cV() - 1.5 * gas.particlesPerGramTimesK(), TOLERANCE, s.cV(), "c_V,rad");
    }

    @ParameterizedTest
    @CsvSource({"1e3", "5778", "1.57e7", "1e9", "1e10"})
    void photonNumberDensity(double t) {
        // n_γ = (2ζ(3)/π²)(kT/ħc)³ = 20.2868 T³ cm^-3 (coefficient from CODATA 2018 k, ħ, c; six
        // digits, so half a unit of the last: 2.5e-6)
        relative(20.2868 * t * t * t, GasRadiationEos.photonDensity(t), 2.5e-6, "n_gamma");
        relative(ReferenceMixture.ZETA_3 * 2.0 / (Math.PI * Math.PI)
                * Math.pow(ReferenceMixture.K * t / (ReferenceMixture.HBAR * ReferenceMixture.C), 3),
                GasRadiationEos.photonDensity(t), 1e-14, "n_gamma closed form");
    }

    @Test
    void photonNumberConstants() {
        // 2ζ(3) = 2.404114 (Apéry's constant 1.2020569..., OEIS A002117; from memory)
        assertEquals(2.404114, 2.0 * Constants.ZETA_3, 5e-7);
        // mean photon energy π⁴/(30ζ(3)) kT = 2.701 kT (from the Planck spectrum; four digits)
        double kT = Constants.BOLTZMANN * 1e7;
        assertEquals(2.701, GasRadiationEos.meanPhotonEnergy(1e7) / kT, 5e-4);
        relative(Math.pow(Math.PI, 4) / (30.0 * ReferenceMixture.ZETA_3), GasRadiationEos.meanPhotonEnergy(1e7) / kT,
                1e-15, "mean photon energy");
        // entropy per photon s_rad ρ/n_γ = (4aT³/3)/n_γ = 2π⁴/(45ζ(3)) k = 3.602 k (four digits)
        for (double t : new double[] {1e4, 1e7, 1e10}) {
            double perPhoton = 4.0 * Constants.RADIATION_DENSITY * t * t * t / 3.0
                    / (GasRadiationEos.photonDensity(t) * Constants.BOLTZMANN);
            assertEquals(3.602, perPhoton, 5e-4);
            relative(2.0 * Math.pow(Math.PI, 4) / (45.0 * ReferenceMixture.ZETA_3), perPhoton, 1e-14,
                    "entropy per photon");
        }
    }

    @Test
    void photonsPerBaryon() {
        EosState s = EOS.state(1e-3, 1e8);
        relative(s.photonDensity() * Constants.ATOMIC_MASS_UNIT / s.rho(), s.photonsPerBaryon(), 1e-15,
                "n_gamma m_u/rho");
        relative(s.s() * Constants.ATOMIC_MASS_UNIT / Constants.BOLTZMANN, s.sPerBaryon(), 1e-15, "s per baryon");
    }
}
