package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * g, the Gibbs energy per gram, is the gas's alone: black-body photons have zero chemical
 * potential (u_rad − T s_rad + P_rad/ρ = 0, the closed form of the photon gas), so
 * g = Σ_j μ_j n_j/ρ over the gas species whatever radiation does, down to β = 1e-17 and for a
 * composition of metals only.
 */
class GibbsEnergyTest {

    @ParameterizedTest
    @CsvSource({
        "1.0, 1e7, 0.7, 0.28, 0.02",
        "1e-10, 5e9, 0.7, 0.28, 0.02",
        "1e-10, 5e9, 0.0, 0.96, 0.04",
        "1e-20, 1e10, 0.7, 0.28, 0.02",
        "1e-25, 3e10, 0.7, 0.28, 0.02",
        "1e5, 1e6, 0.0, 0.0, 1.0"})
    void gibbsEnergyIsTheGasChemicalPotentials(double rho, double temperature, double x, double y, double z) {
        Composition c = z == 1.0 ? Composition.of(x, y, z, 16.0) : Composition.of(x, y, z);
        EosState state = new GasRadiationEos(c).state(rho, temperature);
        ReferenceMixture.Point ref = ReferenceMixture.of(c).at(rho, temperature);
        // two independent sums of the same Sackur–Tetrode chemical potentials: agreement to
        // rounding of a few logarithms (1e-12 relative)
        assertEquals(1.0, state.g() / ref.gGas(), 1e-12, "g at beta = " + state.beta());
        // the free energy is the same gas part minus P_rad/rho: f = g - P/rho exactly
        assertEquals(state.g() - state.P() / rho, state.f(), 1e-12 * Math.abs(state.f()), "f = g - P/rho");
    }

    @ParameterizedTest
    @CsvSource({"1e-25, 3e10", "1e-20, 1e10"})
    void theseStatesReallyAreRadiationDominated(double rho, double temperature) {
        EosState state = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)).state(rho, temperature);
        assertTrue(state.beta() < 1e-15, "beta = " + state.beta());
    }
}
