package org.stellabar.structure;

import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;

/**
 * What star to build: one validated value, one record per {@link StarKind}, whether it comes
 * from a scenario file or from command-line options (both go through {@link StarDraft}). Every
 * record checks its values in its compact constructor with {@link StarRequestRules}, reporting
 * every broken rule at once; a builder never sees an impossible request.
 *
 * <p>CGS throughout: masses in g, radii in cm, temperatures in K.
 */
public sealed interface StarRequest permits StandardModelRequest, PolytropeRequest, IsentropicRequest {

    /** Label of a request that was not given one. */
    String DEFAULT_NAME = "model";
    /** Profile rows when none are asked for (scenario files and the command line alike). */
    int DEFAULT_POINTS = 400;
    /** Fewest profile rows: centre, one interior point, surface. */
    int MIN_POINTS = 3;
    /**
     * Most profile rows. 10⁵ rows of ~20 columns is ~30 MB of CSV per star, far past what a
     * smooth polytropic or isentropic profile needs; more is almost certainly a typing mistake.
     */
    int MAX_POINTS = 100_000;
    /** The polytropic index must lie below this: from n = 5 on, θ never reaches zero. */
    double INDEX_LIMIT = 5.0;

    /** @return a short label for titles and file names, e.g. "model" or a star's name */
    String name();

    /** @return the kind of model */
    StarKind kind();

    /** @return total mass M [g] */
    double mass();

    /** @return the mixture */
    Composition composition();

    /** @return which equation of state treats the electrons; the classical mixture unless a kind says otherwise */
    default Electrons electrons() {
        return Electrons.classical;
    }

    /** @return what fixes the star's scale besides its mass */
    ScaleAnchor anchor();

    /** @return number of profile rows, in [{@link #MIN_POINTS}, {@link #MAX_POINTS}] */
    int points();

    /**
     * @param profilePoints number of profile rows
     * @return a copy with this many profile rows
     */
    StarRequest withPoints(int profilePoints);
}
