package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.table.NumberColumn;

/** What a caller may hand to the charts package, and what it is refused. */
class ChartSpecTest {

    private static final double[] X = {1, 2, 3};

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteValuesNeverReachAChart(double bad) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Series.line("β", X, new double[] {0.5, bad, 0.7}));
        assertTrue(e.getMessage().contains("\"β\"") && e.getMessage().contains("point 2"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Series.points("x", new double[] {bad, 1, 2}, X));
        assertThrows(IllegalArgumentException.class, () -> ReferenceLine.horizontal(bad, "line"));
        assertThrows(IllegalArgumentException.class, () -> Axis.linear("x", "").withRange(0, bad));
    }

    @Test
    void seriesShapeMustBeConsistent() {
        assertThrows(IllegalArgumentException.class, () -> Series.line("a", X, new double[] {1, 2}));
        assertThrows(IllegalArgumentException.class, () -> Series.line("a", new double[0], new double[0]));
        assertThrows(IllegalArgumentException.class, () -> Series.points("a", X, X).withPointLabels(List.of("A")));
        assertThrows(IllegalArgumentException.class, () -> Series.line("a", X, X).withStyleSlot(-2));
    }

    @Test
    void seriesCopiesItsArraysInAndOut() {
        double[] y = {4, 5, 6};
        Series s = Series.line("a", X, y);
        y[0] = 99;
        assertEquals(4, s.y()[0]);
        s.y()[1] = 99;
        assertEquals(5, s.y()[1]);
        assertEquals(Series.line("a", X, new double[] {4, 5, 6}), s);
    }

    @Test
    void seriesFromTableColumns() {
        NumberColumn r = new NumberColumn("r", "cm", "radius", new double[] {0, 1, 2});
        NumberColumn rho = new NumberColumn("rho", "g/cm3", "density", new double[] {3, 2, 1});
        Series s = Series.line("ρ", r, rho);
        assertArrayEquals(new double[] {3, 2, 1}, s.y());
    }

    @Test
    void secondaryAxisMustExistAndBeUsed() {
        ChartSpec base = ChartSpec.of(Axis.linear("m/M", ""), Axis.linear("β", ""));
        assertThrows(IllegalArgumentException.class,
                () -> base.withSeries(Series.line("Γ_1", X, X).onSecondaryAxis()));
        assertThrows(IllegalArgumentException.class,
                () -> base.withReferenceLine(ReferenceLine.horizontal(4.0 / 3, "4/3").onSecondaryAxis()));
        ChartSpec unused = base.withSecondaryYAxis(Axis.linear("Γ_1", "")).withSeries(Series.line("β", X, X));
        ChartRenderer renderer = new ChartRenderer(FigureSize.ONE_COLUMN);
        assertThrows(IllegalArgumentException.class, () -> renderer.render(unused));
        assertThrows(IllegalArgumentException.class, () -> renderer.render(base));
    }

    @Test
    void logRangeMustBePositive() {
        assertThrows(IllegalArgumentException.class, () -> Axis.log("ρ", "g/cm3").withRange(0, 10));
        assertThrows(IllegalArgumentException.class, () -> Axis.linear("x", "").withRange(2, 1));
        assertThrows(IllegalArgumentException.class, () -> new FigureSize(0.5, 3, 8));
        assertThrows(IllegalArgumentException.class, () -> ReferenceLine.vertical(1, "v").onSecondaryAxis());
    }
}
