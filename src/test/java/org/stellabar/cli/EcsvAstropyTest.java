package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.output.PythonChecks;

/**
 * ECSV files astropy reads with units and descriptions and no warnings, the same table as the
 * FITS file (units equal as astropy units, values equal exactly): a grid and a star's profile.
 */
class EcsvAstropyTest {

    @Test
    void astropyReadsOurEcsvLikeOurFits(@TempDir Path dir) throws Exception {
        PythonChecks.requireModules("astropy", "numpy");
        for (String format : new String[] {"ecsv", "fits"}) {
            assertEquals(0, CliRun.of("grid", "--rho-range", "1e-6:1", "--temp-range", "1e4:1e8", "--points", "6",
                    "--format", format, "--out", dir.resolve("grid").toString(), "-q").exitCode());
        }
        Path scenario = dir.resolve("one.toml");
        Files.writeString(scenario, String.join("\n", "chart_formats = [\"svg\"]", "notebook = false",
                "[[star]]", "name = \"Ecsvia\"", "mass = \"40 Msun\"", "radius = \"12 Rsun\"",
                "outputs = [\"ecsv\", \"fits\"]", ""));
        CliRun model = CliRun.of("model", scenario.toString(), "--out", dir.resolve("model").toString(), "--quiet");
        assertEquals(0, model.exitCode(), model.err());

        PythonChecks.Outcome o = PythonChecks.run(Duration.ofSeconds(120), dir, Map.of(), PythonChecks.PYTHON,
                PythonChecks.resource("read_ecsv_with_astropy.py").toString(),
                dir.resolve("grid/grid.ecsv").toString(), dir.resolve("grid/grid.fits").toString(),
                dir.resolve("model/stars/ecsvia.ecsv").toString(), dir.resolve("model/stars/ecsvia.fits").toString());
        assertEquals(0, o.exitCode(), o.describe());
        JsonNode files = new ObjectMapper().readTree(o.stdout()).get("files");
        assertEquals(2, files.size());
        for (JsonNode f : files) {
            assertEquals(0, f.get("problems").size(), f.toString());
            assertTrue(f.get("columns").size() > 10, f.toString());
        }
    }
}
