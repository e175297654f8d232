package org.stellabar.cli;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Units;
import org.stellabar.pipeline.PairInstabilityRun;
import org.stellabar.survey.PairInstabilitySequence;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar pair-instability}: isentropic cores over central temperature on the fermi EOS. */
public final class PairInstabilityCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    List<String> coreMasses = new ArrayList<>();

    String tempRange;

    int temperatures;

    final CompositionOptions composition = new CompositionOptions();

    OutputFormat format;

    Path out;

    final ChartFormatOption chartFormats = new ChartFormatOption();

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("pair-instability", this)
                .header("Where a stellar core turns pair-unstable.")
                .description("For each core mass: isentropic models on the equation of state with electrons",
                        "of any degeneracy and electron-positron pairs, over a log-spaced range of",
                        "central temperatures; for each model the pressure-weighted Gamma1 - 4/3 and the",
                        "post-Newtonian margin Gamma1 - 4/3 - K 2GM/(Rc^2) (Chandrasekhar 1964), and per",
                        "core the central temperature where it first turns unstable (Brent's method",
                        "between the neighbours that bracket it). Without composition options the core",
                        "is pure oxygen (X = Y = 0, Z = 1, metal ions of A = 16).")
                .footer("%nWith --out, DIR receives pair-instability.csv and .json (every model),",
                        "pair-instability-onset.csv (one row per core) and the chart",
                        "pair-instability-margin; their names go to stderr.",
                        "%nExamples:",
                        "  stellabar pair-instability --core-mass 40,80 --temp-range 5e8:3e9",
                        "  stellabar pair-instability --core-mass \"60 Msun\" --X 0 --Z 1 \\",
                        "      --metal-mass-number 12 --temperatures 8 --out profiles/out/carbon");
        quiet.describe(m);
        m.option("--core-mass").label("MASS").split(",").required()
                .description("Core masses, comma-separated; bare numbers are SOLAR MASSES, e.g. 40,80 or \"80 Msun\".")
                .field(this, "coreMasses");
        m.option("--temp-range").label("LOW:HIGH").defaultValue("3e8:4e9")
                .description("Lowest and highest central temperature (K; also MK) (default: ${DEFAULT-VALUE}).")
                .field(this, "tempRange");
        m.option("--temperatures").label("K").defaultValue("9")
                .description("Central temperatures per core, log-spaced, 2.." + PairInstabilitySequence.MAX_TEMPERATURES
                        + " (default: ${DEFAULT-VALUE}).")
                .field(this, "temperatures");
        composition.describe(m);
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Output form of the onsets: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "format");
        m.option("-o", "--out").label("DIR")
                .description("Also write the models, the onsets and the chart into this folder (created if needed).")
                .field(this, "out");
        chartFormats.describe(m);
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        List<Double> masses = new ArrayList<>();
        for (String text : coreMasses) {
            String t = text.strip();
            double m = t.matches("[-+0-9.eE]+") ? Units.parseNumber("--core-mass", t) * SOLAR_MASS
                    : Units.parse("--core-mass", t, Dimension.MASS);
            if (!(m > 0.0) || !Double.isFinite(m)) {
                throw BadInputException.mustBePositive("--core-mass", m, "g");
            }
            masses.add(m);
        }
        double[] range = Ranges.parse("--temp-range", tempRange, Dimension.TEMPERATURE, 1.0);
        boolean given = composition.x != null || composition.y != null || composition.z != null
                || composition.mu != null;
        Composition mixture = given ? composition.composition() : Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);
        PairInstabilityRun.Result run;
        try {
            run = PairInstabilityRun.run(new PairInstabilitySequence(mixture), masses, range[0], range[1],
                    temperatures, out, chartFormats.formats());
        } catch (BadInputException e) {
            throw e.about("--core-mass/--temp-range/--temperatures");
        }
        PrintWriter stdout = spec.commandLine().getOut();
        if (format == OutputFormat.text) {
            Printer.print(run.result().table(), format, stdout);
            stdout.println();
        }
        Printer.print(run.result().onsetTable(), format, stdout);
        stdout.flush();
        if (!quiet.quiet) {
            Printer.wrote(run.files(), spec.commandLine().getErr());
        }
        return 0;
    }
}
