package org.stellabar.eos;

/**
 * An independent implementation of the gas + radiation equation of state for tests, written
 * from the formulas of DESIGN §3 and the textbooks in a different form from the code: particle
 * densities species by species instead of μ, the Sackur–Tetrode entropy per species with its
 * thermal wavelength, Chandrasekhar's general-γ forms of the exponents with γ = 5/3, and the
 * classical c_P − c_V = Pχ_T²/(ρTχ_ρ). Constants are typed in from CODATA 2018 (Tiesinga et al.
 * 2021, Rev. Mod. Phys. 93, 025010) rather than read from {@code Constants}; a and ζ(3) are
 * computed here.
 */
final class ReferenceMixture {

    // CODATA 2018, CGS
    static final double K = 1.380649e-16;
    static final double H = 6.62607015e-27;
    static final double C = 2.99792458e10;
    static final double M_U = 1.66053906660e-24;
    static final double M_E = 9.1093837015e-28;
    static final double HBAR = H / (2.0 * Math.PI);
    /** a = π²k⁴/(15ħ³c³), the black-body energy density constant. */
    static final double A_RAD = Math.PI * Math.PI * Math.pow(K, 4) / (15.0 * Math.pow(HBAR * C, 3));
    /** ζ(3) by its series with the Euler–Maclaurin tail. */
    static final double ZETA_3 = zeta3();
    /** γ of the classical monatomic gas. */
    private static final double GAMMA = 5.0 / 3.0;

    private final double x;
    private final double y;
    private final double z;
    private final double metalMassNumber;

    /**
     * @param x hydrogen mass fraction
     * @param y helium mass fraction
     * @param z metal mass fraction
     * @param metalMassNumber A of the metal ions, 0 to leave the ions out (their electrons count)
     */
    ReferenceMixture(double x, double y, double z, double metalMassNumber) {
        this.x = x;
        this.y = y;
        this.z = z;
        this.metalMassNumber = metalMassNumber;
    }

    static ReferenceMixture of(Composition c) {
        return new ReferenceMixture(c.X(), c.Y(), c.Z(), c.metalMassNumber());
    }

    /** The state quantities, all CGS. */
    record Point(double P, double Pgas, double Prad, double beta, double oneMinusBeta, double u, double s,
            double sGas, double gGas, double f, double g, double chiRho, double chiT, double delta, double cV,
            double cP, double Gamma1, double Gamma2, double Gamma3, double nablaAd, double soundSpeed,
            double photonDensity, double meanPhotonEnergy, double photonsPerBaryon, double sPerBaryon,
            double particlesPerGramTimesK) {
    }

    Point at(double rho, double t) {
        double kT = K * t;
        // number densities [1/cm3]: electrons (metals give Z/2 per nucleon), protons, alphas, metal ions
        double nE = rho * (x + y / 2.0 + z / 2.0) / M_U;
        double nH = rho * x / M_U;
        double nHe = rho * y / (4.0 * M_U);
        double nZ = metalMassNumber > 0 ? rho * z / (metalMassNumber * M_U) : 0.0;
        double nTotal = nE + nH + nHe + nZ;
        double pGas = nTotal * kT;
        double pRad = A_RAD * t * t * t * t / 3.0;
        double p = pGas + pRad;
        double oneMinusBeta = 1.0 / (1.0 + pGas / pRad);
        double beta = 1.0 / (1.0 + pRad / pGas);

        double u = 1.5 * nTotal * kT / rho + A_RAD * Math.pow(t, 4) / rho;
        // Sackur–Tetrode per species: s_j = (n_j k/ρ)[5/2 + ln(g_j/(n_j λ_j³))], λ_j = h/√(2π m_j kT);
        // the chemical potential of each is kT ln(n_j λ_j³/g_j)
        double sGas = 0.0;
        double gGas = 0.0;
        double[][] species = {{nE, 2.0, M_E}, {nH, 1.0, M_U}, {nHe, 1.0, 4.0 * M_U},
            {nZ, 1.0, metalMassNumber * M_U}};
        for (double[] sp : species) {
            double n = sp[0];
            if (n > 0) {
                double lambda = H / Math.sqrt(2.0 * Math.PI * sp[2] * kT);
                double lnOccupation = Math.log(n * lambda * lambda * lambda / sp[1]);
                sGas += n * K / rho * (2.5 - lnOccupation);
                gGas += n / rho * kT * lnOccupation;
            }
        }
        double sRad = 4.0 * A_RAD * t * t * t / (3.0 * rho);
        double s = sGas + sRad;
        double gasR = nTotal * K / rho;
        double cV = gasR * (1.5 + 12.0 * oneMinusBeta / beta);
        double cP = gasR * (1.5 + 12.0 * oneMinusBeta / beta + (4.0 - 3.0 * beta) * (4.0 - 3.0 * beta) / (beta * beta));
        // Chandrasekhar 1939, ch. II: exponents of a gas of ratio γ mixed with radiation
        double g1 = GAMMA - 1.0;
        double denominator = beta + 12.0 * g1 * oneMinusBeta;
        double gamma3 = 1.0 + (4.0 - 3.0 * beta) * g1 / denominator;
        double gamma1 = beta + (4.0 - 3.0 * beta) * (4.0 - 3.0 * beta) * g1 / denominator;
        double gamma2 = 1.0 + (4.0 - 3.0 * beta) * g1 / (beta * beta + 3.0 * g1 * oneMinusBeta * (4.0 + beta));
        double nablaAd = (gamma2 - 1.0) / gamma2;
        double photonDensity = 2.0 * ZETA_3 / (Math.PI * Math.PI) * Math.pow(kT / (HBAR * C), 3);
        double meanPhotonEnergy = Math.pow(Math.PI, 4) / (30.0 * ZETA_3) * kT;
        double f = u - t * s;
        return new Point(p, pGas, pRad, beta, oneMinusBeta, u, s, sGas, gGas, f, f + p / rho, beta, 4.0 - 3.0 * beta,
                (4.0 - 3.0 * beta) / beta, cV, cP, gamma1, gamma2, gamma3, nablaAd, Math.sqrt(gamma1 * p / rho),
                photonDensity, meanPhotonEnergy, photonDensity / (rho / M_U), s * M_U / K, gasR);
    }

    private static double zeta3() {
        int n = 10_000;
        double sum = 0.0;
        for (int i = n; i >= 1; i--) {
            double v = i;
            sum += 1.0 / (v * v * v);
        }
        double nn = n;
        return sum + 1.0 / (2 * nn * nn) - 1.0 / (2 * nn * nn * nn) + 1.0 / (4 * nn * nn * nn * nn);
    }
}
