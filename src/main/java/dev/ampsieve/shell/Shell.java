package dev.ampsieve.shell;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.Failures;
import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.commands.StageOption;
import dev.ampsieve.commands.VisibleWriter;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.Caution;
import dev.ampsieve.report.Glyphs;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.report.Wrap;
import dev.ampsieve.stats.Cancelled;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;
import java.util.stream.Collectors;
import org.jline.reader.Completer;
import org.jline.reader.EndOfFileException;
import org.jline.reader.LineReader;
import org.jline.reader.LineReaderBuilder;
import org.jline.reader.ParsedLine;
import org.jline.reader.UserInterruptException;
import org.jline.reader.impl.DefaultParser;
import org.jline.terminal.Terminal;
import org.jline.terminal.TerminalBuilder;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The interactive shell: a JLine line editor in front of the same picocli command tree the
 * command line uses, plus the shell's own verbs for the current stage. Each line is split
 * into words (quotes group words) and executed by the tree; a command that takes
 * {@code --stage FILE} gets the current stage, in memory, when the line gives none (the shell
 * hands it to the root command as its current stage before building the tree).
 *
 * <p>Ctrl-C drops the line being typed (or stops the questions of {@code ask}); while a command
 * runs it interrupts the thread running it, which stops at its next checkpoint with
 * {@link Cancelled} (see DEVELOPERS.md "Stopping a command"), and the shell says so and goes
 * back to the prompt with the stage as it was; it never ends the shell. Keys typed after it
 * are kept for the next line. Ctrl-D leaves. Lines over {@link LineLimit#MAX} characters are
 * refused. Any failure goes to the one handler ({@link Failures}, in the shell's voice) and the
 * loop goes on; a stack trace only with {@code --verbose}.
 */
public final class Shell {
    private final RootCommand root;
    private final List<String> rootArgs;
    private final Terminal terminal;
    private final Path historyFile;
    private final Map<String, String> env;
    /** Guards {@link #running} and {@link #cancelRequested} between the reader and Ctrl-C's handler. */
    private final Object commandLock = new Object();
    /** The thread running a command; null at the prompt. */
    private Thread running;
    /** Ctrl-C was pressed while the current command ran. */
    private boolean cancelRequested;

    private LineLimit lineLimit;
    private ShellState state;
    /** Each line's exit code, in order (the shell's own verbs and the shared commands alike), for tests. */
    private final List<Integer> exitCodes = new ArrayList<>();
    /** Commands added to the tree after the shell's own (tests add one that fails in a way no user can cause). */
    private final List<Object> extraCommands = new ArrayList<>();
    /** Whether the catalog is read after the prompt is up (the default) or before the banner. */
    private boolean loadInBackground = true;
    /** How many catalog files the background read found (for the note of a line that waits); 0 until known. */
    private volatile int catalogFiles;
    /** Runs on the reading thread before the catalog is read (tests hold the read back with it). */
    private Runnable beforeLoad = () -> {};

    /**
     * @param rootArgs    the options the shell was started with ({@code --catalog DIR} ...), given
     *                    again before every line because picocli resets options on each parse
     * @param historyFile where to keep the history; null for none
     * @param env         the environment (NO_COLOR)
     */
    public Shell(
            RootCommand root, List<String> rootArgs, Terminal terminal, Path historyFile, Map<String, String> env) {
        this.root = root;
        this.rootArgs = List.copyOf(rootArgs);
        this.terminal = terminal;
        this.historyFile = historyFile;
        this.env = Map.copyOf(env);
    }

    /**
     * Opens the shell on the process's terminal; returns the exit code.
     *
     * @param root     the root of the command tree (from {@code Main}); the shell gives it its current stage
     * @param rootArgs the options the program was started with
     */
    public static int start(RootCommand root, List<String> rootArgs) {
        try (Terminal t = systemTerminal()) {
            Map<String, String> env = System.getenv();
            return new Shell(root, rootArgs, t, XdgPaths.history(env, System.getProperty("user.home")), env).run();
        } catch (IOException e) {
            System.err.println(
                    "ampsieve: cannot open the terminal (" + e.getMessage() + "); give a command to run instead");
            return ExitCode.INTERNAL.code();
        }
    }

    /**
     * The process's terminal through JLine's JNI provider (its native library ships in JLine's
     * jar), else through JLine's default choice. Naming the provider saves start-up time: the
     * default list also asks the exec provider, which runs {@code test -t 1} (a process) on every
     * start (issue 13; seen with strace).
     */
    private static Terminal systemTerminal() throws IOException {
        try {
            return TerminalBuilder.builder()
                    .system(true)
                    .name("ampsieve")
                    .provider("jni")
                    .dumb(false) // fail here rather than fall back to a dumb terminal: the default may do better
                    .build();
        } catch (IOException | RuntimeException | LinkageError e) {
            return TerminalBuilder.builder().system(true).name("ampsieve").build();
        }
    }

    /** Colours off for NO_COLOR (any non-empty value, no-color.org) and dumb terminals; ASCII when not UTF-8. */
    static OutputStyle look(Terminal t, Map<String, String> env, boolean asciiAsked) {
        String type = t.getType() == null ? "dumb" : t.getType();
        boolean dumb = type.startsWith("dumb");
        String noColor = env.get("NO_COLOR");
        boolean color = !dumb && (noColor == null || noColor.isEmpty());
        boolean unicode = !asciiAsked
                && t.encoding() != null
                && t.encoding().name().toUpperCase(Locale.ROOT).startsWith("UTF");
        return new OutputStyle(t.getWidth(), unicode, color);
    }

    public int run() {
        OutputStyle style = look(terminal, env, rootArgs.contains("--ascii"));
        PrintWriter raw = terminal.writer();
        PrintWriter out = new PrintWriter(new TerminalLines(raw, s -> shown(s, false)), true);
        PrintWriter err = new PrintWriter(new TerminalLines(raw, s -> shown(s, true)), true);

        // the completer needs the tree and the context, which need the reader: wire it in after building
        AtomicReference<Completer> completer = new AtomicReference<>();
        CompletableFuture<CommandLine> treeReady = new CompletableFuture<>();
        DefaultParser parser = new DefaultParser();
        parser.setEofOnUnclosedQuote(false); // an unclosed quote ends at the end of the line
        LineReaderBuilder builder = LineReaderBuilder.builder()
                .terminal(terminal)
                .appName("ampsieve")
                .parser(parser)
                .completer((r, l, c) -> {
                    try {
                        treeReady.get(); // the tree may still be built in the background
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt(); // Ctrl-C: nothing offered, the line is dropped
                        return;
                    } catch (ExecutionException e) {
                        return; // no tree: every line says why
                    }
                    completer.get().complete(r, l, c);
                })
                .variable(LineReader.HISTORY_SIZE, 1000)
                .variable(LineReader.HISTORY_FILE_SIZE, 5000)
                .option(LineReader.Option.DISABLE_EVENT_EXPANSION, true) // '!' is text, not a history reference
                .option(LineReader.Option.HISTORY_IGNORE_SPACE, true)
                .history(new LineLimit.History());
        String historyNote = null;
        if (historyFile != null) {
            historyNote = prepareHistory(historyFile);
            if (historyNote == null) {
                builder.variable(LineReader.HISTORY_FILE, historyFile);
            }
        }
        LineReader reader = builder.build();
        lineLimit = LineLimit.install(reader);
        ShellContext ctx = new ShellContext(root, reader, out, style);
        state = ctx.state;
        ctx.lineLimit = lineLimit;
        // commands without --stage FILE take the current stage, in memory, under the name the user knows it by
        root.useCurrentStage(() -> StageCheck.given(ctx.state.answers(), ctx.state.nameInMessages()));

        // the tree (picocli reads every command's annotations), the root options and the catalog: on
        // a thread of their own unless the catalog is to be read before the banner
        Supplier<String> setUp = () -> {
            CommandLine tree;
            String parseError = null;
            try {
                tree = tree(ctx, out, err);
                completer.set(new ShellCompleter(ctx, tree));
                try {
                    tree.parseArgs(rootArgs.toArray(String[]::new)); // --catalog and friends before the read
                } catch (CommandLine.ParameterException e) {
                    parseError = e.getMessage();
                    if (!loadInBackground) {
                        err.println(parseError); // before the banner, as always
                    }
                }
                if (loadInBackground) {
                    Path dir = root.catalogDir();
                    catalogFiles = dir.toString().isBlank()
                            ? 0
                            : CatalogLoader.files(dir).size();
                }
            } catch (RuntimeException | Error e) {
                treeReady.completeExceptionally(e);
                throw e;
            }
            treeReady.complete(tree);
            beforeLoad.run();
            String line = catalogLine();
            return parseError == null || !loadInBackground ? line : parseError + "\n" + line;
        };
        ctx.load.start(setUp, e -> "Catalog: not loaded (" + e + ").", loadInBackground);
        banner(ctx, historyNote);
        // the counts when the read ends: above the line being typed, unless a command waits for them
        ctx.load.whenDone(() -> announce(ctx, reader));
        // for the whole session, so a Ctrl-C between two reads never meets the default (ending the
        // program); the line reader puts its own in place while it reads and restores this one
        Terminal.SignalHandler previous = terminal.handle(Terminal.Signal.INT, s -> interruptCommand());
        try {
            loop(ctx, reader, treeReady, err);
        } finally {
            terminal.handle(Terminal.Signal.INT, previous != null ? previous : Terminal.SignalHandler.SIG_DFL);
            out.flush();
            err.flush();
        }
        return ExitCode.OK.code();
    }

    /** The command tree, the shell's verbs added, set up for the shell; its completer set too. */
    private CommandLine tree(ShellContext ctx, PrintWriter out, PrintWriter err) {
        CommandLine tree = Commands.build(root, out, err);
        ShellCommands.all(ctx).forEach(tree::addSubcommand);
        extraCommands.forEach(tree::addSubcommand);
        // picocli hands these settings to the subcommands present when they are set: set them again
        tree.setOut(out);
        tree.setErr(err);
        tree.setCaseInsensitiveEnumValuesAllowed(true);
        tree.setColorScheme(CommandLine.Help.defaultColorScheme(CommandLine.Help.Ansi.OFF)); // see Commands.build
        // "set temperature -40..85 C": a negative value is a value, not an unknown option
        tree.getSubcommands().get("set").setUnmatchedOptionsArePositionalParams(true);
        tree.setParameterExceptionHandler((ex, args) -> Failures.usage(ex, args, Failures.Voice.SHELL, null));
        tree.setExecutionExceptionHandler((ex, line, parsed) -> failure(ex, err));
        return tree;
    }

    private void loop(ShellContext ctx, LineReader reader, CompletableFuture<CommandLine> treeReady, PrintWriter err) {
        while (!ctx.quit) {
            ctx.style = look(terminal, env, rootArgs.contains("--ascii"));
            ctx.paint = new Paint(ctx.style.color());
            root.setOutputStyle(ctx.style);
            String line;
            try {
                line = reader.readLine(prompt(ctx));
            } catch (UserInterruptException e) {
                refused(err); // Ctrl-C: the line is dropped, the shell stays; or a line over the limit
                continue;
            } catch (EndOfFileException e) {
                if (ctx.state.unsaved() && !ctx.warnedUnsaved) {
                    ctx.warnedUnsaved = true;
                    ctx.out.println();
                    ctx.out.println(
                            ctx.fold(
                                    "The current stage is not saved: 'save FILE' keeps it; Ctrl-D again leaves without saving."));
                    continue;
                }
                ctx.out.println();
                break;
            }
            if (line.length() > LineLimit.MAX) { // recalled from an old history file, for instance
                err.println(LineLimit.refusal(line.length()));
                continue;
            }
            List<String> words = words(reader.getParsedLine(), line);
            if (words.isEmpty()) {
                continue;
            }
            if (!words.get(0).equals("quit") && !words.get(0).equals("exit")) {
                ctx.warnedUnsaved = false;
            }
            execute(ctx, treeReady, words, err);
        }
    }

    private static List<String> words(ParsedLine parsed, String line) {
        List<String> words = new ArrayList<>();
        if (parsed == null) {
            for (String w : line.strip().split("\\s+")) {
                if (!w.isEmpty()) {
                    words.add(w);
                }
            }
            return withoutLeadingProgramName(words);
        }
        for (String w : parsed.words()) {
            if (!w.isEmpty()) {
                words.add(w);
            }
        }
        return withoutLeadingProgramName(words);
    }

    /**
     * The words without a leading "ampsieve": messages and help name commands as the command line
     * types them ("run 'ampsieve check'"), and the shell takes that form as it is, so no printed
     * text needs rewriting for it.
     */
    static List<String> withoutLeadingProgramName(List<String> words) {
        return words.size() > 1 && words.get(0).equals(PROGRAM_NAME)
                ? new ArrayList<>(words.subList(1, words.size()))
                : words;
    }

    /** The program's name as the command line types it. */
    static final String PROGRAM_NAME = "ampsieve";

    /**
     * Reads the catalog before the banner ({@code background} false: what a test needs to see the
     * same lines every time) or after the prompt is up (the default), running {@code before} on
     * the reading thread first; call before {@link #run}.
     */
    Shell catalogRead(boolean background, Runnable before) {
        loadInBackground = background;
        beforeLoad = before;
        return this;
    }

    /** Adds a command to the tree the shell builds; call before {@link #run}. */
    Shell withCommand(Object command) {
        extraCommands.add(command);
        return this;
    }

    /** The exit code of each line run so far, in order. */
    List<Integer> exitCodes() {
        return List.copyOf(exitCodes);
    }

    /** Runs one line through the tree; never throws. */
    void execute(ShellContext ctx, CompletableFuture<CommandLine> treeReady, List<String> words, PrintWriter err) {
        String name = words.get(0);
        if (!ctx.load.done() && leavesNow(ctx, words)) {
            return;
        }
        // a Ctrl-C at the prompt can leave this thread interrupted (the line reader restores the
        // status it found); it belongs to no command
        Thread.interrupted();
        synchronized (commandLock) {
            running = Thread.currentThread();
            cancelRequested = false;
        }
        boolean cancelled;
        boolean waiting = false;
        try {
            if (!ctx.load.done()) {
                waiting = true;
                ctx.out.println(ctx.fold(waitingNote(name), ctx.paint::dim));
                try {
                    ctx.load.await();
                } catch (InterruptedException e) {
                    throw new Cancelled(); // Ctrl-C: back to the prompt; the read goes on
                }
                waiting = false;
            }
            String counts = ctx.load.takeLine();
            if (counts != null) {
                ctx.out.println(ctx.fold(counts));
            }
            CommandLine tree = treeReady.getNow(null);
            if (tree == null) { // the tree could not be built: the read's line said why
                throw new IllegalStateException("the command tree was not built", failureOf(treeReady));
            }
            tree.setUsageHelpWidth(Math.max(55, Math.min(ctx.style.width(), 120)));
            CommandLine sub = tree.getSubcommands().get(name);
            if (sub == null && !name.startsWith("-")) {
                String near = Fields.closest(name, tree.getSubcommands().keySet());
                exitCodes.add(failure(
                        new Refusal(
                                "unknown command '" + name + "'"
                                        + (near != null ? "; did you mean '" + near + "'?" : "")
                                        + " ('help' lists the commands)",
                                ExitCode.USAGE,
                                Place.field(name)),
                        err));
                return;
            }
            Refusal noStage = sub == null ? null : missingStage(ctx, sub, words);
            if (noStage != null) {
                exitCodes.add(failure(noStage, err));
                return;
            }
            List<String> args = new ArrayList<>(rootArgs);
            args.addAll(words);
            exitCodes.add(tree.execute(args.toArray(String[]::new)));
        } catch (RuntimeException | StackOverflowError e) {
            exitCodes.add(failure(e, err));
        } finally {
            synchronized (commandLock) {
                running = null; // from here on Ctrl-C's handler leaves this thread alone
                cancelled = cancelRequested;
            }
            // no interrupt may reach the next read: the line reader would drop the keys typed after Ctrl-C
            Thread.interrupted();
            ctx.out.flush();
            err.flush();
        }
        if (cancelled && !waiting) {
            // a read cut short by the interrupt may have left the catalog incomplete: read it afresh
            // (not when the line only waited for the background read: that read was not interrupted)
            root.forgetCatalog();
        }
    }

    /**
     * 'quit' (or 'exit') alone while the catalog is read: the shell leaves at once instead of
     * waiting. No stage can be unsaved yet, as every line that sets one waits for the read.
     */
    private boolean leavesNow(ShellContext ctx, List<String> words) {
        if (words.size() != 1 || !List.of("quit", "exit").contains(words.get(0)) || ctx.state.unsaved()) {
            return false;
        }
        ctx.quit = true;
        exitCodes.add(ExitCode.OK.code());
        return true;
    }

    /** Why {@code f}, done, failed. */
    private static Throwable failureOf(CompletableFuture<?> f) {
        try {
            f.join();
            return null;
        } catch (CompletionException | CancellationException e) {
            return e.getCause();
        }
    }

    /** Said when a line has to wait for the catalog's background read. */
    private String waitingNote(String command) {
        int files = catalogFiles; // counted by the reading thread (0 until then)
        return "The catalog is still loading" + (files > 0 ? " (" + files + " file(s))" : "") + "; '" + command
                + "' runs when it is read. Ctrl-C stops waiting.";
    }

    /**
     * The catalog line, above the line being typed, when the background read ends at the prompt;
     * nothing while a line runs (it waits for the read and prints the line itself).
     */
    private void announce(ShellContext ctx, LineReader reader) {
        synchronized (commandLock) {
            if (running != null) {
                return;
            }
            String line = ctx.load.takeLine();
            if (line != null) {
                // not through ctx.out: printAbove keeps the prompt and the keys typed so far below it
                OutputStyle st = look(terminal, env, rootArgs.contains("--ascii"));
                reader.printAbove(Arrays.stream(Wrap.prose(line, st.width()).split("\n", -1))
                        .map(l -> shown(l, false)) // a line at a time, as ctx.out shows them
                        .collect(Collectors.joining("\n")));
            }
        }
    }

    /** Ctrl-C's handler (on a signal thread): interrupts the command running, if any; else nothing. */
    private void interruptCommand() {
        synchronized (commandLock) {
            if (running != null) {
                cancelRequested = true;
                running.interrupt();
            }
        }
    }

    private boolean cancelRequested() {
        synchronized (commandLock) {
            return cancelRequested;
        }
    }

    /** Prints the line about a refused over-long line, if the last read ended with one. */
    private void refused(PrintWriter err) {
        String r = lineLimit.takeRefusal();
        if (r != null) {
            err.println(r);
        }
    }

    /**
     * Null when the line can run as far as its stage goes: the command takes none, the line names
     * a file, or there is a current stage (the command takes it from the root); else the refusal
     * saying how to get one.
     */
    private static Refusal missingStage(ShellContext ctx, CommandLine sub, List<String> line) {
        OptionSpec stage = sub.getCommandSpec().findOption(StageOption.NAME);
        if (stage == null || ctx.state.hasStage() || line.contains("--help") || line.contains("-h")) {
            return null;
        }
        for (String w : line) {
            for (String n : stage.names()) {
                if (w.equals(n) || w.startsWith(n + "=")) {
                    return null;
                }
            }
        }
        return new Refusal(
                "'" + line.get(0) + "' needs a stage: type 'ask' to describe one, 'load FILE', or add --stage FILE",
                ExitCode.USAGE,
                Place.field(StageOption.NAME));
    }

    /** Exit status of a command stopped by Ctrl-C: 128 + SIGINT, as shells report it. */
    private static final int INTERRUPTED = 130;

    /** Ctrl-C's line, else the one handler's lines; the stack trace only when --verbose was given. */
    private int failure(Throwable ex, PrintWriter err) {
        if (ex instanceof Cancelled || cancelRequested()) {
            // whatever a command throws after Ctrl-C (Cancelled, or a read cut short) is the interrupt
            Thread.interrupted(); // printing must not meet it
            err.println();
            err.println(
                    state != null && state.hasStage()
                            ? "Interrupted; the current stage is as it was."
                            : "Interrupted.");
            return INTERRUPTED;
        }
        return Failures.report(ex, err, root.verbose(), Failures.Voice.SHELL).code();
    }

    /**
     * What a printed line looks like on this terminal: guarded, in ASCII where the terminal is not
     * UTF-8. Error lines are folded to its width and
     * painted, so the terminal never breaks a word. Commands are named as the command line types
     * them ('ampsieve check'), which the shell also takes ({@link #withoutLeadingProgramName}).
     */
    private String shown(String s, boolean error) {
        s = VisibleWriter.guard(s); // before our own colours: only they may reach the terminal
        OutputStyle st = look(terminal, env, rootArgs.contains("--ascii"));
        if (!st.unicode()) {
            s = Glyphs.ascii(s);
        }
        if (!error) {
            return s;
        }
        Paint paint = new Paint(st.color());
        return Arrays.stream(Wrap.prose(s, st.width()).split("\n", -1))
                .map(paint::red)
                .collect(Collectors.joining("\n"));
    }

    private String prompt(ShellContext ctx) {
        String label = ctx.state.label();
        String p = label.isEmpty() ? "ampsieve> " : "ampsieve [" + label + "]> ";
        return ctx.paint.cyan(p);
    }

    private void banner(ShellContext ctx, String historyNote) {
        PrintWriter out = ctx.out;
        Paint paint = ctx.paint;
        out.println(paint.bold(new RootCommand.Version().getVersion()[0])
                + ": op-amp choice by the full output error budget of your stage.");
        String counts = ctx.load.takeLine();
        out.println(ctx.fold(counts != null ? counts : "Catalog: loading; its counts follow."));
        out.println(paint.dim(Wrap.prose(Caution.TEXT, ctx.style.width())));
        if (historyNote != null) {
            out.println(ctx.fold(historyNote, paint::dim));
        }
        out.println(ctx.foldBold(
                "Type ask to describe your stage, help for the commands, Tab to complete, Ctrl-D to leave.",
                "ask",
                "help"));
    }

    private String catalogLine() {
        try {
            Catalog c = root.catalog();
            long errors = c.problems().stream().filter(Problem::isError).count();
            return "Catalog " + c.root() + ": " + c.parts().size() + " part(s)"
                    + (c.problems().isEmpty()
                            ? "."
                            : "; " + errors + " error(s), " + (c.problems().size() - errors)
                                    + " warning(s): 'check' lists them.");
        } catch (InputException e) {
            return "Catalog " + root.catalogDir() + ": " + e.problems().size() + " problem(s); 'check' lists them.";
        } catch (Refusal | RuntimeException e) {
            return "Catalog " + root.catalogDir() + ": not loaded (" + e.getMessage() + ").";
        }
    }

    /** Makes the history folder; returns a note when history cannot be kept, else null. */
    private static String prepareHistory(Path file) {
        try {
            Files.createDirectories(file.getParent());
            if (Files.exists(file) ? !Files.isWritable(file) : !Files.isWritable(file.getParent())) {
                return "History is not kept: " + file + " is not writable.";
            }
            return null;
        } catch (IOException | SecurityException e) {
            return "History is not kept: cannot make " + file.getParent() + " (" + e.getMessage() + ").";
        }
    }
}
