package org.stellabar.survey;

import java.util.Objects;
import org.stellabar.structure.StarSchema;

/**
 * What became of one point of a survey: its model's headline values, or the reason it has none.
 * A failed point keeps its place in the table; its numbers are zero (never NaN) and its status
 * says it failed.
 *
 * @param point 0-based point number
 * @param failure empty when the model was built, else why not (one line)
 * @param row the model's values in the star schema (zeros for a failed point)
 */
public record SurveyOutcome(int point, String failure, StarSchema.Row row) {

    /** Status word of a point whose model was built. */
    public static final String OK = "ok";
    /** Status word of a point whose model failed. */
    public static final String FAILED = "failed";

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param point 0-based point number
     * @param failure empty when the model was built, else why not (one line)
     * @param row the model's values in the star schema (zeros for a failed point)
     */
    public SurveyOutcome {
        Objects.requireNonNull(failure, "failure");
        Objects.requireNonNull(row, "row");
    }

    /** @return true if the model was built */
    public boolean ok() {
        return failure.isEmpty();
    }

    /** @return {@link #OK} or {@link #FAILED} */
    public String status() {
        return ok() ? OK : FAILED;
    }
}
