package dev.ampsieve.shell;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.failure.UserError;
import dev.ampsieve.report.CriterionText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.StageWriter;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.jline.reader.EndOfFileException;
import org.jline.reader.UserInterruptException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * The shell's own verbs: describing, changing, showing, saving and loading the current stage,
 * help and quit. They join the command tree only inside the shell (on the command line a stage
 * is a file), so {@code help} lists them beside the shared commands and completion knows them.
 */
final class ShellCommands {
    private ShellCommands() {}

    /** Names of the shell's own verbs, for grouping in help. */
    static final List<String> NAMES = List.of("ask", "set", "unset", "show", "save", "load", "help", "quit");

    /** A command's one-line summary: its header, else the first line of its description. */
    static String summary(CommandLine c) {
        String[] h = c.getCommandSpec().usageMessage().header();
        if (h.length > 0 && !h[0].isBlank()) {
            return h[0];
        }
        String[] d = c.getCommandSpec().usageMessage().description();
        return d.length == 0 ? "" : d[0];
    }

    static List<Object> all(ShellContext ctx) {
        return List.of(
                new Ask(ctx),
                new SetKey(ctx),
                new UnsetKey(ctx),
                new Show(ctx),
                new Save(ctx),
                new Load(ctx),
                new Help(ctx),
                new Quit(ctx));
    }

    /** The base: the context and where to print. */
    abstract static class Base implements Callable<Integer> {
        final ShellContext ctx;

        @Spec
        CommandSpec spec;

        Base(ShellContext ctx) {
            this.ctx = ctx;
        }

        PrintWriter out() {
            return spec.commandLine().getOut();
        }

        /** After a question ended like Ctrl-C: the line saying an over-long answer was refused, if that was why. */
        void noteRefusal() {
            String r = ctx.lineLimit == null ? null : ctx.lineLimit.takeRefusal();
            if (r != null) {
                spec.commandLine().getErr().println(r);
            }
        }

        Paint paint() {
            return ctx.paint;
        }
    }

    @Command(name = "ask", description = "Describe the stage by answering questions, one value at a time.")
    static final class Ask extends Base {
        @Option(names = "--fresh", description = "Start from the defaults instead of the current stage.")
        boolean fresh;

        Ask(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            if (ctx.reader == null) {
                throw new Refusal("questions need a terminal; use 'set KEY VALUE' or a stage file", ExitCode.USAGE);
            }
            Map<String, String> start = fresh ? Map.of() : ctx.state.answers();
            Map<String, String> answers;
            try {
                answers = new GuidedEntry(ctx).run(start);
            } catch (GuidedEntry.Cancelled e) {
                out().println();
                noteRefusal();
                out().println(ctx.fold(stopped(e)));
                return ExitCode.OK.code();
            }
            if (ctx.state.hasStage() && !fresh) {
                ctx.state.update(answers);
            } else {
                ctx.state.replace(answers, null, false);
            }
            out().println();
            int code = Show.print(ctx, out(), false);
            out().println();
            out().println(ctx.foldBold(
                    "Next: rank lists the parts that fit, save FILE keeps this stage, "
                            + "set KEY VALUE changes one value.",
                    "rank",
                    "save FILE",
                    "set KEY VALUE"));
            List<String> more = Questions.setOnly(ctx.state.answers());
            out().println(ctx.fold("Not asked (set them if needed): " + String.join(", ", more) + ".", paint()::dim));
            return code;
        }

        /**
         * After Ctrl-C: the answers given were each checked as they came, so they are kept when
         * they make a whole stage (gain and limit at least); a stage that was there stays otherwise.
         */
        private String stopped(GuidedEntry.Cancelled e) {
            boolean had = ctx.state.hasStage();
            String before = had ? "the current stage is as it was." : "no stage yet.";
            if (e.given() == 0) {
                return "Stopped; " + before;
            }
            try {
                StageCheck.stage(e.answers());
            } catch (InputException notYet) {
                return "Stopped; nothing kept (a stage needs the gain and the limit); " + before;
            }
            if (had && !fresh) {
                ctx.state.update(e.answers());
            } else {
                ctx.state.replace(e.answers(), null, false);
            }
            return "Stopped; kept the " + (e.given() == 1 ? "one answer" : e.given() + " answers")
                    + " given: 'show' lists them, 'ask' starts again.";
        }
    }

