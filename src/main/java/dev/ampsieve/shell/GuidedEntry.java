package dev.ampsieve.shell;

import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.jline.reader.EndOfFileException;
import org.jline.reader.LineReader;
import org.jline.reader.UserInterruptException;

/**
 * The question sequence that describes a stage: gain, temperature range and limit first, then
 * the rest with the default (or the current answer) in brackets and one line on why it is
 * asked. Each answer is checked at once and asked again, with the reason, until it is usable.
 * {@code ?} explains a question, Enter keeps the value shown, {@code done} keeps every
 * remaining value, Ctrl-C (or Ctrl-D) stops the sequence and hands back the answers given so
 * far, each already checked, for the caller to keep when they make a stage.
 */
final class GuidedEntry {

    /** The user stopped the sequence: the answers as they stood, and how many questions got a new value. */
    static final class Cancelled extends Exception {
        private static final long serialVersionUID = 1L;
        private final transient Map<String, String> answers;
        private final int given;

        Cancelled(Map<String, String> answers, int given) {
            this.answers = Map.copyOf(answers);
            this.given = given;
        }

        Map<String, String> answers() {
            return answers;
        }

        int given() {
            return given;
        }
    }

    static final String DONE = "done";
    static final String EXPLAIN = "?";

    private final ShellContext ctx;
    private final LineReader reader;
    private final PrintWriter out;
    private final Paint paint;
    private boolean finishing;
    /** Questions that got a new, usable value in this sequence. */
    private final Set<String> answered = new LinkedHashSet<>();

    GuidedEntry(ShellContext ctx) {
        this.ctx = ctx;
        this.reader = ctx.reader;
        this.out = ctx.out;
        this.paint = ctx.paint;
    }

