package dev.ampsieve.commands;

import java.io.PrintWriter;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * Builds the one command tree both front ends use (the command line and the shell feed it the
 * same words); failures go to the one handler, {@link Failures}.
 */
public final class Commands {
    private Commands() {}

    /** A fresh tree whose commands print to {@code out} and {@code err}. */
    public static CommandLine build(PrintWriter out, PrintWriter err) {
        return build(new RootCommand(), out, err);
    }

    /**
     * The tree around {@code root}, without the command line's {@code help} (the shell brings its
     * own). When the root has a current stage ({@link RootCommand#useCurrentStage}), {@code --stage}
     * may be left out.
     */
    public static CommandLine build(RootCommand root, PrintWriter out, PrintWriter err) {
        return build(root, out, err, false, null);
    }

    /**
     * The commands, in the order the usage lists them (the command line's {@code help} comes last);
     * each is its class's {@code @Command} name ({@code CommandsTest} checks).
     */
    static final List<String> NAMES = List.of(
            "check",
            "budget",
            "find",
            "rank",
            "compare",
            "suffices",
            "offset-rig",
            "bars",
            "scatter",
            "new-part",
            "import",
            "export",
            "completion",
            "record",
            "recheck");

    /** The command line's own command, which lists and shows the others. */
    static final String HELP = "help";

    /** A new instance of the command named {@code name}, one of {@link #NAMES}. */
    static Object newCommand(String name) {
        return switch (name) {
            case "check" -> new CheckCommand();
            case "budget" -> new BudgetCommand();
            case "find" -> new FindCommand();
            case "rank" -> new RankCommand();
            case "compare" -> new CompareCommand();
            case "suffices" -> new SufficesCommand();
            case "offset-rig" -> new OffsetRigCommand();
            case "bars" -> new BarsCommand();
            case "scatter" -> new ScatterCommand();
            case "new-part" -> new NewPartCommand();
            case "import" -> new ImportCommand();
            case "export" -> new ExportCommand();
            case "completion" -> new CompletionCommand();
            case "record" -> new RecordCommand();
            case "recheck" -> new RecheckCommand();
            default -> throw new IllegalArgumentException("no command " + name);
        };
    }

    /**
     * @param withHelp add the {@code help} command (the command line has it; the shell brings its own)
     * @param only the one command to add, or null for all: picocli builds each command's model by
     *     reflection, about a quarter of a one-shot command's start, so the command line builds only
     *     the command its words name ({@link #onlyCommand})
     */
    static CommandLine build(RootCommand root, PrintWriter out, PrintWriter err, boolean withHelp, String only) {
        CommandLine cl = new CommandLine(root);
        for (String name : only != null ? List.of(only) : NAMES) {
            cl.addSubcommand(newCommand(name));
        }
        if (withHelp && only == null) {
            cl.addSubcommand(new HelpCommand());
        }
        if (root.hasCurrentStage()) {
            cl.getSubcommands().values().forEach(Commands::stageOptional);
        }
        cl.setOut(out);
        cl.setErr(err);
        // plain help: picocli's own colour codes (SGR 39, 22 ...) are not ours, so the output guard
        // (VisibleWriter) would show them as escapes
        cl.setColorScheme(CommandLine.Help.defaultColorScheme(CommandLine.Help.Ansi.OFF));
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        CommandLine find = cl.getSubcommands().get("find");
        if (find != null) {
            FindCommand.configure(find);
        }
        // the query grammar in find's help is laid out for about 110 columns; a narrower terminal wins
        cl.setUsageHelpWidth(110);
        cl.setUsageHelpAutoWidth(true);
        cl.setExecutionExceptionHandler((ex, line, parseResult) -> Failures.report(
                        ex, line.getErr(), root.verbose(), Failures.Voice.COMMAND_LINE)
                .code());
        IParameterExceptionHandler picocliDefault = cl.getParameterExceptionHandler();
        cl.setParameterExceptionHandler(
                (ex, args) -> Failures.usage(ex, args, Failures.Voice.COMMAND_LINE, picocliDefault));
        return cl;
    }

    /** The command line: runs {@code args} on a fresh tree, with the {@code help} command. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        int code = build(new RootCommand(), out, err, true, onlyCommand(args)).execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /**
     * True when {@code args} name no command and ask for neither help nor the version (only
     * options such as {@code --catalog DIR}): with a terminal, {@code Main} opens the shell then.
     * Words that do not parse are for the command line to report, so they give false.
     */
    public static boolean namesNoCommand(String[] args) {
        int at = firstWord(args);
        if (at == args.length) {
            return true; // only root options that parse: no command, no help, no version
        }
        if (at >= 0 && (NAMES.contains(args[at]) || args[at].equals(HELP))) {
            return false;
        }
        try {
            CommandLine all = new CommandLine(new RootCommand());
            NAMES.forEach(name -> all.addSubcommand(newCommand(name)));
            ParseResult r = all.parseArgs(args);
            return !r.hasSubcommand() && !r.isUsageHelpRequested() && !r.isVersionHelpRequested();
        } catch (ParameterException e) {
            return false;
        }
    }

    /**
     * The command {@code args} name when nothing printed could depend on the other commands: plain
     * root options (each once), then the name of a command other than {@code help} and
     * {@code completion} (which read the whole tree). Null otherwise (help, version, usage errors,
     * unknown words, argument files): those get the whole tree, so their words and exit codes
     * are those of the full command line.
     */
    static String onlyCommand(String[] args) {
        int at = firstWord(args);
        if (at < 0 || at == args.length) {
            return null;
        }
        String name = args[at];
        return NAMES.contains(name) && !name.equals("completion") ? name : null;
    }

    /**
     * The index of the first word after the plain root options ({@code --catalog DIR},
     * {@code --catalog=DIR}, {@code --strict}, {@code --verbose}, {@code --ascii}, each at most
     * once), {@code args.length} when there is none, or -1 when the words need picocli to read
     * them: an argument file ({@code @FILE}), a repeated option, a {@code --catalog} without a
     * plain folder name after it.
     */
    private static int firstWord(String[] args) {
        for (String a : args) {
            if (a.startsWith("@")) {
                return -1;
            }
        }
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            String option = a.startsWith("--catalog=") ? "--catalog" : a;
            switch (option) {
                case "--strict", "--verbose", "--ascii", "--catalog" -> {
                    if (!seen.add(option)) {
                        return -1;
                    }
                }
                default -> {
                    return i;
                }
            }
            if (a.equals("--catalog")) {
                if (i + 1 >= args.length) {
                    return -1;
                }
                String dir = args[++i];
                if (dir.startsWith("-") || NAMES.contains(dir) || dir.equals(HELP)) {
                    return -1;
                }
            }
        }
        return args.length;
    }

    /** In the shell a command's {@code --stage} is optional: the current stage stands in for it. */
    private static void stageOptional(CommandLine sub) {
        CommandSpec spec = sub.getCommandSpec();
        OptionSpec stage = spec.findOption(StageOption.NAME);
        if (stage != null && stage.required()) {
            spec.remove(stage);
            spec.addOption(OptionSpec.builder(stage)
                    .required(false)
                    .description("Stage file (YAML); left out, the current stage.")
                    .build());
        }
    }
}
