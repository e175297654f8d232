package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.fermi.FermiGasRadiationEos;

/**
 * {@code --electrons fermi} through {@code model}, {@code grid} and {@code audit}: each output
 * against the Fermi–Dirac equation of state itself (identities), and the choice in the metadata.
 */
class FermiThroughTheToolTest {

    private static final String[] OXYGEN = {"--X", "0", "--Z", "1", "--metal-mass-number", "16"};
    private static final Composition OXYGEN_MIX = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);

    private static String[] args(String... head) {
        String[] all = Arrays.copyOf(head, head.length + OXYGEN.length);
        System.arraycopy(OXYGEN, 0, all, head.length, OXYGEN.length);
        return all;
    }

    /** Rows of a CSV printed by the tool: '#' lines skipped, the header first. */
    private static List<String[]> csv(String text) {
        List<String[]> rows = new ArrayList<>();
        for (String line : text.split("\n")) {
            if (!line.startsWith("#") && !line.isBlank()) {
                rows.add(line.split(","));
            }
        }
        return rows;
    }

    private static int column(String[] header, String name) {
        for (int i = 0; i < header.length; i++) {
            if (header[i].equals(name) || header[i].startsWith(name + " [")) {
                return i;
            }
        }
        throw new AssertionError("no column " + name + " in " + String.join(",", header));
    }

    /**
     * A polytrope n = 3 of a hot oxygen core: T at every row is the root of P(ρ, T) = P on the fermi
     * EOS, so the EOS at the row's (ρ, T) gives back its P (Newton in ln T to 1e-15; 1e-12 allows the
     * CSV's shortest round-trip digits) and its Γ1.
     */
    @Test
    void polytropeRowsLieOnTheFermiEos() {
        CliRun run = CliRun.of(args("model", "--mass", "40 Msun", "--radius", "0.3 Rsun", "--kind", "polytrope",
                "--index", "3", "--electrons", "fermi", "--points", "41", "--format", "csv"));
        assertEquals(0, run.exitCode(), run.err());
        List<String[]> rows = csv(run.out());
        String[] h = rows.get(0);
        FermiGasRadiationEos eos = new FermiGasRadiationEos(OXYGEN_MIX);
        for (int i = 1; i < rows.size() - 1; i++) {
            double rho = Double.parseDouble(rows.get(i)[column(h, "rho")]);
            double t = Double.parseDouble(rows.get(i)[column(h, "T")]);
            EosState s = eos.state(rho, t);
            assertEquals(1.0, s.P() / Double.parseDouble(rows.get(i)[column(h, "P")]), 1e-12, "P, row " + i);
            assertEquals(s.Gamma1(), Double.parseDouble(rows.get(i)[column(h, "Gamma1")]), 1e-12, "Gamma1, row " + i);
        }
    }

    /** The standard model is classical by construction: fermi is bad input naming --electrons, exit 2. */
    @Test
    void standardModelWithFermiIsBadInput() {
        CliRun run = CliRun.of("model", "--mass", "40 Msun", "--radius", "12 Rsun", "--electrons", "fermi");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--electrons"), run.err());
        assertFalse(run.err().contains("\tat "), "no stack trace");
        assertEquals(1, run.err().strip().split("\n").length, run.err());
    }

    /** The grid's columns are the fermi EOS at each (ρ, T), η and n₊ included. */
    @Test
    void gridCarriesEtaPositronsAndGamma1(@TempDir Path dir) throws IOException {
        CliRun run = CliRun.of(args("grid", "--rho-range", "1e2:1e7", "--temp-range", "1e8:5e9", "--points", "4x5",
                "--electrons", "fermi", "--chart-formats", "svg", "--out", dir.toString(), "-q"));
        assertEquals(0, run.exitCode(), run.err());
        List<String[]> rows = csv(Files.readString(dir.resolve("grid.csv")));
        String[] h = rows.get(0);
        assertEquals(21, rows.size());
        FermiGasRadiationEos eos = new FermiGasRadiationEos(OXYGEN_MIX);
        for (int i = 1; i < rows.size(); i++) {
            double rho = Double.parseDouble(rows.get(i)[column(h, "rho")]);
            double t = Double.parseDouble(rows.get(i)[column(h, "T")]);
            FermiGasRadiationEos.FermiState s = eos.fermiState(rho, t);
            // the same computation, printed in shortest round-trip digits: equal exactly
            assertEquals(s.common().Gamma1(), Double.parseDouble(rows.get(i)[column(h, "Gamma1")]));
            assertEquals(s.eta(), Double.parseDouble(rows.get(i)[column(h, "eta")]));
            assertEquals(s.nPositron(), Double.parseDouble(rows.get(i)[column(h, "n_positron")]));
        }
        String svg = Files.readString(dir.resolve("rho-T-plane-2col.svg"));
        assertTrue(svg.contains("4/3"), "the chart labels the Gamma1 < 4/3 region");
    }

    /**
     * Auditing a fermi model with the fermi EOS reproduces its pressure (the audit recomputes P from
     * the profile's ρ and T: 1e-9 is far above the inversion's 1e-15); with the classical EOS the
     * hot, pair-rich core disagrees by far more than the default tolerance 1e-3.
     */
    @Test
    void auditOfAFermiCore(@TempDir Path dir) throws IOException {
        CliRun model = CliRun.of(args("model", "--mass", "40 Msun", "--radius", "0.3 Rsun", "--kind", "polytrope",
                "--index", "3", "--electrons", "fermi", "--points", "101", "--out", dir.toString(), "-q"));
        assertEquals(0, model.exitCode(), model.err());
        Path profile = dir.resolve("stars").resolve("model.csv");
        String written = Files.readString(profile);
        assertTrue(written.contains("# input electrons = fermi"), "the profile's metadata names the EOS");
        assertTrue(written.contains("energy convention"), "and its energy convention");
        assertTrue(Files.readString(dir.resolve("summary.csv")).contains("electrons = fermi for: model"));
        CliRun fermi = CliRun.of("audit", profile.toString(), "--electrons", "fermi", "--format", "json");
        assertEquals(0, fermi.exitCode(), fermi.err());
        assertTrue(fermi.out().contains("\"electrons\""), "metadata names the equation of state");
        assertTrue(mismatch(fermi.out()) < 1e-9, fermi.out());
        CliRun classical = CliRun.of("audit", profile.toString(), "--format", "json");
        assertEquals(0, classical.exitCode(), classical.err());
        assertTrue(mismatch(classical.out()) > 1e-3);
    }

    private static double mismatch(String json) {
        Matcher m = Pattern.compile("\"max_pressure_mismatch\"\\s*:\\s*([-+0-9.eE]+)").matcher(json);
        assertTrue(m.find(), json);
        return Double.parseDouble(m.group(1));
    }
}
