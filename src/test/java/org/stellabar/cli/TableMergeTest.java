package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Parts of a sharded {@code sequence} merge, like a survey's, into the bytes of the unsharded
 * run, however the options of each part were ordered or spelt; a part of another sequence is
 * refused.
 */
class TableMergeTest {

    @Test
    void sequencePartsMergeToTheWholeRun(@TempDir Path dir) throws IOException {
        Path whole = dir.resolve("whole");
        CliRun w = CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "23", "--X", "0.7", "--Z", "0.02",
                "--out", whole.toString(), "--chart-formats", "svg", "-q");
        assertEquals(0, w.exitCode(), w.err());
        Path parts = dir.resolve("parts");
        for (int k = 1; k <= 4; k++) {
            // the same job written differently: option order, -o or --out, --steps=23
            CliRun p = k % 2 == 0
                    ? CliRun.of("sequence", "--shard", k + "/4", "--Z", "0.02", "--X", "0.7", "--steps=23",
                            "--mass-range", "0.1:1e8", "-o", parts.toString(), "-q")
                    : CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "23", "--X", "0.7", "--Z", "0.02",
                            "--shard", k + "/4", "--out", parts.toString(), "-q", "--format", "csv");
            assertEquals(0, p.exitCode(), p.err());
            assertTrue(Files.exists(parts.resolve("sequence-" + k + "-of-4.part.json")));
        }
        Path merged = dir.resolve("merged");
        CliRun m = CliRun.of("merge", parts.toString(), "--out", merged.toString(), "--chart-formats", "svg");
        assertEquals(0, m.exitCode(), m.err());
        assertTrue(m.out().contains("sequence: 4 parts merged, 23 rows"), m.out());
        List<String> names = list(whole);
        assertEquals(names, list(merged));
        assertTrue(names.contains("sequence.csv") && names.contains("sequence-support-1col.svg"), names.toString());
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(name)), Files.readAllBytes(merged.resolve(name)), name);
        }

        Path other = dir.resolve("other");
        assertEquals(0, CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "24", "--shard", "4/4", "--out",
                other.toString(), "-q").exitCode());
        CliRun foreign = CliRun.of("merge", parts.resolve("sequence-1-of-4.part.json").toString(),
                parts.resolve("sequence-2-of-4.part.json").toString(),
                parts.resolve("sequence-3-of-4.part.json").toString(),
                other.resolve("sequence-4-of-4.part.json").toString(), "--out", dir.resolve("x").toString());
        assertEquals(2, foreign.exitCode());
        assertTrue(foreign.err().contains("belongs to another run"), foreign.err());
    }

    @Test
    void gridPartsMergeToTheWholeRun(@TempDir Path dir) throws IOException {
        // a P-T grid leaves out the points with P <= aT^4/3: the merged metadata counts them again
        String[] grid = {"grid", "--pressure-range", "1e8:1e18", "--temp-range", "1e5:1e8", "--points", "7x5",
            "--table-formats", "csv,fits", "--chart-formats", "svg", "-q"};
        Path whole = dir.resolve("whole");
        CliRun w = CliRun.of(concat(grid, "--out", whole.toString()));
        assertEquals(0, w.exitCode(), w.err());
        Path parts = dir.resolve("parts");
        for (int k = 1; k <= 3; k++) {
            CliRun p = CliRun.of(concat(grid, "--shard", k + "/3", "-o", parts.toString()));
            assertEquals(0, p.exitCode(), p.err());
        }
        Path merged = dir.resolve("merged");
        CliRun m = CliRun.of("merge", parts.toString(), "--out", merged.toString(), "--chart-formats", "svg");
        assertEquals(0, m.exitCode(), m.err());
        assertTrue(Files.readString(whole.resolve("grid.csv")).contains("points with P <= aT^4/3"),
                "the test grid leaves points out");
        List<String> names = list(whole);
        assertEquals(names, list(merged));
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(name)), Files.readAllBytes(merged.resolve(name)), name);
        }
    }

    private static String[] concat(String[] a, String... b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }

    private static List<String> list(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
