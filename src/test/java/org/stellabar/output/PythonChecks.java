package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Runs checks with Debian's Python 3 and its libraries (astropy, nbformat, nbconvert), which are
 * independent readers of what our writers produce. {@code .ci/run} installs them. A missing
 * interpreter or library fails the test with a message saying so; it never skips, so a machine
 * without them cannot pass the suite by accident.
 */
final class PythonChecks {

    /** Debian's interpreter; the first python3 on PATH may be another one without the libraries. */
    static final String PYTHON = "/usr/bin/python3";

    private static final String INSTALL_HINT = "run .ci/run (as root) once: it installs the Debian packages"
            + " python3-astropy python3-nbformat jupyter-nbconvert python3-nbclient python3-ipykernel"
            + " python3-matplotlib python3-numpy python3-pandas";

    /** What a finished process said. */
    record Outcome(int exitCode, String stdout, String stderr, Duration elapsed) {
        /** @return the exit code, stdout and stderr for a failure message */
        String describe() {
            return "exit code " + exitCode + "\n--- stdout ---\n" + stdout + "\n--- stderr ---\n" + stderr;
        }
    }

    private PythonChecks() {
    }

    /**
     * Fails the calling test unless {@link #PYTHON} imports every module.
     *
     * @param modules Python module names, e.g. "astropy"
     */
    static void requireModules(String... modules) {
        if (!Files.isExecutable(Path.of(PYTHON))) {
            fail(PYTHON + " is missing; " + INSTALL_HINT);
        }
        String imports = "import " + String.join(", ", modules);
        Outcome o;
        try {
            o = run(Duration.ofSeconds(60), Path.of("."), Map.of(), PYTHON, "-c", imports);
        } catch (IOException e) {
            throw new AssertionError(PYTHON + " could not be started: " + e.getMessage() + "; " + INSTALL_HINT, e);
        }
        if (o.exitCode() != 0) {
            fail(PYTHON + " cannot '" + imports + "': " + o.stderr().strip() + "\n" + INSTALL_HINT);
        }
    }

    /**
     * @param name a file name in this package's test resources
     * @return its path on disk
     */
    static Path resource(String name) {
        URL url = PythonChecks.class.getResource(name);
        if (url == null) {
            throw new IllegalStateException("test resource " + name + " is missing");
        }
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * Runs a command with a time limit, Debian's /usr/bin first on PATH, Matplotlib's Agg backend
     * and Python's byte-code cache off.
     *
     * @param limit the time allowed; the process is killed after it and the test fails
     * @param workDir the working folder (also receives the captured output files)
     * @param extraEnv more environment variables
     * @param command the command and its arguments
     * @return what the process said
     * @throws IOException if it cannot be started
     */
    static Outcome run(Duration limit, Path workDir, Map<String, String> extraEnv, String... command)
            throws IOException {
        ProcessBuilder pb = new ProcessBuilder(List.of(command)).directory(workDir.toFile());
        Map<String, String> env = pb.environment();
        env.put("PATH", "/usr/bin:/bin:" + env.getOrDefault("PATH", ""));
        env.put("MPLBACKEND", "Agg");
        env.put("PYTHONDONTWRITEBYTECODE", "1");
        env.putAll(extraEnv);
        Path out = Files.createTempFile(workDir, "python-", ".out");
        Path err = Files.createTempFile(workDir, "python-", ".err");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        long start = System.nanoTime();
        Process p = pb.start();
        try {
            if (!p.waitFor(limit.toMillis(), TimeUnit.MILLISECONDS)) {
                p.destroyForcibly();
                fail(String.join(" ", command) + " did not finish within " + limit + ":\n" + Files.readString(err));
            }
        } catch (InterruptedException e) {
            p.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        }
        Duration elapsed = Duration.ofNanos(System.nanoTime() - start);
        Outcome o = new Outcome(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8), elapsed);
        Files.deleteIfExists(out);
        Files.deleteIfExists(err);
        return o;
    }
}
