package dev.ampsieve.shell;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.jline.builtins.Completers;
import org.jline.reader.Candidate;
import org.jline.reader.Completer;
import org.jline.reader.LineReader;
import org.jline.reader.ParsedLine;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * Tab completion from the command tree itself: command names, each command's options, the
 * values an option or parameter takes (file names for files, part ids from the loaded catalog
 * for a parameter labelled PART, enum constants), stage keys after {@code set}, and units
 * after a number where the key says what the number measures. While a guided question is
 * asked, completion offers that question's words and units instead.
 */
final class ShellCompleter implements Completer {
    private final ShellContext ctx;
    private final CommandLine tree;
    private final Completer files = new Completers.FileNameCompleter();

    /** A word that ends in a number, so a unit may follow directly. */
    private static final Pattern ENDS_IN_NUMBER = Pattern.compile(".*(\\d|\\d\\.)$");

    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");

    ShellCompleter(ShellContext ctx, CommandLine tree) {
        this.ctx = ctx;
        this.tree = tree;
    }

    /** Every candidate {@link Visible}: a part title or a file name must not drive the terminal from the menu. */
    @Override
    public void complete(LineReader reader, ParsedLine line, List<Candidate> out) {
        int from = out.size();
        offer(reader, line, out);
        for (int i = from; i < out.size(); i++) {
            out.set(i, visible(out.get(i)));
        }
    }

    /**
     * The candidate with its value, display and description made visible. The value too: a file
     * name holding ESC completes to its escaped spelling, which then names no file, rather than
     * putting a raw ESC on the command line.
     */
    static Candidate visible(Candidate c) {
        return new Candidate(
                Visible.of(c.value()),
                Visible.of(c.displ()),
                Visible.of(c.group()),
                Visible.of(c.descr()),
                c.suffix(),
                c.key(),
                c.complete(),
                c.sort());
    }

    private void offer(LineReader reader, ParsedLine line, List<Candidate> out) {
        List<String> words = line.words();
        int idx = line.wordIndex();
        String word =
                line.word().substring(0, Math.min(line.wordCursor(), line.word().length()));
        String question = ctx.question;
        if (question != null) {
            value(question, word, idx > 0 ? words.get(idx - 1) : null, out);
            return;
        }
        if (idx == 0) {
            commands(out);
            return;
        }
        CommandLine sub = tree.getSubcommands().get(words.get(0));
        if (sub == null) {
            return;
        }
        CommandSpec spec = sub.getCommandSpec();
        String name = spec.name();
        OptionSpec previous = spec.findOption(words.get(idx - 1));
        if (previous != null && previous.arity().min() > 0) {
            argument(reader, line, previous, out);
            return;
        }
        if (word.startsWith("-")) {
            for (OptionSpec o : spec.options()) {
                if (!o.hidden()) {
                    String d = o.description().length > 0 ? o.description()[0] : null;
                    for (String n : o.names()) {
                        out.add(new Candidate(n, n, null, d, null, o.longestName(), true));
                    }
                }
            }
            return;
        }
        int position = position(words, idx, spec);
        switch (name) {
            case "set" -> {
                if (position == 0) {
                    keys(out);
                } else {
                    value(words.get(idx - position), word, words.get(idx - 1), out);
                }
                return;
            }
            case "unset" -> {
                keys(out);
                return;
            }
            case "help" -> {
                commands(out);
                return;
            }
            default -> {}
        }
        for (PositionalParamSpec p : spec.positionalParameters()) {
            if (p.index().contains(position)) {
                argument(reader, line, p, out);
                return;
            }
        }
    }

    private void commands(List<Candidate> out) {
        for (Map.Entry<String, CommandLine> e : tree.getSubcommands().entrySet()) {
            String d = ShellCommands.summary(e.getValue());
            out.add(new Candidate(e.getKey(), e.getKey(), null, d.isEmpty() ? null : d, null, null, true));
        }
    }

    private void keys(List<Candidate> out) {
        for (String id : Answers.ids()) {
            String d = Questions.why(id);
            out.add(new Candidate(id, id, null, brief(d), null, null, true));
        }
    }

