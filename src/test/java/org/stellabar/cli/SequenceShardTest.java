package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The parts of a sharded sequence, in K order, are the whole sequence row for row. */
class SequenceShardTest {

    private static List<String> rows(String csv) {
        List<String> lines = new ArrayList<>(csv.lines().toList());
        lines.remove(0); // header
        return lines;
    }

    @Test
    void partsConcatenateToTheWhole(@TempDir Path dir) throws Exception {
        CliRun whole = CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "23", "--format", "csv");
        assertEquals(0, whole.exitCode(), whole.err());
        List<String> joined = new ArrayList<>();
        for (int k = 1; k <= 4; k++) {
            CliRun part = CliRun.of("sequence", "--mass-range", "0.1:1e8", "--steps", "23", "--shard", k + "/4",
                    "--format", "csv", "--out", dir.toString());
            assertEquals(0, part.exitCode(), part.err());
            joined.addAll(rows(part.out()));
            assertTrue(Files.exists(dir.resolve("sequence-" + k + "-of-4.csv")));
        }
        assertEquals(rows(whole.out()), joined);
        assertTrue(Files.notExists(dir.resolve("sequence-support-1col.png")), "no charts for a part");
    }

    @Test
    void badShardsAreBadInput() {
        for (String bad : new String[] {"0/3", "4/3", "1/0", "1/24", "a/b", "2"}) {
            CliRun r = CliRun.of("sequence", "--steps", "23", "--shard", bad);
            assertEquals(2, r.exitCode(), bad + ": " + r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
        }
    }
}
