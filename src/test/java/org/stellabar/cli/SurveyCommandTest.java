package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code survey} and {@code merge} from the command line: the parts of a sharded survey merge into
 * the very bytes of the unsharded run (tables and maps), a part rerun gives the same bytes, bad
 * survey files and bad part sets are refused with exit 2 and one line per problem, and nothing is
 * written by a refused merge.
 */
class SurveyCommandTest {

    /** A small two-axis survey: 4 masses × 3 radii of standard models, the last radii too compact. */
    static final String SMALL = """
            [survey]
            name = "small-edge"
            kind = "standard"
            X = 0.7
            Z = 0.02
            points = 60
            table_formats = ["csv", "ecsv", "fits", "json"]
            chart_formats = ["svg", "png"]
            [survey.axes.mass]
            from = "1e3 Msun"
            to = "1e6 Msun"
            count = 4
            scale = "log"
            [survey.axes.radius]
            from = "1 Rsun"
            to = "100 Rsun"
            count = 3
            """;

    @Test
    void partsMergeToTheBytesOfTheWholeRun(@TempDir Path dir) throws IOException {
        Path survey = write(dir, "small.toml", SMALL);
        Path whole = dir.resolve("whole");
        CliRun w = CliRun.of("survey", survey.toString(), "--out", whole.toString());
        assertEquals(0, w.exitCode(), w.err());
        assertTrue(w.out().contains("12 points"), w.out());
        Path parts = dir.resolve("parts");
        for (int k : new int[] {3, 1, 2}) {
            CliRun p = CliRun.of("survey", survey.toString(), "--shard", k + "/3", "--out", parts.toString());
            assertEquals(0, p.exitCode(), p.err());
        }
        Path merged = dir.resolve("merged");
        CliRun m = CliRun.of("merge", parts.toString(), "--out", merged.toString());
        assertEquals(0, m.exitCode(), m.err());
        List<String> names = list(whole);
        assertEquals(names, list(merged), "the same files");
        assertTrue(names.contains("small-edge.csv") && names.contains("small-edge-gr-margin-1col.svg"), names.toString());
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(name)), Files.readAllBytes(merged.resolve(name)), name);
        }
        // a part computed again (after a kill, say) is the same file
        byte[] before = Files.readAllBytes(parts.resolve("small-edge-2-of-3.part.json"));
        assertEquals(0, CliRun.of("survey", survey.toString(), "--shard", "2/3", "--out", parts.toString()).exitCode());
        assertArrayEquals(before, Files.readAllBytes(parts.resolve("small-edge-2-of-3.part.json")));
        // the compact corners failed with their reason; no numeric cell is NaN or infinite
        String csv = Files.readString(whole.resolve("small-edge.csv"));
        assertTrue(csv.contains(",failed,radius: radius R ="), csv);
        assertFalse(csv.contains("NaN") || csv.contains("Infinity"));
    }

    @Test
    void badPartSetsAreRefusedInOneLineAndWriteNothing(@TempDir Path dir) throws IOException {
        Path survey = write(dir, "small.toml", SMALL);
        Path parts = dir.resolve("parts");
        for (int k = 1; k <= 3; k++) {
            assertEquals(0, CliRun.of("survey", survey.toString(), "--shard", k + "/3", "--out", parts.toString())
                    .exitCode());
        }
        Path p1 = parts.resolve("small-edge-1-of-3.part.json");
        Path p2 = parts.resolve("small-edge-2-of-3.part.json");
        Path p3 = parts.resolve("small-edge-3-of-3.part.json");
        Path out = dir.resolve("out");

        refused(out, "part 3 of 3 is missing", "merge", p1.toString(), p2.toString(), "--out", out.toString());
        Path copy = Files.copy(p2, dir.resolve("again.part.json"));
        refused(out, "part 2 of 3 is given twice", "merge", parts.toString(), copy.toString(), "--out",
                out.toString());

        Path other = write(dir, "other.toml", SMALL.replace("count = 4", "count = 5"));
        Path foreign = dir.resolve("foreign");
        assertEquals(0, CliRun.of("survey", other.toString(), "--shard", "3/3", "--out", foreign.toString())
                .exitCode());
        refused(out, "belongs to another run", "merge", p1.toString(), p2.toString(),
                foreign.resolve("small-edge-3-of-3.part.json").toString(), "--out", out.toString());

        byte[] whole = Files.readAllBytes(p3);
        Path cut = dir.resolve("cut").resolve("small-edge-3-of-3.part.json");
        Files.createDirectories(cut.getParent());
        Files.write(cut, java.util.Arrays.copyOf(whole, whole.length / 2));
        refused(out, "not a survey part", "merge", p1.toString(), p2.toString(), cut.toString(), "--out",
                out.toString());
        refused(out, "no such file or folder", "merge", dir.resolve("out-not-here").toString(), "--out", out.toString());
    }

    @Test
    void badSurveyFilesAreRefusedWithTheirPosition(@TempDir Path dir) throws IOException {
        String[][] cases = {
            // what is wrong, the expected line:column, a phrase of the message
            {SMALL.replace("points = 60", "pionts = 60"), ":6:1", "did you mean 'points'"},
            {SMALL.replace("count = 4", "count = 0"), ":12:9", "[1, 10000]"},
            {SMALL.replace("from = \"1e3 Msun\"", "from = \"1e-9 Msun\""), ":10:8", "mass"},
            {SMALL.replace("kind = \"standard\"", "kind = \"standard\"\nradius = \"3 Rsun\""), ":4:1",
                "give it as a fixed value or as an axis"},
            {SMALL.replace("[survey.axes.radius]", "[survey.axes.central_temperature]")
                    .replace("\"1 Rsun\"", "\"1e7 K\"").replace("\"100 Rsun\"", "\"1e8 K\""), ":1:1",
                "radius"},
            {SMALL.replace("scale = \"log\"", "scale = \"logarithmic\""), ":13:9", "log"},
            {SMALL.replace("points = 60", "points = 60\nelectrons = \"quantum\""), ":7:13", "fermi"},
            // the standard model is classical by construction: fermi electrons need another kind
            {SMALL.replace("points = 60", "points = 60\nelectrons = \"fermi\""), ":1:1", "standard"},
        };
        for (String[] c : cases) {
            Path file = write(dir, "bad.toml", c[0]);
            CliRun r = CliRun.of("survey", file.toString());
            assertEquals(2, r.exitCode(), c[2] + ": " + r.err());
            assertTrue(r.err().contains(file + c[1]), c[1] + " expected in: " + r.err());
            assertTrue(r.err().contains(c[2]), c[2] + " expected in: " + r.err());
            assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        }
    }

    @Test
    void slurmDriverIsValidBashAndItsOptionsAreChecked(@TempDir Path dir) throws Exception {
        Path survey = write(dir, "small.toml", SMALL);
        Path script = dir.resolve("job.sh");
        CliRun r = CliRun.of("survey", survey.toString(), "--slurm-script", script.toString(), "--shards", "3",
                "--out", dir.resolve("run").toString(), "--partition", "debug", "--time", "0:30:00", "--mem", "1G");
        assertEquals(0, r.exitCode(), r.err());
        String text = Files.readString(script);
        assertTrue(text.contains("--array=1-\"$SHARDS\"") && text.contains("--dependency=\"afterok:$array_id\"")
                && text.contains("--partition=debug") && text.contains("--time=0:30:00"), text);
        Process check = new ProcessBuilder("bash", "-n", script.toString()).redirectErrorStream(true).start();
        String out = new String(check.getInputStream().readAllBytes());
        assertEquals(0, check.waitFor(), "bash -n: " + out);

        CliRun badTime = CliRun.of("survey", survey.toString(), "--slurm-script", script.toString(), "--shards", "3",
                "--out", dir.resolve("run").toString(), "--time", "ten minutes");
        assertEquals(2, badTime.exitCode());
        assertTrue(badTime.err().contains("--time: 'ten minutes'"), badTime.err());
        CliRun tooMany = CliRun.of("survey", survey.toString(), "--slurm-script", script.toString(), "--shards", "13",
                "--out", dir.resolve("run").toString());
        assertEquals(2, tooMany.exitCode());
        assertTrue(tooMany.err().contains("13 parts for 12 points"), tooMany.err());
    }

    private static void refused(Path out, String phrase, String... args) throws IOException {
        CliRun r = CliRun.of(args);
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().contains(phrase), phrase + " expected in: " + r.err());
        assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
        assertFalse(Files.exists(out) && list(out).size() > 0, "nothing written by a refused merge");
    }

    private static Path write(Path dir, String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text);
    }

    private static List<String> list(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
