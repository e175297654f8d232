package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.eos.Samples.relative;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;

/**
 * Mean molecular weights of a fully ionized mixture: 1/μ = 2X + 3Y/4 + Z/2, 1/μ_e = X + Y/2 +
 * Z/2 = (1 + X)/2, 1/μ_i = X + Y/4 (+ Z/A_Z when metal ions count) — DESIGN §3; the textbook
 * forms, e.g. Kippenhahn, Weigert &amp; Weiss 2012, ch. 13 (from memory). Tolerance: a few
 * roundings of numbers of order one, 1e-15.
 */
class CompositionTest {

    private static final double TOLERANCE = 1e-15;

    @ParameterizedTest(name = "X={0}, Y={1}, Z={2}")
    @CsvSource({"0.70, 0.28, 0.02", "1, 0, 0", "0, 1, 0", "0.75, 0.25, 0", "0.35, 0.63, 0.02", "0.5, 0.3, 0.2",
        "0.1, 0.1, 0.8"})
    void closedForms(double x, double y, double z) {
        Composition c = Composition.of(x, y, z);
        relative(1.0 / (2 * x + 0.75 * y + 0.5 * z), c.mu(), TOLERANCE, "mu");
        relative(2.0 / (1.0 + x), c.muE(), TOLERANCE, "mu_e = 2/(1+X)");
        relative(1.0 / (x + 0.25 * y), c.muI(), TOLERANCE, "mu_i");
        relative(1.0 / c.mu(), 1.0 / c.muE() + 1.0 / c.muI(), TOLERANCE, "1/mu = 1/mu_e + 1/mu_i");
        relative((1.0 + x) / 2.0 / Constants.ATOMIC_MASS_UNIT, c.electronsPerGram(), TOLERANCE, "electrons per g");
        relative((x + y / 4) / Constants.ATOMIC_MASS_UNIT, c.ionsPerGram(), TOLERANCE, "ions per g");
        // ⟨Z²⟩ over H (charge 1) and He (charge 2) ions
        relative((x + 4 * y / 4) / (x + y / 4), c.meanSquareIonCharge(), TOLERANCE, "<Z^2>");
        assertFalse(c.fromMu());
    }

    @Test
    void textbookValues() {
        // solar-like X = 0.70, Z = 0.02: 1/μ = 1.62, μ = 0.6173 (common practice, no source)
        assertEquals(0.6172839506172839, Composition.of(0.70, 0.28, 0.02).mu(), 1e-16);
        // fully ionized hydrogen μ = 1/2; helium μ = 4/3 (closed forms)
        assertEquals(0.5, Composition.of(1, 0, 0).mu(), 0.0);
        assertEquals(4.0 / 3.0, Composition.of(0, 1, 0).mu(), 1e-16);
    }

    @Nested
    class AnyTwo {

        @Test
        void eachPairDerivesTheThird() {
            Composition full = Composition.of(0.70, 0.28, 0.02);
            for (Composition c : new Composition[] {Composition.fromAnyTwo(0.70, Double.NaN, 0.02),
                Composition.fromAnyTwo(Double.NaN, 0.28, 0.02), Composition.fromAnyTwo(0.70, 0.28, Double.NaN)}) {
                assertEquals(full.X(), c.X(), 1e-15);
                assertEquals(full.Y(), c.Y(), 1e-15);
                assertEquals(full.Z(), c.Z(), 1e-15);
                relative(full.mu(), c.mu(), TOLERANCE, "mu");
            }
        }

        @Test
        void allThreeAreChecked() {
            assertEquals(0.02, Composition.fromAnyTwo(0.7, 0.28, 0.02).Z());
            assertThrows(BadInputException.class, () -> Composition.fromAnyTwo(0.7, 0.28, 0.03));
        }

        @Test
        void fewerThanTwoOrTooMuch() {
            assertThrows(BadInputException.class, () -> Composition.fromAnyTwo(0.7, Double.NaN, Double.NaN));
            assertThrows(BadInputException.class, () -> Composition.fromAnyTwo(Double.NaN, Double.NaN, Double.NaN));
            // the two given add up to more than 1
            assertThrows(BadInputException.class, () -> Composition.fromAnyTwo(0.8, 0.3, Double.NaN));
            assertThrows(BadInputException.class, () -> Composition.fromAnyTwo(Double.NaN, 0.9, 0.2));
        }

        @Test
        void roundingOfTheSumIsTolerated() {
            // 0.7 + 0.3 in binary differs from 1 in the last bit; the derived Y is clamped at 0
            Composition c = Composition.fromAnyTwo(0.7, Double.NaN, 0.3);
            assertTrue(c.Y() >= 0.0 && c.Y() < 1e-15);
        }
    }

