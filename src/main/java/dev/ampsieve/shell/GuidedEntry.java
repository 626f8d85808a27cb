package dev.ampsieve.shell;

import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.jline.reader.EndOfFileException;
import org.jline.reader.LineReader;
import org.jline.reader.UserInterruptException;

/**
 * The question sequence that describes a stage: gain, temperature range and limit first, then
 * the rest with the default (or the current answer) in brackets and one line on why it is
 * asked. Each answer is checked at once and asked again, with the reason, until it is usable.
 * {@code ?} explains a question, Enter keeps the value shown, {@code done} keeps every
 * remaining value, Ctrl-C (or Ctrl-D) abandons the sequence and leaves the stage as it was.
 */
final class GuidedEntry {

    /** The user abandoned the sequence. */
    static final class Cancelled extends Exception {
        private static final long serialVersionUID = 1L;
    }

    static final String DONE = "done";
    static final String EXPLAIN = "?";

    private final ShellContext ctx;
    private final LineReader reader;
    private final PrintWriter out;
    private final Paint paint;
    private boolean finishing;

    GuidedEntry(ShellContext ctx) {
        this.ctx = ctx;
        this.reader = ctx.reader;
        this.out = ctx.out;
        this.paint = ctx.paint;
    }

    /** Runs the questions starting from {@code start}; returns the new answers. */
    Map<String, String> run(Map<String, String> start) throws Cancelled {
        out.println("Describe the stage: gain, temperature range and error limit first, then the rest.");
        out.println(paint.dim("Enter keeps the value in [ ], ? explains a question, 'done' keeps all remaining values, "
                + "Ctrl-C cancels."));
        Map<String, String> a = new LinkedHashMap<>(start);
        Object historyWas = reader.getVariable(LineReader.DISABLE_HISTORY);
        reader.setVariable(LineReader.DISABLE_HISTORY, true); // answers are not commands to recall
        try {
            List<String> order = Questions.order();
            for (int i = 0; i < order.size() && !finishing; i++) {
                String id = order.get(i);
                if (!Questions.applies(id, a)) {
                    continue;
                }
                if (i == Questions.FIRST.size()) {
                    out.println(paint.dim("The rest have defaults; Enter keeps them, 'done' keeps them all."));
                }
                a = ask(id, a, position(order, i, a));
            }
        } finally {
            ctx.question = null;
            reader.setVariable(LineReader.DISABLE_HISTORY, historyWas == null ? Boolean.FALSE : historyWas);
        }
        return a;
    }

    /** "[4/19]": where the question sits among those that apply now. */
    private static String position(List<String> order, int i, Map<String, String> a) {
        int n = 0;
        int at = 0;
        for (int j = 0; j < order.size(); j++) {
            if (Questions.applies(order.get(j), a)) {
                n++;
                if (j <= i) {
                    at = n;
                }
            }
        }
        return "[" + at + "/" + n + "]";
    }

    /** Asks one question until it has a usable answer; returns the answers with it applied. */
    Map<String, String> ask(String id, Map<String, String> a, String position) throws Cancelled {
        out.println();
        out.println(paint.bold(position + " " + id) + "  " + paint.dim(Questions.why(id)));
        while (true) {
            String current = Questions.current(id, a);
            String shown = current != null ? current : Questions.required(id) ? "required" : Questions.defaultText(id);
            String line = read("  " + id + " [" + shown + "] > ", id).strip();
            if (line.equals(EXPLAIN)) {
                explain(id, shown);
                continue;
            }
            if (line.equalsIgnoreCase(DONE)) {
                String missing = missingRequired(a);
                if (missing != null) {
                    out.println(paint.red("  " + missing + " is needed before the rest can take defaults") + "; "
                            + Questions.why(missing));
                    continue;
                }
                finishing = true;
                return a;
            }
            if (line.isEmpty()) {
                if (current == null && Questions.required(id)) {
                    out.println(paint.red("  " + id + " has no default") + "; " + Questions.why(id));
                    continue;
                }
                return a;
            }
            Answers.Change change;
            try {
                change = Answers.interpret(id, line, a);
            } catch (AnswerException e) {
                reject(e.line(), id);
                continue;
            }
            Map<String, String> next = change.applyTo(a);
            if (next.containsKey("limit.percent-of-full-scale") && !next.containsKey("full-scale-output")) {
                out.println(paint.dim("  a share of full scale needs the full-scale output:"));
                next = ask("full-scale-output", next, "[+]");
            }
            List<Problem> problems = StageCheck.problemsFor(next, change.paths());
            if (!problems.isEmpty()) {
                reject(StageCheck.brief(problems.get(0)), id);
                continue;
            }
            if (change.note() != null) {
                out.println(paint.dim("  " + change.note()));
            }
            return next;
        }
    }

    private void reject(String why, String id) {
        out.println(paint.red("  not usable: " + why));
        out.println(paint.dim("  (" + id + ": " + Questions.why(id) + ")"));
    }

    private void explain(String id, String shown) {
        boolean needed = Questions.required(id) && shown.equals("required");
        out.println("  " + id + ": " + Questions.why(id) + ".");
        out.println("  for example: " + Questions.example(id));
        java.util.List<String> units = UnitHints.of(Answers.dimension(id));
        if (!units.isEmpty()) {
            out.println("  units: " + String.join(", ", units) + " (Tab after a number offers them)");
        }
        out.println(needed ? "  no default: an answer is needed" : "  default: " + Questions.defaultText(id)
                + (shown.equals(Questions.defaultText(id)) ? "" : "; now: " + shown));
        out.println(paint.dim("  " + (needed ? "" : "Enter keeps [" + shown + "]; ")
                + "'done' keeps all remaining values; Ctrl-C cancels the questions."));
    }

    /** The first required question still unanswered, or null. */
    private static String missingRequired(Map<String, String> a) {
        for (String id : Questions.FIRST) {
            if (Questions.required(id) && Questions.current(id, a) == null) {
                return id;
            }
        }
        return null;
    }

    private String read(String prompt, String id) throws Cancelled {
        ctx.question = id;
        try {
            return reader.readLine(prompt);
        } catch (UserInterruptException | EndOfFileException e) {
            throw new Cancelled();
        }
    }
}
