package dev.ampsieve.cli;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.commands.VisibleWriter;
import dev.ampsieve.shell.Shell;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import java.util.List;

/**
 * Entry point, and the one place that chooses the front end: with a terminal and no command
 * (only options such as {@code --catalog DIR}) the interactive shell; else the command line,
 * which runs one command of the shared tree and exits with its code.
 */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        if (System.console() != null && Commands.namesNoCommand(args)) {
            System.exit(Shell.start(new RootCommand(), List.of(args)));
        }
        // the default charset is what the terminal was set up with; VisibleWriter is the last guard
        PrintWriter out =
                new PrintWriter(VisibleWriter.over(new OutputStreamWriter(System.out, Charset.defaultCharset())), true);
        PrintWriter err =
                new PrintWriter(VisibleWriter.over(new OutputStreamWriter(System.err, Charset.defaultCharset())), true);
        System.exit(Commands.run(args, out, err));
    }
}
