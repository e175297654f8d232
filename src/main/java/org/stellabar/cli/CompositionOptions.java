package org.stellabar.cli;

import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;

/**
 * Composition options shared by every command: two or three of {@code --X --Y --Z}, or
 * {@code --mu}; with none, {@link Composition#DEFAULT}.
 */
public final class CompositionOptions {

    Double x;

    Double y;

    Double z;

    Double mu;

    Double metalMassNumber;

    /** @param m the command that takes the composition options */
    void describe(CommandModel m) {
        m.option("--X").label("X").converter(new Quantities.Number())
                .description("Hydrogen mass fraction in [0,1]. With no composition option at all: X = 0.70, Z = 0.02.")
                .field(this, "x");
        m.option("--Y").label("Y").converter(new Quantities.Number())
                .description("Helium mass fraction in [0,1]; derived from X and Z when omitted.")
                .field(this, "y");
        m.option("--Z").label("Z").converter(new Quantities.Number())
                .description("Metal mass fraction in [0,1].")
                .field(this, "z");
        m.option("--mu").label("MU").converter(new Quantities.Number())
                .description("Mean molecular weight in [0.5, 2) instead of X, Y, Z.")
                .field(this, "mu");
        m.option("--metal-mass-number").label("A").converter(new Quantities.Number())
                .description("Count metal ions as ions of mass number A (default: metal ions neglected, 1/mu_i = X + Y/4).")
                .field(this, "metalMassNumber");
    }

    /**
     * @return the composition the options describe
     * @throws BadInputException naming the options when they conflict or are incomplete
     */
    public Composition composition() {
        boolean anyFraction = x != null || y != null || z != null;
        Composition c;
        if (mu != null) {
            if (anyFraction) {
                throw new BadInputException("--mu cannot be combined with --X/--Y/--Z; give either mu or the mass fractions");
            }
            try {
                c = Composition.ofMu(mu);
            } catch (BadInputException e) {
                throw e.about("--mu");
            }
        } else if (!anyFraction) {
            c = Composition.DEFAULT;
        } else {
            int given = (x != null ? 1 : 0) + (y != null ? 1 : 0) + (z != null ? 1 : 0);
            if (given < 2) {
                throw new BadInputException("composition: give two of --X, --Y, --Z (the third is derived), or --mu");
            }
            try {
                // the mass number goes in at once: pure metals have no ions without it
                c = Composition.fromAnyTwo(x == null ? Double.NaN : x, y == null ? Double.NaN : y,
                        z == null ? Double.NaN : z, metalMassNumber == null ? 0.0 : metalMassNumber);
            } catch (BadInputException e) {
                throw e.about(metalMassNumber == null ? "--X/--Y/--Z" : "--X/--Y/--Z/--metal-mass-number");
            }
        }
        if (metalMassNumber != null && c.metalMassNumber() != metalMassNumber) {
            try {
                c = c.withMetalMassNumber(metalMassNumber);
            } catch (BadInputException e) {
                throw e.about("--metal-mass-number");
            }
        }
        return c;
    }

    /** @return how the composition was asked for, for metadata */
    public String describe() {
        Composition c = composition();
        String base = mu != null ? "mu = " + mu + " (" + c.muImplication() + ")"
                : String.format(java.util.Locale.US, "X = %s, Y = %s, Z = %s", c.X(), c.Y(), c.Z());
        return c.metalMassNumber() > 0 ? base + ", A_Z = " + c.metalMassNumber() : base;
    }
}
