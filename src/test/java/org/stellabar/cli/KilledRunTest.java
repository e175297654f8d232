package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * A real run killed while it writes a large table: SIGINT and SIGTERM leave no temporary behind,
 * and what SIGKILL leaves, the next run into the same folder removes.
 */
class KilledRunTest {

    private static final String JAVA = Path.of(System.getProperty("java.home"), "bin", "java").toString();

    private static Process grid(Path out, int points) throws Exception {
        return new ProcessBuilder(List.of(JAVA, "-cp", System.getProperty("java.class.path"), Main.class.getName(),
                "grid", "--rho-range", "1e-10:1e8", "--temp-range", "1e3:1e10", "--points", Integer.toString(points),
                "--chart-formats", "png", "--out", out.toString()))
                .redirectOutput(new File("/dev/null")).redirectError(new File("/dev/null")).start();
    }

    private static long temporaries(Path folder) throws Exception {
        try (var files = Files.list(folder)) {
            return files.filter(f -> f.getFileName().toString().endsWith(".part")).count();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"INT", "TERM", "KILL"})
    void noTemporaryOutlivesAKilledRun(String signal, @TempDir Path dir) throws Exception {
        // 1500 x 1500 rows: about 600 MB of CSV, seconds of writing to interrupt
        Process run = grid(dir, 1500);
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (temporaries(dir) == 0 && run.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        assertTrue(run.isAlive() && temporaries(dir) > 0, "the run is writing its table");
        Process kill = new ProcessBuilder("kill", "-" + signal, Long.toString(run.pid())).start();
        assertEquals(0, kill.waitFor());
        assertTrue(run.waitFor(60, TimeUnit.SECONDS), "the run ended");
        if (!signal.equals("KILL")) {
            assertEquals(0, temporaries(dir), "the shutdown hook removed the temporary");
        }
        Process again = grid(dir, 10);
        assertTrue(again.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, again.exitValue());
        assertEquals(0, temporaries(dir), "no temporary after a rerun");
        assertTrue(Files.isRegularFile(dir.resolve("grid.csv")));
    }
}
