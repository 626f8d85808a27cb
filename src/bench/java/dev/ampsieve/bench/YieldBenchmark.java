package dev.ampsieve.bench;

import dev.ampsieve.budget.YieldProbe;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Monte Carlo yield of one part in the bridge stage (20,000 trials, yield 99.9 % criterion):
 * {@link #allTrials} runs every trial (what a worst-case or RSS stage reports beside its
 * verdict), {@link #earlyStop} lets the Wilson interval stop it as the yield criterion does.
 * The parts are chosen so that neither bound decides the answer: sampling really runs.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class YieldBenchmark {

    /** A precision bipolar part near the limit (yield about 97 %): every trial runs. */
    @Param("prec-bip-03")
    public String fullPart;

    /** A part that clearly meets 99.9 %: the interim interval clears the target before the last trial. */
    @Param("prec-bip-01")
    public String earlyPart;

    private YieldProbe full;
    private YieldProbe early;
    private double target;

    @Setup
    public void setUp() {
        Catalog c = BenchData.demoCatalog();
        Stage stage = BenchData.stage(BenchData.BRIDGE);
        if (stage.criterion().kind() != Criterion.Kind.YIELD) {
            throw new IllegalStateException(BenchData.BRIDGE + " no longer has a yield criterion");
        }
        target = stage.criterion().yieldTarget();
        full = YieldProbe.untrimmed(stage, part(c, fullPart));
        early = YieldProbe.untrimmed(stage, part(c, earlyPart));
        // refuse to measure a case the bounds decide without sampling, or one that runs the wrong length
        YieldResult f = full.run(Double.NaN);
        YieldResult e = early.run(target);
        if (!f.decided().equals("sampled") || f.trials() != stage.trials() || stage.trials() != 20_000) {
            throw new IllegalStateException(fullPart + ": expected 20000 sampled trials, got " + f);
        }
        if (!e.decided().equals("sampled") || e.trials() >= stage.trials()) {
            throw new IllegalStateException(earlyPart + ": expected an early stop, got " + e);
        }
    }

    private static Part part(Catalog c, String id) {
        return c.find(id).orElseThrow(() -> new IllegalStateException("no demo part " + id));
    }

    @Benchmark
    public YieldResult allTrials() {
        return full.run(Double.NaN);
    }

    @Benchmark
    public YieldResult earlyStop() {
        return early.run(target);
    }
}
