package org.stellabar.eos;

import org.stellabar.table.Quantity;

/**
 * The quantities of the equation of state as columns and summary fields: each name (the JSON
 * name of DESIGN §4), unit and meaning written once here and used by the one-state summary
 * ({@link EosStateSummary}), the ρ–T and P–T grids, and the star profiles. Units are CGS in the
 * table spelling ("g/cm3", "dyn/cm2", ...).
 */
public final class EosQuantities {

    /** {@code rho}: density [g/cm3]. */
    public static final Quantity RHO = new Quantity("rho", "g/cm3", "density");
    /** {@code T}: temperature [K]. */
    public static final Quantity T = new Quantity("T", "K", "temperature");
    /** {@code P}: total pressure P_gas + P_rad [dyn/cm2]. */
    public static final Quantity P = new Quantity("P", "dyn/cm2", "total pressure P_gas + P_rad");
    /** {@code P_gas}: ion + electron pressure [dyn/cm2]. */
    public static final Quantity P_GAS = new Quantity("P_gas", "dyn/cm2", "ion + electron pressure");
    /** {@code P_rad}: radiation pressure aT^4/3 [dyn/cm2]. */
    public static final Quantity P_RAD = new Quantity("P_rad", "dyn/cm2", "radiation pressure aT^4/3");
    /** {@code beta}: gas pressure fraction P_gas/P, dimensionless. */
    public static final Quantity BETA = Quantity.dimensionless("beta", "gas pressure fraction P_gas/P");
    /** {@code one_minus_beta}: radiation pressure fraction P_rad/P, dimensionless. */
    public static final Quantity ONE_MINUS_BETA =
            Quantity.dimensionless("one_minus_beta", "radiation pressure fraction P_rad/P");
    /** {@code u}: specific internal energy [erg/g]. */
    public static final Quantity U = new Quantity("u", "erg/g", "specific internal energy");
    /** {@code s}: specific entropy (Sackur-Tetrode + radiation) [erg/g/K]. */
    public static final Quantity S = new Quantity("s", "erg/g/K", "specific entropy (Sackur-Tetrode + radiation)");
    /** {@code s_per_baryon}: entropy per baryon s m_u/k_B, dimensionless. */
    public static final Quantity S_PER_BARYON = Quantity.dimensionless("s_per_baryon",
            "entropy per baryon s m_u/k_B, in units of Boltzmann's constant");
    /** {@code f}: specific Helmholtz free energy u - Ts [erg/g]. */
    public static final Quantity F = new Quantity("f", "erg/g", "specific Helmholtz free energy u - Ts");
    /** {@code g}: specific Gibbs free energy f + P/rho [erg/g]. */
    public static final Quantity G = new Quantity("g", "erg/g", "specific Gibbs free energy f + P/rho");
    /** {@code chi_rho}: (dlnP/dlnrho)_T, dimensionless. */
    public static final Quantity CHI_RHO = Quantity.dimensionless("chi_rho", "(dlnP/dlnrho)_T");
    /** {@code chi_T}: (dlnP/dlnT)_rho, dimensionless. */
    public static final Quantity CHI_T = Quantity.dimensionless("chi_T", "(dlnP/dlnT)_rho");
    /** {@code delta}: -(dlnrho/dlnT)_P = chi_T/chi_rho, dimensionless. */
    public static final Quantity DELTA = Quantity.dimensionless("delta", "-(dlnrho/dlnT)_P = chi_T/chi_rho");
    /** {@code c_V}: specific heat at constant volume [erg/g/K]. */
    public static final Quantity C_V = new Quantity("c_V", "erg/g/K", "specific heat at constant volume");
    /** {@code c_P}: specific heat at constant pressure [erg/g/K]. */
    public static final Quantity C_P = new Quantity("c_P", "erg/g/K", "specific heat at constant pressure");
    /** {@code Gamma1}: (dlnP/dlnrho)_s, dimensionless. */
    public static final Quantity GAMMA1 = Quantity.dimensionless("Gamma1", "(dlnP/dlnrho)_s");
    /** {@code Gamma2}: adiabatic exponent with Gamma2/(Gamma2-1) = (dlnP/dlnT)_s, dimensionless. */
    public static final Quantity GAMMA2 =
            Quantity.dimensionless("Gamma2", "adiabatic exponent with Gamma2/(Gamma2-1) = (dlnP/dlnT)_s");
    /** {@code Gamma3}: adiabatic exponent with Gamma3 - 1 = (dlnT/dlnrho)_s, dimensionless. */
    public static final Quantity GAMMA3 =
            Quantity.dimensionless("Gamma3", "adiabatic exponent with Gamma3 - 1 = (dlnT/dlnrho)_s");
    /** {@code nabla_ad}: (dlnT/dlnP)_s, dimensionless. */
    public static final Quantity NABLA_AD = Quantity.dimensionless("nabla_ad", "(dlnT/dlnP)_s");
    /** {@code sound_speed}: adiabatic sound speed sqrt(Gamma1 P/rho) [cm/s]. */
    public static final Quantity SOUND_SPEED =
            new Quantity("sound_speed", "cm/s", "adiabatic sound speed sqrt(Gamma1 P/rho)");
    /** {@code n_photon}: black-body photon number density [1/cm3]. */
    public static final Quantity N_PHOTON = new Quantity("n_photon", "1/cm3", "black-body photon number density");
    /** {@code mean_photon_energy}: mean photon energy (2.701 kT) [erg]. */
    public static final Quantity MEAN_PHOTON_ENERGY =
            new Quantity("mean_photon_energy", "erg", "mean photon energy (2.701 kT)");
    /** {@code photons_per_baryon}: n_photon m_u/rho, dimensionless. */
    public static final Quantity PHOTONS_PER_BARYON = Quantity.dimensionless("photons_per_baryon", "n_photon m_u/rho");
    /** Bits of {@link ValidityCheck#maskLegend()}; an integer column, so every table format holds it exactly. */
    public static final Quantity WARNING_MASK =
            Quantity.integer("warning_mask", "validity warnings as bits: " + ValidityCheck.maskLegend());

    /** {@code X}: hydrogen mass fraction, dimensionless. */
    public static final Quantity X = Quantity.dimensionless("X", "hydrogen mass fraction");
    /** {@code Y}: helium mass fraction, dimensionless. */
    public static final Quantity Y = Quantity.dimensionless("Y", "helium mass fraction");
    /** {@code Z}: metal mass fraction, dimensionless. */
    public static final Quantity Z = Quantity.dimensionless("Z", "metal mass fraction");
    /** {@code mu}: mean molecular weight per particle, dimensionless. */
    public static final Quantity MU = Quantity.dimensionless("mu", "mean molecular weight per particle");
    /** {@code mu_e}: mean molecular weight per electron, dimensionless. */
    public static final Quantity MU_E = Quantity.dimensionless("mu_e", "mean molecular weight per electron");
    /** {@code mu_i}: mean molecular weight per ion, dimensionless. */
    public static final Quantity MU_I = Quantity.dimensionless("mu_i", "mean molecular weight per ion");
    /** {@code A_Z}: mass number of the metal ions, dimensionless. */
    public static final Quantity A_Z = Quantity.dimensionless("A_Z", "mass number of the metal ions");

    private EosQuantities() {
    }
}
