package org.stellabar.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.Table;

/**
 * Columns of log10 values read as linear are found; linear columns of real stars are not. The
 * profiles are our own standard models (a 1 and a 40 Msun star: central T 1e7 K and above,
 * densities from 1e-9 to 1e2 g/cm3), written with some columns as log10 of their values.
 */
class LogValuedColumnGuardTest {

    private static final Composition MIX = Composition.of(0.70, 0.28, 0.02);

    private static Table star(double massMsun, double radiusRsun) {
        return new StarBuilder().build(StandardModelRequest.of(massMsun * org.stellabar.physics.Constants.SOLAR_MASS,
                radiusRsun * org.stellabar.physics.Constants.SOLAR_RADIUS, MIX)).profile();
    }

    /** The profile's r, m, rho, T, P columns, those named in {@code logged} as log10 (surface row left out). */
    private static List<LogValuedColumnGuard.Finding> inspect(Table profile, String unitOfT, DoubleUnaryOperator tScale,
            String... logged) {
        int rows = profile.rowCount() - 1; // the vacuum surface row has rho = T = P = 0
        ColumnarProfileSource.Builder b = new ColumnarProfileSource.Builder("star.csv", rows);
        for (String name : new String[] {"r", "m", "rho", "T", "P"}) {
            double[] all = profile.numbers(name).values();
            double[] v = new double[rows];
            boolean log = List.of(logged).contains(name);
            for (int i = 0; i < rows; i++) {
                double x = name.equals("T") ? tScale.applyAsDouble(all[i]) : all[i];
                v[i] = log ? Math.log10(x) : x;
            }
            String unit = name.equals("T") ? unitOfT : profile.numbers(name).unit();
            b.numbers(new ColumnHeading(name, unit), v);
        }
        ColumnarProfileSource source = b.build();
        ProfileLoader loader = new ProfileLoader(ColumnMapping.ourNames(), CompositionPolicy.wholeStar(MIX), false);
        return LogValuedColumnGuard.inspect(source, loader.mappedColumns(source));
    }

    @Test
    void linearColumnsOfRealStarsPass() {
        assertEquals(List.of(), inspect(star(1, 1), "K", t -> t));
        assertEquals(List.of(), inspect(star(40, 12), "K", t -> t));
        // temperatures in MK are small numbers but large once converted: the rule reads CGS values
        assertEquals(List.of(), inspect(star(1, 1), "MK", t -> t / 1e6));
    }

    @Test
    void logTemperatureIsFoundWithItsFix() {
        List<LogValuedColumnGuard.Finding> found = inspect(star(40, 12), "K", t -> t, "T");
        assertEquals(1, found.size(), found.toString());
        assertEquals("T", found.get(0).key());
        assertTrue(found.get(0).message().contains("--log T"), found.get(0).message());
    }

    /** log10 rho of the Sun-like model runs from about 2 at the centre to about -9: negative, within the log span. */
    @Test
    void logDensityAndLogPressureAreFound() {
        List<LogValuedColumnGuard.Finding> found = inspect(star(1, 1), "K", t -> t, "rho", "P");
        assertEquals(List.of("rho", "P"),
                found.stream().map(LogValuedColumnGuard.Finding::key).toList(), found.toString());
        String line = LogValuedColumnGuard.oneLine(found);
        assertTrue(line.contains("--log rho") && line.contains("--log P") && !line.contains("\n"), line);
    }
}
