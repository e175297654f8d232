package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import org.stellabar.pipeline.DemoCatalogue;
import org.stellabar.pipeline.RunLayout;
import org.stellabar.pipeline.RunResult;
import org.stellabar.pipeline.ObservedRun;
import org.stellabar.pipeline.ScenarioRunner;
import org.stellabar.scenario.Scenario;
import org.stellabar.scenario.ScenarioReader;
import org.stellabar.scenario.ScenarioStar;
import org.stellabar.structure.StarDraft;
import org.stellabar.structure.StarKind;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.StarRequestException;
import org.stellabar.structure.StarSchema;
import org.stellabar.table.Summary;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar model}: one physical star from options: summary, stability and profile. */
public final class ModelCommand implements Callable<Integer>, Subcommand {

    /** Columns of the scenario summary shown on a terminal. */
    static final String[] TERMINAL_COLUMNS = {StarSchema.NAME, StarSchema.KIND, StarSchema.INDEX,
        StarSchema.M.name(), StarSchema.R.name(), StarSchema.T_C.name(), StarSchema.BETA_C.name(),
        StarSchema.ONE_MINUS_BETA_C.name(), StarSchema.GAMMA1_MEAN.name(), StarSchema.NEWTONIAN_MARGIN.name(),
        StarSchema.GR_MARGIN.name(), StarSchema.R_CRIT.name(), StarSchema.VERDICT};

    CommandSpec spec;

    Path scenarioFile;

    boolean quiet;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    Double mass;

    Double radius;

    final CompositionOptions composition = new CompositionOptions();

    final ElectronsOption electrons = new ElectronsOption();

    StarKind kind;

    Double index;

    Double centralTemperature;

    Double entropy;

    int points;

    OutputFormat format;

