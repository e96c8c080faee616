package org.quire.app.cli;

import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code quire completion}: the bash (and zsh) completion script of every command and option, from picocli. */
@Command(name = "completion", mixinStandardHelpOptions = true,
        description = {"Print the shell completion script for bash (zsh loads it with bashcompinit): commands, "
                + "actions and options complete with TAB.",
            "The Linux package installs it; by hand: source <(quire completion)."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire completion > ~/.local/share/bash-completion/completions/quire",
            "  source <(quire completion)"})
final class CompletionCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        String script = AutoComplete.bash("quire", spec.root().commandLine());
        spec.commandLine().getOut().print(script);
        spec.commandLine().getOut().flush();
        return CommandLine.OK;
    }
}
