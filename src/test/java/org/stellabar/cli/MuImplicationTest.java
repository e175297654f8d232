package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** --mu alone stands for a hydrogen-helium mixture, whose X matters: the output says so. */
class MuImplicationTest {

    private static final String SAID = "taken as the hydrogen-helium mixture of that mu, X = 0.733333";

    @Test
    void eosSaysWhatMuWasTakenAsOnTheTerminalAndInTheMetadata() {
        CliRun text = CliRun.of("eos", "--rho", "1", "--temp", "1e7", "--mu", "0.6");
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().contains(SAID), text.out());
        CliRun json = CliRun.of("eos", "--rho", "1", "--temp", "1e7", "--mu", "0.6", "--format", "json");
        assertTrue(json.out().contains(SAID), "in the JSON metadata");
    }

    @Test
    void aStarSaysItToo() {
        CliRun run = CliRun.of("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--mu", "0.6");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains(SAID), run.out());
    }

    @Test
    void muWithMassFractionsIsRefused() {
        CliRun run = CliRun.of("eos", "--rho", "1", "--temp", "1e7", "--mu", "0.6", "--X", "0.7");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--mu cannot be combined with --X/--Y/--Z"), run.err());
    }
}
