package org.stellabar.output;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes files so that a reader never sees a partial one: the content goes to a temporary file
 * in the target's folder, which is then moved over the target in one step.
 */
public final class AtomicFiles {

    /** Writes bytes to a stream. */
    @FunctionalInterface
    public interface StreamContent {
        /** @param out the stream to write to */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes characters to a writer. */
    @FunctionalInterface
    public interface TextContent {
        /** @param out the writer to write to */
        void writeTo(Writer out) throws IOException;
    }

    /** Random names tried for the temporary file before giving up (collisions are very rare). */
    private static final int MAX_NAME_ATTEMPTS = 100;

    private AtomicFiles() {
    }

    /**
     * Writes a binary file atomically, creating parent folders.
     *
     * @param target the file to create or replace
     * @param content what to write
     * @throws IOException on failure, after removing the temporary file
     */
    public static void write(Path target, StreamContent content) throws IOException {
        Path parent = target.toAbsolutePath().getParent();
        Files.createDirectories(parent);
        Path tmp = createSibling(parent, target);
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * Creates an empty hidden file beside the target. Unlike {@link Files#createTempFile}, which
     * makes the file readable by its owner only, this gives it the permissions any new file gets
     * (the process umask), so that the finished output is as readable as one written directly.
     */
    private static Path createSibling(Path parent, Path target) throws IOException {
        String prefix = "." + target.getFileName() + ".";
        for (int attempt = 0; attempt < MAX_NAME_ATTEMPTS; attempt++) {
            String tag = Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36);
            try {
                return Files.createFile(parent.resolve(prefix + tag + ".part"));
            } catch (FileAlreadyExistsException e) {
                // another writer holds this name; draw another
            }
        }
        throw new IOException("could not create a temporary file beside " + target + " after "
                + MAX_NAME_ATTEMPTS + " attempts");
    }

    /**
     * Writes a UTF-8 text file atomically, creating parent folders.
     *
     * @param target the file to create or replace
     * @param content what to write
     * @throws IOException on failure, after removing the temporary file
     */
    public static void writeText(Path target, TextContent content) throws IOException {
        write(target, out -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
            content.writeTo(w);
            w.flush();
        });
    }
}
