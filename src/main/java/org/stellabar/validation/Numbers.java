package org.stellabar.validation;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Fixed, locale-free number formatting for the report, so that the same numbers always give the
 * same text.
 */
final class Numbers {

    private Numbers() {
    }

    /**
     * @param x a value
     * @param significant significant digits
     * @return x rounded half-even to that many digits: plain notation for 1e-4 ≤ |x| &lt; 1e6,
     *     else scientific ("1.2345e+17"); "not finite" for NaN or an infinity
     */
    static String significant(double x, int significant) {
        if (!Double.isFinite(x)) {
            return "not finite";
        }
        if (x == 0.0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(x).round(new MathContext(significant, RoundingMode.HALF_EVEN));
        double magnitude = Math.abs(d.doubleValue());
        if (magnitude >= 1e-4 && magnitude < 1e6) {
            return d.toPlainString();
        }
        BigDecimal unscaled = new BigDecimal(d.unscaledValue());
        int exponent = d.precision() - d.scale() - 1;
        BigDecimal mantissa = unscaled.movePointLeft(unscaled.precision() - 1);
        return mantissa.toPlainString() + "e" + (exponent >= 0 ? "+" : "-") + String.format(java.util.Locale.US, "%02d", Math.abs(exponent));
    }

    /** @return a deviation or ratio to two significant digits */
    static String brief(double x) {
        return significant(x, 2);
    }

    /** @return x in short scientific form without trailing zeros, e.g. "1e-13" */
    static String compact(double x) {
        return new BigDecimal(x).round(new MathContext(6)).stripTrailingZeros().toString().replace("E", "e")
                .replace("e+", "e");
    }
}
