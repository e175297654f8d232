package org.stellabar.output;

import java.util.ArrayList;
import java.util.List;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/** Small tables and summaries with awkward text for the writer tests (no physics). */
final class Fixtures {

    static final Metadata META = Metadata.of("a test table, with a comma", Inputs.builder().text("rho", "1 g/cm3")
            .text("label", "say \"hi\"").number("M", 40.0, "Msun", "total mass").integer("points", 7, "rows")
            .number("tolerance", 1e-10, "", "").build(), List.of("first note", "second note"));

    /** Doubles whose shortest decimal forms are easy to get wrong. */
    static final double[] AWKWARD = {0.1, 1.0 / 3.0, 1e-300, Double.MIN_VALUE, Double.MAX_VALUE, -2.5e17, 0.0, 1e7,
        123456789.123, 6.02214076e23};

    static final List<String> AWKWARD_TEXT = List.of("plain", "with, comma", "with \"quotes\"", "two\nlines", "cr\rhere",
            "λ_e and ∇_ad", "", "  padded  ");

    private Fixtures() {
    }

    static Table table() {
        double[] index = new double[AWKWARD.length];
        List<String> text = new ArrayList<>();
        for (int i = 0; i < AWKWARD.length; i++) {
            index[i] = i;
            text.add(AWKWARD_TEXT.get(i % AWKWARD_TEXT.size()));
        }
        return new Table.Builder("sample", META).number("rho", "g/cm3", "density", AWKWARD)
                .number("index", "", "row number", index).text("label", "free text", text).build();
    }

    static Summary summary() {
        Summary inner = new Summary.Builder("composition", META).number("mu", 0.6172839506172839, "", "mean weight")
                .build();
        Summary w1 = new Summary.Builder("warning", META).text("code", "pair_creation", "code")
                .text("message", "pairs, \"many\"", "message").build();
        Summary w2 = new Summary.Builder("warning", META).text("code", "coulomb_coupling", "code")
                .text("message", "coupled", "message").build();
        return new Summary.Builder("state", META).number("P", 1.3721620554405665E15, "dyn/cm2", "pressure")
                .number("beta", 0.9816208947519909, "", "gas fraction").integer("count", 42, "a count")
                .text("name", "a, b", "text").flag("ok", true, "flag").nested("composition", inner, "mixture")
                .summaries("warnings", List.of(w1, w2), "warnings").table("profile", table(), "a table").build();
    }
}
