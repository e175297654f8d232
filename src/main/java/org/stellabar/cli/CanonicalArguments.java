package org.stellabar.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The arguments that define a job, as the parts of a sharded job record them: every option the
 * user gave, in the order the command declares its options, as {@code --name=value} (one per value
 * given), leaving out the options that only choose the part, the output folder or what is
 * printed. Two runs of the same job give the same list however the options were ordered or
 * spelt ({@code -o} or {@code --out}, {@code --steps 5} or {@code --steps=5}); the list parsed
 * again rebuilds the job.
 */
final class CanonicalArguments {

    private CanonicalArguments() {
    }

    /**
     * @param spec the command as parsed
     * @param ignored long names of the options to leave out
     * @return the canonical arguments
     */
    static List<String> of(CommandSpec spec, Set<String> ignored) {
        CommandLine.ParseResult parsed = spec.commandLine().getParseResult();
        List<String> arguments = new ArrayList<>();
        for (OptionSpec option : spec.options()) {
            if (ignored.contains(option.longestName()) || !parsed.hasMatchedOption(option)) {
                continue;
            }
            OptionSpec matched = parsed.matchedOption(option.longestName());
            for (String value : matched.originalStringValues()) {
                arguments.add(option.longestName() + "=" + value);
            }
            if (matched.originalStringValues().isEmpty()) {
                arguments.add(option.longestName());
            }
        }
        return arguments;
    }

    /**
     * Parses recorded arguments into a fresh command object.
     *
     * @param command the command object to fill
     * @param arguments the recorded arguments
     * @param <T> its type
     * @return the filled command object
     */
    static <T extends Subcommand> T parse(T command, List<String> arguments) {
        new CommandLine(command.model()).parseArgs(arguments.toArray(String[]::new));
        return command;
    }
}
