package org.stellabar.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The constants against their published values. CODATA 2018 = Tiesinga et al. 2021, Rev. Mod.
 * Phys. 93, 025010 (also physics.nist.gov/constants); IAU 2015 B3 = IAU 2015 Resolution B3
 * (Prša et al. 2016, AJ 152, 41). SI values are converted to CGS here by powers of ten only.
 */
class ConstantsTest {

    /**
     * name, value in the code, published value (CGS), relative tolerance. Exact constants of the
     * 2019 SI must match to rounding (2 ulp ~ 4e-16). Measured CODATA values are published with
     * 10 to 12 significant digits and the code must carry all of them: tolerance half a unit of
     * the last published digit. Derived values quoted to fewer digits get half a unit of theirs.
     */
    static Stream<Arguments> publishedValues() {
        return Stream.of(
                // CODATA 2018: k = 1.380649e-23 J/K, exact
                Arguments.of("k", Constants.BOLTZMANN, 1.380649e-16, 4e-16),
                // CODATA 2018: h = 6.62607015e-34 J s, exact
                Arguments.of("h", Constants.PLANCK, 6.62607015e-27, 4e-16),
                // CODATA 2018: hbar = 1.054571817...e-34 J s (exact, truncated to 10 digits)
                Arguments.of("hbar", Constants.HBAR, 1.054571817e-27, 1e-9),
                // CODATA 2018: c = 299 792 458 m/s, exact
                Arguments.of("c", Constants.SPEED_OF_LIGHT, 2.99792458e10, 4e-16),
                // CODATA 2018: G = 6.67430(15)e-11 m^3 kg^-1 s^-2
                Arguments.of("G", Constants.GRAVITATION, 6.67430e-8, 1e-6),
                // CODATA 2018: m_u = 1.66053906660(50)e-27 kg
                Arguments.of("m_u", Constants.ATOMIC_MASS_UNIT, 1.66053906660e-24, 4e-12),
                // CODATA 2018: m_e = 9.1093837015(28)e-31 kg
                Arguments.of("m_e", Constants.ELECTRON_MASS, 9.1093837015e-28, 6e-12),
                // CODATA 2018: m_p = 1.67262192369(51)e-27 kg
                Arguments.of("m_p", Constants.PROTON_MASS, 1.67262192369e-24, 4e-12),
                // CODATA 2018: e = 1.602176634e-19 C, exact; in Gaussian units e = 4.803204713e-10
                // statC (1 C = 2.99792458e9 statC; the statC value from memory, 10 digits)
                Arguments.of("e", Constants.ELEMENTARY_CHARGE, 4.803204713e-10, 1e-9),
                // CODATA 2018: sigma = 5.670374419...e-8 W m^-2 K^-4 (exact, truncated)
                Arguments.of("sigma", Constants.STEFAN_BOLTZMANN, 5.670374419e-5, 1e-9),
                // radiation density constant a = 4 sigma/c = 7.5657e-15 erg cm^-3 K^-4 (five digits
                // as usually quoted, e.g. Kippenhahn, Weigert & Weiss 2012, from memory)
                Arguments.of("a", Constants.RADIATION_DENSITY, 7.5657e-15, 1e-5),
                // IAU 2015 B3: nominal R_sun = 6.957e8 m, exact by definition
                Arguments.of("R_sun", Constants.SOLAR_RADIUS, 6.957e10, 4e-16),
                // IAU 2015 B3: nominal (GM)_sun = 1.3271244e20 m^3 s^-2, exact by definition
                Arguments.of("GM_sun", Constants.SOLAR_MASS_PARAMETER, 1.3271244e26, 4e-16),
                // IAU 2015 B3: nominal L_sun = 3.828e26 W, exact by definition
                Arguments.of("L_sun", Constants.SOLAR_LUMINOSITY, 3.828e33, 4e-16),
                // M_sun = (GM)_sun / G: IAU 2015 B3 nominal GM over CODATA 2018 G gives
                // 1.98841e30 kg (six digits; the uncertainty of G limits it to about 2e-5)
                Arguments.of("M_sun", Constants.SOLAR_MASS, 1.98841e33, 3e-6),
                // IAU 2012 Resolution B2: 1 au = 149 597 870 700 m, exact
                Arguments.of("au", Constants.ASTRONOMICAL_UNIT, 1.495978707e13, 4e-16),
                // Julian year = 365.25 d of 86400 s (IAU), 31 557 600 s
                Arguments.of("yr", Constants.JULIAN_YEAR, 3.15576e7, 4e-16),
                // zeta(3) = 1.2020569031595942853... (Apery's constant; OEIS A002117, from memory)
                Arguments.of("zeta(3)", Constants.ZETA_3, 1.2020569031595942853, 2e-16));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("publishedValues")
    void matchesPublishedValue(String name, double actual, double published, double relativeTolerance) {
        assertEquals(published, actual, relativeTolerance * Math.abs(published), name);
    }

    @Test
    void derivedConstantsFollowFromTheDefiningOnes() {
        double pi = Math.PI;
        // hbar = h / 2 pi, to rounding
        assertEquals(Constants.PLANCK / (2 * pi), Constants.HBAR, 4e-16 * Constants.HBAR);
        // a = pi^2 k^4 / (15 hbar^3 c^3): the Planck-spectrum form, written differently from the code
        double k = Constants.BOLTZMANN;
        double hbarC = Constants.HBAR * Constants.SPEED_OF_LIGHT;
        double a = pi * pi * k * k * k * k / (15.0 * hbarC * hbarC * hbarC);
        assertEquals(a, Constants.RADIATION_DENSITY, 1e-14 * a);
        assertEquals(4.0 * Constants.STEFAN_BOLTZMANN / Constants.SPEED_OF_LIGHT, Constants.RADIATION_DENSITY,
                4e-16 * a);
        // CODATA 2018 quotes a = 7.565 733 250...e-16 J m^-3 K^-4 (from memory; the exact value
        // follows from k, h, c): ten digits
        assertEquals(7.565733250e-15, Constants.RADIATION_DENSITY, 1e-9 * a);
        // one eV = e x 1 V = 1.602176634e-12 erg, exact in the 2019 SI
        assertEquals(1.602176634e-12, Constants.ELECTRONVOLT, 4e-16 * 1.602176634e-12);
        // e^2 in Gaussian units equals e_SI^2 c^2 / 1e2 (1 C = c/10 statC with c in cm/s)
        double eSi = Constants.ELEMENTARY_CHARGE_SI;
        assertEquals(eSi * eSi * 2.99792458e10 * 2.99792458e10 / 100.0,
                Constants.ELEMENTARY_CHARGE * Constants.ELEMENTARY_CHARGE,
                1e-15 * Constants.ELEMENTARY_CHARGE * Constants.ELEMENTARY_CHARGE);
    }

    @Test
    void zetaThreeMatchesItsSeries() {
        // zeta(3) = sum 1/n^3; the tail beyond N is 1/(2N^2) - 1/(2N^3) + 1/(4N^4) + O(N^-6)
        // (Euler-Maclaurin), so N = 1e4 leaves an error of order 1e-25
        int n = 10_000;
        double sum = 0.0;
        for (int i = n; i >= 1; i--) {
            double x = i;
            sum += 1.0 / (x * x * x);
        }
        double nn = n;
        sum += 1.0 / (2 * nn * nn) - 1.0 / (2 * nn * nn * nn) + 1.0 / (4 * nn * nn * nn * nn);
        assertEquals(sum, Constants.ZETA_3, 1e-15);
    }

    @Test
    void releaseNamesBothSources() {
        assertTrue(Constants.RELEASE.contains("CODATA 2018"));
        assertTrue(Constants.RELEASE.contains("IAU 2015"));
    }
}
