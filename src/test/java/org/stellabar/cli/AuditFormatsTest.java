package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.eos.Composition;
import org.stellabar.output.OutputFolder;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/**
 * One profile, four files: CSV, ECSV, VOTable, and whitespace-separated text as an evolution
 * code writes it (a block of header lines, log10 T, ρ and P, surface first). Each audits to the
 * same ⟨Γ1⟩ and flags the same shells; the text file's header block reaches the report.
 */
class AuditFormatsTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Composition MIXTURE = Composition.of(0.7, 0.28, 0.02);
    /** Rows (0-based, centre first) whose pressure is raised by 1 %, so that the audit flags them. */
    private static final int FIRST_RAISED = 40;
    private static final int LAST_RAISED = 44;

    /**
     * The standard model of an invented 40 Msun, 12 Rsun star with P raised in a few rows, without
     * its vacuum surface row (T = rho = P = 0 has no logarithm, and codes that write logarithms
     * end at a surface of finite values).
     */
    private static Table profile() {
        Table t = new StarBuilder().build(StandardModelRequest.of(40 * Constants.SOLAR_MASS, 12 * Constants.SOLAR_RADIUS,
                MIXTURE).withPoints(121)).profile();
        List<Column> columns = new ArrayList<>();
        for (Column c : t.columns()) {
            NumberColumn n = (NumberColumn) c;
            double[] v = java.util.Arrays.copyOf(n.values(), t.rowCount() - 1);
            if (n.name().equals("P")) {
                for (int i = FIRST_RAISED; i <= LAST_RAISED; i++) {
                    v[i] *= 1.01;
                }
            }
            columns.add(n.quantity().column(v));
        }
        return new Table(t.name(), t.metadata(), columns);
    }

    /** The text twin: header lines, the names, then r, m, log10 T, log10 rho, log10 P from the surface in. */
    private static List<String> whitespaceText(Table t) {
        double[] r = t.numbers("r").values();
        double[] m = t.numbers("m").values();
        double[] temp = t.numbers("T").values();
        double[] rho = t.numbers("rho").values();
        double[] p = t.numbers("P").values();
        List<String> lines = new ArrayList<>();
        lines.add("stellabar audit test: a profile written as an evolution code might");
        lines.add("# a comment line, ignored");
        lines.add("total_mass = 40 Msun, radius = 12 Rsun (invented)");
        lines.add("");
        lines.add("  r_cm   m_g   logT   logRho   logP");
        for (int i = r.length - 1; i >= 0; i--) {
            lines.add(String.format(Locale.ROOT, "%.17e %.17e %.17f %.17f %.17f", r[i], m[i], Math.log10(temp[i]),
                    Math.log10(rho[i]), Math.log10(p[i])));
        }
        return lines;
    }

    private static JsonNode audit(Path file, String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("audit", file.toString(), "--X", "0.7", "--Z", "0.02",
                "--format", "json"));
        args.addAll(List.of(extra));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        return JSON.readTree(run.out());
    }

    /** m/M of each flagged shell, from the per-shell table of the JSON summary. */
    private static List<Double> flaggedMassFractions(JsonNode audit) {
        List<Double> out = new ArrayList<>();
        JsonNode columns = audit.get("shells").get("columns");
        JsonNode row = null;
        JsonNode mOverM = null;
        for (JsonNode c : columns) {
            if (c.get("name").asText().equals("row")) {
                row = c.get("values");
            } else if (c.get("name").asText().equals("m_over_M")) {
                mOverM = c.get("values");
            }
        }
        for (JsonNode flagged : audit.get("flagged_rows")) {
            for (int i = 0; i < row.size(); i++) {
                if (row.get(i).asInt() == flagged.asInt()) {
                    out.add(mOverM.get(i).asDouble());
                }
            }
        }
        out.sort(Double::compare);
        return out;
    }

    @Test
    void csvEcsvVotableAndLog10TextAuditAlike(@TempDir Path dir) throws Exception {
        Table t = profile();
        OutputFolder folder = new OutputFolder(dir);
        Path csv = folder.table("model", t, TableFormat.CSV);
        Path ecsv = folder.table("model", t, TableFormat.ECSV);
        Path vot = folder.table("model", t, TableFormat.VOTABLE);
        Path text = dir.resolve("model.dat");
        Files.write(text, whitespaceText(t), StandardCharsets.UTF_8);

        JsonNode fromCsv = audit(csv);
        List<Double> flagged = flaggedMassFractions(fromCsv);
        assertEquals(LAST_RAISED - FIRST_RAISED + 1, flagged.size(), "the raised rows are flagged: " + flagged);
        double gamma1 = fromCsv.get("Gamma1_mean").asDouble();
        List<JsonNode> others = List.of(audit(ecsv), audit(vot), audit(text, "--columns", "r=r_cm,m=m_g,T=logT,rho=logRho,P=logP",
                "--log", "T,rho,P", "--units", "T=K,rho=g/cm3,P=dyn/cm2"));
        for (JsonNode other : others) {
            // ECSV and VOTable carry the same shortest decimals as CSV: identical results. The text
            // file holds log10 values to 17 digits, so rho, T, P come back within a few 1e-16
            // relative; <Gamma1> is a smooth mean of them: 1e-12 relative leaves a wide margin.
            assertEquals(gamma1, other.get("Gamma1_mean").asDouble(), 1e-12 * gamma1, other.get("source").asText());
            List<Double> f = flaggedMassFractions(other);
            assertEquals(flagged.size(), f.size(), other.get("source").asText());
            for (int i = 0; i < f.size(); i++) {
                assertEquals(flagged.get(i), f.get(i), 1e-12, other.get("source").asText());
            }
        }
        JsonNode textAudit = others.get(2);
        assertEquals("surface first", textAudit.get("order").asText());
        String notes = textAudit.get("metadata").get("notes").toString();
        assertTrue(notes.contains("file header: total_mass = 40 Msun, radius = 12 Rsun (invented)"), notes);
        assertTrue(!notes.contains("a comment line"), "# lines are comments, not metadata: " + notes);
    }

    /** Files astropy writes (its own ECSV, a BINARY2 VOTable, units like "g / cm3") audit like ours. */
    @Test
    void tablesAstropyWritesAuditLikeOurs(@TempDir Path dir) throws Exception {
        org.stellabar.output.PythonChecks.requireModules("astropy");
        Table t = profile();
        Path ecsv = new OutputFolder(dir).table("model", t, TableFormat.ECSV);
        Path script = dir.resolve("rewrite.py");
        Files.writeString(script, String.join("\n",
                "import sys, warnings",
                "warnings.simplefilter('error')",
                "from astropy.table import Table",
                "t = Table.read(sys.argv[1], format='ascii.ecsv')",
                "t.write(sys.argv[2], format='ascii.ecsv', overwrite=True)",
                "t.write(sys.argv[3], format='votable', tabledata_format='binary2', overwrite=True)", ""));
        Path astropyEcsv = dir.resolve("astropy.ecsv");
        Path astropyVot = dir.resolve("astropy.xml");
        org.stellabar.output.PythonChecks.Outcome o = org.stellabar.output.PythonChecks.run(java.time.Duration.ofSeconds(120),
                dir, java.util.Map.of(), org.stellabar.output.PythonChecks.PYTHON, script.toString(), ecsv.toString(),
                astropyEcsv.toString(), astropyVot.toString());
        assertEquals(0, o.exitCode(), o.describe());
        assertTrue(Files.readString(astropyEcsv).contains("unit: g / cm3"), "astropy spells units its own way");
        double gamma1 = audit(ecsv).get("Gamma1_mean").asDouble();
        for (Path p : List.of(astropyEcsv, astropyVot)) {
            JsonNode other = audit(p);
            // the same doubles (astropy writes ECSV with repr, BINARY2 as IEEE bits): identical results
            assertEquals(gamma1, other.get("Gamma1_mean").asDouble(), 0.0, p.toString());
            assertEquals(5, other.get("flagged_rows").size(), p.toString());
        }
    }

    @Test
    void theNamesLineCanBeGivenAndBadLogKeysAreRefused(@TempDir Path dir) throws Exception {
        Table t = profile();
        List<String> lines = whitespaceText(t);
        // a header block of a names line over a line of numbers: the first all-number line is not
        // data, so the column-name line must be given
        lines.add(1, "model_number  star_age");
        lines.add(2, "1  0.0");
        Path text = dir.resolve("block.dat");
        Files.write(text, lines, StandardCharsets.UTF_8);
        String[] mapping = {"--columns", "r=r_cm,m=m_g,T=logT,rho=logRho,P=logP", "--log", "T,rho,P"};
        List<String> args = new ArrayList<>(List.of("audit", text.toString(), "--X", "0.7", "--Z", "0.02"));
        args.addAll(List.of(mapping));
        CliRun guessed = CliRun.of(args.toArray(String[]::new));
        assertEquals(2, guessed.exitCode(), "the names line is found above '1 0.0': " + guessed.err());
        JsonNode named = audit(text, "--names-line", "7", mapping[0], mapping[1], mapping[2], mapping[3]);
        Path csv = new OutputFolder(dir).table("model", t, TableFormat.CSV);
        JsonNode fromCsv = audit(csv);
        assertEquals(fromCsv.get("shells_audited").asInt(), named.get("shells_audited").asInt());
        assertEquals(fromCsv.get("Gamma1_mean").asDouble(), named.get("Gamma1_mean").asDouble(),
                1e-12 * fromCsv.get("Gamma1_mean").asDouble());

        CliRun bad = CliRun.of("audit", text.toString(), "--names-line", "7", "--columns", "r=r_cm,m=m_g,T=logT,rho=logRho,P=logP",
                "--log", "T,density");
        assertEquals(2, bad.exitCode());
        assertTrue(bad.err().contains("--log density"), bad.err());
        CliRun both = CliRun.of("audit", text.toString(), "--names-line", "7", "--columns", "r=r_cm,m=m_g,T=logT,rho=logRho,P=logP",
                "--log", "T,rho,P", "--ln", "T");
        assertEquals(2, both.exitCode());
        assertTrue(both.err().contains("--ln T"), both.err());
    }
}
