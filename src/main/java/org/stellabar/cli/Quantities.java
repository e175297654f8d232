package org.stellabar.cli;

import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** picocli converters that read quantities with units into CGS doubles. */
public final class Quantities {

    private Quantities() {
    }

    private static double convert(String text, Dimension dimension) {
        try {
            return Units.parse(null, text, dimension);
        } catch (BadInputException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }

    /** Temperature, bare number in K. */
    public static final class Temperature implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.TEMPERATURE);
        }
    }

    /** Density, bare number in g/cm3. */
    public static final class Density implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.DENSITY);
        }
    }

    /** Pressure, bare number in dyn/cm2. */
    public static final class Pressure implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.PRESSURE);
        }
    }

    /** Mass, bare number in g. */
    public static final class Mass implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.MASS);
        }
    }

    /** Length, bare number in cm. */
    public static final class Length implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.LENGTH);
        }
    }

    /** Specific entropy, bare number in erg/g/K. */
    public static final class SpecificEntropy implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            return Quantities.convert(value, Dimension.SPECIFIC_ENTROPY);
        }
    }

    /** A plain finite number (refuses NaN and infinities, which Double.parseDouble accepts). */
    public static final class Number implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            try {
                return Units.parseNumber(null, value);
            } catch (BadInputException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }
}
