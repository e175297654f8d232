package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.cli.StellabarCommand;
import picocli.CommandLine;

/** Bad input to {@code stellabar validate}: one line, exit 2, nothing written. */
class ValidateCommandTest {

    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int exit = cl.execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void referencesThatAreNotAFolderAreBadInput(@TempDir Path tmp) {
        Run r = run("validate", "--references", tmp.resolve("nowhere").toString(), "--out", tmp.toString());
        assertEquals(2, r.exit);
        assertTrue(r.err.contains("--references"), r.err);
        assertEquals(1, r.err.strip().lines().count(), r.err);
        assertFalse(Files.exists(tmp.resolve("report.md")));
    }

    @Test
    void anOutputThatIsAFileIsBadInput(@TempDir Path tmp) throws IOException {
        Path file = Files.writeString(tmp.resolve("taken"), "x");
        Run r = run("validate", "--out", file.toString());
        assertEquals(2, r.exit);
        assertTrue(r.err.contains("--out"), r.err);
    }

    @Test
    void aMalformedTableIsBadInputNamingItsLine(@TempDir Path tmp) throws IOException {
        Path refs = Files.createDirectory(tmp.resolve("refs"));
        try (var files = Files.list(ValidationRunTest.TABLES)) {
            for (Path p : files.filter(p -> p.toString().endsWith(".csv")).toList()) {
                Files.copy(p, refs.resolve(p.getFileName()));
            }
        }
        Path constants = refs.resolve("constants.csv");
        Files.writeString(constants, Files.readString(constants).replace("boltzmann,,1.380649e-16,erg/K,1e-15,rel,",
                "boltzmann,,1.380649e-16,erg/K,1e-15,relative,"));
        Run r = run("validate", "--references", refs.toString(), "--out", tmp.resolve("out").toString());
        assertEquals(2, r.exit, r.out + r.err);
        assertTrue(r.err.contains("constants.csv line") && r.err.contains("relative"), r.err);
        assertFalse(r.err.contains("Exception"), r.err);
        assertFalse(Files.exists(tmp.resolve("out").resolve("report.md")));
    }
}
