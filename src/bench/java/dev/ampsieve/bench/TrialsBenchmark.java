package dev.ampsieve.bench;

import dev.ampsieve.budget.YieldProbe;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
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
 * How the Monte Carlo's cost grows with the number of simulated units: one part of the bridge
 * stage (the part {@link YieldBenchmark#allTrials} uses, which neither bound decides) run for
 * 2,000, 20,000 and 200,000 units without early stop. Linear growth is expected: the units are
 * drawn and counted in fixed blocks of 1000 with no per-unit allocation.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class TrialsBenchmark {

    @Param({"2000", "20000", "200000"})
    public int trials;

    private YieldProbe probe;

    @Setup
    public void setUp() {
        Stage bridge = BenchData.stage(BenchData.BRIDGE);
        Stage stage = bridge.toBuilder().trials(trials).build();
        Part part = BenchData.demoCatalog()
                .find("prec-bip-03")
                .orElseThrow(() -> new IllegalStateException("no demo part prec-bip-03"));
        probe = YieldProbe.untrimmed(stage, part);
        YieldResult r = probe.run(Double.NaN);
        if (!r.decided().equals("sampled") || r.trials() != trials) {
            throw new IllegalStateException("expected " + trials + " sampled units, got " + r);
        }
    }

    @Benchmark
    public YieldResult units() {
        return probe.run(Double.NaN);
    }
}
