package org.stellabar.validation;

import java.util.Arrays;
import java.util.stream.Collectors;
import org.stellabar.physics.BadInputException;

/**
 * Where a reference value comes from, as its row in a reference table says. The labels are the
 * ones the project's provenance rule uses, so a reader can tell a transcribed number from a
 * recalled, computed or derived one.
 */
public enum Provenance {
    /** Transcribed from the printed source with the source at hand. */
    PUBLISHED("published"),
    /** A published number typed without the source at hand. */
    FROM_MEMORY("from memory"),
    /** Computed independently of stellabar by the script beside the table. */
    COMPUTED("computed"),
    /** The exact value of a closed-form expression. */
    CLOSED_FORM("closed form"),
    /** A rounded number in common use, quoted without a particular source. */
    COMMON_PRACTICE("common practice"),
    /** An identity of thermodynamics checked by finite differences (no table). */
    IDENTITY("identity");

    private final String label;

    Provenance(String label) {
        this.label = label;
    }

    /** @return the label as written in the tables and the report */
    public String label() {
        return label;
    }

    /**
     * @param label a label as written in a table
     * @param where file and line, for the error message
     * @return the provenance
     * @throws BadInputException for an unknown label
     */
    public static Provenance parse(String label, String where) {
        for (Provenance p : values()) {
            if (p.label.equals(label.strip())) {
                return p;
            }
        }
        throw new BadInputException(where + ": provenance \"" + label + "\" is not one of "
                + Arrays.stream(values()).map(p -> "\"" + p.label + "\"").collect(Collectors.joining(", ")));
    }
}
