package dev.ampsieve.bench;

import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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

/**
 * How the ranking's compute cost grows with the catalog: {@code rank}'s domain work (every budget
 * on every core, Monte Carlo where a yield criterion needs it, order, Pareto front, advice) for the
 * bridge stage (yield 99.9 %) over 1,000, 10,000 and 100,000 synthetic parts, the catalog already
 * loaded. The catalogs are written once by {@code bench/make-catalog N DIR} (seed 1) under
 * {@code target/bench/catalogs/N}; the script's path can be given as {@code -Dampsieve.makeCatalog}.
 * Single shot: one ranking of 100,000 parts takes tens of seconds.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class RankGrowthBenchmark {

    @Param({"1000", "10000", "100000"})
    public int parts;

    private Stage stage;
    private List<Part> catalog;

    @Setup
    public void setUp() throws IOException, InterruptedException, InputException {
        stage = BenchData.stage(BenchData.BRIDGE);
        Path dir = BenchData.home().resolve("target/bench/catalogs/" + parts);
        if (!Files.isDirectory(dir)) {
            String script = System.getProperty(
                    "ampsieve.makeCatalog",
                    BenchData.home().resolve("bench/make-catalog").toString());
            Process p = new ProcessBuilder(script, String.valueOf(parts), dir.toString())
                    .inheritIO()
                    .start();
            if (p.waitFor() != 0) {
                throw new IllegalStateException(script + " failed for " + parts + " parts");
            }
        }
        Catalog c = CatalogLoader.load(dir, true);
        if (c.parts().size() != parts) {
            throw new IllegalStateException(dir + " holds " + c.parts().size() + " parts, not " + parts);
        }
        catalog = c.parts();
    }

    @Benchmark
    public Ranking rank() {
        return Ranker.rank(stage, catalog, BudgetCalculator::screen);
    }
}
