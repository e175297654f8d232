package org.stellabar.pipeline;

import java.nio.file.Path;
import java.util.List;
import org.stellabar.physics.BadInputException;
import org.stellabar.scenario.SurveyFile;
import org.stellabar.scenario.SurveyReader;
import org.stellabar.survey.SurveyRows;

/**
 * A complete, checked set of parts of one survey ({@link PartSet}), with the survey rebuilt from
 * the text the parts carry, which must hash to the recorded value.
 *
 * @param survey the survey, as the parts recorded it
 * @param parts the parts' headers, in K order
 */
public record SurveyParts(SurveyFile survey, List<SurveyPart.Header> parts) {

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param survey the survey, as the parts recorded it
     * @param parts the parts' headers, in K order
     */
    public SurveyParts {
        parts = List.copyOf(parts);
    }

    /**
     * @param files the part files
     * @param toolVersion this stellabar's version
     * @return the checked set
     * @throws BadInputException naming the file(s) and what is wrong, in one line
     */
    public static SurveyParts gather(List<Path> files, String toolVersion) {
        List<SurveyPart.Header> parts = PartSet.checked(files, SurveyPart::readHeader, toolVersion);
        SurveyPart.Header first = parts.get(0);
        SurveyFile survey = SurveyReader.read(first.fileName() + " (recorded in " + first.file() + ")",
                first.fileName(), first.text());
        if (!survey.contentHash().equals(first.contentHash())) {
            throw new BadInputException(first.file() + ": the survey text it carries does not match its content"
                    + " hash; the file was altered");
        }
        if (survey.plan().size() != first.totalPoints()) {
            throw new BadInputException(first.file() + ": records " + first.totalPoints()
                    + " points, but its survey has " + survey.plan().size());
        }
        return new SurveyParts(survey, parts);
    }

    /**
     * Reads every part's outcomes, streamed into column storage.
     *
     * @return every point's outcome
     * @throws BadInputException naming a part whose outcomes are not whole
     */
    public SurveyRows rows() {
        SurveyRows rows = new SurveyRows(survey.plan().size());
        // the parts hold disjoint points: read them side by side on all cores
        parts.parallelStream().forEach(p -> SurveyPart.readOutcomes(p, rows));
        return rows;
    }
}
