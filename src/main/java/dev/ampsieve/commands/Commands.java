package dev.ampsieve.commands;

import java.io.PrintWriter;
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
        return build(root, out, err, false);
    }

    /** @param withHelp add the {@code help} command (the command line has it; the shell brings its own) */
    static CommandLine build(RootCommand root, PrintWriter out, PrintWriter err, boolean withHelp) {
        CommandLine cl = new CommandLine(root);
        if (withHelp) {
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
        FindCommand.configure(cl.getSubcommands().get("find"));
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
        int code = build(new RootCommand(), out, err, true).execute(args);
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
        try {
            ParseResult r = new CommandLine(new RootCommand()).parseArgs(args);
            return !r.hasSubcommand() && !r.isUsageHelpRequested() && !r.isVersionHelpRequested();
        } catch (ParameterException e) {
            return false;
        }
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
