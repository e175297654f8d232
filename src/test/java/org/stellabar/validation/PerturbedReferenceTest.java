package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.cli.StellabarCommand;
import picocli.CommandLine;

/** The checks can fail: a reference value moved just outside its tolerance is reported, exit 1. */
class PerturbedReferenceTest {

    /** The 50-digit ξ₁ of n = 3 as committed, and the same moved by 1.45e-8 relative (14 × its 1e-9 tolerance). */
    static final String ORIGINAL = "xi1,n=3,6.8968486193769604,";
    static final String PERTURBED = "xi1,n=3,6.8968487193769604,";

    private static Path perturbedCopy(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(ValidationRunTest.TABLES)) {
            for (Path p : files.filter(p -> p.toString().endsWith(".csv")).toList()) {
                Files.copy(p, folder.resolve(p.getFileName()));
            }
        }
        Path target = folder.resolve("lane-emden-computed.csv");
        String text = Files.readString(target);
        assertTrue(text.contains(ORIGINAL), "the committed table no longer holds " + ORIGINAL);
        Files.writeString(target, text.replace(ORIGINAL, PERTURBED));
        return folder;
    }

    @Test
    void theFamilyReportsExactlyThePerturbedRow(@TempDir Path tmp) throws IOException {
        FamilyResult result = new LaneEmdenFamily().run(ReferenceSource.folder(perturbedCopy(tmp)));
        assertFalse(result.passed());
        List<CheckResult> failures = result.failures();
        assertEquals(1, failures.size(), failures.toString());
        CheckResult c = failures.get(0);
        assertEquals("xi1 (n=3)", c.label());
        assertEquals(Provenance.COMPUTED, c.provenance());
        assertTrue(c.ratio() > 10 && c.ratio() < 20, "deviation in tolerances: " + c.ratio());
    }

    @Test
    void theCommandListsTheFailureFirstAndExitsWithOne(@TempDir Path tmp) throws IOException {
        Path refs = perturbedCopy(Files.createDirectory(tmp.resolve("refs")));
        Path out = tmp.resolve("out");
        StringWriter stdout = new StringWriter();
        StringWriter stderr = new StringWriter();
        CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(stdout));
        cl.setErr(new PrintWriter(stderr));
        int exit = cl.execute("validate", "--references", refs.toString(), "--out", out.toString());
        assertEquals(1, exit, stdout + "\n" + stderr);
        String text = stdout.toString();
        int failedAt = text.indexOf("FAILED CHECKS (1):");
        int tableAt = text.indexOf("family ");
        assertTrue(failedAt >= 0 && failedAt < tableAt, "failures must come before the summary:\n" + text);
        assertTrue(text.contains("lane-emden: xi1 (n=3): reference 6.8968487193769604"), text);
        assertTrue(text.contains("1 of ") && text.contains(" checks FAIL"), text);

        String report = Files.readString(out.resolve(ReportWriter.REPORT_FILE));
        int failures = report.indexOf("## Failures");
        int summary = report.indexOf("## Summary");
        assertTrue(failures > 0 && failures < summary, "the report must list failures first");
        assertTrue(report.contains("**Result: 1 of "), "the report must say how many checks fail");
        assertTrue(report.substring(failures, summary).contains("xi1 (n=3)"), "the failing check must be listed");
    }

    @Test
    void theUnchangedTablesPassWithExitZero(@TempDir Path tmp) {
        StringWriter stdout = new StringWriter();
        CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(stdout));
        cl.setErr(new PrintWriter(new StringWriter()));
        int exit = cl.execute("validate", "--references", ValidationRunTest.TABLES.toString(), "--out", tmp.toString());
        assertEquals(0, exit, stdout.toString());
        assertFalse(stdout.toString().contains("FAILED"));
        assertTrue(Files.exists(tmp.resolve("report.md")));
    }
}
