package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * The launcher {@code ./stellabar}, run as users run it, on the jar this build packaged: it records
 * the start-up archives once, and it does not rebuild the jar because a command wrote an output
 * file (here {@code validation/report.md}, which {@code validate} rewrites).
 */
class LauncherIT {

    private static final Path PROJECT = Path.of("").toAbsolutePath();

    private record Run(int status, String out, String err) {
    }

    private static Run launch(String... args) throws IOException, InterruptedException {
        List<String> command = new java.util.ArrayList<>(List.of("bash", PROJECT.resolve("stellabar").toString()));
        command.addAll(List.of(args));
        Path out = Files.createTempFile("launcher", ".out");
        Path err = Files.createTempFile("launcher", ".err");
        try {
            Process p = new ProcessBuilder(command).directory(PROJECT.toFile())
                    .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            assertTrue(p.waitFor(5, TimeUnit.MINUTES), "the launcher did not finish in 5 minutes");
            return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                    Files.readString(err, StandardCharsets.UTF_8));
        } finally {
            Files.deleteIfExists(out);
            Files.deleteIfExists(err);
        }
    }

    @Test
    void recordsTheArchiveOnceAndDoesNotRebuildAfterAnOutputFileChanges() throws Exception {
        Path jar = PROJECT.resolve("target/stellabar.jar");
        assertTrue(Files.isRegularFile(jar), "run after mvn package: " + jar);
        Instant jarTime = Files.getLastModifiedTime(jar).toInstant();

        Run first = launch("--version");
        assertEquals(0, first.status(), first.err());
        assertTrue(first.out().startsWith("stellabar "), first.out());
        assertFalse(first.err().contains("building"), "the packaged jar is up to date: " + first.err());
        assertTrue(Files.isRegularFile(PROJECT.resolve("target/stellabar.jsa")), "start-up archive recorded");
        for (String command : List.of("eos", "polytrope", "sequence")) {
            assertTrue(Files.isRegularFile(PROJECT.resolve("target/stellabar-" + command + ".jsa")),
                    "the archive of " + command + "'s own classes recorded");
        }

        // what `stellabar validate` does to the checkout: rewrite its report (same bytes, new time)
        Path report = PROJECT.resolve("validation/report.md");
        FileTime before = Files.getLastModifiedTime(report);
        try {
            Files.setLastModifiedTime(report, FileTime.from(Instant.now().plusSeconds(5)));
            Run second = launch("--version");
            assertEquals(0, second.status(), second.err());
            assertEquals("", second.err(), "no rebuild and no archive recording on the second call");
            assertEquals(first.out(), second.out());
        } finally {
            Files.setLastModifiedTime(report, before);
        }
        assertEquals(jarTime, Files.getLastModifiedTime(jar).toInstant(), "the jar was not rebuilt");
    }
}
