package org.stellabar.eos.fermi;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.physics.BadInputException;

class FermiEosInversionTest {

    private static final FermiGasRadiationEos EOS = new FermiGasRadiationEos(Composition.of(0.0, 0.0, 1.0, 16.0));
    private static final FermiEosInversion INVERSION = new FermiEosInversion(EOS);

    /**
     * Round trips (identity): a state at (ρ, T) is found again from (P, T), (ρ, P), (ρ, s) and (P, s). The
     * iterations stop at 1e-15 in ln ρ or ln T; the recovered variable then carries the forward rounding
     * (~1e-15) divided by the logarithmic slope (χ_ρ, χ_T, or c_V T/s), so 1e-11, or 1e-14/χ where the
     * slope is small (strongly degenerate electrons: P hardly depends on T, and T hardly on P).
     */
    @ParameterizedTest(name = "rho = {0}, T = {1}")
    @CsvSource({"1e4, 2e9", "1e6, 1e9", "1e2, 1e7", "1e8, 5e9", "1e-2, 1e6", "1e9, 1e10", "1e5, 3e9", "1e7, 1e6"})
    void roundTrips(double rho, double T) {
        EosState state = EOS.state(rho, T);
        assertRelative(rho, INVERSION.density(state.P(), T), Math.max(1e-11, 1e-14 / state.chiRho()), "(P,T) -> rho");
        assertRelative(T, INVERSION.atDensityPressure(rho, state.P()).T(), Math.max(1e-11, 1e-14 / state.chiT()),
                "(rho,P) -> T");
        // s of strongly degenerate electrons is a difference (E + P − kTηn₀)/(ρT) that keeps ~1e-16 η of its
        // scale; the recovered T carries that over the slope c_V T/s
        double eta = Math.max(1.0, EOS.fermiState(rho, T).eta());
        double entropySlope = state.cV() * T / Math.abs(state.s());
        double entropyTolerance = Math.max(1e-11, 1e-15 * eta / entropySlope);
        assertRelative(T, INVERSION.atDensityEntropy(rho, state.s()).T(), entropyTolerance, "(rho,s) -> T");
        // on the isobar each entropy evaluation also carries the density solve's rounding, of the same size
        double isobarTolerance = 3.0 * entropyTolerance;
        EosState back = INVERSION.atPressureEntropy(state.P(), state.s());
        assertRelative(T, back.T(), isobarTolerance, "(P,s) -> T");
        assertRelative(rho, back.rho(), Math.max(1e-11, isobarTolerance * state.chiT() / state.chiRho()), "(P,s) -> rho");
    }

    @Test
    void refusesPressureBelowRadiation() {
        assertThrows(BadInputException.class, () -> INVERSION.density(1.0, 1e9));
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        double error = Math.abs(actual - expected) / Math.abs(expected);
        assertTrue(error <= tolerance, what + ": expected " + expected + " got " + actual + " (relative " + error + ")");
    }
}
