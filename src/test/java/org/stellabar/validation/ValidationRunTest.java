package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same checks as {@code stellabar validate}, run in the test suite so that any regression of
 * the library against the reference tables fails the build, and the committed report compared
 * with what the code writes.
 */
class ValidationRunTest {

    /** Maven runs tests in the project folder, where the reference tables live. */
    static final Path TABLES = Path.of("validation");
    private static ValidationReport report;

    @BeforeAll
    static void runEverything() {
        report = Validation.standard().run(ReferenceSource.folder(TABLES));
    }

    @TestFactory
    Stream<DynamicTest> everyFamilyPasses() {
        return report.families().stream().map(f -> DynamicTest.dynamicTest(f.id(), () -> {
            if (!f.passed()) {
                fail(f.failures().size() + " checks of " + f.id() + " outside their tolerance:\n"
                        + f.failures().stream().map(c -> "  " + c.label() + ": reference " + c.reference() + ", ours "
                                + c.ours() + ", deviation " + c.deviation() + " > " + c.tolerance().amount() + " "
                                + c.tolerance().kind() + " (" + c.origin() + ")").collect(Collectors.joining("\n")));
            }
            assertTrue(f.checks().size() > 0, "a family with no checks checks nothing");
        }));
    }

    @Test
    void committedReportIsExactlyWhatTheCodeWrites(@TempDir Path out) throws IOException {
        new ReportWriter().write(report, out);
        String how = " differs from what the code writes. Regenerate it from the project folder with "
                + "`./stellabar validate` (which rewrites validation/report.md and validation/charts/) and commit both.";
        compareText(TABLES.resolve(ReportWriter.REPORT_FILE), out.resolve(ReportWriter.REPORT_FILE), how);
        for (FamilyResult f : report.families()) {
            for (ReportChart chart : f.charts()) {
                String name = MarkdownReport.CHART_FOLDER + "/" + chart.fileStem() + ".svg";
                Path committed = TABLES.resolve(name);
                assertTrue(Files.exists(committed), "validation/" + name + " is missing;" + how);
                if (!Files.readString(committed).equals(Files.readString(out.resolve(name)))) {
                    fail("validation/" + name + how);
                }
            }
        }
    }

    private static void compareText(Path committed, Path written, String how) throws IOException {
        assertTrue(Files.exists(committed), committed + " is missing;" + how);
        List<String> expected = Files.readAllLines(committed);
        List<String> actual = Files.readAllLines(written);
        for (int i = 0; i < Math.max(expected.size(), actual.size()); i++) {
            String e = i < expected.size() ? expected.get(i) : "(end of file)";
            String a = i < actual.size() ? actual.get(i) : "(end of file)";
            if (!e.equals(a)) {
                fail(committed + how + "\nFirst difference at line " + (i + 1) + ":\n  committed: " + e
                        + "\n  written:   " + a);
            }
        }
    }

    @Test
    void everyTableInTheFolderIsReadByAFamilyAndNoneIsMissing() throws IOException {
        Set<String> read = new TreeSet<>();
        for (FamilyResult f : report.families()) {
            f.tables().forEach(t -> read.add(t.file()));
        }
        Set<String> present;
        try (Stream<Path> files = Files.list(TABLES)) {
            present = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".csv"))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(present, read, "every validation/*.csv must belong to a family, and every family's table must exist");
    }

    @Test
    void theReportCoversEveryKindOfReference() {
        // published tables could not be consulted here; every other kind must be present
        for (Provenance p : List.of(Provenance.FROM_MEMORY, Provenance.COMPUTED, Provenance.CLOSED_FORM,
                Provenance.COMMON_PRACTICE, Provenance.IDENTITY)) {
            assertTrue(report.families().stream().flatMap(f -> f.checks().stream()).anyMatch(c -> c.provenance() == p),
                    "no check of provenance " + p.label());
        }
    }

    @Test
    void theRequiredIndicesAndExponentsAreAllChecked() {
        FamilyResult laneEmden = family(LaneEmdenFamily.ID);
        for (String n : List.of("0", "0.5", "1", "1.5", "2", "2.5", "3", "3.5", "4", "4.5")) {
            for (String q : List.of("xi1", "omega_n", "rho_c_over_mean")) {
                assertTrue(laneEmden.checks().stream().anyMatch(c -> c.quantity().equals(q)
                        && c.parameters().equals("n=" + n)), q + " at n = " + n + " is not checked");
            }
        }
        FamilyResult mixture = family(MixtureExponentFamily.ID);
        for (int k = 0; k <= 10; k++) {
            String beta = "beta=" + (k == 10 ? "1.0" : "0." + k);
            for (String q : List.of("Gamma1", "Gamma2", "Gamma3", "nabla_ad")) {
                assertTrue(mixture.checks().stream().anyMatch(c -> c.quantity().equals(q) && c.parameters().equals(beta)),
                        q + " at " + beta + " is not checked");
            }
        }
    }

    private static FamilyResult family(String id) {
        return report.families().stream().filter(f -> f.id().equals(id)).findFirst().orElseThrow();
    }
}
