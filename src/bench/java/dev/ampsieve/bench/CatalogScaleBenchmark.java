package dev.ampsieve.bench;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.search.Hit;
import dev.ampsieve.search.ParsedCache;
import dev.ampsieve.search.PartIndex;
import dev.ampsieve.search.PartQuery;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
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
 * How the catalog side grows with the catalog: a synthetic catalog of {@link #parts} parts written
 * by {@code bench/make-catalog} (seed 1, 200 parts a file; kept in {@code target/bench/catalogs/}
 * and reused), at 1k, 10k and 100k parts.
 *
 * <ul>
 *   <li>{@link #loadParse}: every file read and parsed (no cache): a first command, or any
 *       command before the cache;</li>
 *   <li>{@link #loadCached}: every file read and hashed, its parts taken from the parsed-catalog
 *       cache: every later command;</li>
 *   <li>{@link #indexBuild}: the Lucene index built from nothing (single shot, a fresh folder each
 *       time);</li>
 *   <li>{@link #findSteadyState}: what {@code find} does in the shell once the catalog is loaded
 *       and its index open: one query and its parts looked up by id.</li>
 * </ul>
 *
 * <p>Run: {@code bench/run CatalogScale -p parts=1000,10000}; the 100k row is single shots:
 * {@code bench/run 'CatalogScaleBenchmark.(loadCached|indexBuild|findSteadyState)' -p parts=100000 -wi 1 -i 3}.
 */
@State(Scope.Benchmark)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CatalogScaleBenchmark {

    @Param({"1000", "10000", "100000"})
    public int parts;

    /** A selective query, as typed at the prompt: a dozen matches per 10,000 parts. */
    @Param("zero-drift vos<2uV gbw>5MHz")
    public String query;

    private Path dir;
    private ParsedCache cache;
    private Catalog catalog;
    private PartIndex open;
    private Path openFolder;
    private Path coldFolder;
    private PartQuery parsed;
    private Map<String, Part> byId;

    @Setup(Level.Trial)
    public void setUp() throws IOException, InputException, InterruptedException {
        dir = BenchData.syntheticCatalog(parts);
        cache = ParsedCache.forCatalog(dir);
        check(cache != null, "no folder for the parsed-catalog cache beside " + dir);
        catalog = CatalogLoader.load(dir, false, cache); // fills the cache
        check(catalog.parts().size() == parts, "loaded " + catalog.parts().size() + " parts");
        openFolder = BenchData.tempDir("ampsieve-bench-open");
        open = PartIndex.open(catalog, openFolder);
        parsed = QueryLanguage.parse(query);
        byId = new HashMap<>();
        catalog.parts().forEach(p -> byId.put(p.id(), p));
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
        BenchData.deleteTree(openFolder);
    }

    private static void check(boolean ok, String what) {
        if (!ok) {
            throw new IllegalStateException(what);
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    public Catalog loadParse() throws InputException {
        return CatalogLoader.load(dir, false);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    public Catalog loadCached() throws InputException {
        return CatalogLoader.load(dir, false, cache);
    }

    /** One build per iteration (SingleShotTime): a second call would find the index current. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    public int indexBuild() throws IOException {
        try (PartIndex index = PartIndex.open(catalog, coldFolder)) {
            check(index.source() == PartIndex.Source.BUILT, "cold build: " + index.source());
            return index.size();
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    public List<Part> findSteadyState() throws InputException {
        List<Hit> hits = open.search(QueryLanguage.parse(query));
        return hits.stream().map(h -> byId.get(h.id())).toList();
    }
}
