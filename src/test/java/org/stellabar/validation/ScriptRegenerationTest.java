package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The computed tables are what their scripts write: the fast scripts are rerun into a scratch copy
 * of the folder and their output compared byte for byte with the committed tables. Needs Debian's
 * /usr/bin/python3 with mpmath; skipped (not passed) without it. The 50-digit Lane-Emden script
 * (about a minute) is not rerun here; its closed-form self-check runs whenever it is.
 */
class ScriptRegenerationTest {

    private static final Path PYTHON = Path.of("/usr/bin/python3");

    private static boolean mpmathAvailable() {
        if (!Files.isExecutable(PYTHON)) {
            return false;
        }
        try {
            Process p = new ProcessBuilder(PYTHON.toString(), "-c", "import mpmath").redirectErrorStream(true).start();
            return p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    private static void regenerate(Path scratch, String script, List<String> tables) throws Exception {
        assumeTrue(mpmathAvailable(), "/usr/bin/python3 with mpmath (Debian python3-mpmath) is not installed");
        Path scripts = Files.createDirectories(scratch.resolve("validation/scripts"));
        try (Stream<Path> files = Files.list(ValidationRunTest.TABLES.resolve("scripts"))) {
            for (Path p : files.filter(p -> p.toString().endsWith(".py")).toList()) {
                Files.copy(p, scripts.resolve(p.getFileName()));
            }
        }
        Process p = new ProcessBuilder(PYTHON.toString(), scripts.resolve(script).toString()).redirectErrorStream(true)
                .start();
        assertTrue(p.waitFor(10, TimeUnit.MINUTES), script + " did not finish");
        String output = new String(p.getInputStream().readAllBytes());
        assertEquals(0, p.exitValue(), script + " failed:\n" + output);
        for (String table : tables) {
            assertEquals(Files.readString(ValidationRunTest.TABLES.resolve(table)),
                    Files.readString(scratch.resolve("validation").resolve(table)),
                    "validation/" + table + " is not what validation/scripts/" + script + " writes; rerun it and commit");
        }
    }

    @Test
    void closedFormTablesAreWhatTheirScriptWrites(@TempDir Path scratch) throws Exception {
        regenerate(scratch, "closed_forms.py",
                List.of("lane-emden-closed-forms.csv", "mixture-exponents.csv", "photon-gas.csv"));
    }

    @Test
    void fermiStateTableIsWhatItsScriptWrites(@TempDir Path scratch) throws Exception {
        Path fermi = Files.createDirectories(scratch.resolve("validation/fermi"));
        Files.copy(ValidationRunTest.TABLES.resolve("fermi/fermi-eos-mpmath.csv"), fermi.resolve("fermi-eos-mpmath.csv"));
        regenerate(scratch, "fermi_eos_table.py", List.of("fermi-eos.csv"));
    }

    @Test
    void standardModelTableIsWhatItsScriptWrites(@TempDir Path scratch) throws Exception {
        regenerate(scratch, "standard_model.py", List.of("standard-model-computed.csv"));
    }
}
