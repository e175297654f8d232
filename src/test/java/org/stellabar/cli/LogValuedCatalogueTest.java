package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * {@code observed} on the demo's catalogue (profiles/demo-catalogue.csv, invented stars whose L
 * and Teff columns hold log10 values) with {@code --log} left out for Teff: a warning naming the
 * column and {@code --log Teff}; under {@code --strict}, one line and exit 2. With the mapping the
 * catalogue's header gives, no warning.
 */
class LogValuedCatalogueTest {

    private static final String CATALOGUE = "profiles/demo-catalogue.csv";
    private static final String COLUMNS = "name=star,L=logL,Teff=logTeff,M=Mspec,L_err=e_logL,Teff_err=e_logTeff,"
            + "M_err=e_Mspec,X=Xsurf";

    @Test
    void theDemoMappingRaisesNoWarning() {
        CliRun run = CliRun.of("observed", CATALOGUE, "--columns", COLUMNS, "--log", "L,Teff", "-f", "json");
        assertEquals(0, run.exitCode(), run.err());
        assertFalse(run.err().contains("warning"), run.err());
    }

    @Test
    void logTeffReadAsLinearWarns() {
        CliRun run = CliRun.of("observed", CATALOGUE, "--columns", COLUMNS, "--log", "L", "-f", "json");
        assertTrue(run.err().contains("warning") && run.err().contains("column 'logTeff' (Teff)")
                && run.err().contains("--log Teff"), run.err());
        assertFalse(run.err().contains("(L)"), "L is declared log10: " + run.err());
    }

    @Test
    void strictRefusesInOneLine() {
        CliRun run = CliRun.of("observed", CATALOGUE, "--columns", COLUMNS, "--log", "L", "--strict");
        assertEquals(2, run.exitCode(), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains("--log Teff"), run.err());
        assertEquals("", run.out());
    }
}
