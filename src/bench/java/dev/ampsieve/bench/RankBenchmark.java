package dev.ampsieve.bench;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.commands.Commands;
import dev.ampsieve.report.RankReport;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The ranking of the demo catalog for the bridge stage, as {@code ampsieve rank} does it:
 * {@link #rank} is the domain work (every budget, verdicts, order, Pareto front, advice);
 * {@link #rankCommand} is the whole command in-process (load catalog and stage, rank,
 * render the text report), i.e. everything but the JVM start. {@link #rankNothingFits} is the
 * same stage with the limit tightened to {@value #TIGHT_LIMIT} so that no part fits: the advice
 * then re-runs the budget (Monte Carlo included) in bisections for the changes that would help.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class RankBenchmark {

    /** The bridge stage's limit, and the one that leaves nothing fitting (checked in setup). */
    static final String LIMIT_LINE = "limit: \"6 mV\"";

    static final String TIGHT_LIMIT = "1 mV";

    private Stage stage;
    private Stage tight;
    private Ranking ranked;
    private List<Part> parts;
    private String[] args;

    @Setup
    public void setUp() {
        stage = BenchData.stage(BenchData.BRIDGE);
        tight = tightened();
        parts = BenchData.demoCatalog().parts();
        ranked = rank();
        args = new String[] {
            "--catalog",
            BenchData.demoCatalogDir().toString(),
            "rank",
            "--stage",
            BenchData.stageFile(BenchData.BRIDGE).toString()
        };
        // the command must succeed, or we would time an error message
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Commands.run(args, new PrintWriter(out), new PrintWriter(err));
        String first = rank().candidates().get(0).id();
        if (code != 0 || !out.toString().contains(first)) {
            throw new IllegalStateException("rank failed (" + code + "): " + err + out);
        }
    }

    private static Stage tightened() {
        Path file = BenchData.stageFile(BenchData.BRIDGE);
        try {
            String text = Files.readString(file);
            if (!text.contains(LIMIT_LINE)) {
                throw new IllegalStateException(file + " no longer has the line " + LIMIT_LINE);
            }
            Stage s = StageLoader.parse(text.replace(LIMIT_LINE, "limit: \"" + TIGHT_LIMIT + "\""), file);
            if (Ranker.rank(s, BenchData.demoCatalog().parts(), BudgetCalculator::compute).candidates().stream()
                    .anyMatch(Candidate::fits)) {
                throw new IllegalStateException("a part fits the bridge stage at " + TIGHT_LIMIT + ": tighten further");
            }
            return s;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InputException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    @Benchmark
    public Ranking rank() {
        return Ranker.rank(stage, parts, BudgetCalculator::compute);
    }

    @Benchmark
    public String rankAndRenderText() {
        return RankReport.text(Ranker.rank(stage, parts, BudgetCalculator::compute), "bridge-amp.yaml", null, 15);
    }

    /** The text report alone, from a ranking made once. */
    @Benchmark
    public String renderText() {
        return RankReport.text(ranked, "bridge-amp.yaml", null, 15);
    }

    @Benchmark
    public Ranking rankNothingFits() {
        return Ranker.rank(tight, parts, BudgetCalculator::compute);
    }

    @Benchmark
    public String rankCommand() {
        StringWriter out = new StringWriter();
        Commands.run(args, new PrintWriter(out), new PrintWriter(new StringWriter()));
        return out.toString();
    }
}
