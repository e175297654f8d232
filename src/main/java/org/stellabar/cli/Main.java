package org.stellabar.cli;

import java.io.BufferedWriter;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;

/** Entry point of the runnable jar. */
public final class Main {

    /** Shows library log messages and the stack trace of an internal error; accepted anywhere. */
    static final String VERBOSE = "--verbose";
    private static final AtomicBoolean OUT_OF_MEMORY_SAID = new AtomicBoolean();
    /**
     * Heap held back at start and let go at the first OutOfMemoryError, so that saying so and
     * exiting (shutdown hooks, the other threads unwinding) has room to run.
     */
    private static volatile byte[] reserve = new byte[(int) Math.min(8L << 20, Runtime.getRuntime().maxMemory() / 16)];
    /** Made before the heap can fill: saying it must not need memory. */
    private static final byte[] OUT_OF_MEMORY_LINE = String.format(Locale.ROOT, "stellabar: out of memory: the job"
            + " needs more than the Java heap's %d MB; give the JVM more (STELLABAR_JAVA_OPTS=-Xmx8g ./stellabar ...,"
            + " or java -Xmx8g -jar stellabar.jar ...) or ask for fewer rows (--steps, --points)%n",
            Runtime.getRuntime().maxMemory() / (1024 * 1024)).getBytes(java.nio.charset.StandardCharsets.UTF_8);

    private Main() {
    }

    /** @param args command-line arguments */
    public static void main(String[] args) {
        // charts are drawn off screen; no display is needed or wanted
        System.setProperty("java.awt.headless", "true");
        // a worker thread that runs out of memory says so in the same one line, not a stack trace
        Thread.setDefaultUncaughtExceptionHandler((thread, e) -> {
            reserve = null; // room for what follows, if the heap is full
            if (causedByOutOfMemory(e)) {
                outOfMemory();
            } else if (!OUT_OF_MEMORY_SAID.get()) {
                // after running out of memory, other threads fail as a consequence (a class that
                // could not initialize, say): the one line already said what happened
                System.err.println("stellabar: internal error in " + thread.getName() + ": " + e
                        + " (please report it)");
            }
        });
        // Libraries log through java.util.logging (nom-tam-fits warns with a stack trace about a
        // truncated file before we report it in one line): silent unless --verbose, given anywhere
        boolean verbose = java.util.Arrays.asList(args).contains(VERBOSE);
        if (verbose) {
            args = java.util.Arrays.stream(args).filter(a -> !a.equals(VERBOSE)).toArray(String[]::new);
            StellabarCommand.verbose(true);
        } else {
            java.util.logging.LogManager.getLogManager().reset();
            java.util.logging.Logger.getLogger("").setLevel(java.util.logging.Level.OFF);
        }
        int status;
        try {
            var commandLine = StellabarCommand.commandLine(args);
            // UTF-8 always, whatever the locale says (under LANG=C Java would print Γ1 as ?1):
            // terminals, files and pipes today read UTF-8; numbers are locale-independent anyway
            commandLine.setOut(new PrintWriter(new BufferedWriter(new OutputStreamWriter(
                    new FileOutputStream(FileDescriptor.out), StandardCharsets.UTF_8), 1 << 16), false));
            commandLine.setErr(new PrintWriter(new OutputStreamWriter(new FileOutputStream(FileDescriptor.err),
                    StandardCharsets.UTF_8), true));
            status = commandLine.execute(args);
            commandLine.getOut().flush();
            commandLine.getErr().flush();
        } catch (Error e) {
            reserve = null; // room for what follows, if the heap is full
            if (!causedByOutOfMemory(e)) {
                throw e;
            }
            status = outOfMemory();
        }
        System.exit(status);
    }

    /**
     * An OutOfMemoryError, or a failure it caused: a JDK class whose initializer ran out of memory
     * is afterwards "Could not initialize class java.…" in every thread that touches it (nothing
     * else makes a class of the JDK itself fail to initialize).
     */
    private static boolean causedByOutOfMemory(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String message = String.valueOf(t.getMessage());
            if (t instanceof OutOfMemoryError || message.contains("OutOfMemoryError")
                    || t instanceof NoClassDefFoundError && message.startsWith("Could not initialize class java.")) {
                return true;
            }
        }
        return false;
    }

    /** One line: what ran out and what to do. */
    private static int outOfMemory() {
        reserve = null;
        if (OUT_OF_MEMORY_SAID.compareAndSet(false, true)) {
            System.err.write(OUT_OF_MEMORY_LINE, 0, OUT_OF_MEMORY_LINE.length);
            System.err.flush();
        }
        // like bad input, the run cannot be answered as asked: fewer rows or a larger heap will do
        return StellabarCommand.EXIT_BAD_INPUT;
    }
}
