package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Conventions of the command line: where lines go, suggestions, shell completion. */
class CommandLineConventionsTest {

    @Test
    void aWronglyCasedOptionGetsTheRightOneSuggested() {
        CliRun run = CliRun.of("eos", "--rho", "1", "--temp", "1e7", "--x", "0.7");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("did you mean --X?"), run.err());
    }

    @Test
    void aMisspeltCommandGetsTheRightOneSuggested() {
        CliRun run = CliRun.of("modle");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("did you mean model"), run.err());
    }

    /** Results on stdout, the files written on stderr: `audit … --out DIR > results.txt` keeps only results. */
    @Test
    void auditListsItsFilesOnStderr(@TempDir Path dir) throws Exception {
        assertEquals(0, CliRun.of("model", "--mass", "10 Msun", "--radius", "5 Rsun", "--kind", "polytrope",
                "--index", "1.5", "--out", dir.resolve("m").toString(), "--quiet").exitCode());
        CliRun run = CliRun.of("audit", dir.resolve("m/stars/model.csv").toString(), "--out", dir.resolve("a").toString());
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.out().contains("wrote "), "no file list on stdout");
        assertTrue(run.err().contains("wrote " + dir.resolve("a").resolve("shells.csv")), run.err());
    }

    /** The completion script, sourced in a real bash, completes commands and options. */
    @Test
    void completionCompletesCommandsAndOptionsInBash(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("completion");
        assertEquals(0, run.exitCode(), run.err());
        Path script = dir.resolve("stellabar.bash");
        Files.writeString(script, run.out());
        assertEquals("model", complete(script, "stellabar mo", "stellabar", "mo"));
        assertEquals("--temp", complete(script, "stellabar eos --te", "stellabar", "eos", "--te"));
    }

    private static String complete(Path script, String line, String... words) throws Exception {
        String program = "source '" + script + "'; COMP_WORDS=(" + String.join(" ", words) + "); COMP_CWORD="
                + (words.length - 1) + "; COMP_LINE='" + line + "'; COMP_POINT=" + line.length()
                + "; _complete_stellabar 2>/dev/null; echo \"${COMPREPLY[@]}\"";
        Process p = new ProcessBuilder(List.of("bash", "-c", program)).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        return out;
    }

    /** A single star with --out: the profile goes to the files, the terminal gets the headline only. */
    @Test
    void aSingleStarWithOutPrintsItsHeadlineNotItsProfile(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("model", "--mass", "10 Msun", "--radius", "5 Rsun", "--format", "json",
                "--out", dir.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.out().contains("\"profile\""), "no profile on stdout");
        assertTrue(run.out().contains("\"Gamma1_mean\""), "the headline");
        assertTrue(Files.exists(dir.resolve("stars/model.csv")), "the profile is in the files");
    }

    /** Short options for the common ones, and -q keeps stderr empty where files are written. */
    @Test
    void shortOptionsAndQuiet(@TempDir Path dir) throws Exception {
        CliRun run = CliRun.of("polytrope", "--index", "3", "-f", "json", "-o", dir.toString(), "-q");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.err());
        assertTrue(run.out().contains("\"xi1\""), "JSON on stdout");
        try (var files = Files.list(dir)) {
            assertTrue(files.findAny().isPresent(), "files written");
        }
        for (String command : List.of("grid", "sequence", "audit", "observed", "model")) {
            CliRun help = CliRun.of(command, "--help");
            assertTrue(help.out().contains("-q, --quiet") && help.out().contains("-o, --out"), command);
        }
    }
}
