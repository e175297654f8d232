package org.stellabar.output;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.charts.Palette;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Two small CSV files written by {@link CsvWriter#withComments()} and a notebook that plots them.
 * The numbers are made-up smooth shapes for a transport test, not a star.
 */
final class NotebookSamples {

    static final int PROFILE_ROWS = 9;

    private NotebookSamples() {
    }

    static Metadata metadata() {
        Inputs inputs = Inputs.builder().number("mass", 40.0, "Msun", "").number("X", 0.70, "", "")
                .text("note|with pipe", "a|b").build();
        return Metadata.of("Made-up profile for a notebook test", inputs,
                List.of("numbers are smooth made-up shapes, not a model"));
    }

    static Table profile() {
        double[] m = new double[PROFILE_ROWS];
        double[] r = new double[PROFILE_ROWS];
        double[] rho = new double[PROFILE_ROWS];
        double[] t = new double[PROFILE_ROWS];
        double[] oneMinusBeta = new double[PROFILE_ROWS];
        for (int i = 0; i < PROFILE_ROWS; i++) {
            double x = (i + 1.0) / (PROFILE_ROWS + 1.0);
            r[i] = 12.5 * x;
            m[i] = 40 * x * x * (3 - 2 * x);
            rho[i] = 30 * Math.pow(1 - x * x, 3) + 1e-6;
            t[i] = 3.5e7 * (1 - x * x) + 1e4;
            oneMinusBeta[i] = 0.3 + 0.01 * i;
        }
        return new Table.Builder("profile", metadata())
                .number("m_r", "Msun", "mass inside r", m)
                .number("r", "Rsun", "radius", r)
                .number("rho", "g/cm3", "density", rho)
                .number("T", "K", "temperature", t)
                .number("one_minus_beta", "", "radiation pressure fraction", oneMinusBeta)
                .text("zone", "made-up zone label", List.of("core, inner", "core \"hot\"", "b", "c", "d", "e", "f",
                        "g", "# not a comment"))
                .build();
    }

    static Table sequence() {
        double[] mass = {1, 10, 100, 1000, 10000};
        double[] beta = {0.99, 0.9, 0.6, 0.3, 0.1};
        return new Table.Builder("sequence", metadata())
                .number("M", "Msun", "mass", mass)
                .number("beta", "", "gas pressure fraction", beta)
                .build();
    }

    static NotebookContent content() {
        return new NotebookContent("Notebook test: β, ρ and T", NotebookWriter.describe(metadata()), List.of(
                NotebookPlot.of("Density and temperature", "profile.csv", "r", List.of("rho", "T"),
                        "r [R$_\\odot$]", "ρ [g cm⁻³], T [K]")
                        .withLogY()
                        .withHorizontalLine(1e6, "10⁶ (a level)")
                        .withVerticalLine(6.25, "half radius"),
                NotebookPlot.of("Radiation fraction", "profile.csv", "m_r", List.of("one_minus_beta"),
                        "m [M☉]", "1 − β"),
                NotebookPlot.of("Mass sequence", "data/sequence.csv", "M", List.of("beta"), "M [M☉]", "β")
                        .withLogX()
                        .withHorizontalLine(0.5, "β = 1/2 \"quoted\" \\ back")));
    }

    /** Writes both CSV files (one in a subfolder) and the notebook into a folder. */
    static Path writeAll(Path dir) throws IOException {
        AtomicFiles.writeText(dir.resolve("profile.csv"), out -> CsvWriter.withComments().write(profile(), out));
        AtomicFiles.writeText(dir.resolve("data/sequence.csv"),
                out -> CsvWriter.withComments().write(sequence(), out));
        Path notebook = dir.resolve("test.ipynb");
        new NotebookWriter(Palette.hexCodes()).write(content(), notebook);
        return notebook;
    }
}
