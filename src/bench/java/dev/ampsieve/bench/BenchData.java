package dev.ampsieve.bench;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.Stream;

/**
 * Inputs shared by the benchmarks: the demo catalog and stages as the program loads them,
 * and a larger invented catalog made by varying the demo parts.
 *
 * <p>The project folder is the system property {@code ampsieve.home}, else the working
 * directory (bench/run starts JMH from the project folder; JMH forks inherit it).
 */
final class BenchData {
    private BenchData() {}

    /** Stage file names in demo-catalog/stages/, without ".yaml". */
    static final String BRIDGE = "bridge-amp";

    static Path home() {
        Path home = Path.of(System.getProperty("ampsieve.home", System.getProperty("user.dir")));
        if (!Files.isDirectory(home.resolve("demo-catalog"))) {
            throw new IllegalStateException("no demo-catalog/ under " + home.toAbsolutePath()
                    + ": run from the project folder (bench/run does) or set -Dampsieve.home=DIR");
        }
        return home;
    }

    static Path demoCatalogDir() {
        return home().resolve("demo-catalog");
    }

    /** The demo catalog, loaded strictly: a benchmark on a half-loaded catalog would mislead. */
    static Catalog demoCatalog() {
        try {
            return CatalogLoader.load(demoCatalogDir(), true);
        } catch (InputException e) {
            throw new IllegalStateException("demo catalog does not load: " + e.getMessage(), e);
        }
    }

    static Path stageFile(String name) {
        return demoCatalogDir().resolve(CatalogLoader.STAGES_FOLDER).resolve(name + ".yaml");
    }

    static Stage stage(String name) {
        try {
            return StageLoader.load(stageFile(name));
        } catch (InputException e) {
            throw new IllegalStateException("demo stage " + name + " does not load: " + e.getMessage(), e);
        }
    }

    /** Every demo stage, by file name. */
    static List<String> stageNames() {
        try (Stream<Path> s = Files.list(demoCatalogDir().resolve(CatalogLoader.STAGES_FOLDER))) {
            return s.map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".yaml"))
                    .map(n -> n.substring(0, n.length() - ".yaml".length()))
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * {@code n} invented parts, ids {@code bench-00001} ..., made by cycling through the demo
     * parts and scaling their offset, drift, bias, bandwidth and price by seeded factors, so
     * the index sees many distinct values and titles rather than copies. Deterministic.
     */
    static List<Part> scaledParts(List<Part> demo, int n) {
        Random r = new Random(5000);
        List<Part> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            Part p = demo.get(i % demo.size());
            double k = 0.5 + 1.5 * r.nextDouble(); // offset, drift, bias in 0.5x .. 2x
            double g = 0.7 + 0.6 * r.nextDouble(); // bandwidth in 0.7x .. 1.3x
            double c = 0.8 + 0.4 * r.nextDouble(); // price in 0.8x .. 1.2x
            String id = String.format(Locale.ROOT, "bench-%05d", i + 1);
            List<String> tags = new ArrayList<>(p.tags());
            tags.add("series-" + (i % 37));
            out.add(new Part(
                    id,
                    p.title() + " (variant " + (i + 1) + ")",
                    p.architecture(),
                    p.input(),
                    p.factoryTrim(),
                    p.nullPins(),
                    p.channels(),
                    p.packages(),
                    tags,
                    new Price(
                            p.price().unit() * c,
                            p.price().quantity(),
                            p.price().currency()),
                    p.supply(),
                    p.temperature(),
                    scale(p.vos(), k),
                    scale(p.vosDrift(), k),
                    scale(p.ib(), k),
                    scale(p.ios(), k),
                    p.cmrr(),
                    p.psrr(),
                    p.aol(),
                    p.gbw() * g,
                    p.slew() == null ? null : p.slew() * g,
                    p.noise(),
                    p.longTermDrift(),
                    p.inputHeadroom(),
                    p.outputHeadroom(),
                    p.choppingFrequency(),
                    p.quiescentCurrent(),
                    p.inputCapacitance(),
                    p.testConditions(),
                    p.inputCrossover(),
                    p.thetaJa(),
                    p.choppingRipple(),
                    p.measured(),
                    p.source(),
                    p.notes(),
                    p.where()));
        }
        return out;
    }

    private static Spread scale(Spread s, double k) {
        return new Spread(times(s.typ(), k), times(s.max(), k), times(s.maxOverTemp(), k));
    }

    private static Double times(Double v, double k) {
        return v == null ? null : v * k;
    }

    /** A catalog of {@code parts} rooted at {@code root} (an empty folder: nothing on disk to hash). */
    static Catalog catalogOf(Path root, List<Part> parts) {
        return new Catalog(root, parts, List.of(), 0);
    }

    /**
     * A synthetic catalog of {@code parts} parts written by {@code bench/make-catalog} (seed 1,
     * one file per 200 parts) under {@code target/bench/catalogs/}, made once and reused (the
     * generator is deterministic, so a kept catalog is the one it would write).
     */
    static Path syntheticCatalog(int parts) throws IOException, InterruptedException {
        Path dir = home().resolve("target/bench/catalogs/syn-" + parts);
        Path done = home().resolve("target/bench/catalogs/syn-" + parts + ".done");
        if (Files.exists(done)) {
            return dir;
        }
        deleteTree(dir); // half written by an interrupted run
        Files.createDirectories(dir.getParent());
        Process p = new ProcessBuilder(
                        home().resolve("bench/make-catalog").toString(), String.valueOf(parts), dir.toString())
                .inheritIO()
                .start();
        if (p.waitFor() != 0) {
            throw new IllegalStateException("bench/make-catalog failed (python3 is needed)");
        }
        Files.writeString(done, "bench/make-catalog " + parts + "\n");
        return dir;
    }

    static Path tempDir(String prefix) {
        try {
            return Files.createTempDirectory(prefix);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static void deleteTree(Path dir) {
        if (dir == null || !Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