    @Command(
            name = "set",
            description = "Change one stage value, checked with its unit. Examples: set limit 10 uV input; "
                    + "set temperature -40..85 C; set output-range 0.1..2.4 V; set band 0.1..10 Hz; set supply 5 V ± 0.25 V; "
                    + "set supply.variation 0.25 V; set rf 100k.")
    static final class SetKey extends Base {
        @Parameters(
                index = "0",
                paramLabel = "KEY",
                description = "A stage key (Tab lists them; a block's key as block.key), or a range for both ends: "
                        + "temperature, band, output-range, common-mode-range; or supply (voltage ± variation).")
        String key;

        @Parameters(index = "1..*", arity = "1..*", paramLabel = "VALUE", description = "The value with its unit.")
        List<String> value;

        SetKey(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            String id;
            Answers.Change change;
            try {
                id = Answers.id(key);
                change = Answers.interpret(id, String.join(" ", value), ctx.state.answers());
            } catch (AnswerException e) {
                throw new Refusal(key + ": " + e.line(), ExitCode.USAGE, Place.field(key));
            }
            Map<String, String> next = change.applyTo(ctx.state.answers());
            List<Problem> problems = StageCheck.problemsFor(next, change.paths());
            if (!problems.isEmpty()) {
                throw new Refusal(
                        id + ": " + StageCheck.brief(problems.get(0)) + " (" + Questions.why(id) + ")",
                        ExitCode.FINDINGS,
                        Place.field(id));
            }
            boolean had = ctx.state.hasStage();
            if (had) {
                ctx.state.update(next);
            } else {
                ctx.state.replace(next, null, false);
            }
            out().println(id + " = " + Questions.current(id, next)
                    + (change.note() != null ? "  (" + change.note() + ")" : ""));
            List<Problem> rest =
                    StageCheck.problems(next).stream().filter(Problem::isError).toList();
            if (!rest.isEmpty()) {
                out().println(ctx.fold(
                        "The stage is not complete yet: " + StageCheck.brief(rest.get(0)), paint()::dim));
            }
            return ExitCode.OK.code();
        }
    }

    @Command(name = "unset", description = "Return stage values to their defaults.")
    static final class UnsetKey extends Base {
        @Parameters(arity = "1..*", paramLabel = "KEY", description = "Stage keys.")
        List<String> keys;

        UnsetKey(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            Map<String, String> next = new LinkedHashMap<>(ctx.state.answers());
            for (String k : keys) {
                String id;
                try {
                    id = Answers.id(k);
                } catch (AnswerException e) {
                    throw new Refusal(k + ": " + e.line(), ExitCode.USAGE, Place.field(k));
                }
                Answers.RangeId r = Answers.range(id);
                if (r != null) {
                    next.remove(r.low());
                    next.remove(r.high());
                } else if (id.equals(Answers.SUPPLY)) {
                    next.keySet().removeIf(p -> p.startsWith("supply."));
                } else if (id.equals(Answers.LIMIT)) {
                    next.keySet().removeIf(p -> p.equals("limit") || p.startsWith("limit."));
                } else {
                    next.remove(id);
                }
            }
            ctx.state.update(next);
            out().println("Back to the default: " + String.join(", ", keys));
            return ExitCode.OK.code();
        }
    }

    @Command(name = "show", description = "Show the current stage, its noise gain and its limit at the output.")
    static final class Show extends Base {
        @Option(names = "--all", description = "Also list every key left at its default.")
        boolean all;

        Show(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            if (!ctx.state.hasStage() && !all) {
                out().println("No current stage yet: type 'ask' to describe one, or 'load FILE'.");
                return ExitCode.OK.code();
            }
            return print(ctx, out(), all);
        }

