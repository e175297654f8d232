package org.stellabar.charts;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Proposes tick marks for an axis range, from the densest sensible set to sparser ones; the axis
 * takes the first whose labels do not collide. Labels use the minus sign U+2212 and Unicode
 * superscripts ("10⁻³", "2×10⁵"), so they stay plain text in every format.
 *
 * <p>Linear axes step by 1, 2, 2.5 or 5 times a power of ten. Logarithmic axes label powers of
 * ten (every 1, 2, 3, 5, 10 … decades) with minor marks at 2…9 times each power; when fewer than
 * three powers of ten fall inside the range they label 1, 2, 5 (or every integer) times each
 * power instead.
 */
final class TickPlanner {

    /**
     * One tick: the value it marks and, for a major tick, its label. A linear axis's label is
     * written when first asked for: an axis looks at the labels of the candidate sets it tries,
     * usually a few of twenty, and rounding the others' values to text was most of its time.
     */
    static final class Tick {
        private final double value;
        private final java.util.function.Supplier<String> labeller;
        private String label;

        /**
         * @param value the value it marks
         * @param label its label, or null for a minor (unlabelled) tick
         */
        Tick(double value, String label) {
            this.value = value;
            this.label = label;
            this.labeller = null;
        }

        /**
         * @param value the value it marks
         * @param labeller writes its label when first asked (a major tick)
         */
        Tick(double value, java.util.function.Supplier<String> labeller) {
            this.value = value;
            this.labeller = labeller;
        }

        double value() {
            return value;
        }

        /** @return the label, null for a minor tick */
        String label() {
            if (label == null && labeller != null) {
                label = labeller.get();
            }
            return label;
        }

        boolean major() {
            return label != null || labeller != null;
        }
    }

    private static final double[] LINEAR_MANTISSAS = {1, 2, 2.5, 5};
    private static final int[] DECADE_STEPS = {1, 2, 3, 4, 5, 10, 20, 25, 50, 100};
    private static final int MAX_TICKS = 200;

    private TickPlanner() {
    }

    /**
     * @param scale the axis scale
     * @param lower lower end of the shown range (positive on a log axis)
     * @param upper upper end, above lower
     * @return candidate tick sets, densest first, each sorted by value; never empty
     */
    static List<List<Tick>> candidates(AxisScale scale, double lower, double upper) {
        List<List<Tick>> result = scale == AxisScale.LOG ? logCandidates(lower, upper) : linearCandidates(lower, upper);
        result.removeIf(List::isEmpty);
        if (result.isEmpty()) {
            result.add(List.of());
        }
        return result;
    }

    private static List<List<Tick>> linearCandidates(double lower, double upper) {
        List<List<Tick>> result = new ArrayList<>();
        double span = upper - lower;
        int firstExponent = (int) Math.floor(Math.log10(span / 25));
        for (int e = firstExponent; e <= firstExponent + 4; e++) {
            for (double m : LINEAR_MANTISSAS) {
                double step = m * Math.pow(10, e);
                int minorPerStep = m == 2 ? 4 : 5;
                result.add(linearTicks(lower, upper, step, minorPerStep, decimalsFor(m, e)));
            }
        }
        result.removeIf(t -> t.size() > MAX_TICKS);
        return result;
    }

    private static List<Tick> linearTicks(double lower, double upper, double step, int minorPerStep, int decimals) {
        List<Tick> ticks = new ArrayList<>();
        double minor = step / minorPerStep;
        long first = (long) Math.ceil(lower / minor - 1e-9);
        long last = (long) Math.floor(upper / minor + 1e-9);
        if (last - first + 1 > MAX_TICKS) {
            // more ticks than any axis shows: left out by the caller anyway, so not labelled
            return List.of();
        }
        boolean scientific = Math.max(Math.abs(lower), Math.abs(upper)) >= 1e5 || step < 1e-4;
        for (long i = first; i <= last; i++) {
            double v = i * minor;
            boolean major = Math.floorMod(i, minorPerStep) == 0;
            if (Math.abs(v) < minor * 1e-6) {
                v = 0;
            }
            if (!major) {
                ticks.add(new Tick(v, (String) null));
            } else {
                double at = v;
                ticks.add(new Tick(v, scientific ? () -> scientific(at, step) : () -> decimal(at, decimals)));
            }
        }
        return ticks;
    }

    private static int decimalsFor(double mantissa, int exponent) {
        int d = -exponent + (mantissa == 2.5 ? 1 : 0);
        return Math.max(0, d);
    }

    private static List<List<Tick>> logCandidates(double lower, double upper) {
        List<List<Tick>> result = new ArrayList<>();
        double lo = Math.log10(lower);
        double hi = Math.log10(upper);
        int firstDecade = (int) Math.ceil(lo - 1e-9);
        int lastDecade = (int) Math.floor(hi + 1e-9);
        if (lastDecade - firstDecade + 1 < 3) {
            result.add(mantissaTicks(lower, upper, new int[] {1, 2, 3, 4, 5, 6, 7, 8, 9}));
            result.add(mantissaTicks(lower, upper, new int[] {1, 2, 5}));
            result.add(mantissaTicks(lower, upper, new int[] {1, 3}));
        }
        for (int d : DECADE_STEPS) {
            List<Tick> ticks = decadeTicks(lower, upper, d);
            result.add(ticks);
            if (lastDecade - firstDecade < d) {
                break;
            }
        }
        result.removeIf(t -> t.size() > MAX_TICKS);
        return result;
    }

