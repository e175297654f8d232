package org.stellabar.output;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.locks.LockSupport;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes files so that a reader never sees a partial one: the content goes to a temporary file
 * in the target's folder ({@code .NAME.HOST-PID-RANDOM.part}, the writing machine and process), which is then
 * moved over the target in one step.
 *
 * <p>No temporary outlives its run: a failure removes it at once; SIGINT and SIGTERM remove the
 * live ones through a shutdown hook; and what a SIGKILL (or a power cut) leaves behind, the next
 * run removes from every folder it writes into: temporaries of this naming scheme written on this
 * machine by a process that is no longer alive (another machine's, in a folder shared between
 * cluster nodes, are left alone).
 */
public final class AtomicFiles {

    /** Our temporaries: a leading dot, the target's name, a dot, the writer's pid, a base-36 tag, ".part". */
    private static final Pattern TEMPORARY = Pattern.compile("^\\..+\\.([A-Za-z0-9]+)-([0-9]+)-[0-9a-z]+\\.part$");
    private static final long PID = ProcessHandle.current().pid();
    /**
     * This machine's name, letters and digits only: a folder shared between cluster nodes holds
     * other machines' temporaries, whose process ids mean nothing here and must not be swept.
     */
    private static final String HOST = host();
    /** Temporaries being written by this process, removed on SIGINT/SIGTERM. */
    private static final Set<Path> LIVE = ConcurrentHashMap.newKeySet();
    /** Folders already swept of stale temporaries by this process. */
    private static final Set<Path> SWEPT = ConcurrentHashMap.newKeySet();

    /** Set when the process ends: no temporary may be begun after it. */
    private static volatile boolean ending;

    /**
     * Writers between the start of their temporary and its end (moved into place or removed).
     * Counted before the temporary is made and after {@link #LIVE} lets go of it, so that a
     * writer the shutdown hook does not count reads {@link #ending} as set, after the hook set it.
     */
    private static final AtomicInteger WRITING = new AtomicInteger();

    /** How long the shutdown hook waits at most for writers under way. */
    private static final long WRITERS_WAIT_NANOS = 100_000_000L;

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            ending = true;
            // twice: a writer that began a temporary just before the flag was set registers it
            // a moment later (other threads run on while shutdown hooks do). The wait is for
            // writers under way only: a run that ends normally has none and exits at once (an
            // unconditional 100 ms sleep here delayed the end of every run that wrote a file).
            removeLive();
            long deadline = System.nanoTime() + WRITERS_WAIT_NANOS;
            while (WRITING.get() > 0 && System.nanoTime() - deadline < 0) {
                LockSupport.parkNanos(1_000_000L);
            }
            removeLive();
        }, "stellabar-temporaries"));
    }

    private static void removeLive() {
        for (Path p : LIVE) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                // nothing more can be done while the process ends
            }
        }
    }

    /** Writes bytes to a stream. */
    @FunctionalInterface
    public interface StreamContent {
        /**
         * @param out the stream to write to
         * @throws IOException when writing fails (the temporary is then removed)
         */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes characters to a writer. */
    @FunctionalInterface
    public interface TextContent {
        /**
         * @param out the writer to write to
         * @throws IOException when writing fails (the temporary is then removed)
         */
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
        // a folder that exists is the rule: createDirectories would find that out by failing to
        // make it, two exceptions with their stack traces per file written
        if (!Files.isDirectory(parent)) {
            Files.createDirectories(parent);
        }
        sweep(parent);
        WRITING.incrementAndGet();
        try {
            writeThrough(parent, target, content);
        } finally {
            WRITING.decrementAndGet();
        }
    }

    /** @return writers under way now: between the start of their temporary and its end */
    static int writersUnderWay() {
        return WRITING.get();
    }

    /** {@link #write}'s temporary, from its creation to its move into place or its removal. */
    private static void writeThrough(Path parent, Path target, StreamContent content) throws IOException {
        Path tmp = createSibling(parent, target);
        LIVE.add(tmp);
        if (ending) {
            Files.deleteIfExists(tmp);
            LIVE.remove(tmp);
            throw new IOException("the process is ending; " + target + " was not written");
        }
        boolean moved = false;
        try {
            // buffered: writers such as PDFBox's write a PDF a name or a number at a time, and
            // each unbuffered write is a system call (writes of a buffer or more pass straight on)
            try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                content.writeTo(out);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } finally {
            // after the move there is no temporary left to delete (looking for it would cost an
            // exception inside the JDK per file)
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
            LIVE.remove(tmp);
        }
    }

    /**
     * Removes, once per folder and run, temporaries of our naming scheme that a killed earlier run
     * left: those whose writing process is no longer alive (never a live writer's file).
     */
    private static void sweep(Path folder) throws IOException {
        if (!SWEPT.add(folder)) {
            return;
        }
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder, ".*.part")) {
            for (Path p : entries) {
                Matcher m = TEMPORARY.matcher(p.getFileName().toString());
                if (m.matches() && m.group(1).equals(HOST) && Files.isRegularFile(p) && !alive(m.group(2))) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private static String host() {
        try {
            String name = Files.readString(Path.of("/proc/sys/kernel/hostname")).replaceAll("[^A-Za-z0-9]", "");
            return name.isEmpty() ? "host" : name;
        } catch (IOException | RuntimeException e) {
            return "host";
        }
    }

    private static boolean alive(String pid) {
        try {
            long id = Long.parseLong(pid);
            return id == PID || ProcessHandle.of(id).map(ProcessHandle::isAlive).orElse(false);
        } catch (NumberFormatException e) {
            return false;
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
            String tag = HOST + "-" + PID + "-" + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36);
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
