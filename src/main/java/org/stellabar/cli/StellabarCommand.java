package org.stellabar.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.table.Version;
import picocli.CommandLine;

/** The top command: lists the subcommands and holds the error policy. */
public final class StellabarCommand implements Runnable {

    private static volatile boolean verbose;

    /** @param on whether internal errors print their stack trace (the launcher's --verbose) */
    static void verbose(boolean on) {
        verbose = on;
    }

    /** Exit status for bad input. */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit status for an internal failure. */
    public static final int EXIT_FAILURE = 1;

    CommandLine.Model.CommandSpec spec;

    /** @return the top command's model, bound to this object; the subcommands are added to it */
    CommandLine.Model.CommandSpec model() {
        CommandModel m = CommandModel.of("stellabar", this)
                .description("Gas + radiation equation of state, polytropes, the Eddington standard model and",
                        "stability margins of massive stars, with tables and charts for papers.",
                        "Numbers without a unit are CGS; a unit may follow, e.g. \"40 Msun\", \"1.5e7 K\".")
                .footer("%n--verbose, given anywhere on the line, also shows the libraries' log messages and the stack",
                        "trace of an internal error.");
        Map<String, String> exitCodes = new LinkedHashMap<>();
        exitCodes.put("0", "success");
        exitCodes.put("1", "internal failure (please report it)");
        exitCodes.put("2", "bad input (the message names the option, the value and what is allowed)");
        m.spec().usageMessage().exitCodeListHeading("%nExit status:%n").exitCodeList(exitCodes);
        m.spec().versionProvider(new VersionProvider());
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * The subcommands' names in the order the help lists them. Each command object is made only
     * when it is needed ({@link #make}): a run needs one command's model, not all of them
     * ({@link Subcommand#model()}; picocli's own {@code help} command is the one model still read
     * from annotations).
     */
    private static final List<String> SUBCOMMANDS = List.of("eos", "polytrope", "model", "sequence", "grid",
            "validate", "audit", "observed", "survey", "merge", "pair-instability", "completion", "help");

    /**
     * A switch, not a map of constructor references: linking a dozen method references at every
     * start (each loading its command's class) took 15-20 ms before the command line was read.
     */
    private static Object make(String name) {
        return switch (name) {
            case "eos" -> new EosCommand();
            case "polytrope" -> new PolytropeCommand();
            case "model" -> new ModelCommand();
            case "sequence" -> new SequenceCommand();
            case "grid" -> new GridCommand();
            case "validate" -> new ValidateCommand();
            case "audit" -> new AuditCommand();
            case "observed" -> new ObservedCommand();
            case "survey" -> new SurveyCommand();
            case "merge" -> new MergeCommand();
            case "pair-instability" -> new PairInstabilityCommand();
            case "completion" -> new CompletionCommand();
            case "help" -> new CommandLine.HelpCommand();
            default -> throw new IllegalArgumentException("no subcommand " + name);
        };
    }

    /** @return the configured command line with every subcommand, the error handlers installed */
    public static CommandLine commandLine() {
        return commandLine(Set.copyOf(SUBCOMMANDS));
    }

    /**
     * The command line for one run: with only the subcommand that {@code args} names when the
     * first argument names one (other than {@code help}), else with all of them (for the usage
     * list, {@code help} and the message for an unknown command).
     *
     * @param args the run's arguments
     * @return the configured command line
     */
    public static CommandLine commandLine(String[] args) {
        if (args.length > 0 && SUBCOMMANDS.contains(args[0]) && !"help".equals(args[0])) {
            return commandLine(Set.of(args[0]));
        }
        return commandLine();
    }

    private static CommandLine commandLine(Set<String> names) {
        CommandLine cl = new CommandLine(new StellabarCommand().model());
        for (String name : SUBCOMMANDS) {
            if (names.contains(name)) {
                Object command = make(name);
                cl.addSubcommand(name, command instanceof Subcommand ours ? new CommandLine(ours.model()) : command);
            }
        }
        ErrorHandlers handlers = new ErrorHandlers();
        cl.setParameterExceptionHandler(handlers);
        cl.setExecutionExceptionHandler(handlers);
        return cl;
    }

    /*
     * A class rather than method references: a lambda that implements one of picocli's interfaces
     * (compiled for Java 5) cannot be kept in the start-up archive, and the JVM then makes its
     * class anew at every start (a few milliseconds each).
     */

    /** The error policy: bad input in one line (exit 2), failures by {@link #onExecutionError}. */
    private static final class ErrorHandlers
            implements CommandLine.IParameterExceptionHandler, CommandLine.IExecutionExceptionHandler {
        @Override
        public int handleParseException(CommandLine.ParameterException e, String[] args) {
            return onParameterError(e, args);
        }

        @Override
        public int handleExecutionException(Exception e, CommandLine commandLine, CommandLine.ParseResult parseResult)
                throws Exception {
            return onExecutionError(e, commandLine, parseResult);
        }
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
        return oneLine(e.getMessage()) + suggestion(e);
    }

    /**
     * For an unknown option, the option it was probably meant to be: the same name in another
     * case first (--x for --X), else picocli's nearest names.
     */
    private static String suggestion(CommandLine.ParameterException e) {
        if (!(e instanceof CommandLine.UnmatchedArgumentException unmatched)) {
            return "";
        }
        CommandLine.Model.CommandSpec command = e.getCommandLine().getCommandSpec();
        for (String given : unmatched.getUnmatched()) {
            String name = given.split("=", 2)[0];
            if (!name.startsWith("-")) {
                continue;
            }
            for (CommandLine.Model.OptionSpec o : command.options()) {
                for (String candidate : o.names()) {
                    if (candidate.equalsIgnoreCase(name) && !candidate.equals(name)) {
                        return "; did you mean " + candidate + "?";
                    }
                }
            }
        }
        List<String> near = unmatched.getSuggestions();
        return near.isEmpty() ? "" : "; did you mean " + String.join(" or ", near.subList(0, Math.min(3, near.size())))
                + "?";
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
        Throwable cause = e instanceof java.io.UncheckedIOException u ? u.getCause() : e;
        if (cause instanceof java.nio.file.FileSystemException fs) {
            // the output folder failed under the run (a file in the way, no permission): the
            // user's to fix, like any bad input
            err.println(name + ": " + oneLine(OutFolder.describe(fs)));
            err.flush();
            return EXIT_BAD_INPUT;
        }
        if (verbose) {
            e.printStackTrace(err);
        }
        String what = e instanceof ConvergenceException ? "numerical failure" : "internal error";
        StackTraceElement where = e.getStackTrace().length > 0 ? e.getStackTrace()[0] : null;
        err.println(name + ": " + what + ": " + oneLine(String.valueOf(e.getMessage())) + " ("
                + e.getClass().getSimpleName() + (where == null ? "" : " at " + where) + "; please report it)");
        err.flush();
        return EXIT_FAILURE;
    }

    /**
     * The one path every error line takes: one line; control characters (a NUL in a star's name,
     * say) shown as escapes rather than sent to the terminal; and no "Infinity" or "NaN" where a
     * message quotes a number beyond the double range, in words instead.
     */
    static String oneLine(String message) {
        if (message == null) {
            return "";
        }
        String line = message.replaceAll("\\s*\\R\\s*", " ").strip();
        StringBuilder b = new StringBuilder(line.length());
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (Character.isISOControl(c)) {
                b.append(String.format(java.util.Locale.US, "\\u%04x", (int) c));
            } else {
                b.append(c);
            }
        }
        return b.toString().replaceAll("-Infinity\\b", "below -1.8e308").replaceAll("\\bInfinity\\b", "over 1.8e308")
                .replaceAll("\\bNaN\\b", "undefined");
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
