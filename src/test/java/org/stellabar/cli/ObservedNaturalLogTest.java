package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code observed --ln}: the demo catalogue with its log10 L column (and its dex errors) rewritten
 * as natural logarithms (and e-fold errors), read with {@code --ln L}, gives the same estimates as
 * the original read with {@code --log L} — an identity, ln x = ln 10 · log10 x.
 */
class ObservedNaturalLogTest {

    private static final String COLUMNS = "name=star,L=logL,Teff=logTeff,M=Mspec,L_err=e_logL,Teff_err=e_logTeff,"
            + "M_err=e_Mspec,X=Xsurf";

    @Test
    void naturalLogColumnsGiveTheSameStarsAsLog10Ones(@TempDir Path dir) throws Exception {
        Path original = Path.of("profiles/demo-catalogue.csv");
        List<String> rewritten = new ArrayList<>();
        for (String line : Files.readAllLines(original)) {
            String[] cells = line.split(",", -1);
            if (line.startsWith("#") || line.startsWith("star,") || cells.length < 4) {
                rewritten.add(line);
                continue;
            }
            // logL and its error, in column order 2 and 4: times ln 10
            for (int k : new int[] {1, 3}) {
                if (!cells[k].isBlank()) { // a blank cell (an error not given) stays blank
                    cells[k] = String.format(Locale.ROOT, "%.17g", Double.parseDouble(cells[k]) * Math.log(10.0));
                }
            }
            rewritten.add(String.join(",", cells));
        }
        Path natural = Files.write(dir.resolve("natural.csv"), rewritten);
        CliRun log10 = CliRun.of("observed", original.toString(), "--columns", COLUMNS, "--log", "L,Teff",
                "--format", "json");
        CliRun ln = CliRun.of("observed", natural.toString(), "--columns", COLUMNS, "--log", "Teff", "--ln", "L",
                "--format", "json");
        assertEquals(0, log10.exitCode(), log10.err());
        assertEquals(0, ln.exitCode(), ln.err());
        JsonNode a = new ObjectMapper().readTree(log10.out()).get("stars");
        JsonNode b = new ObjectMapper().readTree(ln.out()).get("stars");
        assertEquals(a.size(), b.size());
        assertTrue(a.size() > 20);
        for (int i = 0; i < a.size(); i++) {
            for (String field : new String[] {"L", "Gamma_e", "beta_standard", "M_from_L", "gr_margin"}) {
                if (!a.get(i).has(field) || a.get(i).get(field).isNull()) {
                    continue;
                }
                double want = a.get(i).get(field).asDouble();
                // exp(x ln 10) and 10^x differ by rounding only: 1e-12 relative is many times that
                assertEquals(want, b.get(i).get(field).asDouble(), 1e-12 * Math.abs(want) + 1e-300,
                        a.get(i).get("name") + " " + field);
            }
        }
        CliRun both = CliRun.of("observed", original.toString(), "--columns", COLUMNS, "--log", "L,Teff", "--ln", "L");
        assertEquals(2, both.exitCode());
        assertTrue(both.err().contains("--ln L") && both.err().contains("also given to --log"), both.err());
    }
}
