package org.stellabar.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
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
                GridCommand.class, ValidateCommand.class, AuditCommand.class, ObservedCommand.class,
                CommandLine.HelpCommand.class},
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
        err.println(name + ": " + message(e, args) + " (see '" + name + " --help')");
        err.flush();
        return EXIT_BAD_INPUT;
    }

    /**
     * picocli's own one-line message, except for an exclusive group of options given twice or
     * together: picocli words that with option labels ("--rho=DENSITY") and an "Error: " prefix,
     * so the message is built here instead, from the group's option names and the arguments.
     */
    private static String message(CommandLine.ParameterException e, String[] args) {
        if (e instanceof CommandLine.MutuallyExclusiveArgsException
                || e instanceof CommandLine.MaxValuesExceededException) {
            for (CommandLine.Model.ArgGroupSpec group : e.getCommandLine().getCommandSpec().argGroups()) {
                if (!group.exclusive()) {
                    continue;
                }
                List<String> options = new ArrayList<>();
                List<String> given = new ArrayList<>();
                for (CommandLine.Model.OptionSpec o : group.options()) {
                    options.add(o.longestName());
                    for (String arg : args) {
                        if (Arrays.asList(o.names()).contains(arg.split("=", 2)[0])) {
                            given.add(o.longestName());
                        }
                    }
                }
                if (given.size() > 1) {
                    return exclusive(given, options);
                }
            }
        }
        if (e instanceof CommandLine.MissingParameterException missing && !missing.getMissing().isEmpty()) {
            List<String> names = new ArrayList<>();
            for (CommandLine.Model.ArgSpec a : missing.getMissing()) {
                names.add(a instanceof CommandLine.Model.OptionSpec o ? o.longestName() : a.paramLabel());
            }
            return names.size() == 1 ? "missing required option " + names.get(0)
                    : "missing required option: give one of " + String.join(" | ", names);
        }
        return oneLine(e.getMessage());
    }

    /** The message format for an exclusive group: which options were given, which one may be. */
    private static String exclusive(List<String> given, List<String> options) {
        String choice = "give exactly one of " + String.join(" | ", options) + ", once";
        return given.stream().distinct().count() == 1
                ? "option '" + given.get(0) + "' was given more than once; " + choice
                : String.join(" and ", given.stream().distinct().toList()) + " exclude each other; " + choice;
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
