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
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code stellabar survey}: star models over one or two axes, on one machine or as Slurm array tasks. */
@Command(name = "survey", header = "Star models over a plane of inputs, on this machine or a Slurm cluster.",
        mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Builds one star model per point of a survey file's axes (mass, radius, central",
                "temperature, entropy per baryon, X, Z; one or two axes, linear or log steps),",
                "in parallel on all cores, and writes one table (a row per point, first axis",
                "outer) and maps of <Gamma1> - 4/3, the post-Newtonian margin, beta_c and T_c",
                "with the stability boundary. A point whose model fails keeps its row, with",
                "status 'failed' and the reason; it never stops the survey.",
                "%nWith --shard K/N only the K-th of N parts is computed and written as",
                "NAME-K-of-N.part.json; 'stellabar merge' joins the parts into the same files,",
                "byte for byte. With --slurm-script a job-array driver for Slurm is written."},
        footer = {"%nExamples:%n  stellabar survey gr-edge.toml --out runs/gr-edge",
                "  stellabar survey gr-edge.toml --shard 2/4 --out runs/parts",
                "  stellabar survey gr-edge.toml --slurm-script gr-edge.sh --shards 16 --out runs/gr-edge",
                "  bash gr-edge.sh --wait"})
public final class SurveyCommand implements Callable<Integer> {

    @Mixin
    QuietOption quiet = new QuietOption();

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "The survey file (TOML, see the README).")
    Path file;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR",
            description = "Write the table and maps (or the part, with --shard) into this folder (created if needed);"
                    + " with --slurm-script, where the merged survey goes.")
    Path out;

    @Option(names = "--shard", paramLabel = "K/N",
            description = "Compute only the K-th of N equal parts of the points and write NAME-K-of-N.part.json"
                    + " (needs --out).")
    String shard;

    @Option(names = {"-f", "--format"}, paramLabel = "FORMAT", defaultValue = "text",
            description = "Without --out, how to print the table: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Option(names = "--chart-formats", split = ",", paramLabel = "FORMATS", converter = ChartFormatOption.Words.class,
            completionCandidates = ChartFormatOption.Words.class,
            description = "Map image formats, comma-separated: png, svg, pdf (default: the survey file's"
                    + " chart_formats, else png,svg).")
    List<ChartFormat> chartFormats;

    @Mixin
    TableFormatsOption tableFormats;

    @ArgGroup(exclusive = false, heading = "%nSlurm job array:%n")
    Slurm slurm;

    /** The options of the Slurm driver. */
    static final class Slurm {
        @Option(names = "--slurm-script", required = true, paramLabel = "JOB.sh",
                description = "Write a driver script instead of computing: 'bash JOB.sh' submits --shards array tasks"
                        + " and a merge job; 'bash JOB.sh --wait' also waits and exits with the merge's status.")
        Path script;

        @Option(names = "--shards", required = true, paramLabel = "N", description = "Number of array tasks (parts).")
        int shards;

        @Option(names = "--parts", paramLabel = "DIR",
                description = "Folder of the parts (default: OUT/parts); logs go to OUT/logs.")
        Path parts;

        @Option(names = "--partition", paramLabel = "NAME", description = "Slurm partition (default: the cluster's).")
        String partition;

        @Option(names = "--time", paramLabel = "LIMIT", defaultValue = "1:00:00",
                description = "Time limit per task, a Slurm time such as 30, 2:00:00 or 1-00:00:00 (default: ${DEFAULT-VALUE}).")
        String time;

        @Option(names = "--mem", paramLabel = "SIZE", defaultValue = "2G",
                description = "Memory per task, e.g. 2000M or 4G (default: ${DEFAULT-VALUE}).")
        String memory;

        @Option(names = "--cpus-per-task", paramLabel = "C", defaultValue = "1",
                description = "Processors per task; each task's JVM uses this many (default: ${DEFAULT-VALUE}).")
        int cpus;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        SurveyFile read = SurveyReader.read(file);
        // --table-formats overrides the file's table_formats for this run's table (not a part's)
        SurveyFile survey = tableFormats.formats().map(read::withTableFormats).orElse(read);
        var err = spec.commandLine().getErr();
        if (slurm != null) {
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
            spec.commandLine().getOut().printf(Locale.ROOT, "survey %s part %d of %d: %d points, %d failed%n",
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
        spec.commandLine().getOut().printf(Locale.ROOT, "survey %s: %d points, %d failed%n", survey.plan().name(),
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
        spec.commandLine().getOut().printf(Locale.ROOT, "submit with: bash %s   (add --wait to wait for the merge)%n",
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
