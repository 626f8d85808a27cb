package dev.ampsieve.cli;

import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * Builds the one command tree both front ends use (the command line and the shell feed it the
 * same words) and maps failures to one-line messages and named exit codes.
 */
public final class Commands {
    private Commands() {
    }

    /** A fresh tree whose commands print to {@code out} and {@code err}. */
    public static CommandLine build(PrintWriter out, PrintWriter err) {
        return build(new RootCommand(), out, err);
    }

    public static CommandLine build(RootCommand root, PrintWriter out, PrintWriter err) {
        return build(root, out, err, false);
    }

    /** @param withHelp add the {@code help} command (the command line has it; the shell brings its own) */
    static CommandLine build(RootCommand root, PrintWriter out, PrintWriter err, boolean withHelp) {
        CommandLine cl = new CommandLine(root);
        if (withHelp) {
            cl.addSubcommand(new HelpCommand());
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
        cl.setExecutionExceptionHandler((ex, line, parseResult) -> handle(ex, line, root.verbose()));
        IParameterExceptionHandler picocliDefault = cl.getParameterExceptionHandler();
        cl.setParameterExceptionHandler((ex, args) -> {
            String unknown = unknownWord(ex);
            if (unknown != null) {
                ex.getCommandLine().getErr().println(unknown);
                ex.getCommandLine().getErr().flush();
                return ExitCode.USAGE;
            }
            return picocliDefault.handleParseException(visible(ex), args);
        });
        return cl;
    }

    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        // the command line's help with reference topics; the shell adds its own 'help' instead
        int code = build(new RootCommand(), out, err, true).execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /**
     * The usage error with what the user typed made {@link Visible}; an unknown word stays an
     * {@link UnmatchedArgumentException} so picocli still suggests the nearest option.
     */
    static ParameterException visible(ParameterException ex) {
        if (ex instanceof UnmatchedArgumentException u) {
            List<String> shown = u.getUnmatched().stream().map(Visible::of).toList();
            UnmatchedArgumentException copy = new UnmatchedArgumentException(u.getCommandLine(), shown);
            copy.initCause(ex);
            return copy;
        }
        return new ParameterException(ex.getCommandLine(), Visible.lines(ex.getMessage()), ex);
    }

    /**
     * "unknown command X; did you mean Y" for a word no command takes, in place of picocli's
     * "Unmatched argument at index"; null for other usage errors (options keep picocli's suggestions).
     */
    static String unknownWord(ParameterException ex) {
        if (!(ex instanceof UnmatchedArgumentException u) || u.getUnmatched().isEmpty()) {
            return null;
        }
        String word = u.getUnmatched().get(0);
        if (word.startsWith("-")) {
            return null;
        }
        CommandLine at = u.getCommandLine();
        String shown = "'" + Visible.of(word) + "'";
        if (at.getParent() == null) {
            String near = dev.ampsieve.yaml.Fields.closest(word, at.getSubcommands().keySet());
            return "ampsieve: unknown command " + shown + (near != null ? "; did you mean '" + near + "'?" : "")
                    + " ('ampsieve --help' lists the commands)";
        }
        String name = at.getCommandName();
        return "ampsieve " + name + ": unexpected word " + shown + " ('ampsieve " + name + " --help' shows what it takes)";
    }

    /** One line per problem, never a stack trace for something the user typed. */
    static int handle(Exception ex, CommandLine line, boolean verbose) {
        PrintWriter err = line.getErr();
        if (ex instanceof InputException ie) {
            for (Problem p : ie.problems()) {
                err.println(p);
            }
            err.flush();
            return ExitCode.FINDINGS;
        }
        if (ex instanceof UserException ue) {
            // messages quote ids, queries and paths the user typed
            err.println("ampsieve: " + Visible.lines(ue.getMessage()));
            err.flush();
            return ue.exitCode();
        }
        err.println("ampsieve: internal error: " + Visible.lines(String.valueOf(ex)));
        if (verbose) {
            ex.printStackTrace(err);
        } else {
            err.println("(run again with --verbose for the details)");
        }
        err.flush();
        return ExitCode.INTERNAL;
    }
}
