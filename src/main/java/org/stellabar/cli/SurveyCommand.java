package org.stellabar.cli;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.stellabar.charts.ChartFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.Shard;
import org.stellabar.pipeline.SlurmDriver;
import org.stellabar.pipeline.SurveyRun;
import org.stellabar.scenario.SurveyFile;
import org.stellabar.scenario.SurveyReader;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar survey}: star models over one or two axes, on one machine or as Slurm array tasks. */
public final class SurveyCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    Path file;

    Path out;

    String shard;

    OutputFormat format;

    List<ChartFormat> chartFormats;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    /** The Slurm options; all null and zero unless --slurm-script (with --shards) is given. */
    final Slurm slurm = new Slurm();

    /** The options of the Slurm driver. */
    static final class Slurm {
        /*
         * The defaults are the fields' initial values too: picocli applies an option's default
         * to an annotated group's new object, but a group built in code has none to apply it to.
         */
        static final String DEFAULT_TIME = "1:00:00";
        static final String DEFAULT_MEMORY = "2G";
        static final int DEFAULT_CPUS = 1;

        Path script;
        int shards;
        Path parts;
        String partition;
        String time = DEFAULT_TIME;
        String memory = DEFAULT_MEMORY;
        int cpus = DEFAULT_CPUS;
    }

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("survey", this)
                .header("Star models over a plane of inputs, on this machine or a Slurm cluster.")
                .description("Builds one star model per point of a survey file's axes (mass, radius, central",
                        "temperature, entropy per baryon, X, Z; one or two axes, linear or log steps),",
                        "in parallel on all cores, and writes one table (a row per point, first axis",
                        "outer) and maps of <Gamma1> - 4/3, the post-Newtonian margin, beta_c and T_c",
                        "with the stability boundary. A point whose model fails keeps its row, with",
                        "status 'failed' and the reason; it never stops the survey.",
                        "%nWith --shard K/N only the K-th of N parts is computed and written as",
                        "NAME-K-of-N.part.json; 'stellabar merge' joins the parts into the same files,",
                        "byte for byte. With --slurm-script a job-array driver for Slurm is written.")
                .footer("%nExamples:%n  stellabar survey gr-edge.toml --out runs/gr-edge",
                        "  stellabar survey gr-edge.toml --shard 2/4 --out runs/parts",
                        "  stellabar survey gr-edge.toml --slurm-script gr-edge.sh --shards 16 --out runs/gr-edge",
                        "  bash gr-edge.sh --wait");
        quiet.describe(m);
        m.positional("0").label("FILE")
                .description("The survey file (TOML, see the README).")
                .field(this, "file");
        m.option("-o", "--out").label("DIR")
                .description("Write the table and maps (or the part, with --shard) into this folder (created if needed);"
                        + " with --slurm-script, where the merged survey goes.")
                .field(this, "out");
        m.option("--shard").label("K/N")
                .description("Compute only the K-th of N equal parts of the points and write NAME-K-of-N.part.json"
                        + " (needs --out).")
                .field(this, "shard");
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Without --out, how to print the table: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "format");
        m.option("--chart-formats").label("FORMATS").split(",").converter(new ChartFormatOption.Words()).candidates(new ChartFormatOption.Words())
                .description("Map image formats, comma-separated: png, svg, pdf (default: the survey file's"
                        + " chart_formats, else png,svg).")
                .field(this, "chartFormats");
        tableFormats.describe(m);
        CommandModel.Group driver = m.group(false).heading("%nSlurm job array:%n");
        driver.option("--slurm-script").label("JOB.sh").required()
                .description("Write a driver script instead of computing: 'bash JOB.sh' submits --shards array tasks"
                        + " and a merge job; 'bash JOB.sh --wait' also waits and exits with the merge's status.")
                .field(slurm, "script");
        driver.option("--shards").label("N").required()
                .description("Number of array tasks (parts).")
                .field(slurm, "shards");
        driver.option("--parts").label("DIR")
                .description("Folder of the parts (default: OUT/parts); logs go to OUT/logs.")
                .field(slurm, "parts");
        driver.option("--partition").label("NAME")
                .description("Slurm partition (default: the cluster's).")
                .field(slurm, "partition");
        driver.option("--time").label("LIMIT").defaultValue(Slurm.DEFAULT_TIME)
                .description("Time limit per task, a Slurm time such as 30, 2:00:00 or 1-00:00:00 (default: ${DEFAULT-VALUE}).")
                .field(slurm, "time");
        driver.option("--mem").label("SIZE").defaultValue(Slurm.DEFAULT_MEMORY)
                .description("Memory per task, e.g. 2000M or 4G (default: ${DEFAULT-VALUE}).")
                .field(slurm, "memory");
        driver.option("--cpus-per-task").label("C").defaultValue(String.valueOf(Slurm.DEFAULT_CPUS))
                .description("Processors per task; each task's JVM uses this many (default: ${DEFAULT-VALUE}).")
                .field(slurm, "cpus");
        driver.add();
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        SurveyFile read = SurveyReader.read(file);
        // --table-formats overrides the file's table_formats for this run's table (not a part's)
        SurveyFile survey = tableFormats.formats().map(read::withTableFormats).orElse(read);
        var err = spec.commandLine().getErr();
        // --slurm-script is required within its group: any Slurm option given brings it
        if (slurm.script != null) {
            return writeDriver(survey);
        }
        if (shard != null) {
            if (out == null) {
                throw new BadInputException("--shard: a part is written to a file; give --out DIR");
            }
            int[] kn = Ranges.shard("--shard", shard, survey.plan().size());
            SurveyRun.PartResult part = SurveyRun.runPart(survey, new Shard(kn[0], kn[1]), out);
            if (!quiet.quiet) {
                Printer.wrote(List.of(part.file()), err);
            }
            spec.commandLine().getOut().printf(Locale.US, "survey %s part %d of %d: %d points, %d failed%n",
                    survey.plan().name(), kn[0], kn[1], part.points(), part.failures());
            spec.commandLine().getOut().flush();
            return 0;
        }
        if (out == null) {
            SurveyRun.Result result = SurveyRun.compute(survey);
            Printer.print(result.table(), format, spec.commandLine().getOut());
            return 0;
        }
        SurveyRun.Result result = SurveyRun.run(survey, out, chartFormats == null ? SurveyRun.formats(survey)
                : EnumSet.copyOf(chartFormats.isEmpty() ? EnumSet.noneOf(ChartFormat.class) : chartFormats));
        if (!quiet.quiet) {
            Printer.wrote(result.files(), err);
        }
        spec.commandLine().getOut().printf(Locale.US, "survey %s: %d points, %d failed%n", survey.plan().name(),
                result.points(), result.failures());
        spec.commandLine().getOut().flush();
        return 0;
    }

    private Integer writeDriver(SurveyFile survey) throws IOException {
        if (out == null) {
            throw new BadInputException("--slurm-script: give --out DIR, the folder of the merged survey");
        }
        if (shard != null) {
            throw new BadInputException("--shard: not with --slurm-script, which runs every part as an array task");
        }
        Path outAbs = out.toAbsolutePath().normalize();
        Path parts = slurm.parts == null ? outAbs.resolve("parts") : slurm.parts.toAbsolutePath().normalize();
        SlurmDriver driver = new SlurmDriver(survey, file.toAbsolutePath().normalize(), slurm.shards, parts, outAbs,
                outAbs.resolve("logs"), Optional.ofNullable(slurm.partition), slurm.time, slurm.memory, slurm.cpus,
                javaCommand());
        driver.write(slurm.script);
        if (!quiet.quiet) {
            Printer.wrote(List.of(slurm.script), spec.commandLine().getErr());
        }
        spec.commandLine().getOut().printf(Locale.US, "submit with: bash %s   (add --wait to wait for the merge)%n",
                slurm.script);
        spec.commandLine().getOut().flush();
        return 0;
    }

    /**
     * The command that runs this stellabar again on a cluster node: this JVM's java, and this
     * jar (or, when run from classes, this class path).
     */
    private static List<String> javaCommand() {
        String javaPath = ProcessHandle.current().info().command()
                .orElse(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        String classPath = System.getProperty("java.class.path");
        List<String> command = new ArrayList<>(List.of(javaPath, "-Djava.awt.headless=true", "-XX:+UseSerialGC"));
        String[] entries = classPath.split(File.pathSeparator);
        if (entries.length == 1 && entries[0].endsWith(".jar")) {
            command.addAll(List.of("-jar", Path.of(entries[0]).toAbsolutePath().toString()));
        } else {
            List<String> absolute = new ArrayList<>();
            for (String e : entries) {
                absolute.add(Path.of(e).toAbsolutePath().toString());
            }
            command.addAll(List.of("-cp", String.join(File.pathSeparator, absolute), Main.class.getName()));
        }
        return command;
    }
}
