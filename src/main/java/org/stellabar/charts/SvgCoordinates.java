package org.stellabar.charts;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.text.FieldPosition;
import java.util.Locale;

/**
 * The number format Batik's SVG generator writes coordinates with at precision 4 — the pattern
 * {@code #.####}, US symbols, half-even rounding — with a short path for the common case. The
 * generator formats every coordinate of every path through {@link DecimalFormat}, whose digit
 * search was two fifths of an SVG file's time (src/bench/README.md); here a number whose
 * v·10⁴ lies clearly away from a rounding tie (more than an ulp from a half) is written from the
 * nearest integer to v·10⁴, and everything else (ties and near-ties, zero after rounding with its
 * "-0", very large numbers) goes to {@link DecimalFormat} itself. The texts are the same (tested against a plain
 * {@code DecimalFormat} over ties, near-ties and random numbers). Used only through
 * {@link #format(double)}, as the generator does: the short path sets no field position.
 */
final class SvgCoordinates extends DecimalFormat {

    private static final long serialVersionUID = 1L;

    /** The pattern Batik's generator context uses at precision 4. */
    static final String PATTERN = "#.####";

    SvgCoordinates() {
        super(PATTERN, DecimalFormatSymbols.getInstance(Locale.US));
    }

    @Override
    public StringBuffer format(double v, StringBuffer out, FieldPosition position) {
        double scaled = v * 1e4;
        double nearest = Math.rint(scaled);
        // the product is rounded once, by at most half an ulp: when it lies more than an ulp
        // from the half-way point between two integers, so does the exact v·10^4, on the same
        // side — no tie, and DecimalFormat's half-even rounding of the exact value gives the
        // nearest integer
        if (nearest == 0 || !(Math.abs(scaled) < 0x1p50)
                || !(Math.abs(Math.abs(scaled - nearest) - 0.5) > Math.ulp(scaled))) {
            return super.format(v, out, position);
        }
        long k = (long) nearest;
        if (k < 0) {
            out.append('-');
            k = -k;
        }
        out.append(k / 10_000);
        int fraction = (int) (k % 10_000);
        if (fraction != 0) {
            out.append('.');
            int digits = 4;
            while (fraction % 10 == 0) {
                fraction /= 10;
                digits--;
            }
            // leading zeros of the fraction: 0.0312 is 312 in four places
            int shown = fraction < 10 ? 1 : fraction < 100 ? 2 : fraction < 1000 ? 3 : 4;
            for (int i = shown; i < digits; i++) {
                out.append('0');
            }
            out.append(fraction);
        }
        return out;
    }
}
