package dev.ampsieve.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.Charset;

/** Entry point: builds the command tree, runs it, exits with its code. Nothing else. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        // the default charset is what the terminal was set up with; VisibleWriter is the last guard
        PrintWriter out = new PrintWriter(new VisibleWriter(new OutputStreamWriter(System.out, Charset.defaultCharset())), true);
        PrintWriter err = new PrintWriter(new VisibleWriter(new OutputStreamWriter(System.err, Charset.defaultCharset())), true);
        System.exit(Commands.run(args, out, err));
    }
}
