package org.stellabar.physics;

/**
 * Physical and astronomical constants in CGS units.
 *
 * <p>Sources: CODATA 2018 recommended values (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010;
 * values also at physics.nist.gov/constants), where the 2019 SI made k, h, c and e exact; and the
 * IAU 2015 Resolution B3 on nominal solar and planetary conversion constants (Prša et al. 2016,
 * AJ 152, 41). Derived constants are computed here from those, never typed in.
 */
public final class Constants {

    /** The release this build's constants come from, written into every output's metadata. */
    public static final String RELEASE = "CODATA 2018; IAU 2015 Resolution B3";

    /** Boltzmann constant k [erg/K]; CODATA 2018, exact (1.380649e-23 J/K). */
    public static final double BOLTZMANN = 1.380649e-16;
    /** Planck constant h [erg s]; CODATA 2018, exact (6.62607015e-34 J s). */
    public static final double PLANCK = 6.62607015e-27;
    /** Reduced Planck constant ħ = h/2π [erg s]. */
    public static final double HBAR = PLANCK / (2.0 * Math.PI);
    /** Speed of light in vacuum c [cm/s]; CODATA 2018, exact. */
    public static final double SPEED_OF_LIGHT = 2.99792458e10;
    /** Newtonian constant of gravitation G [cm^3 g^-1 s^-2]; CODATA 2018 (6.67430(15)e-11 SI). */
    public static final double GRAVITATION = 6.67430e-8;
    /** Atomic mass constant m_u [g]; CODATA 2018 (1.66053906660(50)e-27 kg). */
    public static final double ATOMIC_MASS_UNIT = 1.66053906660e-24;
    /** Electron mass m_e [g]; CODATA 2018 (9.1093837015(28)e-31 kg). */
    public static final double ELECTRON_MASS = 9.1093837015e-28;
    /** Proton mass m_p [g]; CODATA 2018 (1.67262192369(51)e-27 kg). */
    public static final double PROTON_MASS = 1.67262192369e-24;
    /** Elementary charge e in Gaussian units [statC]; CODATA 2018 e = 1.602176634e-19 C exact, times 10c/1 C. */
    public static final double ELEMENTARY_CHARGE = 1.602176634e-19 * SPEED_OF_LIGHT / 10.0;
    /** Elementary charge in SI [C] (exact), used to define the electronvolt. */
    public static final double ELEMENTARY_CHARGE_SI = 1.602176634e-19;
    /** One electronvolt [erg]. */
    public static final double ELECTRONVOLT = ELEMENTARY_CHARGE_SI * 1e7;
    /**
     * Stefan–Boltzmann constant σ [erg cm^-2 s^-1 K^-4]; CODATA 2018 gives 5.670374419...e-8 W m^-2
     * K^-4, exact in the 2019 SI because it is a function of k, h and c. We compute it from those:
     * σ = 2π^5 k^4 / (15 h^3 c^2).
     */
    public static final double STEFAN_BOLTZMANN = 2.0 * Math.pow(Math.PI, 5) * Math.pow(BOLTZMANN, 4)
            / (15.0 * PLANCK * PLANCK * PLANCK * SPEED_OF_LIGHT * SPEED_OF_LIGHT);
    /** Radiation density constant a = 4σ/c [erg cm^-3 K^-4] (≈ 7.5657e-15). */
    public static final double RADIATION_DENSITY = 4.0 * STEFAN_BOLTZMANN / SPEED_OF_LIGHT;
    /** Riemann ζ(3) (Apéry's constant), mathematical; needed for photon number densities. */
    public static final double ZETA_3 = 1.2020569031595942;

    /** Nominal solar radius R☉ [cm]; IAU 2015 B3: 6.957e8 m. */
    public static final double SOLAR_RADIUS = 6.957e10;
    /** Nominal solar mass parameter GM☉ [cm^3 s^-2]; IAU 2015 B3: 1.3271244e20 m^3 s^-2. */
    public static final double SOLAR_MASS_PARAMETER = 1.3271244e26;
    /** Nominal solar luminosity L☉ [erg/s]; IAU 2015 B3: 3.828e26 W. */
    public static final double SOLAR_LUMINOSITY = 3.828e33;
    /** Solar mass M☉ = GM☉/G [g]; IAU 2015 B3 recommends this derivation (≈ 1.98841e33 g). */
    public static final double SOLAR_MASS = SOLAR_MASS_PARAMETER / GRAVITATION;
    /** Astronomical unit [cm]; IAU 2012 Resolution B2, exact 149 597 870 700 m. */
    public static final double ASTRONOMICAL_UNIT = 1.495978707e13;
    /** Julian year [s]; IAU, 365.25 d of 86 400 s. */
    public static final double JULIAN_YEAR = 365.25 * 86400.0;

    private Constants() {
    }
}
