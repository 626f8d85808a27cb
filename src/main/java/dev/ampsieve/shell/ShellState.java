package dev.ampsieve.shell;

import dev.ampsieve.stage.StageWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What the shell remembers between lines: the current stage as answers (key path to the text
 * typed or read from a file), where it came from, and whether it changed since. Commands that
 * take {@code --stage FILE} get it as a file written here.
 */
final class ShellState {
    /** Name of the file commands get; unusual enough to be replaced in their messages by "(current stage)". */
    static final String STAGE_FILE_NAME = "shell-current-stage.yaml";

    private Map<String, String> answers = new LinkedHashMap<>();
    private Path file;
    private boolean unsaved;
    private Path workDir;

    boolean hasStage() {
        return !answers.isEmpty();
    }

    /** The answers, read-only; replace them with {@link #replace}. */
    Map<String, String> answers() {
        return Collections.unmodifiableMap(answers);
    }

    /**
     * @param from  the file they were read from or saved to; null when typed in
     * @param saved true when {@code from} holds exactly these answers
     */
    void replace(Map<String, String> newAnswers, Path from, boolean saved) {
        answers = new LinkedHashMap<>(newAnswers);
        file = from;
        unsaved = !saved;
    }

    void update(Map<String, String> newAnswers) {
        answers = new LinkedHashMap<>(newAnswers);
        unsaved = true;
    }

    void savedAs(Path to) {
        file = to;
        unsaved = false;
    }

    Path file() {
        return file;
    }

    boolean unsaved() {
        return unsaved && hasStage();
    }

    /** A short name for the prompt: the file name, or "new stage"; '*' when not saved. */
    String label() {
        if (!hasStage()) {
            return "";
        }
        String name = file == null ? "new stage" : file.getFileName().toString();
        return unsaved ? name + "*" : name;
    }

    /** How commands' output names the stage: its file while the stage is as saved there, else "(current stage)". */
    String nameInMessages() {
        return file != null && !unsaved ? file.getFileName().toString() : StageCheck.NAME.toString();
    }

    /** The folder for the stage file handed to commands; made on first use, removed by {@link #close}. */
    Path stageFile() {
        try {
            if (workDir == null) {
                workDir = Files.createTempDirectory("ampsieve-shell-");
            }
            Path f = workDir.resolve(STAGE_FILE_NAME);
            Files.writeString(f, StageWriter.toYaml(answers), StandardCharsets.UTF_8);
            return f;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the current stage to a temporary file", e);
        }
    }

    /** The path commands would see, for hiding it in their messages; null before first use. */
    Path stageFileIfWritten() {
        return workDir == null ? null : workDir.resolve(STAGE_FILE_NAME);
    }

    void close() {
        if (workDir == null) {
            return;
        }
        try {
            Files.deleteIfExists(workDir.resolve(STAGE_FILE_NAME));
            Files.deleteIfExists(workDir);
        } catch (IOException e) {
            // a leftover file in the temp folder is harmless; the shell is closing anyway
        }
    }
}
