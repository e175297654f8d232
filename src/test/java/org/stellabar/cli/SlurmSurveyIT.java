package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A survey on a real Slurm scheduler: a 20 × 20 survey of isentropic stars (mass × central
 * temperature) is written out as a job-array driver with 4 shards, submitted with
 * {@code bash JOB.sh --wait} to a one-node cluster started for this test, and its merged table
 * and maps must be byte-identical to the unsharded run's. Fails (does not skip) when Slurm cannot
 * start; the daemons are stopped in every case.
 */
class SlurmSurveyIT {

    private static final Path PROJECT = Path.of("").toAbsolutePath();
    private static final Path JAR = PROJECT.resolve("target/stellabar.jar");

    static final String SURVEY = """
            # isentropic stars over mass and central temperature, near the relativistic edge
            [survey]
            name = "iso-edge"
            kind = "isentropic"
            X = 0.7
            Z = 0.02
            points = 100
            chart_formats = ["svg"]
            [survey.axes.mass]
            from = "10 Msun"
            to = "1e6 Msun"
            count = 20
            scale = "log"
            [survey.axes.central_temperature]
            from = "1e7 K"
            to = "1e9 K"
            count = 20
            scale = "log"
            """;

    @Test
    void jobArrayAndMergeGiveTheUnshardedBytes(@TempDir Path dir) throws Exception {
        assertTrue(Files.isRegularFile(JAR), "run after mvn package: " + JAR);
        Path survey = Files.writeString(dir.resolve("iso-edge.toml"), SURVEY);
        Path whole = dir.resolve("whole");
        assertEquals(0, stellabar(Map.of(), "survey", survey.toString(), "--out", whole.toString(), "-q"));

        Path cluster = Files.createDirectories(dir.resolve("cluster"));
        try (OneNodeSlurm slurm = OneNodeSlurm.start(cluster)) {
            Path run = dir.resolve("run");
            Path job = dir.resolve("iso-edge.sh");
            assertEquals(0, stellabar(slurm.environment(), "survey", survey.toString(), "--slurm-script",
                    job.toString(), "--shards", "4", "--out", run.toString(), "--time", "10:00", "--mem", "1000M"));
            ProcessBuilder b = new ProcessBuilder("bash", job.toString(), "--wait").redirectErrorStream(true)
                    .redirectOutput(dir.resolve("driver.log").toFile());
            b.environment().putAll(slurm.environment());
            Process driver = b.start();
            boolean ended = driver.waitFor(8, TimeUnit.MINUTES);
            if (!ended) {
                driver.destroyForcibly();
            }
            String log = Files.readString(dir.resolve("driver.log"));
            assertTrue(ended, "the driver did not finish within 8 minutes: " + log);
            assertEquals(0, driver.exitValue(), "driver: " + log + logs(run.resolve("logs")));
            for (int k = 1; k <= 4; k++) {
                assertEquals("0", Files.readString(run.resolve("logs/part-" + k + ".status")).strip(), "part " + k);
                assertTrue(Files.exists(run.resolve("parts/iso-edge-" + k + "-of-4.part.json")));
            }
            List<String> names = files(whole);
            List<String> merged = files(run);
            assertEquals(names, merged, "the merged survey has the unsharded run's files");
            assertTrue(names.contains("iso-edge.csv") && names.contains("iso-edge-gr-margin-1col.svg"), names.toString());
            for (String name : names) {
                assertArrayEquals(Files.readAllBytes(whole.resolve(name)), Files.readAllBytes(run.resolve(name)), name);
            }
        }
    }

    private static int stellabar(Map<String, String> env, String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("java", "-Djava.awt.headless=true", "-jar", JAR.toString()));
        command.addAll(List.of(args));
        ProcessBuilder b = new ProcessBuilder(command).redirectErrorStream(true);
        b.environment().putAll(env);
        Process p = b.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor();
        if (p.exitValue() != 0) {
            System.err.println(out);
        }
        return p.exitValue();
    }

    /** The regular files of a folder (not its parts and logs folders), sorted. */
    private static List<String> files(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(Files::isRegularFile).map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static String logs(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return "";
        }
        StringBuilder b = new StringBuilder();
        try (Stream<Path> s = Files.list(dir)) {
            for (Path f : s.sorted().toList()) {
                b.append("\n--- ").append(f.getFileName()).append(": ").append(Files.readString(f).strip());
            }
        }
        return b.toString();
    }
}
