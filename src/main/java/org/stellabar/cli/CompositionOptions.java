package org.stellabar.cli;

import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import picocli.CommandLine.Option;

/**
 * Composition options shared by every command: two or three of {@code --X --Y --Z}, or
 * {@code --mu}; with none, {@link Composition#DEFAULT}.
 */
public final class CompositionOptions {

    @Option(names = "--X", paramLabel = "X", converter = Quantities.Number.class,
            description = "Hydrogen mass fraction in [0,1]. With no composition option at all: X = 0.70, Z = 0.02.")
    Double x;

    @Option(names = "--Y", paramLabel = "Y", converter = Quantities.Number.class,
            description = "Helium mass fraction in [0,1]; derived from X and Z when omitted.")
    Double y;

    @Option(names = "--Z", paramLabel = "Z", converter = Quantities.Number.class,
            description = "Metal mass fraction in [0,1].")
    Double z;

    @Option(names = "--mu", paramLabel = "MU", converter = Quantities.Number.class,
            description = "Mean molecular weight in [0.5, 2) instead of X, Y, Z.")
    Double mu;

    @Option(names = "--metal-mass-number", paramLabel = "A", converter = Quantities.Number.class,
            description = "Count metal ions as ions of mass number A (default: metal ions neglected, 1/mu_i = X + Y/4).")
    Double metalMassNumber;

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
                : String.format(java.util.Locale.ROOT, "X = %s, Y = %s, Z = %s", c.X(), c.Y(), c.Z());
        return c.metalMassNumber() > 0 ? base + ", A_Z = " + c.metalMassNumber() : base;
    }
}
