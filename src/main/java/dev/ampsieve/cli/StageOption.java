package dev.ampsieve.cli;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import picocli.CommandLine.Option;

/**
 * The {@code --stage FILE} option every stage command shares (a picocli mixin), so its name,
 * wording and the way the stage is named in output stay the same everywhere. The shell finds
 * commands that take a stage by this option's name.
 */
public final class StageOption {

    @Option(names = "--stage", required = true, paramLabel = "FILE", description = "Stage file (YAML).")
    Path file;

    /** The stage, validated; problems come back as file:line:col lines. */
    public Stage load() throws InputException {
        return StageLoader.load(file);
    }

    /** The path as given, for JSON. */
    public String label() {
        return file.toString();
    }

    /** The file name alone, so text headers stay within the table width. */
    public String name() {
        return String.valueOf(file.getFileName());
    }
}
