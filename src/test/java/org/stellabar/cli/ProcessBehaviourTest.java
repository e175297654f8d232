package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What only a real process shows: the output encoding under a non-UTF-8 locale, and library
 * logging on bad input (both set up in Main, before picocli runs).
 */
class ProcessBehaviourTest {

    private record Run(int status, String out, String err) {
    }

    private static Run run(Map<String, String> env, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command);
        pb.environment().putAll(env);
        Process p = pb.start();
        byte[] out = p.getInputStream().readAllBytes();
        byte[] err = p.getErrorStream().readAllBytes();
        assertTrue(p.waitFor(2, TimeUnit.MINUTES));
        return new Run(p.exitValue(), new String(out, StandardCharsets.UTF_8), new String(err, StandardCharsets.UTF_8));
    }

    /** Under LANG=C (ASCII) Java would print Γ1 as "?1": we write UTF-8 always. */
    @Test
    void greekSurvivesAnAsciiLocale() throws Exception {
        Run r = run(Map.of("LANG", "C", "LC_ALL", "C"), "eos", "--rho", "1e-10", "--temp", "5e9");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("Γ1"), "UTF-8 Greek in the warnings: " + r.out());
        assertTrue(!r.out().contains("?1"), r.out());
    }

    /**
     * A FITS file whose NAXIS2 promises more rows than it holds: nom-tam-fits would log a
     * warning with a stack trace; the user sees one line (exit 2), and with --verbose more.
     */
    @Test
    void aLyingFitsFileIsOneLineAndVerboseShowsMore(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("m");
        Run made = run(Map.of(), "model", "--mass", "10 Msun", "--radius", "5 Rsun", "--kind", "polytrope",
                "--index", "1.5", "--out", model.toString(), "--quiet");
        assertEquals(0, made.status(), made.err());
        byte[] fits = Files.readAllBytes(model.resolve("stars/model.fits"));
        String text = new String(fits, StandardCharsets.US_ASCII);
        int at = text.indexOf("NAXIS2  =", text.indexOf("XTENSION"));
        byte[] card = String.format("NAXIS2  = %20d", 99_999).getBytes(StandardCharsets.US_ASCII);
        System.arraycopy(card, 0, fits, at, card.length);
        Path lying = dir.resolve("lying.fits");
        Files.write(lying, fits);
        Files.write(dir.resolve("short.fits"), java.util.Arrays.copyOf(fits, 5000));

        for (String file : List.of("lying.fits", "short.fits")) {
            Run r = run(Map.of(), "audit", dir.resolve(file).toString());
            assertEquals(2, r.status(), r.err());
            assertEquals(1, r.err().lines().count(), r.err());
            assertTrue(r.err().contains(file), r.err());
        }
        Run verbose = run(Map.of(), "audit", lying.toString(), "--verbose");
        assertEquals(2, verbose.status(), verbose.err());
        assertTrue(verbose.err().contains("truncated"), verbose.err());
    }
}
