package dev.ampsieve.commands;

import dev.ampsieve.failure.ExitCode;
import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ampsieve completion bash|zsh}: a completion script generated from the command tree by
 * picocli's {@link AutoComplete} (commands, options, enum values, files). picocli 4.7.7 writes
 * bash only; zsh runs the same script through its bash compatibility ({@code bashcompinit}),
 * which the script turns on itself when {@code $ZSH_VERSION} is set, so both words print it.
 */
@Command(
        name = "completion",
        header = "Print a shell completion script (bash or zsh).",
        mixinStandardHelpOptions = true,
        description = "Print a script that completes ampsieve's commands and options as you type them in bash or "
                + "zsh. It is generated from the command tree, so it always matches this version; load it from your "
                + "shell's start-up file.",
        footer = {
            "",
            "Examples:",
            "  ampsieve completion bash > ~/.local/share/bash-completion/completions/ampsieve",
            "  source <(ampsieve completion bash)      in ~/.bashrc",
            "  source <(ampsieve completion zsh)       in ~/.zshrc"
        })
public final class CompletionCommand implements Callable<Integer> {

    /** The shells a script can be printed for. */
    public enum Shell {
        bash,
        zsh
    }

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "SHELL", description = "bash or zsh.")
    Shell shell;

    @Override
    public Integer call() {
        // one script for both: it checks $ZSH_VERSION and, in zsh, turns on bashcompinit itself
        // (without re-running compinit when completion is already set up)
        String script = AutoComplete.bash("ampsieve", spec.root().commandLine());
        spec.commandLine().getOut().print(script);
        return ExitCode.OK.code();
    }
}
