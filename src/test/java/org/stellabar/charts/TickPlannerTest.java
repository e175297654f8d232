package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

class TickPlannerTest {

    private static List<String> labels(List<TickPlanner.Tick> ticks) {
        return ticks.stream().filter(TickPlanner.Tick::major).map(TickPlanner.Tick::label).collect(Collectors.toList());
    }

    private static List<TickPlanner.Tick> withLabels(List<List<TickPlanner.Tick>> candidates, List<String> wanted) {
        return candidates.stream().filter(c -> labels(c).equals(wanted)).findFirst()
                .orElseThrow(() -> new AssertionError("no candidate labelled " + wanted + " among "
                        + candidates.stream().map(TickPlannerTest::labels).collect(Collectors.toList())));
    }

    @Test
    void linearUnitIntervalOffersTenthsAndFifths() {
        List<List<TickPlanner.Tick>> c = TickPlanner.candidates(AxisScale.LINEAR, -0.035, 1.035);
        withLabels(c, List.of("0.0", "0.2", "0.4", "0.6", "0.8", "1.0"));
        withLabels(c, List.of("0.00", "0.25", "0.50", "0.75", "1.00"));
    }

    @Test
    void negativeLabelsUseTheMinusSign() {
        List<List<TickPlanner.Tick>> c = TickPlanner.candidates(AxisScale.LINEAR, -2.2, 2.2);
        withLabels(c, List.of("\u22122", "\u22121", "0", "1", "2"));
    }

    @Test
    void candidatesGoFromDenseToSparse() {
        List<List<TickPlanner.Tick>> c = TickPlanner.candidates(AxisScale.LINEAR, 0, 37);
        for (int i = 1; i < c.size(); i++) {
            assertTrue(labels(c.get(i)).size() <= labels(c.get(i - 1)).size());
        }
    }

    @Test
    void wideLogRangeIsLabelledAtPowersOfTenWithMinorTicksBetween() {
        List<TickPlanner.Tick> first = TickPlanner.candidates(AxisScale.LOG, 5e-10, 2e7).get(0);
        List<String> l = labels(first);
        assertEquals("10⁻⁹", l.get(0));
        assertEquals("10⁷", l.get(l.size() - 1));
        assertEquals(17, l.size());
        // minor ticks at 2…9 × 10^k: 8 per decade inside the range
        long minors = first.stream().filter(t -> !t.major() && t.value() > 1 && t.value() < 10).count();
        assertEquals(8, minors);
        // a sparser candidate labels every second decade
        withLabels(TickPlanner.candidates(AxisScale.LOG, 5e-10, 2e7),
                List.of("10⁻⁸", "10⁻⁶", "10⁻⁴", "10⁻²", "10⁰", "10²", "10⁴", "10⁶"));
    }

    @Test
    void narrowLogRangeLabelsMantissas() {
        // 20 to 80: no power of ten inside, so the labels must come from 2…8 × 10
        List<List<TickPlanner.Tick>> c = TickPlanner.candidates(AxisScale.LOG, 18, 85);
        withLabels(c, List.of("20", "30", "40", "50", "60", "70", "80"));
        withLabels(c, List.of("20", "50"));
    }

    @Test
    void scientificLabelsForLargeLinearValues() {
        assertEquals("2.5×10⁶", TickPlanner.scientific(2.5e6));
        assertEquals("10⁻⁷", TickPlanner.scientific(1e-7));
        assertEquals("\u22123×10⁵", TickPlanner.scientific(-3e5));
    }

    // A narrow range far from zero (β = 0.0224 within 1e-5) keeps its labels apart: the mantissa
    // carries the digits the step needs.
    @Test
    void narrowRangesKeepDistinctLabels() {
        for (List<TickPlanner.Tick> c : TickPlanner.candidates(AxisScale.LINEAR, 0.0223888, 0.0224112)) {
            List<String> l = labels(c);
            assertEquals(l.size(), new java.util.HashSet<>(l).size(), l.toString());
        }
        assertEquals("2.2405×10⁻²", TickPlanner.scientific(0.022405, 5e-6));
    }

    /**
     * The short path of {@link TickPlanner#rounded} against the exact one it stands in for
     * (BigDecimal's half-even rounding of the binary value): tick values (multiples of a step,
     * as formed by the planner), exact ties (multiples of 1/32 at the fifth decimal and of 1/2 at
     * none), numbers within an ulp of a tie, and random magnitudes; identical texts required.
     */
    @Test
    void roundedTextEqualsTheExactDecimalExpansion() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(7);
        int checked = 0;
        for (int e = -12; e <= 12; e++) {
            for (double m : new double[] {1, 2, 2.5, 5}) {
                double step = m * Math.pow(10, e) / 5;
                int decimals = Math.max(0, -e + (m == 2.5 ? 1 : 0));
                for (long i = -300; i <= 300; i += 7) {
                    checked += sameAsExact(i * step, decimals);
                }
            }
        }
        for (int j = -4000; j <= 4000; j++) {
            double tie = j / 32.0; // 0.03125: a tie at 4 decimals, 0.5 at 0
            for (int decimals = 0; decimals <= 6; decimals++) {
                checked += sameAsExact(tie, decimals);
                checked += sameAsExact(Math.nextUp(tie), decimals);
                checked += sameAsExact(Math.nextDown(tie), decimals);
            }
        }
        for (int n = 0; n < 200_000; n++) {
            double v = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(-20, 20));
            checked += sameAsExact(v, random.nextInt(0, 25));
        }
        assertTrue(checked > 250_000, "checked " + checked);
    }

    private static int sameAsExact(double v, int decimals) {
        String exact = new java.math.BigDecimal(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN).toPlainString();
        assertEquals(exact, TickPlanner.rounded(v, decimals), () -> v + " to " + decimals + " decimals");
        return 1;
    }
}