    /**
     * A key's reason short enough for the completion menu: its first clause when that fits, else
     * whole words and an ellipsis, never a word cut in two ('?' at the question gives it in full).
     */
    static String brief(String why) {
        int max = 60;
        if (why.length() <= max) {
            return why;
        }
        int clause = why.indexOf(';');
        if (clause > 0 && clause <= max && balanced(why.substring(0, clause))) {
            return why.substring(0, clause);
        }
        int cut = why.lastIndexOf(' ', max - 1);
        String head = why.substring(0, cut > 0 ? cut : max - 1);
        if (!balanced(head)) {
            head = head.substring(0, head.lastIndexOf('(')).strip(); // no bracket left open
        }
        return head.replaceAll("[,:;(]+$", "") + "…";
    }

    private static boolean balanced(String s) {
        return s.chars().filter(c -> c == '(').count()
                == s.chars().filter(c -> c == ')').count();
    }

    /** Index among the positional words before {@code idx}, skipping options and their values. */
    private static int position(List<String> words, int idx, CommandSpec spec) {
        int pos = 0;
        for (int i = 1; i < idx; i++) {
            String w = words.get(i);
            if (w.startsWith("-") && w.length() > 1 && !NUMBER.matcher(w).matches()) {
                OptionSpec o = spec.findOption(w.contains("=") ? w.substring(0, w.indexOf('=')) : w);
                if (o != null && !w.contains("=") && o.arity().min() > 0) {
                    i++;
                }
                continue;
            }
            pos++;
        }
        return pos;
    }

    /** Values of an option or parameter: files, part ids, enum constants. */
    private void argument(LineReader reader, ParsedLine line, ArgSpec arg, List<Candidate> out) {
        String label = arg.paramLabel().toUpperCase(Locale.ROOT);
        Class<?> type = arg.type();
        if (label.contains("PART")) {
            parts(out);
        } else if (Path.class.isAssignableFrom(type)
                || File.class.isAssignableFrom(type)
                || label.contains("FILE")
                || label.contains("DIR")) {
            files.complete(reader, line, out);
        } else if (arg.completionCandidates() != null) {
            for (String c : arg.completionCandidates()) {
                out.add(new Candidate(c));
            }
        }
    }

    private void parts(List<Candidate> out) {
        Catalog c;
        try {
            ctx.load.await(); // the catalog may still be read in the background
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt(); // Ctrl-C: no ids, and the line reader drops the line
            return;
        }
        try {
            c = ctx.root.catalog();
        } catch (Exception e) {
            return; // no catalog, no ids; the command itself will say why
        }
        for (Part p : c.parts()) {
            out.add(new Candidate(p.id(), p.id(), null, p.title().isEmpty() ? null : p.title(), null, null, true));
        }
    }

    /** Words and units for the value of {@code id}. */
    private static void value(String id, String word, String previous, List<Candidate> out) {
        StageKeys.Key key = StageKeys.get(id);
        if (key != null
                && !key.choices().isEmpty()
                && (key.kind() == StageKeys.Kind.CHOICE || key.kind() == StageKeys.Kind.CHOICES)) {
            // a list key (trim.circuits) completes each word alike
            key.choices().forEach(c -> out.add(new Candidate(c)));
            return;
        }
        if (key != null && key.kind() == StageKeys.Kind.BOOLEAN) {
            List.of("true", "false").forEach(c -> out.add(new Candidate(c)));
            return;
        }
        Dimension d = Answers.dimension(id);
        List<String> units = new ArrayList<>(UnitHints.of(d));
        if (id.equals(Answers.LIMIT) && !word.isEmpty() && Character.isLetter(word.charAt(0))) {
            units.addAll(List.of("input", "lsb", "bits"));
        }
        if (ENDS_IN_NUMBER.matcher(word).matches()) {
            for (String u : units) {
                out.add(new Candidate(word + u, word + u, null, null, null, null, true));
            }
        } else if (previous != null && NUMBER.matcher(previous).matches() || word.isEmpty() && previous != null) {
            for (String u : units) {
                out.add(new Candidate(u));
            }
        }
    }
}
