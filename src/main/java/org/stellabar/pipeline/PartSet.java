package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.stream.Stream;
import org.stellabar.physics.BadInputException;

/**
 * Checks a set of part files before anything is merged: every part from 1 to N exactly once, all
 * of one run (the same survey or job, content hash and N) and of this stellabar version, each
 * holding exactly the slice its K and N give it. The same rules for survey, sequence and grid
 * parts; what a part holds is read afterwards ({@link SurveyRun#merge}, {@link TableMerge}).
 */
public final class PartSet {

    /** File name ending of every part file. */
    public static final String SUFFIX = ".part.json";

    private PartSet() {
    }

    /**
     * The part files named: a folder stands for every {@code *.part.json} directly in it.
     *
     * @param paths part files or folders holding them
     * @return the files, folders' contents sorted by name
     * @throws BadInputException for a path that is neither, or a folder without parts
     */
    public static List<Path> files(List<Path> paths) {
        List<Path> files = new ArrayList<>();
        for (Path p : paths) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> in = Files.list(p)) {
                    List<Path> found = in.filter(f -> f.getFileName().toString().endsWith(SUFFIX)
                            && !f.getFileName().toString().startsWith(".") && Files.isRegularFile(f)).sorted().toList();
                    if (found.isEmpty()) {
                        throw new BadInputException(p + ": no parts (*" + SUFFIX + ") in this folder");
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
            throw new BadInputException("no parts given; name part files or folders holding them");
        }
        return files;
    }

    /**
     * @param file a part file
     * @return what it says it is (its "format" field), or "" when it says nothing readable
     */
    public static String format(Path file) {
        try (com.fasterxml.jackson.core.JsonParser p = new com.fasterxml.jackson.core.JsonFactory()
                .createParser(file.toFile())) {
            if (p.nextToken() != com.fasterxml.jackson.core.JsonToken.START_OBJECT
                    || p.nextToken() != com.fasterxml.jackson.core.JsonToken.FIELD_NAME
                    || !"format".equals(p.currentName())
                    || p.nextToken() != com.fasterxml.jackson.core.JsonToken.VALUE_STRING) {
                return "";
            }
            return p.getText();
        } catch (IOException e) {
            return "";
        }
    }

    /**
     * @param file a part file
     * @return true if the file says it is a survey part
     */
    public static boolean isSurveyPart(Path file) {
        return SurveyPart.FORMAT.equals(format(file));
    }

    /**
     * Reads every part's header and checks the set.
     *
     * @param files the part files
     * @param read reads one part's header
     * @param toolVersion this stellabar's version: parts of another version are refused
     * @param <H> the kind of header
     * @return the headers, in K order
     * @throws BadInputException naming the file(s) and what is wrong, in one line
     */
    static <H extends PartHeader> List<H> checked(List<Path> files, Function<Path, H> read, String toolVersion) {
        H first = null;
        Map<Integer, H> byPart = new TreeMap<>();
        for (Path f : files) {
            H part = read.apply(f);
            if (first == null) {
                first = part;
            } else if (!part.contentHash().equals(first.contentHash()) || part.shard().parts() != first.shard().parts()
                    || !part.runName().equals(first.runName())) {
                throw new BadInputException(f + ": belongs to another run (" + describe(part) + ") than "
                        + first.file() + " (" + describe(first) + "); merge the parts of one run only");
            }
            if (!part.toolVersion().equals(toolVersion)) {
                throw new BadInputException(f + ": written by stellabar " + part.toolVersion() + ", this is "
                        + toolVersion + "; rerun that part with this version so that every row is computed alike");
            }
            H earlier = byPart.putIfAbsent(part.shard().part(), part);
            if (earlier != null) {
                throw new BadInputException("part " + part.shard().part() + " of " + part.shard().parts()
                        + " is given twice: " + earlier.file() + " and " + f + "; give each part once");
            }
            int size = part.total();
            if (part.from() != part.shard().from(size) || part.to() != part.shard().to(size)) {
                throw new BadInputException(f + ": holds indices " + (part.from() + 1) + " to " + part.to()
                        + ", but part " + part.shard().part() + " of " + part.shard().parts() + " is "
                        + (part.shard().from(size) + 1) + " to " + part.shard().to(size) + "; the file was altered");
            }
        }
        List<Integer> missing = new ArrayList<>();
        for (int k = 1; k <= first.shard().parts(); k++) {
            if (!byPart.containsKey(k)) {
                missing.add(k);
            }
        }
        if (!missing.isEmpty()) {
            throw new BadInputException(first.runName() + ": part" + (missing.size() > 1 ? "s " : " ")
                    + join(missing) + " of " + first.shard().parts() + (missing.size() > 1 ? " are" : " is")
                    + " missing (found " + join(new ArrayList<>(byPart.keySet())) + "); run the missing part"
                    + (missing.size() > 1 ? "s" : "") + " with --shard K/" + first.shard().parts());
        }
        return new ArrayList<>(byPart.values());
    }

    private static String describe(PartHeader h) {
        String hash = h.contentHash().length() > 12 ? h.contentHash().substring(0, 12) + "…" : h.contentHash();
        return "\"" + h.runName() + "\", " + h.shard().parts() + " parts, content " + hash;
    }

    private static String join(List<Integer> ks) {
        return String.join(", ", ks.stream().map(String::valueOf).toList());
    }
}
