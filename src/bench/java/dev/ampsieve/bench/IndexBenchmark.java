package dev.ampsieve.bench;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.search.CatalogFingerprint;
import dev.ampsieve.search.Hit;
import dev.ampsieve.search.PartIndex;
import dev.ampsieve.search.PartQuery;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * The Lucene index of a catalog scaled up to {@link #parts} invented parts (demo parts varied,
 * ids bench-00001 ...). {@link #coldBuild}: a first {@code find} on a new catalog (no index on
 * disk), timed once per iteration on a fresh folder. {@link #warmOpenAndQuery}: a later
 * {@code find} (index current on disk: fingerprint check, open with checksum verification,
 * one query, close). {@link #fingerprint}: the staleness check alone (part of every open).
 * {@link #queryOpenIndex}: the query alone on an index kept open.
 */
@State(Scope.Benchmark)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class IndexBenchmark {

    @Param("5000")
    public int parts;

    /** A typical query: words plus numeric and interval constraints. */
    @Param("precision vos<200uV supply>=5V input:cmos")
    public String query;

    private Path root;
    private Path warmFolder;
    private Path coldFolder;
    private Catalog catalog;
    private PartQuery parsed;
    private PartIndex open;

    @Setup(Level.Trial)
    public void setUp() throws InputException, IOException {
        root = BenchData.tempDir("ampsieve-bench-catalog");
        catalog = BenchData.catalogOf(
                root, BenchData.scaledParts(BenchData.demoCatalog().parts(), parts));
        parsed = QueryLanguage.parse(query);
        warmFolder = BenchData.tempDir("ampsieve-bench-warm");
        try (PartIndex built = PartIndex.open(catalog, warmFolder)) {
            check(built.source() == PartIndex.Source.BUILT && built.size() == parts, "warm build: " + built.source());
        }
        open = PartIndex.open(catalog, warmFolder);
        check(open.source() == PartIndex.Source.REUSED, "warm open: " + open.source());
        check(!open.search(parsed).isEmpty(), "the query matches nothing: " + query);
    }

    @Setup(Level.Iteration)
    public void freshColdFolder() {
        coldFolder = BenchData.tempDir("ampsieve-bench-cold");
    }

    @TearDown(Level.Iteration)
    public void dropColdFolder() {
        BenchData.deleteTree(coldFolder);
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        open.close();
        BenchData.deleteTree(warmFolder);
        BenchData.deleteTree(root);
    }

    private static void check(boolean ok, String what) {
        if (!ok) {
            throw new IllegalStateException(what);
        }
    }

    /** One build per iteration (SingleShotTime): a second call would find the index current. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    public int coldBuild() throws IOException {
        try (PartIndex index = PartIndex.open(catalog, coldFolder)) {
            check(index.source() == PartIndex.Source.BUILT, "cold build: " + index.source());
            return index.size();
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    public List<Hit> warmOpenAndQuery() throws IOException {
        try (PartIndex index = PartIndex.open(catalog, warmFolder)) {
            return index.search(parsed);
        }
    }

    /** The staleness check alone, part of every open (hashes the catalog files and parts). */
    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    public String fingerprint() {
        return CatalogFingerprint.of(catalog);
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    public List<Hit> queryOpenIndex() {
        return open.search(parsed);
    }
}
