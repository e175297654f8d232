package org.stellabar.eos.fermi;

import java.util.List;
import org.stellabar.eos.EosStateSummary;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Summary;

/**
 * Presents a {@link FermiGasRadiationEos.FermiState} as a {@link Summary}: every field of the
 * classical summary, then η, n₋, n₊, P_e and P_ion, with the energy convention in the metadata.
 */
public final class FermiEosSummary {

    /** η = (μ₋ − m_e c²)/kT. */
    public static final Quantity ETA = Quantity.dimensionless("eta",
            "electron degeneracy parameter (chemical potential without rest mass)/kT");
    /** n₋. */
    public static final Quantity N_ELECTRON = new Quantity("n_electron", "1/cm3", "electron number density");
    /** n₊. */
    public static final Quantity N_POSITRON = new Quantity("n_positron", "1/cm3", "positron number density");
    /** P of electrons and positrons. */
    public static final Quantity P_E = new Quantity("P_e", "dyn/cm2", "electron + positron pressure");
    /** P of the ions. */
    public static final Quantity P_ION = new Quantity("P_ion", "dyn/cm2", "ion pressure");

    /** The words every output of this equation of state carries about what u counts. */
    public static final String ENERGY_CONVENTION = "u counts the kinetic energy of electrons and positrons and the"
            + " rest-mass energy of the pairs (2 m_e c^2 n_positron / rho), not the rest mass of the net electrons";

    private FermiEosSummary() {
    }

    /**
     * @param state the state
     * @param inputs how it was asked for
     * @return the summary
     */
    public static Summary of(FermiGasRadiationEos.FermiState state, Inputs inputs) {
        Metadata metadata = Metadata.of("ions + electron-positron gas of any degeneracy + radiation at one point",
                inputs, List.of(
                        "equation of state: fermi (electrons of any degeneracy and relativity with e+e- pairs,"
                                + " Fermi-Dirac integrals; classical ions; black-body radiation)",
                        "energy convention: " + ENERGY_CONVENTION,
                        "no Coulomb or partial-ionization corrections; see the warnings"));
        return EosStateSummary.of(state.common(), metadata, b -> b
                .number(ETA, state.eta())
                .number(N_ELECTRON, state.nElectron())
                .number(N_POSITRON, state.nPositron())
                .number(P_E, state.pElectrons())
                .number(P_ION, state.pIon()));
    }
}
