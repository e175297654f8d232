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

    /**
     * Reads a quantity of one dimension (or, with none, a plain finite number); picocli names a
     * converter by its class, so each dimension below is a class that only says which it is.
     */
    abstract static class QuantityConverter implements ITypeConverter<Double> {
        private final Dimension dimension;

        QuantityConverter(Dimension dimension) {
            this.dimension = dimension;
        }

        @Override
        public Double convert(String value) {
            try {
                return dimension == null ? Units.parseNumber(null, value) : Units.parse(null, value, dimension);
            } catch (BadInputException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** Temperature, bare number in K. */
    public static final class Temperature extends QuantityConverter {
        /** A converter to K. */
        public Temperature() {
            super(Dimension.TEMPERATURE);
        }
    }

    /** Density, bare number in g/cm3. */
    public static final class Density extends QuantityConverter {
        /** A converter to g/cm3. */
        public Density() {
            super(Dimension.DENSITY);
        }
    }

    /** Pressure, bare number in dyn/cm2. */
    public static final class Pressure extends QuantityConverter {
        /** A converter to dyn/cm2. */
        public Pressure() {
            super(Dimension.PRESSURE);
        }
    }

    /** Mass, bare number in g. */
    public static final class Mass extends QuantityConverter {
        /** A converter to g. */
        public Mass() {
            super(Dimension.MASS);
        }
    }

    /** Length, bare number in cm. */
    public static final class Length extends QuantityConverter {
        /** A converter to cm. */
        public Length() {
            super(Dimension.LENGTH);
        }
    }

    /** A plain finite number (refuses NaN and infinities, which Double.parseDouble accepts). */
    public static final class Number extends QuantityConverter {
        /** A converter that takes a bare finite number only. */
        public Number() {
            super(null);
        }
    }
}
