package org.stellabar.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line in-process and keeps what it printed. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        CommandLine cl = StellabarCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
