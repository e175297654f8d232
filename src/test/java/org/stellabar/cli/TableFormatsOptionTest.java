package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.output.PythonChecks;

/**
 * {@code --table-formats} on every command that writes table files: each writes its tables in
 * exactly the formats asked for (and its summary JSON, report and charts as always); a bad word
 * is refused in one line naming the option; {@code model --table-formats ecsv,votable} writes
 * files astropy reads like the FITS file of the same star.
 */
class TableFormatsOptionTest {

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> !n.endsWith(".svg") && !n.endsWith(".png")
                    && !n.endsWith(".pdf")).sorted().toList();
        }
    }

    @Test
    void modelWritesEcsvAndVotableThatAstropyReadsLikeFits(@TempDir Path dir) throws Exception {
        PythonChecks.requireModules("astropy", "numpy");
        for (String formats : new String[] {"ecsv,votable", "fits"}) {
            CliRun r = CliRun.of("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--points", "31", "--out",
                    dir.resolve(formats.replace(',', '-')).toString(), "--table-formats", formats, "-q");
            assertEquals(0, r.exitCode(), r.err());
        }
        Path a = dir.resolve("ecsv-votable");
        Path f = dir.resolve("fits");
        assertEquals(List.of("model.ecsv", "model.vot"), names(a.resolve("stars")));
        assertTrue(names(a).containsAll(List.of("summary.ecsv", "summary.vot")), names(a).toString());
        assertFalse(names(a).contains("summary.csv"), names(a).toString());
        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(120), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("read_tables_with_astropy.py").toString(),
                a.resolve("stars/model.ecsv").toString(), f.resolve("stars/model.fits").toString(),
                a.resolve("stars/model.vot").toString(), f.resolve("stars/model.fits").toString(),
                a.resolve("summary.ecsv").toString(), f.resolve("summary.fits").toString(),
                a.resolve("summary.vot").toString(), f.resolve("summary.fits").toString());
        assertEquals(0, o.exitCode(), o.describe());
        for (JsonNode file : new ObjectMapper().readTree(o.stdout()).get("files")) {
            assertEquals(0, file.get("problems").size(), file.toString());
        }
    }

    @Test
    void everyCommandThatWritesTablesTakesTheOption(@TempDir Path dir) throws IOException {
        CliRun grid = CliRun.of("grid", "--rho-range", "1e-6:1", "--temp-range", "1e4:1e8", "--points", "3",
                "--chart-formats", "svg", "--table-formats", "votable,json", "--out", dir.resolve("g").toString(), "-q");
        assertEquals(0, grid.exitCode(), grid.err());
        assertEquals(List.of("grid.json", "grid.vot"), names(dir.resolve("g")));

        CliRun seq = CliRun.of("sequence", "--steps", "5", "--chart-formats", "svg", "--table-formats", "fits",
                "--out", dir.resolve("s").toString());
        assertEquals(0, seq.exitCode(), seq.err());
        assertEquals(List.of("sequence.fits"), names(dir.resolve("s")));

        CliRun poly = CliRun.of("polytrope", "--index", "1.5", "--chart-formats", "svg", "--table-formats", "ecsv",
                "--out", dir.resolve("p").toString());
        assertEquals(0, poly.exitCode(), poly.err());
        assertEquals(List.of("polytrope-n1.5-profile.ecsv", "polytrope-n1.5-summary.json"), names(dir.resolve("p")));

        CliRun model = CliRun.of("model", "--mass", "10 Msun", "--radius", "5 Rsun", "--points", "41",
                "--table-formats", "csv", "--out", dir.resolve("m").toString(), "-q");
        assertEquals(0, model.exitCode(), model.err());
        CliRun audit = CliRun.of("audit", dir.resolve("m/stars/model.csv").toString(), "--table-formats", "votable",
                "--out", dir.resolve("a").toString());
        assertEquals(0, audit.exitCode(), audit.err());
        assertEquals(List.of("report.md", "shells.vot", "summary.json"), names(dir.resolve("a")));

        Path catalogue = dir.resolve("cat.csv");
        Files.writeString(catalogue, "name,logL,logTeff,M\nInventa,5.0,4.5,30\n");
        CliRun observed = CliRun.of("observed", catalogue.toString(), "--columns", "name=name,L=logL,Teff=logTeff,M=M",
                "--log", "L,Teff", "--table-formats", "ecsv", "--out", dir.resolve("o").toString());
        assertEquals(0, observed.exitCode(), observed.err());
        assertEquals(List.of("charts", "observed.ecsv", "observed.json"), names(dir.resolve("o")));
    }

    /** A catalogue as whitespace text with a header block reads as its CSV twin (invented stars). */
    @Test
    void observedReadsAWhitespaceCatalogueLikeItsCsvTwin(@TempDir Path dir) throws IOException {
        Path csv = dir.resolve("cat.csv");
        Files.writeString(csv, "name,logL,logTeff,M\nInventa,5.0,4.5,30\nFabula,5.5,4.6,45\n");
        Path text = dir.resolve("cat.dat");
        Files.writeString(text, "invented survey, two stars\n# comment\nname logL logTeff M\nInventa 5.0 4.5 30\n"
                + "Fabula 5.5 4.6 45\n");
        String[] rest = {"--columns", "name=name,L=logL,Teff=logTeff,M=M", "--log", "L,Teff", "--format", "csv"};
        CliRun a = CliRun.of(java.util.stream.Stream.concat(Stream.of("observed", csv.toString()), Stream.of(rest))
                .toArray(String[]::new));
        CliRun b = CliRun.of(java.util.stream.Stream.concat(Stream.of("observed", text.toString()), Stream.of(rest))
                .toArray(String[]::new));
        assertEquals(0, a.exitCode(), a.err());
        assertEquals(0, b.exitCode(), b.err());
        assertEquals(a.out(), b.out());
        assertEquals(3, a.out().lines().count(), a.out());
    }

    @Test
    void aBadWordIsOneLineNamingTheOptionAndTheChoices(@TempDir Path dir) {
        CliRun r = CliRun.of("sequence", "--table-formats", "csv,xls", "--out", dir.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--table-formats") && r.err().contains("'xls'")
                && r.err().contains("csv, ecsv, fits, votable, json"), r.err());
        CliRun both = CliRun.of("grid", "--rho-range", "1e-6:1", "--temp-range", "1e4:1e8", "--points", "3",
                "--format", "csv", "--table-formats", "ecsv", "--out", dir.toString());
        assertEquals(2, both.exitCode());
        assertTrue(both.err().contains("--format and --table-formats"), both.err());
        assertTrue(r.err().lines().findFirst().orElseThrow().contains("'xls'"), "the first line says it all");
    }
}
