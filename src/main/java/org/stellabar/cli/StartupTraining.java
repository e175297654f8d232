package org.stellabar.cli;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * A short run of every command, in one process, for the launcher to record an application
 * class-data archive from ({@code java -XX:ArchiveClassesAtExit}, JEP 350): the classes these
 * runs load are then mapped from the archive by every later command instead of being parsed and
 * verified again, which is most of a short command's start-up. Writes only into a temporary
 * folder that it removes; prints nothing. Not a user command.
 */
public final class StartupTraining {

    private StartupTraining() {
    }

    /**
     * @param args none for a run of every command; {@value #TERMINAL} and a command's name for that
     *     command's runs that print to the terminal only (the launcher's smaller archive for that
     *     command: see {@link #terminalRuns})
     * @throws IOException if the temporary folder cannot be made or removed
     */
    public static void main(String[] args) throws IOException {
        // what Main sets up before every command (this JVM's logging is then configured quietly)
        Main.prepare(false);
        if (args.length > 1 && TERMINAL.equals(args[0])) {
            terminalRuns().stream().filter(c -> c.get(0).equals(args[1])).forEach(StartupTraining::run);
            return;
        }
        Path folder = Files.createTempDirectory("stellabar-training");
        try {
            String out = folder.toString();
            for (List<String> command : List.of(
                    List.of("--version"),
                    List.of("--help"),
                    List.of("eos", "--rho", "1", "--temp", "1e7", "--format", "json"),
                    List.of("eos", "--rho", "1e4", "--temp", "2e9", "--X", "0", "--Z", "1", "--metal-mass-number",
                            "16", "--electrons", "fermi", "--format", "json"),
                    List.of("polytrope", "--index", "3", "--format", "json"),
                    List.of("polytrope", "--index", "1.5", "--out", out + "/polytrope"),
                    List.of("sequence", "--steps", "50", "--out", out + "/sequence"),
                    List.of("sequence", "--steps", "50", "--format", "csv"),
                    List.of("sequence", "--steps", "50"),
                    List.of("sequence", "--help"),
                    List.of("eos", "--rho", "-1", "--temp", "1e7"),
                    List.of("grid", "--rho-range", "1e-6:1e2", "--temp-range", "1e4:1e8", "--points", "20",
                            "--out", out + "/grid", "--format", "fits"),
                    List.of("grid", "--rho-range", "1e-6:1e2", "--temp-range", "1e4:1e8", "--points", "20",
                            "--out", out + "/grid-csv", "--chart-formats", "png"),
                    List.of("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--format", "json"),
                    List.of("model", "--quiet", "--out", out + "/demo"))) {
                run(command);
            }
        } finally {
            removeTree(folder);
        }
    }

    /** The argument that asks for {@link #terminalRuns} only. */
    static final String TERMINAL = "terminal";

    /**
     * Runs of the short commands that print to the terminal and write no file ({@code eos},
     * {@code polytrope}, {@code sequence} without {@code --out}), for an archive per command: a
     * command's classes are a third of the full archive's, and a JVM that maps an archive of only
     * those starts ~20 ms sooner (page faults over fewer, denser pages), a tenth of such a
     * command's time (src/bench/README.md, "Tenth pass").
     *
     * @return the command lines, each starting with its command's name
     */
    static List<List<String>> terminalRuns() {
        return List.of(
                List.of("eos", "--rho", "1", "--temp", "1e7"),
                List.of("eos", "--rho", "1", "--temp", "1e7", "--format", "json"),
                List.of("eos", "--rho", "1e4", "--temp", "2e9", "--X", "0", "--Z", "1", "--metal-mass-number", "16",
                        "--electrons", "fermi", "--format", "json"),
                List.of("eos", "--rho", "-1", "--temp", "1e7"),
                List.of("polytrope", "--index", "3", "--format", "json"),
                List.of("polytrope", "--index", "1.5"),
                List.of("sequence", "--steps", "50", "--format", "csv"),
                List.of("sequence", "--steps", "50"),
                List.of("sequence", "--steps", "50", "--format", "json"),
                List.of("sequence", "--help"));
    }

    /** Runs one command as {@link Main} does: the same writers, into nowhere. */
    private static void run(List<String> command) {
        String[] args = command.toArray(new String[0]);
        var cl = StellabarCommand.commandLine(args);
        cl.setOut(new StandardOutput(new BufferedOutputStream(OutputStream.nullOutputStream(), 1 << 16)));
        cl.setErr(new PrintWriter(new OutputStreamWriter(OutputStream.nullOutputStream(), StandardCharsets.UTF_8),
                true));
        cl.execute(args);
        cl.getOut().flush();
    }

    private static void removeTree(Path folder) throws IOException {
        try (Stream<Path> paths = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) paths.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(p);
            }
        }
    }
}
