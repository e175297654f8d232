package org.stellabar.cli;

import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar completion}: a completion script for bash (and zsh through bashcompinit). */
final class CompletionCommand implements Callable<Integer>, Subcommand {

    CommandSpec spec;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("completion", this)
                .description("Print a shell completion script for stellabar's commands and options.",
                        "bash, this shell:     source <(./stellabar completion)",
                        "bash, every shell:    ./stellabar completion > ~/.local/share/bash-completion/completions/stellabar",
                        "zsh:                  autoload -U +X bashcompinit && bashcompinit && source <(./stellabar completion)");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() {
        // picocli writes the script from the command model: every subcommand, option and enum value
        String script = AutoComplete.bash("stellabar", StellabarCommand.commandLine());
        spec.commandLine().getOut().print(script);
        spec.commandLine().getOut().flush();
        return 0;
    }
}
