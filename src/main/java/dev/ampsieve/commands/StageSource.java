package dev.ampsieve.commands;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;

/**
 * Where a command gets its stage: a file on the command line ({@code --stage FILE}), the current
 * stage in the shell, held in memory. Either way the command receives the stage itself and the
 * names to show it by, so nothing is written to disk and no output needs rewriting.
 */
@FunctionalInterface
public interface StageSource {

    /** The stage, validated; its problems come back as lines naming the source. */
    Given read() throws InputException;

    /**
     * A stage as a command receives it.
     *
     * @param warnings what the stage loader warns about, each once per root command
     * @param label    how JSON and CSV name the stage (a file's path as given)
     * @param name     how text headers name it (a file's name alone, so they stay within the table width)
     */
    record Given(Stage stage, List<Problem> warnings, String label, String name) {
        public Given {
            warnings = List.copyOf(warnings);
        }
    }

    /** A stage file, read when the command asks for it. */
    static StageSource file(Path file) {
        return () -> {
            StageLoader.Loaded loaded = StageLoader.loadWithWarnings(file);
            return new Given(loaded.stage(), loaded.warnings(), file.toString(), String.valueOf(file.getFileName()));
        };
    }
}
