package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Output folders and file names: problems are bad input (exit 2, one line), and nothing is overwritten. */
class OutputSafetyTest {

    private static final List<List<String>> WRITERS = List.of(
            List.of("grid", "--rho-range", "1e-6:1", "--temp-range", "1e4:1e6", "--points", "4"),
            List.of("polytrope", "--index", "3"),
            List.of("sequence", "--steps", "4"),
            List.of("model", "--mass", "1 Msun", "--radius", "1 Rsun"),
            List.of("model"),
            List.of("validate"));

    private static CliRun withOut(List<String> command, String out) {
        List<String> args = new ArrayList<>(command);
        args.addAll(List.of("--out", out));
        return CliRun.of(args.toArray(new String[0]));
    }

    private static void oneLineBadInput(CliRun run, String words) {
        assertEquals(2, run.exitCode(), run.out() + run.err());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().contains(words), run.err());
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4, 5})
    void outNamingAFileIsBadInput(int which, @TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("a-file"), "keep me");
        oneLineBadInput(withOut(WRITERS.get(which), file.toString()), "--out: " + file + " is a file; give a folder");
        assertEquals("keep me", Files.readString(file));
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4, 5})
    void anEmptyOutIsBadInput(int which) {
        oneLineBadInput(withOut(WRITERS.get(which), ""), "names no folder");
    }

    @Test
    void aFileInTheWayOfTheParentIsBadInput(@TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("a-file"), "");
        oneLineBadInput(withOut(WRITERS.get(1), file.resolve("below").toString()), "is a file, not a folder");
    }

    @Test
    void aStarsFileInTheWayFailsBeforeAnythingIsWritten(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("stars"), "");
        oneLineBadInput(withOut(List.of("model", "--quiet"), dir.toString()), "a file of that name is in the way");
        try (var files = Files.list(dir)) {
            assertEquals(List.of("stars"), files.map(p -> p.getFileName().toString()).toList());
        }
        try (var files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".part")));
        }
    }

    /** Names whose file stems coincide (case, spacing) are refused with both positions; "cluster" is taken. */
    @Test
    void starNamesThatWouldShareFilesAreRefused(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("same.toml");
        Files.writeString(scenario, String.join("\n", "[[star]]", "name = \"A  B\"", "mass = \"40 Msun\"",
                "radius = \"12 Rsun\"", "[[star]]", "name = \"a b\"", "mass = \"40 Msun\"", "radius = \"12 Rsun\"",
                "[[star]]", "name = \"Cluster\"", "mass = \"40 Msun\"", "radius = \"12 Rsun\"", ""));
        CliRun run = CliRun.of("model", scenario.toString(), "--out", dir.resolve("out").toString());
        oneLineBadInput(run, "same.toml:6:8");
        assertTrue(run.err().contains("same.toml:2:8") && run.err().contains("same file stem \"a-b\""), run.err());
        assertTrue(run.err().contains("same.toml:10:8") && run.err().contains("cluster charts"), run.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing written");
    }
}
