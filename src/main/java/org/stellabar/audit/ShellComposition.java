package org.stellabar.audit;

import java.util.Locale;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;

/**
 * A shell's composition from the mass fractions a profile gives, completed from a fallback.
 *
 * <ul>
 *   <li>X, Y and Z given: their sum must be 1 within {@link #SUM_TOLERANCE} (profiles print a
 *       limited number of digits); they are divided by their sum.</li>
 *   <li>Two given: the third is 1 minus their sum (it may be below 0 by at most
 *       {@link #SUM_TOLERANCE}, then it is 0).</li>
 *   <li>X or Y alone: Z is the fallback's, the other 1 − X − Z or 1 − Y − Z.</li>
 *   <li>Z alone: X is the fallback's, Y = 1 − X − Z.</li>
 * </ul>
 * The fallback's metal mass number (metal ions counted or not) carries over.
 */
final class ShellComposition {

    /** Largest |X + Y + Z − 1| accepted from a profile: 1e-4 (a choice: six printed digits per fraction are well inside). */
    static final double SUM_TOLERANCE = 1e-4;

    private ShellComposition() {
    }

    /**
     * @param X hydrogen mass fraction or NaN if the profile lacks it
     * @param Y helium mass fraction or NaN
     * @param Z metal mass fraction or NaN
     * @param fallback the whole-star composition
     * @return the shell's composition
     * @throws BadInputException (message without a row, the caller adds it) for fractions outside
     *     [0, 1] or a sum off 1
     */
    static Composition of(double X, double Y, double Z, Composition fallback) {
        check("X", X);
        check("Y", Y);
        check("Z", Z);
        boolean hx = !Double.isNaN(X);
        boolean hy = !Double.isNaN(Y);
        boolean hz = !Double.isNaN(Z);
        double x;
        double y;
        if (hx && hy && hz) {
            double sum = X + Y + Z;
            if (Math.abs(sum - 1.0) > SUM_TOLERANCE) {
                throw new BadInputException(String.format(Locale.US,
                        "X + Y + Z = %.8g differs from 1 by more than %.0e", sum, SUM_TOLERANCE));
            }
            x = X / sum;
            y = Y / sum;
        } else if (hx && hy) {
            x = X;
            y = Y;
        } else if (hx && hz) {
            x = X;
            y = 1.0 - X - Z;
        } else if (hy && hz) {
            x = 1.0 - Y - Z;
            y = Y;
        } else if (hx) {
            x = X;
            y = 1.0 - X - fallback.Z();
        } else if (hy) {
            x = 1.0 - Y - fallback.Z();
            y = Y;
        } else if (hz) {
            x = fallback.X();
            y = 1.0 - x - Z;
        } else {
            return fallback;
        }
        double z = 1.0 - x - y;
        if (x < -SUM_TOLERANCE || y < -SUM_TOLERANCE || z < -SUM_TOLERANCE) {
            throw new BadInputException(String.format(Locale.US,
                    "the mass fractions do not fit in 1 (X = %.6g, Y = %.6g, Z = %.6g after completing them)", x, y, z));
        }
        x = Math.max(0.0, x);
        y = Math.max(0.0, Math.min(1.0 - x, y));
        z = Math.max(0.0, 1.0 - x - y);
        Composition c = Composition.of(x, y, z);
        return fallback.metalMassNumber() > 0 ? c.withMetalMassNumber(fallback.metalMassNumber()) : c;
    }

    private static void check(String name, double value) {
        if (!Double.isNaN(value) && !(value >= 0.0 && value <= 1.0)) {
            throw new BadInputException(name + " = " + value + " is outside [0, 1]");
        }
    }
}
