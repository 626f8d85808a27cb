package dev.ampsieve.commands;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.failure.UserError;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The {@code --stage FILE} option every stage command shares (a picocli mixin), so its name,
 * wording and the way the stage is named in output stay the same everywhere. Without the option
 * the stage comes from the front end's current stage ({@link RootCommand#useCurrentStage}: the
 * shell's); the shell finds commands that take a stage by this option's {@link #NAME}.
 */
public final class StageOption {

    /** The option's name. */
    public static final String NAME = "--stage";

    @Option(names = NAME, required = true, paramLabel = "FILE", description = "Stage file (YAML).")
    Path file;

    /** The command this option belongs to, for its root (current stage, notes shown) and its stderr. */
    @Spec(Spec.Target.MIXEE)
    CommandSpec mixee;

    private StageSource.Given given;

    /**
     * The stage, validated; problems come back as file:line:col lines. Its warnings go to the
     * command's stderr, each once per root command (the shell runs many commands on one stage).
     */
    public Stage load() throws UserError {
        given = source().read();
        if (mixee != null && !given.warnings().isEmpty()) {
            PrintWriter err = mixee.commandLine().getErr();
            Object root = mixee.root().userObject();
            for (Problem p : given.warnings()) {
                String line = ProblemText.line(p);
                if (!(root instanceof RootCommand r) || r.firstTime(line)) {
                    err.println(line);
                }
            }
            err.flush();
        }
        return given.stage();
    }

    private StageSource source() throws Refusal {
        if (file != null) {
            return StageSource.file(file);
        }
        Object root = mixee == null ? null : mixee.root().userObject();
        if (root instanceof RootCommand r && r.currentStage() != null) {
            return r.currentStage();
        }
        throw new Refusal("Missing required option: '" + NAME + "=FILE'", ExitCode.USAGE, Place.field(NAME));
    }

    /** How JSON names the stage: the path as given, or the shell's name for its current stage. Call after {@link #load}. */
    public String label() {
        return given != null ? given.label() : String.valueOf(file);
    }

    /** The file name alone (or the shell's name), so text headers stay within the table width. Call after {@link #load}. */
    public String name() {
        return given != null ? given.name() : String.valueOf(file == null ? null : file.getFileName());
    }
}
