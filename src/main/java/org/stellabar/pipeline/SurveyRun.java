package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.OutputFolder;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;
import org.stellabar.scenario.Names;
import org.stellabar.scenario.SurveyFile;
import org.stellabar.survey.PlaneSurvey;
import org.stellabar.survey.SurveyOutcome;
import org.stellabar.survey.SurveyRows;
import org.stellabar.survey.SurveyTable;
import org.stellabar.table.Table;
import org.stellabar.table.Version;

/**
 * The {@code survey} job. A whole survey writes its table ({@code STEM.csv}, {@code .ecsv},
 * {@code .fits}, {@code .json} by default) and its figures ({@link SurveyMaps}); one part of a
 * sharded survey writes only {@code STEM-K-of-N.part.json} ({@link SurveyPart}), which
 * {@link #merge} joins into exactly the files of the whole run.
 */
public final class SurveyRun {

    /**
     * What was computed and written.
     *
     * @param table the survey table
     * @param points points computed
     * @param failures points whose model failed
     * @param files files written, in order
     */
    public record Result(Table table, int points, long failures, List<Path> files) {
        /**
         * Canonical constructor: checks and copies the components.
         *
         * @param table the survey table (empty of rows for a part: a part has no table of its own)
         * @param points points computed
         * @param failures points whose model failed
         * @param files files written, in order
         */
        public Result {
            files = List.copyOf(files);
        }
    }

    /**
     * What one part computed and wrote (a part has no table of its own: its rows are in the file).
     *
     * @param points points computed
     * @param failures points whose model failed
     * @param file the part file
     */
    public record PartResult(int points, long failures, Path file) {
    }

    private SurveyRun() {
    }

    /**
     * Computes the whole survey without writing anything.
     *
     * @param survey the survey
     * @return the table
     */
    public static Result compute(SurveyFile survey) {
        SurveyRows rows = computeAll(survey);
        Table table = SurveyTable.of(survey.plan(), rows, survey.contentHash());
        return new Result(table, rows.size(), rows.failures(), List.of());
    }

    /**
     * Computes the whole survey and writes its table and figures.
     *
     * @param survey the survey
     * @param folder where to write
     * @param chartFormats image formats of the figures
     * @return what was written
     * @throws IOException when a file cannot be written
     */
    public static Result run(SurveyFile survey, Path folder, Set<ChartFormat> chartFormats) throws IOException {
        return write(survey, computeAll(survey), folder, chartFormats);
    }

    /**
     * Computes one part and writes it as {@code STEM-K-of-N.part.json}.
     *
     * @param survey the survey
     * @param shard which part
     * @param folder where to write
     * @return the part's points, failures and file
     * @throws IOException when the file cannot be written
     * @throws BadInputException when there are more parts than points
     */
    public static PartResult runPart(SurveyFile survey, Shard shard, Path folder) throws IOException {
        int size = survey.plan().size();
        if (shard.parts() > size) {
            throw new BadInputException("--shard " + shard.part() + "/" + shard.parts() + ": the survey has only "
                    + size + " points to share; use at most " + size + " parts");
        }
        int from = shard.from(size);
        int to = shard.to(size);
        List<SurveyOutcome> outcomes = new PlaneSurvey().compute(survey.plan(), from, to);
        SurveyPart part = new SurveyPart(survey.plan().name(), survey.contentHash(), Version.current(), shard, from,
                size, survey.fileName(), survey.text(), outcomes);
        Path file = folder.resolve(partFileName(survey, shard));
        part.write(file);
        return new PartResult(outcomes.size(), PlaneSurvey.failures(outcomes), file);
    }

    /**
     * Joins a complete set of parts and writes what the unsharded run writes, byte for byte.
     *
     * @param parts the parts, checked by {@link SurveyParts}
     * @param folder where to write
     * @param chartFormats image formats, or empty to take the survey file's
     * @return what was written
     * @throws IOException when a file cannot be written
     */
    public static Result merge(SurveyParts parts, Path folder, Set<ChartFormat> chartFormats) throws IOException {
        SurveyFile survey = parts.survey();
        return write(survey, parts.rows(), folder, chartFormats.isEmpty() ? formats(survey) : chartFormats);
    }

    /**
     * @param survey the survey
     * @param shard which part
     * @return the file name of the part: {@code STEM-K-of-N.part.json}
     */
    public static String partFileName(SurveyFile survey, Shard shard) {
        return shard.stem(Names.fileStem(survey.plan().name())) + SurveyPart.SUFFIX;
    }

    /**
     * @param survey the survey
     * @return the survey file's chart formats
     */
    public static Set<ChartFormat> formats(SurveyFile survey) {
        return survey.chartFormats().isEmpty() ? EnumSet.noneOf(ChartFormat.class)
                : EnumSet.copyOf(survey.chartFormats());
    }

    private static SurveyRows computeAll(SurveyFile survey) {
        SurveyRows rows = new SurveyRows(survey.plan().size());
        new PlaneSurvey().computeInto(survey.plan(), 0, survey.plan().size(), rows);
        return rows;
    }

    private static Result write(SurveyFile survey, SurveyRows rows, Path folder,
            Set<ChartFormat> chartFormats) throws IOException {
        Table table = SurveyTable.of(survey.plan(), rows, survey.contentHash());
        String stem = Names.fileStem(survey.plan().name());
        OutputFolder out = new OutputFolder(folder);
        FileTasks tasks = new FileTasks();
        for (TableFormat format : survey.tableFormats()) {
            Path target = folder.resolve(stem + "." + format.extension());
            tasks.add(target, () -> List.of(out.table(stem, table, format)));
        }
        tasks.addAll(SurveyMaps.tasks(survey.plan(), table, folder, stem, chartFormats));
        List<Path> files = new ArrayList<>(tasks.runAll());
        return new Result(table, rows.size(), rows.failures(), files);
    }
}
