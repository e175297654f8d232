package org.stellabar.cli;

/** Entry point of the runnable jar. */
public final class Main {

    private Main() {
    }

    /** @param args command-line arguments */
    public static void main(String[] args) {
        // charts are drawn off screen; no display is needed or wanted
        System.setProperty("java.awt.headless", "true");
        System.exit(StellabarCommand.commandLine(args).execute(args));
    }
}
