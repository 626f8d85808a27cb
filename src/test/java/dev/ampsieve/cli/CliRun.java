package dev.ampsieve.cli;

import dev.ampsieve.commands.Commands;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

/** One in-process run of the command tree, its exit code and both streams. */
record CliRun(int code, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Commands.run(args, new PrintWriter(out), new PrintWriter(err));
        return new CliRun(code, out.toString(), err.toString());
    }

    List<String> outLines() {
        return out.lines().toList();
    }

    @Override
    public String toString() {
        return "exit " + code + "\n--- out\n" + out + "--- err\n" + err;
    }
}
