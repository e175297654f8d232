package org.stellabar.output;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * Tables for the FITS tests: one column for every unit string tables use, filled with seeded
 * random doubles over many decades plus values that trip naive number printing, and a text column
 * with a comma, a Greek letter and an accent. The numbers mean nothing physical; they test
 * transport, not physics.
 */
final class FitsSamples {

    /** Every unit string of the table package, in the order of its documentation. */
    static final List<String> UNITS = List.of("g/cm3", "dyn/cm2", "K", "cm", "g", "erg/g", "erg/g/K", "cm/s",
            "erg/s", "1/cm3", "erg", "Msun", "Rsun", "Lsun", "");

    /** Column name for each unit, in the same order. */
    static final List<String> NAMES = List.of("rho", "P", "T", "r", "m", "u", "c_V", "sound_speed",
            "L_r", "n_e", "E_bind", "M", "R", "L", "one_minus_beta");

    static final int ROWS = 7;

    private FitsSamples() {
    }

    static Metadata metadata() {
        // made-up inputs; M is about 40 nominal solar masses in grams (invented, as every value here)
        Inputs inputs = Inputs.builder()
                .number("mass", 40.0, "Msun", "")
                .number("radius", 12.5, "Rsun", "")
                .number("X", 0.70, "", "")
                .number("Z", 0.02, "", "")
                .text("kind", "standard")
                .integer("index", 3, "")
                .text("central T", "15 MK")
                .number("M", 7.953639482792202e34, "g", "total mass")
                .number("M_Msun", 40.0, "Msun", "total mass in nominal solar masses")
                .integer("points", 200, "profile rows")
                .build();
        return Metadata.of("Test table: every unit, β and Γ1 in the title",
                inputs, List.of("made-up numbers for a transport test, not a star",
                        "a second note that is long enough to need more than one comment card in a FITS header,"
                                + " so that wrapping at word boundaries is exercised"));
    }

    static Table table(String name, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        Table.Builder b = new Table.Builder(name, metadata());
        for (int c = 0; c < UNITS.size(); c++) {
            double[] v = new double[ROWS];
            for (int i = 0; i < ROWS; i++) {
                // log-uniform over 1e-30 .. 1e30 with a random sign
                v[i] = Math.pow(10, random.nextDouble(-30, 30)) * (random.nextBoolean() ? 1 : -1);
            }
            // values whose shortest decimal form is long, plus extremes and a signed zero
            v[0] = 0.1 + 0.2;
            v[1] = Double.MIN_VALUE;
            v[2] = -Double.MAX_VALUE;
            v[3] = -0.0;
            b.number(NAMES.get(c), UNITS.get(c), "column in " + (UNITS.get(c).isEmpty() ? "no unit" : UNITS.get(c))
                    + ", description with ρ and ∇_ad", v);
        }
        List<String> stars = new ArrayList<>(List.of("Alpha, the first", "β-star", "Ölund", "", "plain", "x", "last"));
        b.text("star", "made-up star name", stars);
        return b.build();
    }

    static Summary summary() {
        Summary composition = new Summary.Builder("composition", metadata())
                .number("X", 0.7, "", "hydrogen mass fraction")
                .number("mu", 0.6153846153846154, "", "mean molecular weight")
                .build();
        Summary warning = new Summary.Builder("warning", metadata())
                .text("code", "radiation_dominated", "code")
                .text("message", "radiation pressure exceeds gas pressure", "what")
                .build();
        return new Summary.Builder("star", metadata())
                .number("mass", 40.0, "Msun", "total mass")
                .number("P_c", 1.234567890123e17, "dyn/cm2", "central pressure")
                .integer("shells", 7L, "number of shells")
                .flag("stable", true, "whether the star is stable")
                .text("kind", "standard", "model kind")
                .nested("composition", composition, "composition")
                .summaries("warnings", List.of(warning), "validity warnings")
                .table("profile", table("profile", 11), "interior profile")
                .build();
    }
}
