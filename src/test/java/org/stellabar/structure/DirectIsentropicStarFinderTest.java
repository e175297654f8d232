package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosState;
import org.stellabar.eos.EquationOfState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.Inversions;
import org.stellabar.eos.fermi.FermiGasRadiationEos;

/**
 * Isentropic stars without homology: the carried adiabat ({@link AdiabatEquations}) against the
 * inverted one ({@link IsentropicEquations}) on the same classical equation of state, the shooting
 * of {@link DirectIsentropicStarFinder} against {@link IsentropicStarFinder}, and identities of a
 * pure-oxygen core on the Fermi–Dirac equation of state.
 */
class DirectIsentropicStarFinderTest {

    private static final Composition SOLAR_LIKE = Composition.of(0.70, 0.28, 0.02);
    private static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);

    /**
     * The classical mixture's inversions behind a plain {@link Inversions}: the solver then carries
     * ln ρ and ln T along the adiabat (it integrates the classical mixture by inversion only when
     * handed an {@link EosInversion}), so both formulations run on one equation of state.
     */
    private static Inversions carried(Composition composition) {
        EosInversion classical = new EosInversion(new GasRadiationEos(composition));
        return new Inversions() {
            @Override
            public EquationOfState eos() {
                return classical.eos();
            }

            @Override
            public double density(double P, double T) {
                return classical.density(P, T);
            }

            @Override
            public double temperature(double rho, double P) {
                return classical.temperature(rho, P);
            }

            @Override
            public EosState atDensityPressure(double rho, double P) {
                return classical.atDensityPressure(rho, P);
            }

            @Override
            public EosState atDensityEntropy(double rho, double s) {
                return classical.atDensityEntropy(rho, s);
            }

            @Override
            public EosState atPressureEntropy(double P, double s) {
                return classical.atPressureEntropy(P, s);
            }

            @Override
            public double temperatureOnIsobar(double P, double s) {
                return classical.temperatureOnIsobar(P, s);
            }
        };
    }

    @Nested
    class CarriedAdiabat {

        /**
         * Same centre, same equation of state, two formulations: M and R to 1e-8 (each integration
         * holds 1e-11 per step over a few hundred steps; the carried one conserves s only to that
         * tolerance, the inverted one exactly), and every row's ρ and T to 1e-8.
         */
        @ParameterizedTest
        @ValueSource(doubles = {1e-2, 1.0, 100.0})
        void matchesTheInvertedAdiabat(double rhoC) {
            double tc = 2e7;
            IsentropicStar inverted = new IsentropicStructureSolver(new EosInversion(new GasRadiationEos(SOLAR_LIKE)))
                    .solve(rhoC, tc);
            IsentropicStar withRhoAndT = new IsentropicStructureSolver(carried(SOLAR_LIKE)).solve(rhoC, tc);
            assertEquals(1.0, withRhoAndT.mass() / inverted.mass(), 1e-8);
            assertEquals(1.0, withRhoAndT.radius() / inverted.radius(), 1e-8);
            StarProfile a = inverted.profile(101);
            StarProfile b = withRhoAndT.profile(101);
            for (int i = 0; i < 100; i++) {
                // rows at the same fraction of the stop radius, which agrees to ~1e-9
                assertEquals(1.0, b.T()[i] / a.T()[i], 1e-7, "T, row " + i);
                assertEquals(1.0, b.radial().rho()[i] / a.radial().rho()[i], 1e-7, "rho, row " + i);
            }
        }
    }

    @Nested
    class Shooting {

        private final DirectIsentropicStarFinder direct = new DirectIsentropicStarFinder(carried(SOLAR_LIKE));
        private final IsentropicStarFinder homologous = new IsentropicStarFinder(new GasRadiationEos(SOLAR_LIKE));

        /** Both finders match M (and R) to 1e-8 by construction; their centres agree to what that allows. */
        @ParameterizedTest
        @ValueSource(doubles = {3.0, 60.0, 1e4})
        void centralTemperatureRequest(double massSolar) {
            double mass = massSolar * SOLAR_MASS;
            IsentropicStar a = homologous.withCentralTemperature(mass, 3e7);
            IsentropicStar b = direct.withCentralTemperature(mass, 3e7);
            assertEquals(1.0, b.centre().rho() / a.centre().rho(), 1e-6);
            assertEquals(1.0, b.radius() / a.radius(), 1e-6);
        }

        @Test
        void entropyRequest() {
            double mass = 40.0 * SOLAR_MASS;
            // the entropy of the 40 Msun star with T_c = 3e7 K: a centre inside the Fermi-Dirac range
            double entropy = homologous.withCentralTemperature(mass, 3e7).centre().sPerBaryon();
            IsentropicStar a = homologous.withEntropy(mass, entropy);
            IsentropicStar b = direct.withEntropy(mass, entropy);
            assertEquals(1.0, b.centre().T() / a.centre().T(), 1e-6);
            assertEquals(1.0, b.radius() / a.radius(), 1e-6);
        }

        @Test
        void radiusRequest() {
            double mass = 20.0 * SOLAR_MASS;
            IsentropicStar a = homologous.withRadius(mass, 6.0 * SOLAR_RADIUS);
            IsentropicStar b = direct.withRadius(mass, 6.0 * SOLAR_RADIUS);
            assertEquals(1.0, b.centre().T() / a.centre().T(), 1e-6);
            assertEquals(1.0, b.radius() / (6.0 * SOLAR_RADIUS), 1e-8);
        }
    }

    @Nested
    class OxygenCoreOnTheFermiEos {

        private static StarModel core;

        private StarModel core() {
            if (core == null) {
                core = new StarBuilder().build(new IsentropicRequest("core", 80.0 * SOLAR_MASS,
                        new ScaleAnchor.CentralTemperature(2e9), OXYGEN, 201, Electrons.fermi));
            }
            return core;
        }

        /** m(R) = M and T_c as asked (the finder's tolerance, 1e-8). */
        @Test
        void massAndCentralTemperature() {
            assertEquals(1.0, core().structure().mass() / (80.0 * SOLAR_MASS), 1e-8);
            assertEquals(2e9, core().structure().centre().T(), 1e-6);
        }

        /**
         * Every row lies on the centre's adiabat of the Fermi–Dirac equation of state: s(ρ, T) of each
         * row, from the EOS itself, equals the centre's. The carried integration conserves s to its
         * tolerance per step (1e-11) accumulated over the steps: 1e-8 allows a thousand of them.
         */
        @Test
        void everyRowHasTheCentralEntropy() {
            FermiGasRadiationEos eos = new FermiGasRadiationEos(OXYGEN);
            StarProfile p = core().structure().profile();
            double s0 = core().structure().centre().s();
            for (int i = 0; i < p.size(); i += 10) {
                assertEquals(1.0, eos.state(p.radial().rho()[i], p.T()[i]).s() / s0, 1e-8, "row " + i);
            }
        }

        /** 3∫P dV = −Ω to the integration's accuracy, as for the classical adiabat. */
        @Test
        void virialTheoremHolds() {
            assertEquals(0.0, core().headline().virialCheck(), 1e-8);
        }

        /**
         * At T_c = 2e9 K the pairs pull ⟨Γ1⟩ of an 80 M☉ oxygen core below 4/3, where the classical
         * mixture keeps it above (its Γ1 ≥ 4/3 always, DESIGN §3): the softening is the pairs'.
         */
        @Test
        void pairsPullTheMeanExponentBelowFourThirds() {
            assertTrue(core().headline().stability().meanGamma1() < 4.0 / 3.0);
            StarModel classical = new StarBuilder().build(new IsentropicRequest("core", 80.0 * SOLAR_MASS,
                    new ScaleAnchor.CentralTemperature(2e9), OXYGEN, 201));
            assertTrue(classical.headline().stability().meanGamma1() > 4.0 / 3.0);
        }
    }
}
