package org.stellabar.eos;

import org.stellabar.physics.BadInputException;

/**
 * Chemical composition of a fully ionized mixture, by mass fractions of hydrogen (X), helium (Y)
 * and heavier elements (Z), with the mean molecular weights that follow from it.
 *
 * <p>Textbook form (e.g. Kippenhahn, Weigert &amp; Weiss 2012, §13.1): 1/μ_e = X + Y/2 + Z/2 (two
 * nucleons per electron in all metals), 1/μ_i = X + Y/4, metal ions neglected, and 1/μ = 1/μ_e +
 * 1/μ_i = 2X + 3Y/4 + Z/2. When a metal mass number A_Z is given, metal ions count too:
 * 1/μ_i = X + Y/4 + Z/A_Z.
 *
 * @param X hydrogen mass fraction, in [0, 1]
 * @param Y helium mass fraction, in [0, 1]
 * @param Z metal mass fraction, in [0, 1]
 * @param metalMassNumber mass number A_Z of a representative metal ion, or 0 to neglect metal ions
 * @param mu mean molecular weight per free particle
 * @param muE mean molecular weight per electron
 * @param muI mean molecular weight per ion
 * @param fromMu true when the user gave μ and the mass fractions are those of the hydrogen–helium
 *     (or helium–metal) mixture that has that μ
 */