    Path out;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("model", this)
                .header("Physical stars: the demo cluster, a scenario file, or one star from options.")
                .description("With no arguments: runs the built-in demo scenario (an invented cluster of",
                        "stars) and writes profiles (CSV, FITS), charts (PNG, SVG, PDF), a summary (CSV,",
                        "JSON, FITS) and a notebook, then the demo's invented catalogue of observed",
                        "stars (profiles/demo-catalogue.csv, as 'stellabar observed') into observed/.",
                        "With FILE: runs that scenario file (TOML; see",
                        "profiles/demo-cluster.toml). With --mass and friends: one physical star, a",
                        "polytrope of any index or Eddington's standard model scaled to M and R, or",
                        "an isentropic gas + radiation star. Prints central values, beta,",
                        "pressure-weighted Gamma1, Newtonian and general-relativistic stability",
                        "margins, the Eddington luminosity and the radial profile",
                        "(r, m, rho, P, P_gas, P_rad, T, beta, 1-beta, Gamma1, nabla_ad, c_s).")
                .footer("%nKinds and what they need besides --mass:",
                        "  standard    --radius (n = 3, beta from Eddington's quartic)",
                        "  polytrope   --radius and --index n, 0 <= n < 5",
                        "  isentropic  exactly one of --radius, --central-temp, --entropy",
                        "%n--electrons fermi (polytrope, isentropic): electrons of any degeneracy with",
                        "e+e- pairs; a scenario file says electrons = \"fermi\" per star or in [defaults].",
                        "%nExamples:",
                        "  stellabar model                       (the built-in demo cluster)",
                        "  stellabar model profiles/demo-cluster.toml --out /tmp/demo",
                        "  stellabar model --mass \"40 Msun\" --radius \"12 Rsun\"",
                        "  stellabar model --mass \"1e6 Msun\" --central-temp 1e8 --kind isentropic \\",
                        "      --mu 0.6 --format json",
                        "  stellabar model --mass \"10 Msun\" --radius \"5 Rsun\" --kind polytrope \\",
                        "      --index 1.5 --out profiles/out/m10",
                        "  stellabar model --mass \"80 Msun\" --central-temp 2e9 --kind isentropic \\",
                        "      --X 0 --Z 1 --metal-mass-number 16 --electrons fermi");
        m.positional("0").label("FILE").arity("0..1")
                .description("Scenario file (TOML). Omit it, and --mass, to run the built-in demo scenario.")
                .field(this, "scenarioFile");
        m.option("-q", "--quiet")
                .description("No progress lines on stderr for scenario runs.")
                .field(this, "quiet");
        tableFormats.describe(m);
        m.option("--mass").label("MASS").converter(new Quantities.Mass())
                .description("Total mass of one star (g; also kg, Msun), e.g. \"40 Msun\".")
                .field(this, "mass");
        m.option("--radius").label("RADIUS").converter(new Quantities.Length())
                .description("Radius (cm; also m, km, Rsun, au), e.g. \"12 Rsun\".")
                .field(this, "radius");
        composition.describe(m);
        electrons.describe(m);
        m.option("--kind").label("KIND").defaultValue("standard")
                .description("Kind of model: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "kind");
        m.option("--index").label("N").converter(new Quantities.Number())
                .description("Polytropic index n in [0, 5) for kind polytrope (3 for standard, which may omit it).")
                .field(this, "index");
        m.option("--central-temp").label("TEMPERATURE").converter(new Quantities.Temperature())
                .description("Central temperature (K; also MK) of an isentropic star.")
                .field(this, "centralTemperature");
        m.option("--entropy").label("S").converter(new Quantities.Number())
                .description("Entropy per baryon of an isentropic star, in units of k_B.")
                .field(this, "entropy");
        m.option("--points").label("K").defaultValue("" + StarRequest.DEFAULT_POINTS)
                .description("Profile rows from the centre to the surface, " + StarRequest.MIN_POINTS + " to "
                        + StarRequest.MAX_POINTS + " (default: ${DEFAULT-VALUE}).")
                .field(this, "points");
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Output form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}); text and json print the"
                        + " summary and the profile, csv the profile.")
                .field(this, "format");
        m.option("-o", "--out").label("DIR")
                .description("Write everything a scenario writes into this folder (star profiles as CSV, ECSV and FITS,"
                        + " charts, summary as CSV, ECSV, JSON and FITS, the notebook; --table-formats or the"
                        + " scenario's table_formats choose others). A scenario defaults to"
                        + " profiles/out/<scenario>/ and notebooks-export/<scenario>.ipynb; one star from options"
                        + " writes files only with --out.")
                .field(this, "out");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        if (mass == null) {
            if (radius != null || index != null || centralTemperature != null || entropy != null
                    || electrons.electrons() != org.stellabar.eos.Electrons.classical) {
                throw new CommandLine.ParameterException(spec.commandLine(), "Missing required option: '--mass=MASS'"
                        + " (a single star needs --mass; give no star options to run a scenario)");
            }
            return runScenario();
        }
        if (scenarioFile != null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "a scenario FILE (" + scenarioFile
                    + ") and --mass cannot be combined; give one or the other");
        }
        StarRequest request;
        try {
            request = new StarDraft(StarRequest.DEFAULT_NAME, kind, mass, optional(radius), optional(index),
                    optional(centralTemperature), optional(entropy), StarDraft.ANCHORS, composition.composition(),
                    points, electrons.electrons()).toRequest();
        } catch (StarRequestException e) {
            throw e.named(ModelCommand::option);
        }
        // one star from options is a scenario of one star: built and written by the same job
        Scenario one = Scenario.ofOne(ScenarioStar.of(request), "command-line options");
        Scenario scenario = tableFormats.formats().map(one::withTableFormats).orElse(one);
        ScenarioRunner runner = new ScenarioRunner();
        StarModel model;
        try {
            model = runner.build(request);
        } catch (StarRequestException e) {
            throw e.named(ModelCommand::option);
        }
        PrintWriter stdout = spec.commandLine().getOut();
        if (out != null) {
            // the profile goes to the files; the terminal gets the headline only
            Printer.print(StarSchema.summary(model, false), format, stdout);
        } else if (format == OutputFormat.csv) {
            Printer.print(model.profile(), format, stdout);
        } else {
            Printer.print(StarSchema.summary(model, true), format, stdout);
        }
        stdout.flush();
        if (out != null) {
            PrintWriter err = spec.commandLine().getErr();
            RunResult result = runner.write(scenario, List.of(model), RunLayout.of(scenario.name(), out),
                    progress(err));
            err.println("model: " + result.files().size() + " files written under " + out);
            err.flush();
        }
        return 0;
    }

    /** The result of a task run beside the main work, or its own failure. */
    private static <T> T finished(java.util.concurrent.FutureTask<T> task) throws IOException {
        try {
            return task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting for the demo catalogue", e);
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof IOException io) {
                throw io;
            }
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    /** Runs a scenario file, or the built-in demo, through the pipeline and reports where everything went. */
    private int runScenario() throws IOException {
        long start = System.nanoTime();
        // the demo also runs its invented catalogue of observed stars (profiles/demo-catalogue.csv),
        // on its own thread beside the cluster, from now on; its files, its own folder's, once
        // that folder is known and checked
        var destination = new java.util.concurrent.CompletableFuture<DemoCatalogue.Destination>();
        var catalogue = scenarioFile == null ? DemoCatalogue.startBeside(destination) : null;
        Scenario scenario;
        RunLayout layout;
        try {
            Scenario read = scenarioFile == null ? ScenarioReader.builtInDemo() : ScenarioReader.read(scenarioFile);
            scenario = tableFormats.formats().map(read::withTableFormats).orElse(read);
            layout = RunLayout.of(scenario.name(), out);
            OutFolder.checkFolders(List.of(layout.outputFolder(), layout.starFolder(), layout.chartFolder()));
        } catch (RuntimeException e) {
            destination.completeExceptionally(e);
            throw e;
        }
        destination.complete(new DemoCatalogue.Destination(layout.outputFolder(),
                scenario.options().tableFormatsOr(ObservedRun.FORMATS)));
        PrintWriter err = spec.commandLine().getErr();
        RunResult result = new ScenarioRunner().run(scenario, layout, progress(err));
        var observed = scenarioFile == null ? finished(catalogue) : null;
        if (observed != null) {
            progress(err).accept(String.format(Locale.US, "observed catalogue: %d stars, %d estimated",
                    observed.getKey().outcomes().size(), observed.getKey().table().rowCount()));
        }
        PrintWriter stdout = spec.commandLine().getOut();
        if (format == OutputFormat.text) {
            // the terminal gets the headline columns; the files hold them all
            Printer.print(result.summary().select(TERMINAL_COLUMNS), format, stdout);
        } else {
            Printer.print(result.summary(), format, stdout);
        }
        if (format == OutputFormat.text) {
            stdout.printf(Locale.US, "%n%d files written in %.1f s:%n", result.files().size(),
                    (System.nanoTime() - start) * 1e-9);
            stdout.println("  star profiles  " + layout.starFolder());
            stdout.println("  charts         " + layout.chartFolder());
            stdout.println("  summary        " + layout.outputFolder().resolve("summary.{" + String.join(",",
                    scenario.options().tableFormatsOr(ScenarioRunner.SUMMARY_FORMATS).stream()
                            .map(org.stellabar.output.TableFormat::extension).toList()) + "}"));
            if (observed != null) {
                stdout.println("  observed stars " + layout.outputFolder().resolve(DemoCatalogue.FOLDER)
                        + " (" + observed.getValue().size() + " files)");
            }
            if (result.files().contains(layout.notebook())) {
                stdout.println("  notebook       " + layout.notebook());
            }
            stdout.flush();
        }
        return 0;
    }

    /** @return where a scenario run's progress lines go: stderr, unless --quiet */
    private Consumer<String> progress(PrintWriter err) {
        return line -> {
            if (!quiet) {
                err.println("model: " + line);
                err.flush();
            }
        };
    }

    private static OptionalDouble optional(Double value) {
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    private static String option(StarRequestException.Component component) {
        return switch (component) {
            case mass -> "--mass";
            case radius -> "--radius";
            case index -> "--index";
            case centralTemperature -> "--central-temp";
            case entropy -> "--entropy";
            case points -> "--points";
            case kind -> "--kind";
            case electrons -> "--electrons";
        };
    }
}
