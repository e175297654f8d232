package org.stellabar.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class UnitsTest {

    /**
     * Every accepted unit with its CGS factor worked out here from the unit's definition, not
     * read from {@link Dimension}. A unit added to the code without a row here fails
     * {@link #everyAcceptedUnitHasAnIndependentFactor}.
     */
    private static final Map<Dimension, Map<String, Double>> FACTORS = Map.of(
            Dimension.TEMPERATURE, Map.of("K", 1.0, "MK", 1e6),
            // 1 kg/m3 = 1000 g / 1e6 cm3
            Dimension.DENSITY, Map.of("g/cm3", 1.0, "g/cm^3", 1.0, "g cm-3", 1.0,
                    "kg/m3", 1000.0 / 1e6, "kg/m^3", 1000.0 / 1e6, "kg m-3", 1000.0 / 1e6),
            // 1 Pa = 1 N/m2 = 1 J/m3 = 1e5 dyn / 1e4 cm2; 1 bar = 1e5 Pa (definition); 1 erg/cm3 = 1 dyn/cm2;
            // the barye (Ba) is the CGS unit of pressure, 1 dyn/cm2 (common practice)
            Dimension.PRESSURE, Map.of("dyn/cm2", 1.0, "dyn/cm^2", 1.0, "dyn cm-2", 1.0, "erg/cm3", 1.0, "erg cm-3", 1.0,
                    "Ba", 1.0, "Pa", 1e5 / 1e4, "N m-2", 1e5 / 1e4, "J m-3", 1e7 / 1e6, "bar", 1e5 * 1e5 / 1e4),
            // IAU 2015 B3 nominal solar radius 6.957e8 m; IAU 2012 B2 au = 149 597 870 700 m ("AU" in FITS)
            Dimension.LENGTH, Map.of("cm", 1.0, "m", 100.0, "km", 1e5, "Rsun", 6.957e8 * 100.0,
                    "solRad", 6.957e8 * 100.0, "au", 149_597_870_700.0 * 100.0, "AU", 149_597_870_700.0 * 100.0),
            // M_sun = IAU 2015 B3 (GM)_sun / CODATA 2018 G, in g
            Dimension.MASS, Map.of("g", 1.0, "kg", 1000.0, "Msun", 1.3271244e20 / 6.67430e-11 * 1000.0,
                    "solMass", 1.3271244e20 / 6.67430e-11 * 1000.0),
            // 1 J = 1e7 erg
            Dimension.ENERGY, Map.of("erg", 1.0, "J", 1e7),
            Dimension.SPECIFIC_ENERGY, Map.of("erg/g", 1.0, "J/kg", 1e7 / 1000.0),
            Dimension.SPECIFIC_ENTROPY, Map.of("erg/g/K", 1.0, "erg/(g.K)", 1.0, "erg g-1 K-1", 1.0, "J/kg/K", 1e7 / 1000.0),
            // Julian year: 365.25 days of 86 400 s (IAU)
            Dimension.TIME, Map.of("s", 1.0, "yr", 365.25 * 86_400.0),
            // IAU 2015 B3 nominal solar luminosity 3.828e26 W
            Dimension.LUMINOSITY, Map.of("erg/s", 1.0, "erg s-1", 1.0, "W", 1e7, "Lsun", 3.828e26 * 1e7,
                    "solLum", 3.828e26 * 1e7));

    static Stream<Arguments> everyUnit() {
        List<Arguments> rows = new ArrayList<>();
        for (Dimension d : Dimension.values()) {
            for (String unit : d.factors().keySet()) {
                rows.add(Arguments.of(d, unit));
            }
        }
        return rows.stream();
    }

    @Test
    void everyAcceptedUnitHasAnIndependentFactor() {
        for (Dimension d : Dimension.values()) {
            assertEquals(new TreeSet<>(FACTORS.get(d).keySet()), new TreeSet<>(d.factors().keySet()), d.label());
        }
    }

    /** Factors are products of exact powers of ten or of one named constant: a few ulp. */
    @ParameterizedTest(name = "{0} in {1}")
    @MethodSource("everyUnit")
    void convertsEachUnitToCgs(Dimension dimension, String unit) {
        double factor = FACTORS.get(dimension).get(unit);
        for (String number : List.of("2.5", "1e-3", "-4.25E+2", ".5", "7.")) {
            double expected = Double.parseDouble(number) * factor;
            for (String text : List.of(number + " " + unit, number + unit, "  " + number + "  " + unit + " ")) {
                assertEquals(expected, Units.parse("--x", text, dimension), 4e-16 * Math.abs(expected), text);
            }
        }
        // and back
        assertEquals(2.5, Units.toUnit(2.5 * factor, unit, dimension), 4e-16 * 2.5);
    }

    @ParameterizedTest
    @EnumSource(Dimension.class)
    void bareNumberIsCgs(Dimension dimension) {
        assertEquals(1.5e7, Units.parse("--x", "1.5e7", dimension));
        assertEquals(0.0, Units.parse("--x", "0", dimension));
        assertEquals(1.0, FACTORS.get(dimension).get(dimension.cgsUnit()), "first unit listed is the CGS one");
    }

    @Nested
    class BadInput {

        @ParameterizedTest
        @ValueSource(strings = {"NaN", "nan", "Infinity", "-Infinity", "inf", "", "   ", "abc", "1.5e7 furlong",
            "1,5 K", "1e999", "-1e999 K", "1e7 k", "3 mk", "0x10", "1e", "--5", "1 2 K"})
        void temperaturesThatAreRefused(String text) {
            assertThrows(BadInputException.class, () -> Units.parse("--temp", text, Dimension.TEMPERATURE));
        }

        @Test
        void nullIsRefused() {
            assertThrows(BadInputException.class, () -> Units.parse("--temp", null, Dimension.TEMPERATURE));
            assertThrows(BadInputException.class, () -> Units.parseNumber("--X", null));
        }

        static Stream<Arguments> unitsOfTheWrongDimension() {
            List<Arguments> rows = new ArrayList<>();
            for (Dimension wanted : Dimension.values()) {
                for (Dimension other : Dimension.values()) {
                    for (String unit : other.factors().keySet()) {
                        if (!wanted.factors().containsKey(unit)) {
                            rows.add(Arguments.of(wanted, unit));
                        }
                    }
                }
            }
            return rows.stream();
        }

        @ParameterizedTest(name = "{1} as {0}")
        @MethodSource("unitsOfTheWrongDimension")
        void unitOfAnotherDimension(Dimension wanted, String unit) {
            BadInputException e = assertThrows(BadInputException.class,
                    () -> Units.parse("--opt", "3 " + unit, wanted));
            assertTrue(e.getMessage().startsWith("--opt: "), "names the option: " + e.getMessage());
            assertFalse(e.getMessage().contains("\n"), "one line");
        }

        @ParameterizedTest
        @ValueSource(strings = {"NaN", "Infinity", "-Infinity", "", "0.7 K", "x", "1e400"})
        void plainNumbersThatAreRefused(String text) {
            assertThrows(BadInputException.class, () -> Units.parseNumber("--X", text));
        }

        @Test
        void toUnitRefusesAnUnknownUnit() {
            assertThrows(BadInputException.class, () -> Units.toUnit(1.0, "furlong", Dimension.LENGTH));
        }
    }

    @Test
    void plainNumbersAreRead() {
        assertEquals(0.7, Units.parseNumber("--X", "0.7"));
        assertEquals(-2e-3, Units.parseNumber("--X", " -2e-3 "));
    }
}
