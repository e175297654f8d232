package org.stellabar.cli;

import picocli.CommandLine.Option;

/** {@code -q/--quiet} for every command that writes files: no progress or "wrote" lines on stderr. */
final class QuietOption {

    @Option(names = {"-q", "--quiet"}, description = "No progress lines and no list of the files written on stderr.")
    boolean quiet;
}