        /** The answers, then the derived values (or the problems that prevent them). */
        static int print(ShellContext ctx, PrintWriter out, boolean all) {
            Paint paint = ctx.paint;
            Map<String, String> a = ctx.state.answers();
            Path file = ctx.state.file();
            out.println(paint.bold("Stage") + " " + (file == null ? "(typed in" : "(" + file)
                    + (ctx.state.unsaved() ? ", not saved)" : ")"));
            int w = 26;
            for (String id : displayIds()) {
                String v = Questions.current(id, a);
                if (v != null) {
                    out.println("  " + pad(id, w) + v);
                } else if (all) {
                    out.println(paint.dim("  " + pad(id, w) + "default: " + Questions.defaultText(id)));
                }
            }
            Stage s;
            try {
                s = StageCheck.stage(a);
            } catch (InputException e) {
                out.println(paint.red("Not a complete stage yet:"));
                for (Problem p : e.problems()) {
                    out.println("  " + (p.field().isEmpty() ? "" : p.field() + ": ") + StageCheck.brief(p));
                }
                return ExitCode.FINDINGS.code();
            }
            out.println(paint.bold("Derived"));
            out.println("  " + pad("noise gain", w) + Units.format(s.noiseGain(), Dimension.NUMBER, 4)
                    + "   (input errors reach the output multiplied by this)");
            boolean currentIn = s.topology() == dev.ampsieve.stage.Topology.TRANSIMPEDANCE;
            out.println("  " + pad("signal gain", w)
                    + (currentIn
                            ? Units.format(s.signalGain(), Dimension.RESISTANCE, 4) + " (volts per ampere)"
                            : Units.format(s.signalGain(), Dimension.NUMBER, 4)));
            String resistors = resistorLine(s.network());
            if (!resistors.isEmpty()) {
                out.println("  " + pad("network", w) + resistors);
            }
            double limit = s.limitVolts();
            out.println("  " + pad("limit at the output", w) + Units.format(limit, Dimension.VOLTAGE) + "   ("
                    + CriterionText.of(s.criterion()) + ")");
            out.println("  " + pad("limit at the input", w)
                    + Units.format(limit / s.sourceGain(), currentIn ? Dimension.CURRENT : Dimension.VOLTAGE));
            out.println("  " + pad("farthest from 25 °C", w) + Units.format(s.deltaT(), Dimension.NUMBER) + " °C");
            String left = dev.ampsieve.report.Uncounted.ofStage(s);
            if (!left.isEmpty()) {
                // accepting a default must not hide a term: the verdicts will say the same
                out.println(ctx.foldBold("Every verdict: " + left + ".", "Every verdict"));
            }
            if (!all) {
                out.println(paint.dim(
                        "Other keys keep their defaults: 'show --all' lists them, 'set KEY VALUE' changes one."));
            }
            return ExitCode.OK.code();
        }

        /** Every key once, the temperature range and the limit as one each. */
        static List<String> displayIds() {
            List<String> out = new ArrayList<>();
            for (String id : Answers.ids()) {
                boolean combined =
                        id.equals(Answers.SUPPLY) || Answers.range(id) != null && !id.equals(Answers.TEMPERATURE);
                if (id.startsWith("temperature.") || id.startsWith("limit.") || combined) {
                    continue;
                }
                out.add(id);
            }
            return out;
        }

        /** The network's parts in one line, as the stage file names them. */
        private static String resistorLine(dev.ampsieve.stage.Network n) {
            return switch (n.topology()) {
                case NON_INVERTING -> {
                    dev.ampsieve.stage.NonInverting x = (dev.ampsieve.stage.NonInverting) n;
                    yield "rf " + ohms(x.rf()) + ", rg " + ohms(x.rg());
                }
                case INVERTING -> {
                    dev.ampsieve.stage.Inverting x = (dev.ampsieve.stage.Inverting) n;
                    yield "rf " + ohms(x.rf()) + ", rg " + ohms(x.rg());
                }
                case FOLLOWER -> "";
                case DIFFERENCE -> {
                    dev.ampsieve.stage.Difference x = (dev.ampsieve.stage.Difference) n;
                    yield "r1 " + ohms(x.r1()) + ", r2 " + ohms(x.r2()) + ", r3 " + ohms(x.r3()) + ", r4 "
                            + ohms(x.r4());
                }
                case TRANSIMPEDANCE -> {
                    dev.ampsieve.stage.Transimpedance x = (dev.ampsieve.stage.Transimpedance) n;
                    yield "rf " + ohms(x.rf()) + ", cf " + Units.format(x.cf(), Dimension.CAPACITANCE);
                }
            };
        }

        private static String ohms(double v) {
            return Units.format(v, Dimension.RESISTANCE);
        }

