package dev.ampsieve.commands;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.UserError;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.text.Visible;
import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * The one handler both front ends use: a {@link UserError} is printed as its lines (each with
 * its place) and exits with its own code; a usage error that picocli finds is a user error too;
 * anything else is an internal error, one line, with the stack trace only under {@code --verbose}.
 * The front ends differ only in their {@link Voice}.
 */
public final class Failures {
    private Failures() {}

    /**
     * How a front end words the handler's lines.
     *
     * @param prefix      in front of a one-line message ("ampsieve: " on the command line; the shell's own lines go without)
     * @param verboseHint how to see a stack trace
     * @param shell       true for the shell: usage errors name the shell's own help
     */
    public record Voice(String prefix, String verboseHint, boolean shell) {
        public static final Voice COMMAND_LINE =
                new Voice("ampsieve: ", "run again with --verbose for the details", false);
        public static final Voice SHELL = new Voice("", "add --verbose to the command for the details", true);
    }

    /** Prints {@code ex} on {@code err} and returns the exit code it stands for. */
    public static ExitCode report(Throwable ex, PrintWriter err, boolean verbose, Voice voice) {
        if (ex instanceof UserError ue) {
            print(ue, err, voice);
            return ue.exitCode();
        }
        err.println(
                voice.prefix() + "internal error: " + oneLine(ex) + (verbose ? "" : " (" + voice.verboseHint() + ")"));
        if (verbose) {
            ex.printStackTrace(err);
        }
        err.flush();
        return ExitCode.INTERNAL;
    }

    /**
     * A user error's lines, worded by {@link ProblemText} (which words the problems loaders report as
     * facts): findings carry their place in front; a refusal gets the front end's prefix.
     */
    static void print(UserError ue, PrintWriter err, Voice voice) {
        boolean located = ue instanceof dev.ampsieve.failure.DataError;
        for (String line : ProblemText.lines(ue)) {
            err.println(located ? line : voice.prefix() + line);
        }
        err.flush();
    }

    /** The class and the first line of the message, made visible. */
    static String oneLine(Throwable ex) {
        String s = String.valueOf(ex);
        int nl = s.indexOf('\n');
        return Visible.of(nl < 0 ? s : s.substring(0, nl) + " ...");
    }

    /**
     * A usage error picocli found while reading the words: printed in the front end's voice,
     * exit code {@link ExitCode#USAGE}. The command line keeps picocli's own report (message,
     * suggestions, the command's usage) for options and names an unknown word in one line; the
     * shell says it in one line with the help to type.
     */
    public static int usage(
            ParameterException ex, String[] args, Voice voice, CommandLine.IParameterExceptionHandler picocliDefault)
            throws Exception {
        PrintWriter err = ex.getCommandLine().getErr();
        if (voice.shell()) {
            CommandLine at = ex.getCommandLine();
            String cmd = at.getParent() == null ? "" : at.getCommandName();
            StringBuilder sb =
                    new StringBuilder(cmd.isEmpty() ? "" : cmd + ": ").append(Visible.lines(ex.getMessage()));
            if (ex instanceof UnmatchedArgumentException u
                    && !u.getSuggestions().isEmpty()) {
                sb.append("; did you mean ")
                        .append(String.join(" or ", u.getSuggestions()))
                        .append('?');
            }
            sb.append(cmd.isEmpty() ? " ('help' lists the commands)" : " ('help " + cmd + "' shows its options)");
            err.println(sb);
            err.flush();
            return ExitCode.USAGE.code();
        }
        String unknown = unknownWord(ex);
        if (unknown != null) {
            err.println(unknown);
            err.flush();
            return ExitCode.USAGE.code();
        }
        return picocliDefault.handleParseException(visible(ex), args);
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
            String near =
                    dev.ampsieve.yaml.Fields.closest(word, at.getSubcommands().keySet());
            return "ampsieve: unknown command " + shown + (near != null ? "; did you mean '" + near + "'?" : "")
                    + " ('ampsieve --help' lists the commands)";
        }
        String name = at.getCommandName();
        return "ampsieve " + name + ": unexpected word " + shown + " ('ampsieve " + name
                + " --help' shows what it takes)";
    }
}
