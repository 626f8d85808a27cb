package dev.ampsieve.shell;

import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What the shell remembers between lines: the current stage as answers (key path to the text
 * typed or read from a file), where it came from, and whether it changed since. Commands that
 * take a stage get it in memory, through the root command's current stage (see {@code Shell}).
 */
final class ShellState {
    private Map<String, String> answers = new LinkedHashMap<>();
    private Path file;
    private boolean unsaved;

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
}
