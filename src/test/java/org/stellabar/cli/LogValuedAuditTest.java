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
import org.stellabar.api.Stellabar;
import org.stellabar.table.Table;

/**
 * {@code audit} on a profile whose columns hold log10 values under linear headings: a warning
 * naming the column and {@code --log}, or one line and exit 2 under {@code --strict}. The profile
 * is our own 40 Msun standard model (surface row left out), written as CSV.
 */
class LogValuedAuditTest {

    @TempDir
    Path dir;

    private Path profile(String name, String... logged) throws Exception {
        Table star = Stellabar.standardModel(40, 12, Stellabar.composition(0.70, 0.28, 0.02)).profile();
        String[] columns = {"r", "m", "rho", "T", "P"};
        String[] units = {"cm", "g", "g/cm3", "K", "dyn/cm2"};
        List<String> lines = new ArrayList<>();
        lines.add("r [cm],m [g],rho [g/cm3],T [K],P [dyn/cm2]");
        for (int i = 0; i < star.rowCount() - 1; i++) {
            StringBuilder row = new StringBuilder();
            for (int c = 0; c < columns.length; c++) {
                double v = star.numbers(columns[c]).get(i);
                row.append(c == 0 ? "" : ",").append(List.of(logged).contains(columns[c]) ? Math.log10(v) : v);
            }
            lines.add(row.toString());
        }
        assertEquals(5, units.length);
        Path file = dir.resolve(name);
        Files.write(file, lines);
        return file;
    }

    @Test
    void linearProfileAuditsWithoutWarning() throws Exception {
        CliRun run = CliRun.of("audit", profile("linear.csv").toString(), "--X", "0.7", "--Z", "0.02", "--strict");
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.err().contains("warning"), run.err());
    }

    @Test
    void logTemperatureWarnsAndStillRuns() throws Exception {
        CliRun run = CliRun.of("audit", profile("logT.csv", "T").toString(), "--X", "0.7", "--Z", "0.02");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.err().contains("warning") && run.err().contains("column 'T' (T)")
                && run.err().contains("--log T"), run.err());
        // the warning is on stderr only: stdout holds the results
        assertFalse(run.out().contains("--log"), run.out());
    }

    @Test
    void strictRefusesInOneLine() throws Exception {
        CliRun run = CliRun.of("audit", profile("logT.csv", "T").toString(), "--X", "0.7", "--Z", "0.02", "--strict");
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains("--log T"), run.err());
        assertEquals("", run.out());
    }

    /** Negative log10 densities would stop the audit at the first row; the hint comes first. */
    @Test
    void logDensityNamesTheLikelyCauseBeforeTheRowError() throws Exception {
        CliRun run = CliRun.of("audit", profile("logRho.csv", "rho").toString(), "--X", "0.7", "--Z", "0.02");
        assertEquals(2, run.exitCode(), run.err());
        List<String> lines = run.err().strip().lines().toList();
        assertTrue(lines.get(0).contains("warning") && lines.get(0).contains("--log rho"), run.err());
        CliRun strict = CliRun.of("audit", profile("logRho.csv", "rho").toString(), "--X", "0.7", "--Z", "0.02",
                "--strict");
        assertEquals(2, strict.exitCode());
        assertEquals(1, strict.err().strip().lines().count(), strict.err());
        assertTrue(strict.err().contains("--log rho"), strict.err());
    }
}
