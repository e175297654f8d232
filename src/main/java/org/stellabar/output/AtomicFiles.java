package org.stellabar.output;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

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
        Path tmp = Files.createTempFile(parent, "." + target.getFileName() + ".", ".part");
        try {
            makeReadable(tmp);
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

    /** Temporary files are created owner-only; a result file is for everyone to read (rw-r--r--). */
    private static void makeReadable(Path file) throws IOException {
        if (file.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        }
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