    @Nested
    class Refused {

        @ParameterizedTest(name = "X={0}, Y={1}, Z={2}")
        @CsvSource({"0.7, 0.2, 0.2", "0.7, 0.28, 0.01", "0.5, 0.5, 0.0000001", "-0.1, 1.1, 0", "1.2, -0.2, 0",
            "0.5, 0.6, -0.1", "NaN, 0.5, 0.5", "0.5, Infinity, 0"})
        void badMassFractions(double x, double y, double z) {
            assertThrows(BadInputException.class, () -> Composition.of(x, y, z));
        }

        @Test
        void sumWithinTheToleranceIsAccepted() {
            Composition.of(0.7, 0.28, 0.02 + 0.5e-9);
            assertThrows(BadInputException.class, () -> Composition.of(0.7, 0.28, 0.02 + 2e-9));
        }

        @Test
        void pureMetalsNeedTheirIons() {
            // with metal ions neglected pure metals would have no ions at all
            assertThrows(BadInputException.class, () -> Composition.of(0, 0, 1));
            // regression: they could not be built at all, the 3-fraction form failing first
            Composition c = Composition.of(0, 0, 1, 16);
            relative(1.0 / (0.5 + 1.0 / 16), c.mu(), TOLERANCE, "pure oxygen-like metals");
            assertEquals(c, Composition.fromAnyTwo(0, 0, Double.NaN, 16));
            assertEquals(c, Composition.fromAnyTwo(Double.NaN, 0, 1, 16));
            assertThrows(BadInputException.class, () -> Composition.of(0, 0, 1, 1.5));
        }
    }

    @Nested
    class FromMu {

        @ParameterizedTest
        @ValueSource(doubles = {0.5, 0.55, 0.6, 0.6173, 0.62, 1.0, 4.0 / 3.0, 1.4, 1.9, 1.999})
        void roundTrip(double mu) {
            Composition c = Composition.ofMu(mu);
            relative(mu, c.mu(), 1e-14, "mu");
            assertTrue(c.fromMu());
            assertEquals(1.0, c.X() + c.Y() + c.Z(), 1e-15);
            // the implied mixture: hydrogen-helium up to 4/3, helium-metals beyond
            if (mu <= 4.0 / 3.0) {
                assertEquals(0.0, c.Z());
            } else {
                assertEquals(0.0, c.X());
            }
        }

        @ParameterizedTest
        @ValueSource(doubles = {0.49, 2.0, 2.5, 0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY})
        void outsideTheRange(double mu) {
            assertThrows(BadInputException.class, () -> Composition.ofMu(mu));
        }

        @Test
        void metalIonsMayNotChangeAGivenMu() {
            // regression: --mu 1.5 --metal-mass-number 16 used to give mu = 1.4545 silently
            assertThrows(BadInputException.class, () -> Composition.ofMu(1.5).withMetalMassNumber(16));
            // without metals in the implied mixture the ions change nothing and are allowed
            Composition c = Composition.ofMu(0.62).withMetalMassNumber(16);
            relative(0.62, c.mu(), 1e-14, "mu kept");
        }
    }

    @Nested
    class MetalIons {

        @ParameterizedTest(name = "A_Z={0}")
        @ValueSource(doubles = {2, 12, 16, 56})
        void counted(double massNumber) {
            double x = 0.70;
            double y = 0.28;
            double z = 0.02;
            Composition c = Composition.of(x, y, z).withMetalMassNumber(massNumber);
            relative(1.0 / (x + y / 4 + z / massNumber), c.muI(), TOLERANCE, "mu_i with metals");
            relative(1.0 / (2 * x + 0.75 * y + 0.5 * z + z / massNumber), c.mu(), TOLERANCE, "mu with metals");
            relative(2.0 / (1.0 + x), c.muE(), TOLERANCE, "mu_e unchanged");
            // metal ions fully ionized with charge A/2
            double nZ = z / massNumber;
            relative((x + y + nZ * massNumber * massNumber / 4) / (x + y / 4 + nZ), c.meanSquareIonCharge(),
                    TOLERANCE, "<Z^2> with metals");
            assertEquals(massNumber, c.metalMassNumber());
            // and back
            assertEquals(Composition.of(x, y, z), c.withMetalMassNumber(0));
        }

        @ParameterizedTest
        @ValueSource(doubles = {1.0, 1.99, -16, Double.NaN, Double.POSITIVE_INFINITY})
        void refused(double massNumber) {
            assertThrows(BadInputException.class, () -> Composition.of(0.7, 0.28, 0.02).withMetalMassNumber(massNumber));
        }
    }
}
