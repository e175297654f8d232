package org.stellabar.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.stellabar.charts.ChartFormat;
import java.util.Map;
import java.util.Set;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.GridRun;
import org.stellabar.pipeline.PartSet;
import org.stellabar.pipeline.SequenceRun;
import org.stellabar.pipeline.SurveyParts;
import org.stellabar.pipeline.TableMerge;
import org.stellabar.pipeline.SurveyRun;
import org.stellabar.table.Version;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar merge}: joins the parts of a sharded survey into the files of the whole run. */
public final class MergeCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    List<Path> parts;

    Path out;

    List<ChartFormat> chartFormats;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("merge", this)
                .header("Join the parts of a sharded survey or sequence into the whole run's files.")
                .description("Reads NAME-K-of-N.part.json files (or every such file in the folders given)",
                        "written by survey, sequence or grid with --shard K/N,",
                        "checks that parts 1 to N of one survey are all there, once each, and writes",
                        "the table and maps the unsharded run writes, byte for byte. A missing,",
                        "duplicated or foreign part is refused before anything is written.")
                .footer("%nExample:%n  stellabar merge runs/parts --out runs/gr-edge");
        quiet.describe(m);
        m.positional("?").label("PART_OR_FOLDER").arity("1..*")
                .description("Part files, or folders holding them.")
                .field(this, "parts");
        m.option("-o", "--out").label("DIR").required()
                .description("Where to write the merged survey (created if needed).")
                .field(this, "out");
        m.option("--chart-formats").label("FORMATS").split(",").converter(new ChartFormatOption.Words()).candidates(new ChartFormatOption.Words())
                .description("Map image formats (default: the survey file's chart_formats, else png,svg).")
                .field(this, "chartFormats");
        tableFormats.describe(m);
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        List<Path> files = PartSet.files(parts);
        Set<ChartFormat> images = chartFormats == null || chartFormats.isEmpty()
                ? EnumSet.noneOf(ChartFormat.class) : EnumSet.copyOf(chartFormats);
        if (PartSet.isSurveyPart(files.get(0))) {
            SurveyParts parts = SurveyParts.gather(files, Version.current());
            SurveyParts set = tableFormats.formats()
                    .map(f -> new SurveyParts(parts.survey().withTableFormats(f), parts.parts())).orElse(parts);
            SurveyRun.Result result = SurveyRun.merge(set, out, images);
            wrote(result.files());
            spec.commandLine().getOut().printf(Locale.US, "survey %s: %d parts merged, %d points, %d failed%n",
                    set.survey().plan().name(), set.parts().size(), result.points(), result.failures());
        } else {
            if (tableFormats.formats().isPresent()) {
                throw new BadInputException("--table-formats: sequence and grid parts merge into the formats their run wrote"
                        + " (recorded in each part); leave the option out");
            }
            TableMerge.Result result = TableMerge.merge(files, Map.of(SequenceRun.JOB, SequenceCommand::wholeJob, GridRun.JOB, GridCommand::wholeJob),
                    out, images, Version.current());
            wrote(result.files());
            spec.commandLine().getOut().printf(Locale.US, "%s: %d parts merged, %d rows%n", result.job(),
                    result.parts(), result.rows());
        }
        spec.commandLine().getOut().flush();
        return 0;
    }

    private void wrote(List<Path> files) {
        if (!quiet.quiet) {
            Printer.wrote(files, spec.commandLine().getErr());
        }
    }
}
