package org.stellabar.scenario;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.survey.SurveyPlan;

/**
 * A survey file as read: the plan, the file's text (parts of a sharded run carry it, so that the
 * merge rebuilds the very same plan), and the output choices.
 *
 * @param plan the survey
 * @param fileName the file's name without folders, as recorded in parts and messages
 * @param text the file's text, exactly as read
 * @param tableFormats formats of the survey table, in order
 * @param chartFormats formats of the maps
 */
public record SurveyFile(SurveyPlan plan, String fileName, String text, List<TableFormat> tableFormats,
        List<ChartFormat> chartFormats) {

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param plan the survey
     * @param fileName the file's name without folders, as recorded in parts and messages
     * @param text the file's text, exactly as read
     * @param tableFormats formats of the survey table, in order
     * @param chartFormats formats of the maps
     */
    public SurveyFile {
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(fileName, "fileName");
        Objects.requireNonNull(text, "text");
        tableFormats = List.copyOf(tableFormats);
        chartFormats = List.copyOf(chartFormats);
    }

    /**
     * @param formats the table formats to write instead of the file's (e.g. from the command line)
     * @return this survey with other table formats; the content hash is unchanged
     */
    public SurveyFile withTableFormats(java.util.Collection<TableFormat> formats) {
        return new SurveyFile(plan, fileName, text, List.copyOf(formats), chartFormats);
    }

    /**
     * The content hash that ties the parts of one survey together: SHA-256 of the file's UTF-8
     * text (any edit, even of a comment, makes a different survey; parts of the old one are then
     * refused rather than mixed).
     *
     * @return 64 lower-case hex digits
     */
    public String contentHash() {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(digest.digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
