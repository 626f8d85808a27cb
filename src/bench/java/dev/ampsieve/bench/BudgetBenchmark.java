package dev.ampsieve.bench;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;

/**
 * {@link BudgetCalculator#compute} for every demo part (about 50) in one demo stage per
 * parameter value: the engine work of {@code ampsieve rank} without ranking or printing.
 * The score is the time for the whole catalog; divide by the part count for one budget.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class BudgetBenchmark {

    /** Keep in step with demo-catalog/stages/ (checked in setup). */
    @Param({"adc-driver", "bridge-amp", "thermocouple"})
    public String stageName;

    private Stage stage;
    private List<Part> parts;

    @Setup
    public void setUp() {
        if (!BenchData.stageNames().contains(stageName)) {
            throw new IllegalStateException("no demo stage " + stageName + " in " + BenchData.stageNames());
        }
        stage = BenchData.stage(stageName);
        parts = BenchData.demoCatalog().parts();
    }

    @Benchmark
    public void everyDemoPart(Blackhole bh) {
        for (Part p : parts) {
            Budget b = BudgetCalculator.compute(stage, p);
            bh.consume(b);
        }
    }
}
