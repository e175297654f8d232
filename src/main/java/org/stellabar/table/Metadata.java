package org.stellabar.table;

import java.util.List;
import java.util.Objects;

/**
 * What a table or summary is, and where it came from.
 *
 * @param title what was computed, one line
 * @param inputs the inputs, typed (numbers with their units), in a stable order
 * @param notes assumptions and cautions, one line each
 * @param toolVersion the stellabar version
 * @param constants the release of the physical constants used
 */
public record Metadata(String title, Inputs inputs, List<String> notes, String toolVersion,
        String constants) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param title what was computed, one line
     * @param inputs the inputs, typed (numbers with their units), in a stable order
     * @param notes assumptions and cautions, one line each
     * @param toolVersion the stellabar version
     * @param constants the release of the physical constants used
     */
    public Metadata {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(inputs, "inputs");
        notes = List.copyOf(notes);
        Objects.requireNonNull(toolVersion, "toolVersion");
        Objects.requireNonNull(constants, "constants");
    }

    /**
     * Metadata stamped with this build's version and constants release.
     *
     * @param title what was computed
     * @param inputs the inputs
     * @param notes assumptions and cautions
     * @return the metadata
     */
    public static Metadata of(String title, Inputs inputs, List<String> notes) {
        return new Metadata(title, inputs, notes, Version.current(), org.stellabar.physics.Constants.RELEASE);
    }

    /**
     * @param note one line
     * @return a copy with one more note
     */
    public Metadata withNote(String note) {
        List<String> more = new java.util.ArrayList<>(notes);
        more.add(note);
        return new Metadata(title, inputs, more, toolVersion, constants);
    }
}
