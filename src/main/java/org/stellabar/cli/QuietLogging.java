package org.stellabar.cli;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.logging.LogManager;

/**
 * The java.util.logging configuration of a run without {@code --verbose}: no handlers and the root
 * level OFF, so libraries that log (nom-tam-fits warns with a stack trace about a truncated file
 * before we report it in one line) stay silent. {@link Main} names this class in the system property
 * {@code java.util.logging.config.class}; the log manager makes it, instead of reading the JDK's
 * logging.properties, only when something first logs, so a run that logs nothing never pays for
 * setting logging up. Not for use otherwise.
 */
public final class QuietLogging {

    /** No handlers, everything off: what {@code LogManager.reset()} and the root level OFF gave. */
    private static final String CONFIGURATION = "handlers=\n.level=OFF\n";

    /**
     * Configures the log manager; called by it, through the documented config-class hook.
     *
     * @throws UncheckedIOException never in practice: the configuration is read from memory
     */
    public QuietLogging() {
        try {
            LogManager.getLogManager().readConfiguration(
                    new ByteArrayInputStream(CONFIGURATION.getBytes(StandardCharsets.ISO_8859_1)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
