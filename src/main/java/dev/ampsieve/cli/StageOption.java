package dev.ampsieve.cli;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The {@code --stage FILE} option every stage command shares (a picocli mixin), so its name,
 * wording and the way the stage is named in output stay the same everywhere. The shell finds
 * commands that take a stage by this option's name.
 */
public final class StageOption {

    @Option(names = "--stage", required = true, paramLabel = "FILE", description = "Stage file (YAML).")
    Path file;

    /**
     * The stage, validated; problems come back as file:line:col lines. Its warnings go to the
     * command's stderr, each once per root command (the shell runs many commands on one stage).
     */
    public Stage load() throws InputException {
        StageLoader.Loaded loaded = StageLoader.loadWithWarnings(file);
        if (mixee != null && !loaded.warnings().isEmpty()) {
            PrintWriter err = mixee.commandLine().getErr();
            Object root = mixee.root().userObject();
            String shown = shellName();
            for (Problem p : loaded.warnings()) {
                // the shell writes its stage to a file of its own: its lines are not the user's, so no place
                Problem named = shown == null ? p
                        : new Problem(p.severity(), Path.of(shown), 0, 0, p.field(), p.message(), p.fix());
                String line = named.toString();
                if (!(root instanceof RootCommand r) || r.firstTime(line)) {
                    err.println(line);
                }
            }
            err.flush();
        }
        return loaded.stage();
    }

    /** The command this option belongs to, for the root's naming of stage files. */
    @Spec(Spec.Target.MIXEE)
    CommandSpec mixee;

    /** The path as given, for JSON (or the shell's name for its current stage). */
    public String label() {
        String shown = shellName();
        return shown != null ? shown : file.toString();
    }

    /** The file name alone, so text headers stay within the table width. */
    public String name() {
        String shown = shellName();
        return shown != null ? shown : String.valueOf(file.getFileName());
    }

    private String shellName() {
        Object root = mixee == null ? null : mixee.root().userObject();
        return root instanceof RootCommand r ? r.stageName(file) : null;
    }
}
