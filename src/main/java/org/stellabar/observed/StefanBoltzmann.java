package org.stellabar.observed;

import static org.stellabar.physics.Constants.STEFAN_BOLTZMANN;

/**
 * The black-body relation L = 4πR²σT_eff⁴ between luminosity, radius and effective temperature
 * (the definition of T_eff; Kippenhahn, Weigert &amp; Weiss 2012, eq. 6.48), solved for each of
 * the three. σ is the CODATA 2018 value built in {@link org.stellabar.physics.Constants}. CGS.
 */
public final class StefanBoltzmann {

    private StefanBoltzmann() {
    }

    /**
     * @param luminosity L [erg/s]
     * @param temperature T_eff [K]
     * @return R = √(L/(4πσ)) / T_eff² [cm]
     */
    public static double radius(double luminosity, double temperature) {
        return Math.sqrt(luminosity / (4.0 * Math.PI * STEFAN_BOLTZMANN)) / (temperature * temperature);
    }

    /**
     * @param luminosity L [erg/s]
     * @param radius R [cm]
     * @return T_eff = (L/(4πσR²))^(1/4) [K]
     */
    public static double temperature(double luminosity, double radius) {
        return Math.sqrt(Math.sqrt(luminosity / (4.0 * Math.PI * STEFAN_BOLTZMANN))) / Math.sqrt(radius);
    }

    /**
     * @param radius R [cm]
     * @param temperature T_eff [K]
     * @return L = 4πR²σT_eff⁴ [erg/s]
     */
    public static double luminosity(double radius, double temperature) {
        double t2 = temperature * temperature;
        return 4.0 * Math.PI * radius * radius * STEFAN_BOLTZMANN * t2 * t2;
    }
}
