package dev.ampsieve.cli;

import java.io.PrintWriter;

/** Entry point: builds the command tree, runs it, exits with its code. Nothing else. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(Commands.run(args, out, err));
    }
}
