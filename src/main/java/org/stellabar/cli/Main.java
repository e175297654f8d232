package org.stellabar.cli;

/** Entry point of the runnable jar. */
public final class Main {

    private Main() {
    }

    /** @param args command-line arguments */
    public static void main(String[] args) {
        System.exit(StellabarCommand.commandLine().execute(args));
    }
}
