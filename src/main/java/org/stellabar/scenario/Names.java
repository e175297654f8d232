package org.stellabar.scenario;

import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The rule for scenario and star names. Names become directory and file names of a run's
 * outputs, so they keep to characters that are safe on every file system.
 */
public final class Names {

    /** Longest accepted name, in characters. */
    static final int MAX_LENGTH = 64;

    /** What a name may contain, for error messages. */
    static final String RULE = "1 to " + MAX_LENGTH + " characters: letters A-Z a-z, digits, space, '.', '_', '+', '-',"
            + " beginning with a letter or digit and not ending with a space";

    private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9 ._+-]*");

    private Names() {
    }

    /**
     * @param name a proposed name
     * @return empty if the name is acceptable, otherwise what is wrong with it
     */
    static Optional<String> problem(String name) {
        if (name == null || name.isEmpty()) {
            return Optional.of("a name cannot be empty; use " + RULE);
        }
        if (name.length() > MAX_LENGTH) {
            return Optional.of("the name has " + name.length() + " characters; use " + RULE);
        }
        if (!NAME.matcher(name).matches() || name.endsWith(" ")) {
            return Optional.of("the name has characters that cannot go into a file name; use " + RULE);
        }
        return Optional.empty();
    }

    /**
     * Turns a file name stem into an acceptable name, replacing every other character with '-'.
     *
     * @param stem the stem of a file name
     * @return an acceptable name, "scenario" if nothing usable is left
     */
    static String fromStem(String stem) {
        String cleaned = stem.replaceAll("[^A-Za-z0-9 ._+-]", "-").strip();
        cleaned = cleaned.replaceFirst("^[^A-Za-z0-9]+", "");
        if (cleaned.length() > MAX_LENGTH) {
            cleaned = cleaned.substring(0, MAX_LENGTH).strip();
        }
        return cleaned.isEmpty() ? "scenario" : cleaned;
    }

    /**
     * File stems a star's name may not have: the cluster charts are named {@code cluster-*}, the
     * same as the charts of a star whose stem is "cluster".
     */
    static final java.util.Set<String> RESERVED_STEMS = java.util.Set.of("cluster");

    /**
     * The file stem of a star or scenario name: lower case, runs of spaces as '-', only
     * [a-z0-9._+-] kept, "unnamed" if nothing is left ("Aurelith Deep" → "aurelith-deep").
     *
     * @param name the name
     * @return its stem
     */
    public static String fileStem(String name) {
        String s = name.strip().toLowerCase(java.util.Locale.ROOT).replaceAll("\\s+", "-")
                .replaceAll("[^a-z0-9._+-]", "");
        return s.isEmpty() ? "unnamed" : s;
    }
}
