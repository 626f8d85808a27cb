package dev.ampsieve.bench;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Reading and validating the demo catalog (every YAML file below demo-catalog/) and one stage
 * file: the first step of every command, and what the shell repeats after a catalog edit.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class LoadBenchmark {

    private Path catalog;
    private Path stage;

    @Setup
    public void setUp() {
        catalog = BenchData.demoCatalogDir();
        stage = BenchData.stageFile(BenchData.BRIDGE);
        BenchData.demoCatalog(); // fails here, not in the measurement, when the catalog has errors
    }

    @Benchmark
    public Catalog demoCatalog() throws InputException {
        return CatalogLoader.load(catalog, false);
    }

    @Benchmark
    public Stage bridgeStage() throws InputException {
        return StageLoader.load(stage);
    }
}
