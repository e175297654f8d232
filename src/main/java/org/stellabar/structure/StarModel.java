package org.stellabar.structure;

import java.util.Objects;
import org.stellabar.table.Table;

/**
 * One physical star: what was asked, its headline numbers, its structure and its profile table.
 *
 * @param request the request
 * @param headline the headline numbers
 * @param structure the structure the numbers come from
 * @param profile the profile as a table (see {@link ProfileTable})
 */
public record StarModel(StarRequest request, StarHeadline headline, StarStructure structure, Table profile) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param request the request
     * @param headline the headline numbers
     * @param structure the structure the numbers come from
     * @param profile the profile as a table (see {@link ProfileTable})
     */
    public StarModel {
        Objects.requireNonNull(request, "request");
        Objects.requireNonNull(headline, "headline");
        Objects.requireNonNull(structure, "structure");
        Objects.requireNonNull(profile, "profile");
    }
}
