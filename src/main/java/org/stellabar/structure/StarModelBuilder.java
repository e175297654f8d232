package org.stellabar.structure;

import org.stellabar.table.Inputs;


/**
 * Builds the stars of one {@link StarKind}: its structure, its stability and its luminosity
 * ratio. One class per kind, registered in {@link StarBuilder}; {@link StarBuilder} adds what is
 * common to every kind (Eddington luminosity, the profile table, metadata, the headline).
 *
 * @param <R> the kind's request record
 */
public interface StarModelBuilder<R extends StarRequest> {

    /** @return the kind this builder makes */
    StarKind kind();

    /** @return the request record of that kind */
    Class<R> requestType();

    /**
     * @param request what to build
     * @param shared the solutions every kind may use (Lane-Emden cache, standard model)
     * @return the structure and what the kind knows about it
     * @throws StarRequestException if the request has no solution
     * @throws org.stellabar.physics.ConvergenceException if an iteration exhausts its bound
     */
    BuiltStar build(R request, StarBuildContext shared);

    /**
     * Adds the kind's own inputs (beyond name, kind, mass, scale anchor, composition and points)
     * for metadata, as the user would read them.
     *
     * @param request the request
     * @param inputs where to add them, in a stable order
     */
    void describeInputs(R request, Inputs.Builder inputs);

    /**
     * @param request the request
     * @return a few words naming the model for titles, e.g. "polytrope n = 1.5"
     */
    String title(R request);
}
