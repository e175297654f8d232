package org.stellabar.cli;

import picocli.CommandLine.Model.CommandSpec;

/** A subcommand of {@code stellabar}: what it runs, and its options as picocli's model ({@link CommandModel}). */
interface Subcommand {

    /** @return this command's model, its options bound to this object's fields */
    CommandSpec model();
}
