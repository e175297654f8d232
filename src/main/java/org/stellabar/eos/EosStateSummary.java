package org.stellabar.eos;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;

/**
 * Presents an {@link EosState} as a {@link Summary} with the field names of the command-line
 * contract (DESIGN §4), units and one-line meanings, for any writer.
 */
public final class EosStateSummary {

    private EosStateSummary() {
    }

    /**
     * @param state the state
     * @param inputs how the state was asked for, for the metadata
     * @return the summary
     */
    public static Summary of(EosState state, Map<String, String> inputs) {
        Metadata metadata = Metadata.of("gas + radiation equation of state at one point", inputs, List.of(
                "fully ionized classical ideal gas of ions and electrons plus black-body radiation",
                "no degeneracy, pair, Coulomb or partial-ionization corrections; see the warnings"));
        Summary.Builder b = new Summary.Builder("eos", metadata)
                .number("rho", state.rho(), "g/cm3", "density")
                .number("T", state.T(), "K", "temperature")
                .number("P", state.P(), "dyn/cm2", "total pressure P_gas + P_rad")
                .number("P_gas", state.Pgas(), "dyn/cm2", "ion + electron pressure")
                .number("P_rad", state.Prad(), "dyn/cm2", "radiation pressure aT^4/3")
                .number("beta", state.beta(), "", "gas pressure fraction P_gas/P")
                .number("one_minus_beta", state.oneMinusBeta(), "", "radiation pressure fraction P_rad/P")
                .number("u", state.u(), "erg/g", "specific internal energy")
                .number("s", state.s(), "erg/g/K", "specific entropy (Sackur-Tetrode + radiation)")
                .number("s_per_baryon", state.sPerBaryon(), "k_B", "entropy per baryon")
                .number("f", state.f(), "erg/g", "specific Helmholtz free energy u - Ts")
                .number("g", state.g(), "erg/g", "specific Gibbs free energy f + P/rho")
                .number("chi_rho", state.chiRho(), "", "(dlnP/dlnrho)_T")
                .number("chi_T", state.chiT(), "", "(dlnP/dlnT)_rho")
                .number("delta", state.delta(), "", "-(dlnrho/dlnT)_P = chi_T/chi_rho")
                .number("c_V", state.cV(), "erg/g/K", "specific heat at constant volume")
                .number("c_P", state.cP(), "erg/g/K", "specific heat at constant pressure")
                .number("Gamma1", state.Gamma1(), "", "(dlnP/dlnrho)_s")
                .number("Gamma2", state.Gamma2(), "", "adiabatic exponent with Gamma2/(Gamma2-1) = (dlnP/dlnT)_s")
                .number("Gamma3", state.Gamma3(), "", "adiabatic exponent with Gamma3 - 1 = (dlnT/dlnrho)_s")
                .number("nabla_ad", state.nablaAd(), "", "(dlnT/dlnP)_s")
                .number("sound_speed", state.soundSpeed(), "cm/s", "adiabatic sound speed sqrt(Gamma1 P/rho)")
                .number("n_photon", state.photonDensity(), "1/cm3", "black-body photon number density")
                .number("mean_photon_energy", state.meanPhotonEnergy(), "erg", "mean photon energy (2.701 kT)")
                .number("photons_per_baryon", state.photonsPerBaryon(), "", "n_photon m_u/rho")
                .nested("composition", composition(state.composition(), metadata), "the mixture")
                .summaries("warnings", warnings(state.warnings(), metadata), "where the idealized physics is doubtful");
        return b.build();
    }

    /**
     * @param c a composition
     * @param metadata metadata to attach
     * @return its summary with fields X, Y, Z, mu, mu_e, mu_i
     */
    public static Summary composition(Composition c, Metadata metadata) {
        Summary.Builder b = new Summary.Builder("composition", metadata)
                .number("X", c.X(), "", c.fromMu() ? "hydrogen mass fraction (implied by mu)" : "hydrogen mass fraction")
                .number("Y", c.Y(), "", c.fromMu() ? "helium mass fraction (implied by mu)" : "helium mass fraction")
                .number("Z", c.Z(), "", c.fromMu() ? "metal mass fraction (implied by mu)" : "metal mass fraction")
                .number("mu", c.mu(), "", "mean molecular weight per particle")
                .number("mu_e", c.muE(), "", "mean molecular weight per electron")
                .number("mu_i", c.muI(), "", "mean molecular weight per ion");
        if (c.metalMassNumber() > 0) {
            b.number("A_Z", c.metalMassNumber(), "", "mass number of the metal ions");
        }
        return b.build();
    }

    /**
     * @param warnings validity warnings
     * @param metadata metadata to attach
     * @return one summary {code, message} per warning
     */
    public static List<Summary> warnings(List<ValidityWarning> warnings, Metadata metadata) {
        List<Summary> list = new ArrayList<>();
        for (ValidityWarning w : warnings) {
            list.add(new Summary.Builder("warning", metadata)
                    .text("code", w.code().code(), "stable warning code")
                    .text("message", w.message(), "what is doubtful and why").build());
        }
        return list;
    }
}
