package org.stellabar.validation;

import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.HBAR;
import static org.stellabar.physics.Constants.PLANCK;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.List;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;

/**
 * Black-body photon numbers: what stellabar's equation of state gives for n_γ, the mean photon
 * energy and the radiation entropy per photon, and the radiation constant a it derives from σ,
 * against the Planck-distribution closed forms and the rounded numbers in common use.
 */
public final class PhotonGasFamily implements CheckFamily {

    /** The family's identifier. */
    public static final String ID = "photon-gas";
    /** Its reference tables. */
    public static final List<String> FILES = List.of("photon-gas.csv", "photon-gas-published.csv");
    /** Temperature of the state the photon numbers are read from [K]; they scale exactly with T. */
    static final double TEMPERATURE = 1e7;
    /** Density of that state [g/cm3]; photons do not depend on it. */
    static final double DENSITY = 1.0;

    private static final String KNOWN = "two_zeta3, pi4_over_15, mean_photon_energy_over_kT, "
            + "entropy_per_photon_over_k, n_photon_over_T3, radiation_density_constant";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public FamilyResult run(ReferenceSource source) {
        return TableChecks.run(ID, "Black-body photon gas", source, FILES, tables -> {
            EosState state = new GasRadiationEos(Composition.of(0.70, 0.28, 0.02)).state(DENSITY, TEMPERATURE);
            return row -> ours(row, state);
        }, TableChecks.NO_CHARTS,
                "Our values from the state of `GasRadiationEos` at ρ = 1 g/cm3, T = 1e7 K: "
                        + "2ζ(3) = n_γ π²(ħc/kT)³; π⁴/15 = a(hc)³/(8πk⁴) with a = 4σ/c as stellabar derives it; "
                        + "mean energy / kT from the state; entropy per photon = (4P_rad/T)/(n_γ k), i.e. the "
                        + "radiation entropy of the state divided by its photon number; n_γ/T³.");
    }

    private static double ours(ReferenceValue row, EosState s) {
        double t = s.T();
        double x = HBAR * SPEED_OF_LIGHT / (BOLTZMANN * t);
        return switch (row.quantity()) {
            case "two_zeta3" -> s.photonDensity() * Math.PI * Math.PI * x * x * x;
            case "pi4_over_15" -> RADIATION_DENSITY * Math.pow(PLANCK * SPEED_OF_LIGHT, 3)
                    / (8.0 * Math.PI * Math.pow(BOLTZMANN, 4));
            case "mean_photon_energy_over_kT" -> s.meanPhotonEnergy() / (BOLTZMANN * t);
            case "entropy_per_photon_over_k" -> 4.0 * s.Prad() / t / (s.photonDensity() * BOLTZMANN);
            case "n_photon_over_T3" -> s.photonDensity() / (t * t * t);
            case "radiation_density_constant" -> RADIATION_DENSITY;
            default -> throw TableChecks.unknownQuantity(row, ID, KNOWN);
        };
    }
}