    /** Runs the questions starting from {@code start}; returns the new answers. */
    Map<String, String> run(Map<String, String> start) throws Cancelled {
        out.println(ctx.fold(
                "Describe the stage: topology, gain, temperature range, error limit, full-scale output and supply "
                        + "first (they decide the verdict), then the rest."));
        out.println(ctx.fold(
                "Enter keeps the value in [ ], ? explains a question, 'done' keeps all remaining values, "
                        + "Ctrl-C stops and keeps the answers given.",
                paint::dim));
        Map<String, String> a = new LinkedHashMap<>(start);
        Object historyWas = reader.getVariable(LineReader.DISABLE_HISTORY);
        reader.setVariable(LineReader.DISABLE_HISTORY, true); // answers are not commands to recall
        try {
            List<String> order = Questions.order();
            boolean restSaid = false;
            for (int i = 0; i < order.size() && !finishing; i++) {
                String id = order.get(i);
                if (!Questions.applies(order, i, a)) {
                    continue;
                }
                if (i >= Questions.FIRST.size() && !restSaid) {
                    restSaid = true;
                    out.println(
                            ctx.fold("The rest have defaults; Enter keeps them, 'done' keeps them all.", paint::dim));
                }
                try {
                    a = ask(id, a, position(order, i, a));
                } catch (Cancelled c) {
                    throw new Cancelled(a, answered.size());
                }
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
            if (Questions.applies(order, j, a)) {
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
        header(position + " " + id, Questions.why(id));
        while (true) {
            String current = Questions.current(id, a);
            String shown =
                    current != null ? current : Questions.required(id, a) ? "required" : Questions.defaultText(id);
            String line = read("  " + id + " [" + shown + "] > ", id).strip();
            if (line.equals(EXPLAIN)) {
                explain(id, shown, a);
                continue;
            }
            if (line.equalsIgnoreCase(DONE)) {
                if (Questions.first(id, a)) {
                    say(
                            "  'done' comes after the supply questions",
                            ": they decide which error terms count. "
                                    + (Questions.required(id, a) && current == null
                                            ? ""
                                            : "Enter keeps [" + shown + "]."));
                    continue;
                }
                String missing = missingRequired(a);
                if (missing != null) {
                    say("  " + missing + " is needed before the rest can take defaults", "; " + Questions.why(missing));
                    continue;
                }
                finishing = true;
                return a;
            }
            if (line.isEmpty()) {
                if (current == null && Questions.required(id, a)) {
                    say("  " + id + " has no default", "; " + Questions.why(id));
                    continue;
                }
                leftOut(id, a);
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
            boolean hadFullScale = answered.contains(FULL_SCALE);
            if (next.containsKey("limit.percent-of-full-scale") && !next.containsKey(FULL_SCALE)) {
                out.println(paint.dim("  a share of full scale needs the full-scale output:"));
                next = ask(FULL_SCALE, next, "[+]");
            }
            List<Problem> problems = StageCheck.problemsFor(next, change.paths());
            if (!problems.isEmpty()) {
                if (!hadFullScale) {
                    answered.remove(FULL_SCALE); // given for this answer, which is refused with it
                }
                reject(StageCheck.brief(problems.get(0)), id);
                continue;
            }
            if (change.note() != null) {
                out.println(ctx.fold("  " + change.note(), paint::dim));
            }
            leftOut(id, next);
            if (!next.equals(a)) {
                answered.add(id);
            }
            return next;
        }
    }

    private static final String FULL_SCALE = "full-scale-output";

    /** Says at once which terms an absent value leaves out, so accepting a default never hides it. */
    private void leftOut(String id, Map<String, String> a) {
        String terms = null;
        if (id.equals(FULL_SCALE) && a.get(FULL_SCALE) == null) {
            terms = "without it the open-loop gain, bandwidth and resistor terms are not counted";
        } else if (id.equals("supply.variation") && zero(a.get("supply.variation"))) {
            terms = "without it supply rejection is not counted";
        }
        if (terms != null) {
            out.println(ctx.fold("  " + terms + "; the verdict will say so.", paint::dim));
        }
    }

    /** Absent, or a zero of any unit. */
    private static boolean zero(String value) {
        if (value == null) {
            return true;
        }
        try {
            return dev.ampsieve.units.Units.parse(value, dev.ampsieve.units.Dimension.VOLTAGE) == 0;
        } catch (dev.ampsieve.units.UnitException e) {
            return false;
        }
    }

    /** "[4/21] gain  why it is asked", folded so the reason hangs under itself; a long key gets a line of its own. */
    private void header(String head, String why) {
        String folded = ctx.fold(head + "  " + why);
        int first = folded.indexOf('\n');
        if (first < 0 && folded.codePointCount(0, folded.length()) > ctx.style.width()) {
            out.println(paint.bold(head)); // the reason would start too far right to fold under itself
            out.println(ctx.fold("  " + why, paint::dim));
            return;
        }
        String[] lines = folded.split("\n", -1);
        StringBuilder sb = new StringBuilder(paint.bold(head)).append(paint.dim(lines[0].substring(head.length())));
        for (int i = 1; i < lines.length; i++) {
            sb.append('\n').append(paint.dim(lines[i]));
        }
        out.println(sb);
    }

    /** A refusal in red and its reason after it, folded to the width; the red part stays red where it is whole. */
    private void say(String refusal, String reason) {
        String folded = ctx.fold(refusal + reason);
        out.println(folded.startsWith(refusal) ? paint.red(refusal) + folded.substring(refusal.length()) : folded);
    }

    private void reject(String why, String id) {
        out.println(ctx.fold("  not usable: " + why, paint::red));
        out.println(ctx.fold("  (" + id + ": " + Questions.why(id) + ")", paint::dim));
    }

    private void explain(String id, String shown, Map<String, String> a) {
        boolean needed = shown.equals("required");
        out.println(ctx.fold("  " + id + ": " + Questions.why(id) + "."));
        out.println(ctx.fold("  for example: " + Questions.example(id)));
        java.util.List<String> units = UnitHints.of(Answers.dimension(id));
        if (!units.isEmpty()) {
            out.println(ctx.fold("  units: " + String.join(", ", units) + " (Tab after a number offers them)"));
        }
        out.println(ctx.fold(
                needed
                        ? "  no default: an answer is needed"
                        : "  default: " + Questions.defaultText(id)
                                + (shown.equals(Questions.defaultText(id)) ? "" : "; now: " + shown)));
        out.println(ctx.fold(
                "  " + (needed ? "" : "Enter keeps [" + shown + "]; ")
                        + (Questions.first(id, a)
                                ? "'done' comes after the supply questions"
                                : "'done' keeps all remaining values")
                        + "; Ctrl-C stops and keeps the answers given.",
                paint::dim));
    }

    /** The first required question still unanswered, or null. */
    private static String missingRequired(Map<String, String> a) {
        for (String id : Questions.FIRST) {
            if (Questions.applies(id, a) && Questions.required(id, a) && Questions.current(id, a) == null) {
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
            throw new Cancelled(Map.of(), 0); // run() fills in the answers as they stand
        }
    }
}
