package org.stellabar.cli;

import java.io.BufferedOutputStream;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.atomic.AtomicBoolean;

/** Entry point of the runnable jar. */
public final class Main {

    /** Shows library log messages and the stack trace of an internal error; accepted anywhere. */
    static final String VERBOSE = "--verbose";
    private static final AtomicBoolean OUT_OF_MEMORY_SAID = new AtomicBoolean();
    /**
     * Heap held back at start and let go at the first OutOfMemoryError, so that saying so and
     * exiting (shutdown hooks, the other threads unwinding) has room to run. 2 MB, the most the
     * one-line test of a 32 MB heap runs with: every page of it is touched (zeroed) at start, and
     * on the virtual machines we run on a first touch costs ~5-10 µs a page (8 MB took 20-40 ms).
     */
    private static volatile byte[] reserve = new byte[(int) Math.min(2L << 20, Runtime.getRuntime().maxMemory() / 16)];
    /**
     * Made before the heap can fill: saying it must not need memory. Joined with a StringBuilder:
     * String.format would set up the locale data at every start (~10 ms) and a {@code +} the
     * method handles of an invokedynamic concatenation (~5 ms), for one number.
     */
    private static final byte[] OUT_OF_MEMORY_LINE = new StringBuilder("stellabar: out of memory: the job needs more"
            + " than the Java heap's ").append(Runtime.getRuntime().maxMemory() / (1024 * 1024)).append(" MB; give the"
            + " JVM more (STELLABAR_JAVA_OPTS=-Xmx8g ./stellabar ..., or java -Xmx8g -jar stellabar.jar ...) or ask"
            + " for fewer rows (--steps, --points)").append(System.lineSeparator()).toString()
            .getBytes(java.nio.charset.StandardCharsets.UTF_8);
    /** {@link QuietLogging}'s name, as text: naming the class would load it at every start. */
    private static final String QUIET_LOGGING = "org.stellabar.cli.QuietLogging";

    private Main() {
    }

    /** @param args command-line arguments */
    public static void main(String[] args) {
        if (args.length > 0 && "sequence".equals(args[0])) {
            // its options do not change the standard model it needs: solving starts now, on a
            // second thread, not after picocli has read the command line
            SequenceCommand.solveAhead();
        }
        boolean verbose = java.util.Arrays.asList(args).contains(VERBOSE);
        if (verbose) {
            args = java.util.Arrays.stream(args).filter(a -> !a.equals(VERBOSE)).toArray(String[]::new);
            StellabarCommand.verbose(true);
        }
        prepare(verbose);
        int status;
        try {
            var commandLine = StellabarCommand.commandLine(args);
            // UTF-8 always, whatever the locale says (under LANG=C Java would print Γ1 as ?1):
            // terminals, files and pipes today read UTF-8; numbers are locale-independent anyway
            commandLine.setOut(new StandardOutput(new BufferedOutputStream(new FileOutputStream(FileDescriptor.out),
                    1 << 16)));
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
     * What a run sets up before its command (also run by {@link StartupTraining}, so that the
     * start-up archive holds these classes too).
     *
     * @param verbose whether the libraries' log messages are shown ({@code --verbose})
     */
    static void prepare(boolean verbose) {
        // charts are drawn off screen; no display is needed or wanted
        System.setProperty("java.awt.headless", "true");
        // picocli's documented switch for its built-in converters of java.sql and java.time types,
        // which no option here takes: registering them set up those packages, and java.time's
        // locale data, at every start (~100 classes)
        System.setProperty("picocli.converters.excludes", "java\\.sql\\..*,java\\.time\\..*");
        // a worker thread that runs out of memory says so in the same one line, not a stack trace
        Thread.setDefaultUncaughtExceptionHandler(new OneLineReport());
        // Libraries log through java.util.logging (nom-tam-fits warns with a stack trace about a
        // truncated file before we report it in one line): silent unless --verbose, given anywhere.
        // Configured when a library first logs, not at every start: most commands never do, and
        // setting up java.util.logging costs ~10 ms (QuietLogging)
        if (!verbose) {
            System.setProperty("java.util.logging.config.class", QUIET_LOGGING);
        }
    }

    /**
     * Reports what a thread let escape in one line (a class rather than a lambda: a lambda's
     * method handles would be spun at every start).
     */
    private static final class OneLineReport implements Thread.UncaughtExceptionHandler {
        @Override
        public void uncaughtException(Thread thread, Throwable e) {
            reserve = null; // room for what follows, if the heap is full
            if (causedByOutOfMemory(e)) {
                outOfMemory();
            } else if (!OUT_OF_MEMORY_SAID.get()) {
                // after running out of memory, other threads fail as a consequence (a class that
                // could not initialize, say): the one line already said what happened
                System.err.println("stellabar: internal error in " + thread.getName() + ": " + e
                        + " (please report it)");
            }
        }
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
