package org.stellabar.pipeline;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteFeature;

/**
 * The JSON factory of part files: numbers written as shortest round-trip decimals (Schubfach) and
 * read back with a correctly rounded fast parser (Lemire's algorithm, as Jackson's
 * {@code USE_FAST_DOUBLE_PARSER}), so that a part's doubles come back bit for bit and a 10⁶-row
 * merge spends its time on the rows, not on decimal conversion.
 */
final class PartJson {

    /** Thread-safe once built, as every Jackson factory. */
    static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .build();

    private PartJson() {
    }
}
