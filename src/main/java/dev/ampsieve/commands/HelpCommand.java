package dev.ampsieve.commands;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.report.ReferencePages;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Fields;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ampsieve help [TOPIC|COMMAND]}: the reference pages, or one command's help. */
@Command(
        name = "help",
        header = "Reference pages (query, stage-keys, catalog-keys, units) and command help.",
        mixinStandardHelpOptions = true,
        description = "Without a word: the commands and the reference topics. With a topic: its page, generated from "
                + "the same tables the program reads, so it is always current. With a command name: that command's "
                + "help, as COMMAND --help prints it.",
        footer = {
            "",
            "Examples:",
            "  ampsieve help query          every query field with its meaning",
            "  ampsieve help stage-keys     every stage key, its default and an example",
            "  ampsieve help rank           the same as 'ampsieve rank --help'"
        })
public final class HelpCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(
            arity = "0..1",
            paramLabel = "TOPIC",
            description = "query, stage-keys, catalog-keys, units, or a command name.")
    String topic;

    @Override
    public Integer call() throws Refusal {
        CommandLine root = spec.root().commandLine();
        PrintWriter out = spec.commandLine().getOut();
        if (topic == null) {
            root.usage(out);
            out.println();
            out.println("Reference topics (ampsieve help TOPIC):");
            for (String t : ReferencePages.TOPICS) {
                out.println("  " + String.format(Locale.ROOT, "%-14s", t) + ReferencePages.summary(t));
            }
            return ExitCode.OK.code();
        }
        String t = topic.strip().toLowerCase(Locale.ROOT);
        if (ReferencePages.TOPICS.contains(t)) {
            out.print(ReferencePages.page(t, OutputStyle.TEXT_WIDTH)); // as every text report on the command line
            return ExitCode.OK.code();
        }
        CommandLine sub = root.getSubcommands().get(t);
        if (sub != null) {
            sub.usage(out);
            return ExitCode.OK.code();
        }
        List<String> known = new ArrayList<>(ReferencePages.TOPICS);
        known.addAll(root.getSubcommands().keySet());
        String near = Fields.closest(t, known);
        throw new Refusal(
                "no help topic or command '" + Visible.of(topic) + "'; "
                        + (near != null
                                ? "did you mean '" + near + "'?"
                                : "topics: " + String.join(", ", ReferencePages.TOPICS)),
                ExitCode.USAGE);
    }
}
