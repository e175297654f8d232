package org.stellabar.cli;


/** {@code -q/--quiet} for every command that writes files: no progress or "wrote" lines on stderr. */
final class QuietOption {

    boolean quiet;

    /** @param m the command that takes {@code -q/--quiet} */
    void describe(CommandModel m) {
        m.option("-q", "--quiet")
                .description("No progress lines and no list of the files written on stderr.")
                .field(this, "quiet");
    }
}
