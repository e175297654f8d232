package org.stellabar.audit;

import java.util.regex.Pattern;

/** Reads a table cell as a finite number. */
final class NumberCells {

    /**
     * A decimal number, optionally with an exponent; Fortran's D exponent (1.5D+07) is accepted
     * because many stellar codes write it.
     */
    private static final Pattern NUMBER =
            Pattern.compile("[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eEdD][-+]?\\d+)?");

    private NumberCells() {
    }

    /**
     * @param text the cell
     * @return the number, or NaN when the cell is empty, not a decimal number, or overflows
     */
    static double parse(String text) {
        String t = text.strip();
        if (!NUMBER.matcher(t).matches()) {
            return Double.NaN;
        }
        double v = Double.parseDouble(t.replace('d', 'e').replace('D', 'e'));
        return Double.isFinite(v) ? v : Double.NaN;
    }
}
