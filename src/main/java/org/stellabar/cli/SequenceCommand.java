package org.stellabar.cli;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.pipeline.TableMerge;
import org.stellabar.table.Table;
import org.stellabar.table.Version;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.pipeline.SequenceRun;
import org.stellabar.pipeline.Shard;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.survey.MassSequence;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar sequence}: Eddington standard models over a range of masses. */
public final class SequenceCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    /** Largest number of masses accepted on the command line. */
    static final int MAX_STEPS = 1_000_000;

    CommandSpec spec;

    String massRange;

    int steps;

    String shard;

    final CompositionOptions composition = new CompositionOptions();

    OutputFormat format;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    Path out;

    final ChartFormatOption chartFormats = new ChartFormatOption();

    /**
     * The n = 3 standard model (a Lane-Emden solve), solved once per process on a second thread
     * from the first moment a run is known to need it ({@link #solveAhead()}): it does not depend
     * on the options, so it runs while picocli reads them (src/bench/README.md, "Start-up").
     */
    private static FutureTask<EddingtonStandardModel> standardModel;

    {
        solveAhead();
    }

    /**
     * Starts solving the standard model on a second thread unless that has begun: {@link Main}
     * calls this for a {@code sequence} run before the command line is read, each command object
     * when it is made.
     */
    static synchronized void solveAhead() {
        if (standardModel == null) {
            // a class and a thread of its own, not a method reference on the common pool: the
            // first method reference of a run sets up the JDK's method handles (~10 ms), which
            // the solve's own lambdas then do on this second thread instead of the main one
            standardModel = new FutureTask<>(new StandardModelSolve());
            Thread solving = new Thread(standardModel, "standard-model");
            solving.setDaemon(true);
            solving.start();
        }
    }

    /** Solves the standard model (see {@link #solveAhead()}). */
    private static final class StandardModelSolve implements Callable<EddingtonStandardModel> {
        @Override
        public EddingtonStandardModel call() {
            return solveStandardModel();
        }
    }

    private static EddingtonStandardModel solveStandardModel() {
        EddingtonStandardModel model = EddingtonStandardModel.create();
        // The table's metadata, made on the main thread later, needs the model's note (the
        // JDK's Formatter set up) and the build's version (a resource looked up through every
        // module of the JDK before the jar): both are made here, meanwhile.
        MassSequence.modelNote(model);
        Version.current();
        return model;
    }

    /** Options that choose the part, the folder or what is printed: not part of what defines the job. */
    static final Set<String> NOT_DEFINING = Set.of("--shard", "--out", "--quiet", "--format", "--chart-formats",
            "--help", "--version");

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("sequence", this)
                .header("Eddington standard models over a range of masses.")
                .description("Eddington standard models (n = 3, uniform beta) over a log-spaced range",
                        "of masses: beta, 1-beta, L/L_Edd (= 1-beta with electron-scattering",
                        "opacity), Gamma1 - 4/3, and the radius, central density and temperature at",
                        "the onset of the general-relativistic instability, Gamma1 - 4/3 =",
                        "K3 2GM/(Rc^2) (Chandrasekhar 1964). Rows are computed in parallel and",
                        "printed in mass order.")
                .footer("%nWith --out, DIR receives sequence.csv (with '#' metadata lines),",
                        "sequence.ecsv and sequence.json (or the --table-formats); their names go to stderr.",
                        "%nExamples:%n  stellabar sequence",
                        "  stellabar sequence --mass-range \"10 Msun:1e8 Msun\" --steps 71 --mu 0.6 \\",
                        "      --format csv");
        quiet.describe(m);
        m.option("--mass-range").label("LOW:HIGH").defaultValue("1:1e6")
                .description("Lowest and highest mass, LOW < HIGH. Bare numbers here are SOLAR MASSES (not grams); "
                        + "units may be given, e.g. \"1 Msun:1e6 Msun\" or \"2e33 g:2e39 g\" (default: ${DEFAULT-VALUE}).")
                .field(this, "massRange");
        m.option("--steps").label("K").defaultValue("61")
                .description("Number of masses, log-spaced with both ends included, 2.." + MAX_STEPS
                        + " (default: ${DEFAULT-VALUE}).")
                .field(this, "steps");
        m.option("--shard").label("K/N")
                .description("Compute only the K-th of N equal parts of the masses (K = 1..N), e.g. for one task of a"
                        + " cluster job array; the parts, concatenated in K order, are the whole sequence. Without"
                        + " charts; files are named sequence-K-of-N.")
                .field(this, "shard");
        composition.describe(m);
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Output form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "format");
        tableFormats.describe(m);
        m.option("-o", "--out").label("DIR")
                .description("Also write the table (sequence.csv, .ecsv, .json unless --table-formats says otherwise) and the charts sequence-support and sequence-stability into this folder (created if needed).")
                .field(this, "out");
        chartFormats.describe(m);
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        var images = chartFormats.formats();
        MassSequence sequence = sequence();
        Optional<Shard> part = shard == null ? Optional.empty()
                : Optional.of(Ranges.shard("--shard", shard, steps)).map(p -> new Shard(p[0], p[1]));
        SequenceRun.Request request = new SequenceRun.Request(sequence, part);
        SequenceRun.Result result = out == null ? SequenceRun.compute(request) : SequenceRun.run(request, out, images,
                tableFormats.formatsOr(SequenceRun.FORMATS), CanonicalArguments.of(spec, NOT_DEFINING));
        Printer.print(result.table(), format, spec.commandLine().getOut());
        if (!quiet.quiet) {
            Printer.wrote(result.files(), spec.commandLine().getErr());
        }
        return 0;
    }

    /** @return the whole sequence the options ask for */
    private MassSequence sequence() {
        // bare numbers in the mass range are solar masses
        double[] range = Ranges.parse("--mass-range", massRange, Dimension.MASS, SOLAR_MASS);
        if (steps < 2 || steps > MAX_STEPS) {
            throw new BadInputException("--steps: " + steps + " is outside 2.." + MAX_STEPS);
        }
        Composition mixture = composition.composition();
        try {
            return new MassSequence(standardModel(), mixture, range[0], range[1], steps);
        } catch (BadInputException e) {
            throw e.about("--mass-range");
        }
    }

    /** @return the standard model, once its solve has finished; its failure as it was thrown */
    private static EddingtonStandardModel standardModel() {
        FutureTask<EddingtonStandardModel> solving;
        synchronized (SequenceCommand.class) {
            solving = standardModel;
        }
        try {
            return solving.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while solving the standard model", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException cause) {
                throw cause;
            }
            if (e.getCause() instanceof Error cause) {
                throw cause;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    /**
     * The whole sequence that a part's recorded arguments define, for {@code merge}.
     *
     * @param arguments the recorded arguments
     * @return the whole job: its table's schema and its writer
     */
    static TableMerge.WholeJob wholeJob(List<String> arguments) {
        SequenceCommand command = CanonicalArguments.parse(new SequenceCommand(), arguments);
        MassSequence sequence = command.sequence();
        // the table formats are part of what defines the job: the merge writes those the run did
        Set<TableFormat> formats = command.tableFormats.formatsOr(SequenceRun.FORMATS);
        return new TableMerge.WholeJob() {
            @Override
            public Table schema(int rows, Map<String, Long> extras) {
                if (rows != sequence.size()) {
                    throw new BadInputException("the parts hold " + rows + " rows of a sequence of " + sequence.size()
                            + " masses");
                }
                Table empty = sequence.table(0, 0);
                return new Table(empty.name(), sequence.metadata(), empty.columns());
            }

            @Override
            public List<Path> write(Table table, Path folder, Set<ChartFormat> chartFormats) throws IOException {
                return SequenceRun.writeWhole(table, folder, chartFormats.isEmpty()
                        ? EnumSet.allOf(ChartFormat.class) : chartFormats, formats);
            }
        };
    }
}
