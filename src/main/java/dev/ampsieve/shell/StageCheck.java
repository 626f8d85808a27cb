package dev.ampsieve.shell;

import dev.ampsieve.commands.StageSource;
import dev.ampsieve.report.ProblemText;
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
    private StageCheck() {}

    /** How a typed-in stage is named in messages. */
    static final Path NAME = Path.of("(current stage)");

    /** The topology and its network's keys decide the network together; a problem in one concerns them all. */
    private static final Set<String> RESISTORS = Set.of(
            "gain",
            "rf",
            "rg",
            "topology",
            "r1",
            "r2",
            "r3",
            "r4",
            "cf",
            "source-resistance",
            "source-capacitance",
            "balance-resistance");

    /** The stage the answers describe. */
    static Stage stage(Map<String, String> answers) throws InputException {
        return StageLoader.parse(StageWriter.toYaml(answers), NAME);
    }

    /**
     * The answers as the commands receive them: the stage built in memory, named {@code name}
     * ("(current stage)" or the file it was loaded from). The lines of the YAML built from the
     * answers are not the user's, so problems name the stage without a line or column.
     */
    static StageSource.Given given(Map<String, String> answers, String name) throws InputException {
        Path shown = Path.of(name);
        StageLoader.Loaded loaded;
        try {
            loaded = StageLoader.parseWithWarnings(StageWriter.toYaml(answers), shown);
        } catch (InputException e) {
            throw new InputException(
                    e.problems().stream().map(p -> unplaced(p, shown)).toList());
        }
        List<Problem> warnings =
                loaded.warnings().stream().map(p -> unplaced(p, shown)).toList();
        return new StageSource.Given(loaded.stage(), warnings, name, name);
    }

    private static Problem unplaced(Problem p, Path name) {
        return p.at(name, 0, 0, p.field());
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
                // a key not answered yet (a required one is asked later): not this answer's fault
                .filter(p -> p.field().isEmpty() || paths.contains(p.field()) || answered(answers, p.field()))
                .filter(p -> paths.stream().anyMatch(path -> concerns(p.field(), path)))
                .toList();
    }

    /** Whether the answers hold {@code field} or a key inside it. */
    private static boolean answered(Map<String, String> answers, String field) {
        return answers.keySet().stream().anyMatch(k -> k.equals(field) || k.startsWith(field + "."));
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
        String message = ProblemText.message(p);
        String fix = ProblemText.fix(p);
        return dev.ampsieve.text.Visible.of(fix.isEmpty() ? message : message + "; " + fix);
    }
}
