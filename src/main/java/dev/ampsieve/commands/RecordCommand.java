package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.report.RecordReport;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.AtomicFiles;
import dev.ampsieve.yaml.BoundedFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve record --stage FILE (--html OUT | --md OUT)}: a decision record to attach to a review. */
@Command(
        name = "record",
        header = "Write a decision record (HTML or Markdown) for a stage and a shortlist or a part change.",
        mixinStandardHelpOptions = true,
        description = "A self-contained decision record: the stage and every assumption, the ranking with verdicts and "
                + "the advice, each shortlisted part's full budget term by term, its catalog source and entry hash, the "
                + "date, the tool version and the caution. HTML has charts and prints with each part on its own page; "
                + "Markdown has the same content in tables. Both embed what 'ampsieve recheck' needs to re-run it.",
        footer = {
            "",
            "Examples:",
            "  ampsieve record --stage demo-catalog/stages/bridge-amp.yaml --html bridge-record.html",
            "  ampsieve record --stage my-stage.yaml --parts prec-bip-02,zd-chop-04 --md choice.md",
            "  ampsieve record --stage my-stage.yaml --change prec-bip-02 zd-chop-04 --html change.html"
        })
public final class RecordCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    StageOption stageOption;

    @Option(
            names = "--parts",
            paramLabel = "PART",
            split = ",",
            description = "The parts to record (default: the ranking's first " + DecisionRecord.DEFAULT_SHORTLIST
                    + " parts that fit, or the closest when none fits).")
    List<String> parts;

    @Option(
            names = "--change",
            arity = "2",
            paramLabel = "PART",
            description = "Record a change from the first part to the second.")
    List<String> change;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Output output;

    static final class Output {
        @Option(names = "--html", paramLabel = "OUT", required = true, description = "Write an HTML record.")
        Path html;

        @Option(names = "--md", paramLabel = "OUT", required = true, description = "Write a Markdown record.")
        Path md;
    }

    @Option(names = "--force", description = "Replace OUT even when it is not a previous record.")
    boolean force;

    @Override
    public Integer call() throws Exception {
        if (parts != null && change != null) {
            throw new Refusal("--parts and --change cannot be used together; give one of them", ExitCode.USAGE);
        }
        Path out = output.html != null ? output.html : output.md;
        boolean replace = mayReplace(out, force);
        Catalog catalog = root.catalog();
        List<Part> chosen = null;
        List<String> ids = change != null ? change : parts;
        if (ids != null) {
            chosen = new ArrayList<>();
            for (String id : ids) {
                chosen.add(Parts.find(catalog, id.strip()));
            }
        }
        Stage stage = stageOption.load();
        String date = Instant.now().truncatedTo(ChronoUnit.SECONDS).toString();
        String version = new RootCommand.Version().getVersion()[0].replaceFirst("^ampsieve ", "");
        DecisionRecord d = DecisionRecord.build(
                stage,
                stageOption.label(),
                root.catalogDir().toString(),
                Parts.withLots(catalog.parts()),
                chosen,
                change != null,
                date,
                version);
        String text = output.html != null ? RecordReport.html(d) : RecordReport.markdown(d);
        AtomicFiles.write(out, text, replace, "choose another name, or add --force to replace it");
        spec.commandLine()
                .getOut()
                .println("wrote " + Visible.of(out.toString()) + " ("
                        + d.shortlist().size() + " part(s); 'ampsieve recheck " + Visible.of(out.toString())
                        + "' re-checks it)");
        return ExitCode.OK.code();
    }

    /**
     * Whether {@code out} may be replaced: absent, a previous record of ours (its record block),
     * or {@code force}. Anything else is refused before any work is done.
     */
    static boolean mayReplace(Path out, boolean force) throws InputException, java.io.IOException {
        if (!Files.exists(out, LinkOption.NOFOLLOW_LINKS)) {
            return false;
        }
        if (force || !Files.isRegularFile(out, LinkOption.NOFOLLOW_LINKS)) {
            return true; // AtomicFiles refuses a link, folder or device whatever force says
        }
        boolean small = Files.size(out) <= MAX_RECORD_BYTES;
        if (!small
                || !RecordReport.isRecord(
                        new String(BoundedFiles.read(out, MAX_RECORD_BYTES, "record"), StandardCharsets.UTF_8))) {
            throw new InputException(Problem.error(
                    Located.nowhere(out),
                    "",
                    "exists and is not an ampsieve decision record;" + " left as it was",
                    "choose another name, or add --force to replace it"));
        }
        return true;
    }

    /** A record is a few hundred kB at most; a larger file is surely not one. */
    static final long MAX_RECORD_BYTES = 16L << 20;
}