    private static List<Tick> mantissaTicks(double lower, double upper, int[] labelled) {
        List<Tick> ticks = new ArrayList<>();
        int e0 = (int) Math.floor(Math.log10(lower)) - 1;
        int e1 = (int) Math.ceil(Math.log10(upper)) + 1;
        for (int e = e0; e <= e1; e++) {
            for (int m = 1; m <= 9; m++) {
                double v = m * Math.pow(10, e);
                if (v < lower * (1 - 1e-9) || v > upper * (1 + 1e-9)) {
                    continue;
                }
                boolean major = false;
                for (int l : labelled) {
                    major |= l == m;
                }
                ticks.add(new Tick(v, major ? plainPositive(m, e) : null));
            }
        }
        return ticks;
    }

    private static List<Tick> decadeTicks(double lower, double upper, int step) {
        List<Tick> ticks = new ArrayList<>();
        int e0 = Math.floorDiv((int) Math.floor(Math.log10(lower)), step) * step;
        int e1 = (int) Math.ceil(Math.log10(upper));
        for (int e = e0; e <= e1; e++) {
            boolean major = Math.floorMod(e, step) == 0;
            double v = Math.pow(10, e);
            if (v >= lower * (1 - 1e-9) && v <= upper * (1 + 1e-9)) {
                ticks.add(new Tick(v, major ? "10" + superscript(e) : null));
            }
            if (step == 1) {
                for (int m = 2; m <= 9; m++) {
                    double w = m * v;
                    if (w >= lower && w <= upper) {
                        ticks.add(new Tick(w, (String) null));
                    }
                }
            }
        }
        return ticks;
    }

    /** m × 10^e as a plain decimal where that stays short, else as m×10ⁿ. */
    private static String plainPositive(int m, int e) {
        if (e >= -3 && e <= 4) {
            return new BigDecimal(m).scaleByPowerOfTen(e).toPlainString();
        }
        return m == 1 ? "10" + superscript(e) : m + "×10" + superscript(e);
    }

    static String decimal(double v, int decimals) {
        String s = rounded(v, decimals);
        if (negativeZero(s)) {
            s = s.substring(1);
        }
        return s.replace('-', ScriptedText.MINUS);
    }

    /** Exact powers of ten as doubles (10^22 is the largest). */
    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    /**
     * v rounded half-even to {@code decimals} places, as plain text: the digits of the exact
     * binary value rounded, as {@code new BigDecimal(v).setScale(decimals, HALF_EVEN)} gives them.
     * That exact expansion (50-odd digits) and its division were a tenth of the demo's time:
     * v·10^decimals is formed in double, with an error of at most half an ulp, and when it lies
     * more than an ulp from the half-way point between two integers, so does the exact product,
     * on the same side: no tie, and the nearest integer is the rounded value. Ties and near-ties
     * (and products of 2^50 or more) take the exact path.
     */
    static String rounded(double v, int decimals) {
        if (decimals < POWERS_OF_TEN.length) {
            double scaled = v * POWERS_OF_TEN[decimals];
            double nearest = Math.rint(scaled);
            if (Math.abs(scaled) < 0x1p50 && Math.abs(Math.abs(scaled - nearest) - 0.5) > Math.ulp(scaled)) {
                return BigDecimal.valueOf((long) nearest, decimals).toPlainString();
            }
        }
        return new BigDecimal(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN).toPlainString();
    }

    /** Whether s is "-0", "-0." or "-0.0…0" (a minus sign that would print before a zero). */
    private static boolean negativeZero(String s) {
        if (!s.startsWith("-0") || s.length() > 2 && s.charAt(2) != '.') {
            return false;
        }
        for (int i = 3; i < s.length(); i++) {
            if (s.charAt(i) != '0') {
                return false;
            }
        }
        return true;
    }

    static String scientific(double v) {
        return scientific(v, Math.abs(v));
    }

    /**
     * @param v the value
     * @param step the spacing of the labelled ticks: the mantissa keeps enough digits (at least
     *     three) to tell neighbours apart, so a narrow range round 0.0224 reads 2.2399, 2.2400 …
     */
    static String scientific(double v, double step) {
        if (v == 0) {
            return "0";
        }
        int e = (int) Math.floor(Math.log10(Math.abs(v)) + 1e-9);
        int digits = Math.max(3, e - (int) Math.floor(Math.log10(step) + 1e-9) + 1);
        double m = v / Math.pow(10, e);
        String mant = new BigDecimal(m).round(new java.math.MathContext(digits)).stripTrailingZeros().toPlainString()
                .replace('-', ScriptedText.MINUS);
        if (mant.equals("1")) {
            return "10" + superscript(e);
        }
        if (mant.equals("\u22121")) {
            return ScriptedText.MINUS + "10" + superscript(e);
        }
        return mant + "×10" + superscript(e);
    }

    static String superscript(int e) {
        return ScriptedText.parse("^{" + e + "}").unicode().orElseThrow();
    }
}
