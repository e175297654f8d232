package org.stellabar.cli;

import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;

/** Parsing of "LOW:HIGH" ranges and "NxM" point counts for survey commands. */
final class Ranges {

    private Ranges() {
    }

    /**
     * @param option the option name for messages
     * @param text "LOW:HIGH", each end a quantity with an optional unit
     * @param dimension what the ends measure
     * @param bareUnitFactor what a bare number is multiplied by (1 for CGS)
     * @return {low, high} in CGS
     */
    static double[] parse(String option, String text, Dimension dimension, double bareUnitFactor) {
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new BadInputException(option + ": '" + text + "' is not a range; write LOW:HIGH, e.g. 1e3:1e10");
        }
        double[] v = new double[2];
        for (int i = 0; i < 2; i++) {
            String p = parts[i].strip();
            boolean bare = p.matches("[-+0-9.eE]+");
            v[i] = bare ? Units.parseNumber(option, p) * bareUnitFactor : Units.parse(option, p, dimension);
        }
        if (!(v[0] > 0 && v[1] > 0)) {
            throw new BadInputException(option + ": '" + text + "' is not allowed; both ends must be positive");
        }
        if (!(v[0] < v[1])) {
            throw new BadInputException(option + ": '" + text + "' is not allowed; LOW must be below HIGH");
        }
        return v;
    }

    /**
     * @param option the option name for messages
     * @param text "N" or "NxM"
     * @param max the largest allowed count per axis
     * @return {n, m} (m = n for a single number)
     */
    static int[] points(String option, String text, int max) {
        String[] parts = text.strip().split("[xX]", -1);
        if (parts.length < 1 || parts.length > 2) {
            throw new BadInputException(option + ": '" + text + "' is not a point count; write N or NxM, e.g. 200x200");
        }
        int[] n = new int[2];
        for (int i = 0; i < 2; i++) {
            String p = parts[Math.min(i, parts.length - 1)].strip();
            try {
                n[i] = Integer.parseInt(p);
            } catch (NumberFormatException e) {
                throw new BadInputException(option + ": '" + text + "' is not a point count; write N or NxM, e.g. 200x200");
            }
            if (n[i] < 2 || n[i] > max) {
                throw new BadInputException(option + ": " + n[i] + " points is not allowed; give 2 to " + max
                        + " per axis");
            }
        }
        return n;
    }

    /**
     * @param option the option name for messages
     * @param text "K/N" with 1 &lt;= K &lt;= N &lt;= max
     * @param max the number of items split into parts
     * @return {K, N}
     */
    static int[] shard(String option, String text, int max) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\s*(\\d{1,9})\\s*/\\s*(\\d{1,9})\\s*")
                .matcher(text);
        if (!m.matches()) {
            throw new BadInputException(option + ": '" + text + "' is not K/N; write e.g. 3/10 for the third of ten parts");
        }
        int k = Integer.parseInt(m.group(1));
        int n = Integer.parseInt(m.group(2));
        if (n < 1 || n > max || k < 1 || k > n) {
            throw new BadInputException(option + ": '" + text + "' is not allowed; K/N needs 1 <= K <= N <= " + max);
        }
        return new int[] {k, n};
    }
}
