package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import picocli.AutoComplete;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgGroupSpec;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * The command line's model — every command's help text and every option's and parameter's
 * attributes (names, label, arity, type, default, initial value, split, group, candidates) — and
 * the bash completion script, held against snapshots in {@code src/test/resources/.../cli/model}.
 * The snapshots were written from the annotated commands before the model was built in code
 * (each command's {@code describe}); they hold the command line users had, so any drift in how
 * the model is built shows here. To change an option on purpose, change its snapshot with it
 * (run with {@code -Dstellabar.snapshots.write=true} to rewrite them, then read the diff).
 */
class CommandModelSnapshotTest {

    private static final Path SOURCE_DIR = Path.of("src/test/resources/org/stellabar/cli/model");

    static Stream<String> commands() {
        List<String> names = new ArrayList<>();
        names.add("stellabar");
        names.addAll(StellabarCommand.commandLine().getSubcommands().keySet());
        return names.stream();
    }

    @ParameterizedTest
    @MethodSource("commands")
    void helpAndModelAreAsBefore(String name) throws IOException {
        CommandLine root = StellabarCommand.commandLine();
        CommandLine command = name.equals("stellabar") ? root : root.getSubcommands().get(name);
        StringWriter help = new StringWriter();
        command.usage(new PrintWriter(help), CommandLine.Help.Ansi.OFF);
        String text = help + "\n--- model\n" + describe(command.getCommandSpec());
        check(name + ".txt", text);
    }

    @ParameterizedTest
    @MethodSource("commands")
    void completionScriptIsAsBefore(String name) throws IOException {
        if (!name.equals("stellabar")) {
            return;
        }
        check("completion.bash", AutoComplete.bash("stellabar", StellabarCommand.commandLine()));
    }

    private static void check(String file, String actual) throws IOException {
        if (Boolean.getBoolean("stellabar.snapshots.write")) {
            Files.createDirectories(SOURCE_DIR);
            Files.writeString(SOURCE_DIR.resolve(file), actual, StandardCharsets.UTF_8);
            return;
        }
        try (InputStream in = CommandModelSnapshotTest.class.getResourceAsStream("model/" + file)) {
            if (in == null) {
                throw new AssertionError("no snapshot model/" + file);
            }
            assertEquals(new String(in.readAllBytes(), StandardCharsets.UTF_8), actual, file);
        }
    }

    /** The model in a stable text form, one line per attribute that picocli acts on. */
    static String describe(CommandSpec spec) {
        StringBuilder s = new StringBuilder();
        s.append("command ").append(spec.name()).append(" aliases=").append(Arrays.toString(spec.aliases()))
                .append(" subcommands=").append(spec.subcommands().keySet())
                .append(" version=").append(Arrays.toString(spec.version())).append('\n');
        s.append("  exitCodes=").append(spec.usageMessage().exitCodeList()).append('\n');
        for (OptionSpec o : spec.options()) {
            s.append("option ").append(Arrays.toString(o.names()));
            common(s, o);
            s.append(" usageHelp=").append(o.usageHelp()).append(" versionHelp=").append(o.versionHelp())
                    .append(" negatable=").append(o.negatable()).append(" fallback=").append(o.fallbackValue())
                    .append(" mapFallback=").append(o.mapFallbackValue()).append(" order=").append(o.order())
                    .append('\n');
        }
        for (PositionalParamSpec p : spec.positionalParameters()) {
            s.append("positional ").append(p.index());
            common(s, p);
            s.append('\n');
        }
        for (ArgGroupSpec g : spec.argGroups()) {
            s.append("group exclusive=").append(g.exclusive()).append(" multiplicity=").append(g.multiplicity())
                    .append(" heading=").append(g.heading()).append(" validate=").append(g.validate())
                    .append(" order=").append(g.order()).append(" args=");
            List<String> args = new ArrayList<>();
            for (ArgSpec a : g.args()) {
                args.add(a instanceof OptionSpec o ? o.longestName() : a.paramLabel());
            }
            s.append(args).append('\n');
        }
        return s.toString();
    }

    private static void common(StringBuilder s, ArgSpec a) {
        // a flag's label is never shown (picocli makes one up from the field name)
        s.append(" label=").append(a.arity().max() == 0 ? "-" : a.paramLabel()).append(" arity=").append(a.arity())
                .append(" required=").append(a.required()).append(" type=").append(a.type().getName())
                .append(" aux=").append(Arrays.stream(a.auxiliaryTypes()).map(Class::getName).toList())
                .append(" split=").append(a.splitRegex()).append(" default=").append(a.defaultValue())
                .append(" initial=").append(a.initialValue()).append(" hidden=").append(a.hidden())
                .append(" interactive=").append(a.interactive()).append(" inGroup=").append(a.group() != null)
                .append(" converters=").append(a.converters().length)
                .append(" candidates=").append(a.completionCandidates() == null ? "none"
                        : String.join(",", a.completionCandidates()))
                .append(" showDefault=").append(a.showDefaultValue())
                .append("\n    description=").append(Arrays.toString(a.description()));
    }
}
