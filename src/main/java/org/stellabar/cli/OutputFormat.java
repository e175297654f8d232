package org.stellabar.cli;

/** The forms a command can print its result in. */
public enum OutputFormat {
    /** aligned for reading, with units */
    text,
    /** one JSON document */
    json,
    /** comma-separated values with a header row carrying units */
    csv
}