public record Composition(double X, double Y, double Z, double metalMassNumber, double mu, double muE,
        double muI, boolean fromMu) {

    /**
     * The composition when none is given, on the command line and in scenario files alike:
     * X = 0.70, Z = 0.02 (Y = 0.28), a common choice for young solar-metallicity stars (common
     * practice, no source).
     */
    public static final Composition DEFAULT = fromAnyTwo(0.70, Double.NaN, 0.02);

    /** Tolerance on X + Y + Z = 1. */
    public static final double SUM_TOLERANCE = 1e-9;

    /** Smallest μ of a fully ionized mixture (pure hydrogen). */
    public static final double MU_MIN = 0.5;
    /**
     * Upper end (excluded) of the μ that {@link #ofMu} accepts: μ = 2 would be pure metals, which
     * have no ions at all once metal ions are neglected.
     */
    public static final double MU_MAX = 2.0;

    /**
     * Canonical constructor: checks ranges and consistency.
     *
     * @param X hydrogen mass fraction, in [0, 1]
     * @param Y helium mass fraction, in [0, 1]
     * @param Z metal mass fraction, in [0, 1]
     * @param metalMassNumber mass number A_Z of a representative metal ion, or 0 to neglect metal ions
     * @param mu mean molecular weight per free particle
     * @param muE mean molecular weight per electron
     * @param muI mean molecular weight per ion
     * @param fromMu true when the user gave μ and the mass fractions are those of the hydrogen–helium
     *        (or helium–metal) mixture that has that μ
     */
    public Composition {
        checkFraction("X", X);
        checkFraction("Y", Y);
        checkFraction("Z", Z);
        double sum = X + Y + Z;
        if (Math.abs(sum - 1.0) > SUM_TOLERANCE) {
            throw new BadInputException(String.format(
                    "X + Y + Z = %.12g + %.12g + %.12g = %.12g; the mass fractions must add up to 1 (within %.0e)",
                    X, Y, Z, sum, SUM_TOLERANCE));
        }
        checkMetalMassNumber(metalMassNumber);
    }

    /**
     * The mixture with all three mass fractions given.
     *
     * @param X hydrogen mass fraction
     * @param Y helium mass fraction
     * @param Z metal mass fraction
     * @return the composition, metal ions neglected
     * @throws BadInputException if a fraction is outside [0, 1] or the sum differs from 1
     */
    public static Composition of(double X, double Y, double Z) {
        return build(X, Y, Z, 0.0, false);
    }

    /**
     * The mixture with all three mass fractions given and metal ions counted; the only way to
     * describe pure metals (X = Y = 0), which have no ions once metal ions are neglected.
     *
     * @param X hydrogen mass fraction
     * @param Y helium mass fraction
     * @param Z metal mass fraction
     * @param metalMassNumber A_Z &gt;= 2, or 0 to neglect metal ions
     * @return the composition
     * @throws BadInputException if a fraction is outside [0, 1], the sum differs from 1, or A_Z
     *     is not allowed
     */
    public static Composition of(double X, double Y, double Z, double metalMassNumber) {
        return build(X, Y, Z, metalMassNumber, false);
    }

    /**
     * The mixture with two mass fractions given and the third derived; pass {@code Double.NaN}
     * for the missing one. With all three given the sum is checked.
     *
     * @param X hydrogen mass fraction, or NaN
     * @param Y helium mass fraction, or NaN
     * @param Z metal mass fraction, or NaN
     * @return the composition
     * @throws BadInputException if fewer than two are given or a derived fraction is negative
     *
     */
    public static Composition fromAnyTwo(double X, double Y, double Z) {
        return fromAnyTwo(X, Y, Z, 0.0);
    }

    /**
     * As {@link #fromAnyTwo(double, double, double)}, with metal ions of mass number A_Z.
     *
     * @param X hydrogen mass fraction, or NaN
     * @param Y helium mass fraction, or NaN
     * @param Z metal mass fraction, or NaN
     * @param metalMassNumber A_Z &gt;= 2, or 0 to neglect metal ions
     * @return the composition
     *
     */
    public static Composition fromAnyTwo(double X, double Y, double Z, double metalMassNumber) {
        int given = (Double.isNaN(X) ? 0 : 1) + (Double.isNaN(Y) ? 0 : 1) + (Double.isNaN(Z) ? 0 : 1);
        if (given < 2) {
            throw new BadInputException("composition: give at least two of X, Y, Z (or mu)");
        }
        if (given == 3) {
            return of(X, Y, Z, metalMassNumber);
        }
        if (Double.isNaN(X)) {
            X = derived("X", 1.0 - Y - Z, Y, Z);
        } else if (Double.isNaN(Y)) {
            Y = derived("Y", 1.0 - X - Z, X, Z);
        } else {
            Z = derived("Z", 1.0 - X - Y, X, Y);
        }
        return of(X, Y, Z, metalMassNumber);
    }

    /**
     * The mixture with mean molecular weight μ. The equation of state needs only μ for pressure
     * and energy, but the entropy, the degeneracy check and the Eddington luminosity need the
     * electrons and ions separately; we take the metal-free hydrogen–helium mixture with this μ
     * (0.5 ≤ μ ≤ 4/3), or the hydrogen-free helium–metal mixture (4/3 &lt; μ ≤ 2).
     *
     * @param mu mean molecular weight, in [0.5, 2)
     * @return the composition, with {@link #fromMu()} true
     */
    public static Composition ofMu(double mu) {
        if (!(mu >= MU_MIN && mu < MU_MAX)) {
            throw new BadInputException("mu = " + mu + " is outside [" + MU_MIN + ", " + MU_MAX
                    + "), the range of a fully ionized mixture from pure hydrogen towards pure metals"
                    + " (metal ions neglected)");
        }
        double X;
        double Y;
        double Z;
        if (mu <= 4.0 / 3.0) {
            // 1/mu = 2X + 3(1-X)/4  =>  X = (4/mu - 3)/5
            X = Math.max(0.0, Math.min(1.0, (4.0 / mu - 3.0) / 5.0));
            Y = 1.0 - X;
            Z = 0.0;
        } else {
            // 1/mu = 3Y/4 + (1-Y)/2  =>  Y = 4/mu - 2
            X = 0.0;
            Y = Math.max(0.0, Math.min(1.0, 4.0 / mu - 2.0));
            Z = 1.0 - Y;
        }
        return build(X, Y, Z, 0.0, true);
    }

    /**
     * The same mixture with metal ions counted as ions of mass number A_Z.
     *
     * @param massNumber A_Z &gt;= 2, or 0 to neglect metal ions
     * @return a new composition
     * @throws BadInputException if the mixture was given by μ and holds metals: counting their
     *     ions would silently change the μ the user asked for
     */
    public Composition withMetalMassNumber(double massNumber) {
        if (fromMu && Z > 0.0 && massNumber != metalMassNumber) {
            throw new BadInputException("metal mass number A_Z = " + massNumber + " cannot be used with mu = " + mu
                    + " given directly: counting metal ions would change mu; give X, Y, Z instead");
        }
        return build(X, Y, Z, massNumber, fromMu);
    }

    /** @return number of free electrons per gram, 1/(μ_e m_u) [1/g] */
    public double electronsPerGram() {
        return 1.0 / (muE * org.stellabar.physics.Constants.ATOMIC_MASS_UNIT);
    }

    /** @return number of ions per gram, 1/(μ_i m_u) [1/g] */
    public double ionsPerGram() {
        return 1.0 / (muI * org.stellabar.physics.Constants.ATOMIC_MASS_UNIT);
    }

    /**
     * Mean square ion charge ⟨Z²⟩ over the ions counted in μ_i (metals, when counted, fully
     * ionized with charge A_Z/2).
     *
     * @return ⟨Z²⟩, or 1 for a mixture with no ions counted
     */
    public double meanSquareIonCharge() {
        double nH = X;
        double nHe = Y / 4.0;
        double nZ = metalMassNumber > 0 ? Z / metalMassNumber : 0.0;
        double charge = metalMassNumber / 2.0;
        double n = nH + nHe + nZ;
        return n > 0 ? (nH + 4.0 * nHe + charge * charge * nZ) / n : 1.0;
    }

    private static Composition build(double X, double Y, double Z, double metalMassNumber, boolean fromMu) {
        checkFraction("X", X);
        checkFraction("Y", Y);
        checkFraction("Z", Z);
        checkMetalMassNumber(metalMassNumber);
        double inverseMuE = X + 0.5 * Y + 0.5 * Z;
        double inverseMuI = X + 0.25 * Y + (metalMassNumber > 0 ? Z / metalMassNumber : 0.0);
        if (inverseMuI <= 0.0) {
            throw new BadInputException("composition X = " + X + ", Y = " + Y + ", Z = " + Z
                    + " has no ions once metals are neglected; give a metal mass number");
        }
        double mu = 1.0 / (inverseMuE + inverseMuI);
        return new Composition(X, Y, Z, metalMassNumber, mu, 1.0 / inverseMuE, 1.0 / inverseMuI, fromMu);
    }

    private static void checkMetalMassNumber(double metalMassNumber) {
        if (!(metalMassNumber == 0.0 || metalMassNumber >= 2.0 && Double.isFinite(metalMassNumber))) {
            throw new BadInputException("metal mass number A_Z = " + metalMassNumber
                    + " is not allowed; give A_Z >= 2 (e.g. 16 for oxygen), or 0 to neglect metal ions");
        }
    }

    private static void checkFraction(String name, double value) {
        if (!(value >= 0.0 && value <= 1.0)) {
            throw new BadInputException(name + " = " + value + " is outside [0, 1]; mass fractions lie in [0, 1]");
        }
    }

    private static double derived(String name, double value, double a, double b) {
        if (value < -SUM_TOLERANCE) {
            throw new BadInputException(String.format(
                    "the two mass fractions given (%.12g and %.12g) add up to more than 1; %s would be %.6g", a, b,
                    name, value));
        }
        return Math.max(0.0, value);
    }

    /**
     * What a composition given as μ alone stands for, said wherever the composition is recorded:
     * μ fixes only the particles per gram, and the hydrogen–helium mixture of that μ it is taken
     * as also fixes X, which sets κ_es = 0.2(1 + X), L_Edd and the entropy.
     *
     * @return the sentence, or "" for a composition given by its mass fractions
     */
    public String muImplication() {
        if (!fromMu) {
            return "";
        }
        return String.format(java.util.Locale.US, "taken as the hydrogen-helium mixture of that mu, X = %.6g,"
                + " Y = %.6g, Z = 0; this X sets kappa_es = 0.2(1+X), L_Edd and the entropy; give --X/--Y/--Z"
                + " instead of --mu for another mixture", X, Y);
    }
}
