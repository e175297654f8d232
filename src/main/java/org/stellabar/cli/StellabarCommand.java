package org.stellabar.cli;

import java.io.PrintWriter;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.table.Version;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top command: lists the subcommands and holds the error policy. */
@Command(name = "stellabar", mixinStandardHelpOptions = true, versionProvider = StellabarCommand.VersionProvider.class,
        description = {"Gas + radiation equation of state, polytropes, the Eddington standard model and",
                "stability margins of massive stars, with tables and charts for papers.",
                "Numbers without a unit are CGS; a unit may follow, e.g. \"40 Msun\", \"1.5e7 K\"."},
        subcommands = {EosCommand.class, PolytropeCommand.class, ModelCommand.class, SequenceCommand.class,
                GridCommand.class, ValidateCommand.class, AuditCommand.class, CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:success", "1:internal failure (please report it)",
                "2:bad input (the message names the option, the value and what is allowed)"})
public final class StellabarCommand implements Runnable {

    /** Exit status for bad input. */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit status for an internal failure. */
    public static final int EXIT_FAILURE = 1;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** @return the configured command line, with the error handlers installed */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new StellabarCommand());
        cl.setParameterExceptionHandler(StellabarCommand::onParameterError);
        cl.setExecutionExceptionHandler(StellabarCommand::onExecutionError);
        return cl;
    }

    private static int onParameterError(CommandLine.ParameterException e, String[] args) {
        PrintWriter err = e.getCommandLine().getErr();
        String name = e.getCommandLine().getCommandSpec().qualifiedName();
        err.println(name + ": " + readable(oneLine(e.getMessage()).replaceFirst("^Error: ", "")) + " (see '" + name
                + " --help')");
        err.flush();
        return EXIT_BAD_INPUT;
    }

    private static int onExecutionError(Exception e, CommandLine cl, CommandLine.ParseResult parse) {
        PrintWriter err = cl.getErr();
        String name = cl.getCommandSpec().qualifiedName();
        if (e instanceof BadInputException) {
            err.println(name + ": " + oneLine(e.getMessage()));
            err.flush();
            return EXIT_BAD_INPUT;
        }
        String what = e instanceof ConvergenceException ? "numerical failure" : "internal error";
        StackTraceElement where = e.getStackTrace().length > 0 ? e.getStackTrace()[0] : null;
        err.println(name + ": " + what + ": " + oneLine(String.valueOf(e.getMessage())) + " ("
                + e.getClass().getSimpleName() + (where == null ? "" : " at " + where) + "; please report it)");
        err.flush();
        return EXIT_FAILURE;
    }

    /** picocli's message for an option of an exclusive group given twice names the group, not the option. */
    private static final java.util.regex.Pattern REPEATED_IN_GROUP =
            java.util.regex.Pattern.compile("expected only one match but got \\((.*?)\\)=\\{(--[\\w-]+)=.*");

    private static String readable(String message) {
        java.util.regex.Matcher m = REPEATED_IN_GROUP.matcher(message);
        if (m.matches()) {
            return "option '" + m.group(2) + "' was given more than once; give exactly one of " + m.group(1)
                    .replaceAll("=[A-Z:]+", "") + ", once";
        }
        return message;
    }

    private static String oneLine(String message) {
        return message == null ? "" : message.replaceAll("\\s*\\R\\s*", " ").strip();
    }

    /** Reports the version of this build. */
    public static final class VersionProvider implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"stellabar " + Version.current(),
                    "constants: " + org.stellabar.physics.Constants.RELEASE};
        }
    }
}
