package org.stellabar.pipeline;

import java.nio.file.Path;

/**
 * What the checks of a set of parts need of each part, whatever the job: which run it belongs to
 * (the job or survey name, the content hash, N and the stellabar version) and which slice of the
 * whole it holds.
 */
interface PartHeader {

    /** @return the part file */
    Path file();

    /** @return the survey's name or the job's ("sequence", "grid") */
    String runName();

    /** @return SHA-256 of what defines the whole run */
    String contentHash();

    /** @return the stellabar version that wrote the part */
    String toolVersion();

    /** @return K and N */
    Shard shard();

    /** @return the first index (point or outer index) of the part */
    int from();

    /** @return one past the last index */
    int to();

    /** @return the indices of the whole run */
    int total();
}
