package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The launcher records an archive per short command from {@link StartupTraining#terminalRuns}:
 * the commands it names there and those the runs cover must agree, and no run may write files
 * (the launcher gives a run with --out the full archive, so its classes would be wasted there).
 */
class StartupTrainingTest {

    @Test
    void terminalRunsCoverExactlyTheLaunchersTerminalCommands() throws Exception {
        String launcher = Files.readString(Path.of("stellabar"));
        Matcher m = Pattern.compile("(?m)^terminal_commands=\\(([^)]*)\\)$").matcher(launcher);
        assertEquals(true, m.find(), "the launcher lists its terminal commands");
        Set<String> named = new TreeSet<>(List.of(m.group(1).trim().split("\\s+")));
        Set<String> trained = new TreeSet<>();
        for (List<String> run : StartupTraining.terminalRuns()) {
            trained.add(run.get(0));
            assertFalse(run.stream().anyMatch(a -> a.startsWith("-o") || a.startsWith("--out")),
                    "a terminal run writes no file: " + run);
        }
        assertEquals(named, trained);
    }
}
