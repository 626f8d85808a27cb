package dev.ampsieve.shell;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.StageWriter;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Checks answers with the stage loader itself, so the shell accepts exactly what a stage file
 * accepts and no rule is written twice. While questions are still being answered the stage is
 * incomplete; only the problems that concern the keys just answered are reported then.
 */
final class StageCheck {
    private StageCheck() {
    }

    /** How a typed-in stage is named in messages. */
    static final Path NAME = Path.of("(current stage)");

    /** gain, rf, rg and topology decide the resistors together; a problem in one concerns all four. */
    private static final Set<String> RESISTORS = Set.of("gain", "rf", "rg", "topology");

    /** The stage the answers describe. */
    static Stage stage(Map<String, String> answers) throws InputException {
        return StageLoader.parse(StageWriter.toYaml(answers), NAME);
    }

    /** Every problem with the answers (empty when they make a valid stage). */
    static List<Problem> problems(Map<String, String> answers) {
        try {
            stage(answers);
            return List.of();
        } catch (InputException e) {
            return e.problems();
        }
    }

    /** The errors among {@link #problems} that concern {@code paths}. */
    static List<Problem> problemsFor(Map<String, String> answers, Collection<String> paths) {
        return problems(answers).stream()
                .filter(Problem::isError)
                .filter(p -> paths.stream().anyMatch(path -> concerns(p.field(), path)))
                .toList();
    }

    /** A problem in {@code field} concerns {@code path} when both sit in one block or both set the resistors. */
    static boolean concerns(String field, String path) {
        if (field.isEmpty()) {
            return true; // about the whole stage: always worth saying
        }
        if (RESISTORS.contains(field) && RESISTORS.contains(path)) {
            return true;
        }
        return section(field).equals(section(path));
    }

    private static String section(String path) {
        int dot = path.indexOf('.');
        return dot < 0 ? path : path.substring(0, dot);
    }

    /** "problem; fix" without the file and field, for an answer just typed. */
    static String brief(Problem p) {
        return dev.ampsieve.text.Visible.of(p.fix().isEmpty() ? p.message() : p.message() + "; " + p.fix());
    }
}