        private static String pad(String s, int w) {
            return s.length() >= w ? s + " " : s + " ".repeat(w - s.length());
        }
    }

    @Command(name = "save", description = "Save the current stage as a commented stage file.")
    static final class Save extends Base {
        @Parameters(paramLabel = "FILE", description = "Where to write, e.g. bridge.yaml.")
        Path file;

        @Option(names = "--force", description = "Replace the file if it exists, without asking.")
        boolean force;

        Save(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            if (!ctx.state.hasStage()) {
                throw new Refusal("no current stage to save; type 'ask' to describe one");
            }
            String notAFile = notARegularFile(file);
            if (notAFile != null) {
                throw new Refusal(
                        file + " is " + notAFile + "; save replaces only regular files, so it was left as it is: "
                                + "give a new file name",
                        ExitCode.USAGE);
            }
            boolean overwrite = force;
            if (Files.exists(file, LinkOption.NOFOLLOW_LINKS) && !force) {
                if (!confirm(file + " exists. Replace it? [y/N] ")) {
                    out().println("Left " + file + " as it was.");
                    return ExitCode.OK.code();
                }
                overwrite = true;
            }
            StageWriter.save(StageWriter.toYaml(ctx.state.answers()), file, overwrite);
            ctx.state.savedAs(file);
            out().println("Saved " + file + ".");
            return ExitCode.OK.code();
        }

        private boolean confirm(String question) throws Refusal {
            if (ctx.reader == null) {
                throw new Refusal(file + " exists; add --force to replace it", ExitCode.USAGE);
            }
            try {
                String a = ctx.reader.readLine(question).strip().toLowerCase(Locale.ROOT);
                return a.equals("y") || a.equals("yes");
            } catch (UserInterruptException | EndOfFileException e) {
                noteRefusal();
                return false;
            }
        }

        /**
         * What the path is when it exists but is not a regular file ("a symbolic link to X", "a
         * folder", "a named pipe (FIFO)", ...); null for a regular file or nothing. Links are not
         * followed: replacing a link's target through it, or opening a FIFO (which blocks until
         * someone reads) or a device, is never what saving a stage means.
         */
        static String notARegularFile(Path file) {
            BasicFileAttributes a;
            try {
                a = Files.readAttributes(file, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
            } catch (NoSuchFileException e) {
                return null;
            } catch (IOException e) {
                return null; // unreadable attributes: the write itself reports what is wrong
            }
            if (a.isRegularFile()) {
                return null;
            }
            if (a.isSymbolicLink()) {
                try {
                    return "a symbolic link to " + Files.readSymbolicLink(file);
                } catch (IOException e) {
                    return "a symbolic link";
                }
            }
            if (a.isDirectory()) {
                return "a folder";
            }
            return special(file);
        }

        /** Names a special file by the type bits of its mode (POSIX stat(2) S_IFMT). */
        private static String special(Path file) {
            int mode;
            try {
                mode = (Integer) Files.getAttribute(file, "unix:mode", LinkOption.NOFOLLOW_LINKS);
            } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
                return "not a regular file";
            }
            return switch (mode & 0170000) {
                case 0010000 -> "a named pipe (FIFO)";
                case 0020000 -> "a character device";
                case 0060000 -> "a block device";
                case 0140000 -> "a socket";
                default -> "not a regular file";
            };
        }
    }

    @Command(name = "load", description = "Make a stage file the current stage.")
    static final class Load extends Base {
        @Parameters(paramLabel = "FILE", description = "A stage file.")
        Path file;

        Load(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            Stage loaded = StageLoader.load(file); // all checks, with file:line:col
            ctx.state.replace(answers(YamlFiles.read(file)), file, true);
            Map<String, String> a = ctx.state.answers();
            // a transimpedance stage has no gain: its rf is what sets the output per ampere; a difference stage
            // given by r1..r4 has none written: the gain its resistors set
            String written = Questions.current("gain", a);
            String gain = Questions.topology(a) == dev.ampsieve.stage.Topology.TRANSIMPEDANCE
                    ? "rf " + a.get("rf")
                    : "gain " + (written != null ? written : Units.format(loaded.signalGain(), Dimension.NUMBER));
            out().println(ctx.fold(
                    "Loaded " + file + ": " + Questions.topology(a).key() + ", " + gain + ", "
                            + Questions.current(Answers.LIMIT, a) + " limit. 'show' lists it."));
            return ExitCode.OK.code();
        }

