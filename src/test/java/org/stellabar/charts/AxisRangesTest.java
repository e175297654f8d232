package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class AxisRangesTest {

    // Ranges are built from powers of ten and a margin of 3.5 % of the span: compare to 1e-12
    // relative, round-off only.
    private static final double TOL = 1e-12;

    @Test
    void logAxisIgnoresNonPositiveValues() {
        ChartSpec spec = ChartSpec.of(Axis.log("x", ""), Axis.log("y", ""))
                .withSeries(Series.line("a", new double[] {-1, 0, 1, 10, 100}, new double[] {1, 1, 1e-2, 0, 1e2}));
        AxisRanges r = new AxisRanges(spec);
        // showable points: (1, 1e-2) and (100, 1e2); x spans 2 decades, y spans 4
        double mx = AxisRanges.MARGIN * 2;
        double my = AxisRanges.MARGIN * 4;
        assertEquals(Math.pow(10, -mx), r.x().lower(), TOL);
        assertEquals(Math.pow(10, 2 + mx), r.x().upper(), 100 * TOL);
        assertEquals(Math.pow(10, -2 - my), r.y(YAxisSide.PRIMARY).lower(), TOL);
        assertEquals(Math.pow(10, 2 + my), r.y(YAxisSide.PRIMARY).upper(), 100 * TOL);
    }

    @Test
    void referenceLinesWidenTheRangeAndFixedRangesWin() {
        ChartSpec spec = ChartSpec.of(Axis.linear("m/M", "").withRange(0, 1), Axis.linear("Γ_1", ""))
                .withSeries(Series.line("Γ_1", new double[] {0, 1}, new double[] {1.4, 1.6}))
                .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "4/3"));
        AxisRanges r = new AxisRanges(spec);
        assertEquals(0, r.x().lower());
        assertEquals(1, r.x().upper());
        double span = 1.6 - 4.0 / 3.0;
        assertEquals(4.0 / 3.0 - AxisRanges.MARGIN * span, r.y(YAxisSide.PRIMARY).lower(), TOL);
        assertEquals(1.6 + AxisRanges.MARGIN * span, r.y(YAxisSide.PRIMARY).upper(), TOL);
    }

    @Test
    void nothingShowableGivesAPlainRangeNotAFailure() {
        ChartSpec spec = ChartSpec.of(Axis.linear("x", ""), Axis.log("|residual|", ""))
                .withSeries(Series.points("r", new double[] {1, 2}, new double[] {0, 0}));
        AxisRanges r = new AxisRanges(spec);
        assertEquals(1, r.y(YAxisSide.PRIMARY).lower(), TOL);
        assertEquals(10, r.y(YAxisSide.PRIMARY).upper(), TOL);
    }

    @Test
    void singleValueIsPaddedSymmetrically() {
        ChartSpec spec = ChartSpec.of(Axis.linear("x", ""), Axis.linear("y", ""))
                .withSeries(Series.points("p", new double[] {2}, new double[] {5}));
        AxisRanges r = new AxisRanges(spec);
        assertEquals(1.8, r.x().lower(), TOL);
        assertEquals(2.2, r.x().upper(), TOL);
        assertEquals(4.5, r.y(YAxisSide.PRIMARY).lower(), TOL);
    }

    // Rounding noise on a constant (β = 0.975 to 1e-12) is drawn as the constant it is: a span of
    // a thousandth of the value, centred, which stays below the impossible β > 1.
    @Test
    void nearlyConstantDataGetANarrowCentredSpan() {
        ChartSpec spec = ChartSpec.of(Axis.linear("x", ""), Axis.linear("y", ""))
                .withSeries(Series.line("β", new double[] {0, 1, 2}, new double[] {0.975, 0.975 + 1e-12, 0.975 - 1e-12}));
        AxisRanges r = new AxisRanges(spec);
        assertEquals(0.975 - 0.0004875, r.y(YAxisSide.PRIMARY).lower(), 1e-12);
        assertEquals(0.975 + 0.0004875, r.y(YAxisSide.PRIMARY).upper(), 1e-12);
    }
}
