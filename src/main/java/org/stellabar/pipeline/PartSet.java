package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.stellabar.physics.BadInputException;
import org.stellabar.scenario.SurveyFile;
import org.stellabar.scenario.SurveyReader;
import org.stellabar.survey.SurveyRows;

/**
 * A complete set of parts of one survey, checked before anything is merged: every part from 1 to
 * N exactly once, all of the same survey (the same content hash and N) and of the same stellabar
 * version, each holding exactly the points its K and N give it. The survey is rebuilt from the
 * text the parts carry, and must hash to the recorded value.
 *
 * @param survey the survey, as the parts recorded it
 * @param parts the parts, in K order
 */
public record PartSet(SurveyFile survey, List<SurveyPart.Header> parts) {

    public PartSet {
        parts = List.copyOf(parts);
    }

    /**
     * Reads every part's outcomes, streamed into column storage.
     *
     * @return every point's outcome
     * @throws BadInputException naming a part whose outcomes are not whole
     */
    public SurveyRows rows() {
        SurveyRows rows = new SurveyRows(survey.plan().size());
        parts.forEach(p -> SurveyPart.readOutcomes(p, rows));
        return rows;
    }

    /**
     * Collects the part files named (a folder stands for every {@code *.part.json} directly in it)
     * and checks them as a set.
     *
     * @param paths part files or folders holding them
     * @param toolVersion this stellabar's version: parts of another version are refused
     * @return the set
     * @throws BadInputException naming the file(s) and what is wrong, in one line
     */
    public static PartSet gather(List<Path> paths, String toolVersion) {
        List<Path> files = new ArrayList<>();
        for (Path p : paths) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> in = Files.list(p)) {
                    List<Path> found = in.filter(f -> f.getFileName().toString().endsWith(SurveyPart.SUFFIX)
                            && !f.getFileName().toString().startsWith(".") && Files.isRegularFile(f)).sorted().toList();
                    if (found.isEmpty()) {
                        throw new BadInputException(p + ": no survey parts (*" + SurveyPart.SUFFIX + ") in this folder");
                    }
                    files.addAll(found);
                } catch (IOException e) {
                    throw new BadInputException(p + ": cannot be listed (" + e.getMessage() + ")");
                }
            } else if (Files.isRegularFile(p)) {
                files.add(p);
            } else {
                throw new BadInputException(p + ": no such file or folder");
            }
        }
        if (files.isEmpty()) {
            throw new BadInputException("no survey parts given; name part files or folders holding them");
        }
        SurveyPart.Header first = null;
        Path firstFile = null;
        Map<Integer, Path> fileOfPart = new TreeMap<>();
        Map<Integer, SurveyPart.Header> byPart = new TreeMap<>();
        for (Path f : files) {
            SurveyPart.Header part = SurveyPart.readHeader(f);
            if (first == null) {
                first = part;
                firstFile = f;
            } else if (!part.contentHash().equals(first.contentHash()) || part.shard().parts() != first.shard().parts()
                    || !part.surveyName().equals(first.surveyName())) {
                throw new BadInputException(f + ": belongs to another run (survey \"" + part.surveyName() + "\", "
                        + part.shard().parts() + " parts, content " + abbreviated(part.contentHash()) + ") than "
                        + firstFile + " (survey \"" + first.surveyName() + "\", " + first.shard().parts()
                        + " parts, content " + abbreviated(first.contentHash()) + "); merge the parts of one run only");
            }
            if (!part.toolVersion().equals(toolVersion)) {
                throw new BadInputException(f + ": written by stellabar " + part.toolVersion() + ", this is "
                        + toolVersion + "; rerun that part with this version so that every row is computed alike");
            }
            Path earlier = fileOfPart.putIfAbsent(part.shard().part(), f);
            if (earlier != null) {
                throw new BadInputException("part " + part.shard().part() + " of " + part.shard().parts()
                        + " is given twice: " + earlier + " and " + f + "; give each part once");
            }
            int size = part.totalPoints();
            if (part.firstPoint() != part.shard().from(size)
                    || part.firstPoint() + part.pointCount() != part.shard().to(size)) {
                throw new BadInputException(f + ": holds points " + (part.firstPoint() + 1) + " to "
                        + (part.firstPoint() + part.pointCount()) + ", but part " + part.shard().part() + " of "
                        + part.shard().parts() + " is points " + (part.shard().from(size) + 1) + " to "
                        + part.shard().to(size) + "; the file was altered");
            }
            byPart.put(part.shard().part(), part);
        }
        List<Integer> missing = new ArrayList<>();
        for (int k = 1; k <= first.shard().parts(); k++) {
            if (!byPart.containsKey(k)) {
                missing.add(k);
            }
        }
        if (!missing.isEmpty()) {
            throw new BadInputException("survey \"" + first.surveyName() + "\": part" + (missing.size() > 1 ? "s " : " ")
                    + join(missing) + " of " + first.shard().parts() + (missing.size() > 1 ? " are" : " is")
                    + " missing (found " + join(new ArrayList<>(byPart.keySet())) + "); run the missing part"
                    + (missing.size() > 1 ? "s" : "") + " with --shard K/" + first.shard().parts());
        }
        SurveyFile survey = SurveyReader.read(first.fileName() + " (recorded in " + firstFile + ")", first.fileName(),
                first.text());
        if (!survey.contentHash().equals(first.contentHash())) {
            throw new BadInputException(firstFile + ": the survey text it carries does not match its content hash;"
                    + " the file was altered");
        }
        if (survey.plan().size() != first.totalPoints()) {
            throw new BadInputException(firstFile + ": records " + first.totalPoints() + " points, but its survey has "
                    + survey.plan().size());
        }
        return new PartSet(survey, new ArrayList<>(byPart.values()));
    }

    private static String abbreviated(String hash) {
        return hash.length() > 12 ? hash.substring(0, 12) + "…" : hash;
    }

    private static String join(List<Integer> ks) {
        return String.join(", ", ks.stream().map(String::valueOf).toList());
    }
}