        /** The file's values as typed, by key path (the loader has already checked them). */
        static Map<String, String> answers(Node root) {
            Map<String, String> found = new LinkedHashMap<>();
            if (root instanceof Node.Mapping m) {
                m.entries().forEach((k, v) -> {
                    if (v instanceof Node.Scalar s && s.text() != null) {
                        found.put(k, s.text());
                    } else if (v instanceof Node.Mapping inner) {
                        inner.entries().forEach((k2, v2) -> {
                            if (v2 instanceof Node.Scalar s2 && s2.text() != null) {
                                found.put(k + "." + k2, s2.text());
                            }
                        });
                    }
                });
            }
            Map<String, String> ordered = new LinkedHashMap<>();
            for (String p : StageKeys.paths()) {
                if (found.containsKey(p)) {
                    ordered.put(p, found.get(p));
                }
            }
            return ordered;
        }
    }

    @Command(
            name = "help",
            description =
                    "List the commands, show one command's options (help COMMAND), or a reference page (help query|stage-keys|catalog-keys|units).")
    static final class Help extends Base {
        @Parameters(arity = "0..1", paramLabel = "COMMAND", description = "A command name.")
        String command;

        Help(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            CommandLine tree = spec.commandLine().getParent();
            PrintWriter out = out();
            if (command != null && dev.ampsieve.report.ReferencePages.TOPICS.contains(command)) {
                // the reference pages of 'ampsieve help TOPIC', at the terminal's width
                out.print(dev.ampsieve.report.ReferencePages.page(command, ctx.style.width()));
                return ExitCode.OK.code();
            }
            if (command != null) {
                CommandLine sub = tree.getSubcommands().get(command);
                if (sub == null) {
                    throw new Refusal("no command '" + command + "'; 'help' lists them", ExitCode.USAGE);
                }
                sub.usage(out);
                return ExitCode.OK.code();
            }
            List<String> shared = new ArrayList<>();
            for (Map.Entry<String, CommandLine> e : tree.getSubcommands().entrySet()) {
                String name = e.getKey();
                if (!NAMES.contains(name) && e.getValue().getCommandName().equals(name)) {
                    shared.add(name);
                }
            }
            out.println(paint().bold("The stage"));
            for (String n : List.of("ask", "set", "unset", "show", "save", "load")) {
                line(out, tree, n);
            }
            out.println(paint().bold("Parts"));
            for (String n : shared) {
                line(out, tree, n);
            }
            out.println(paint().bold("The shell"));
            for (String n : List.of("help", "quit")) {
                line(out, tree, n);
            }
            out.println();
            out.println("Commands that take --stage FILE use the current stage when it is left out.");
            out.println("Tab completes commands, options, part ids, stage keys and units.");
            out.println("Ctrl-C drops the line or stops a running command; Ctrl-D leaves.");
            out.println("Reference: help " + String.join(", help ", dev.ampsieve.report.ReferencePages.TOPICS) + ".");
            return ExitCode.OK.code();
        }

        private void line(PrintWriter out, CommandLine tree, String name) {
            CommandLine c = tree.getSubcommands().get(name);
            if (c == null) {
                return;
            }
            String text = ShellCommands.summary(c);
            int room = Math.max(20, ctx.style.width() - 12);
            if (text.length() > room) {
                text = text.substring(0, room - 3) + "...";
            }
            out.println("  " + String.format(Locale.ROOT, "%-10s", name) + text);
        }
    }

    @Command(name = "quit", aliases = "exit", description = "Leave the shell (Ctrl-D does the same).")
    static final class Quit extends Base {
        Quit(ShellContext ctx) {
            super(ctx);
        }

        @Override
        public Integer call() throws UserError {
            if (ctx.state.unsaved() && !ctx.warnedUnsaved) {
                ctx.warnedUnsaved = true;
                out().println(ctx.fold(
                        "The current stage is not saved: 'save FILE' keeps it; 'quit' again leaves without saving."));
                return ExitCode.OK.code();
            }
            ctx.quit = true;
            return ExitCode.OK.code();
        }
    }
}
