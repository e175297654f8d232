package org.stellabar.pipeline;

import java.nio.file.Path;
import java.util.List;
import org.stellabar.structure.StarModel;
import org.stellabar.table.Table;

/**
 * What a scenario run produced.
 *
 * @param models the stars, in scenario order
 * @param summary the cluster summary table
 * @param files every file written, in the order written
 */
public record RunResult(List<StarModel> models, Table summary, List<Path> files) {

    /**
     * Canonical constructor: copies collections in.
     *
     * @param models the stars, in scenario order
     * @param summary the cluster summary table
     * @param files every file written, in the order written
     */
    public RunResult {
        models = List.copyOf(models);
        files = List.copyOf(files);
    }
}
