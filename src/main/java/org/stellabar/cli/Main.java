package org.stellabar.cli;

import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;

/** Entry point of the runnable jar. */
public final class Main {

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
            if (e instanceof OutOfMemoryError) {
                outOfMemory();
            } else {
                System.err.println("stellabar: internal error in " + thread.getName() + ": " + e
                        + " (please report it)");
            }
        });
        int status;
        try {
            status = StellabarCommand.commandLine(args).execute(args);
        } catch (OutOfMemoryError e) {
            status = outOfMemory();
        }
        System.exit(status);
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
