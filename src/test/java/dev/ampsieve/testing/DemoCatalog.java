package dev.ampsieve.testing;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

/** A copy of the shipped demo catalog, so its search index lands in a temporary folder. */
public final class DemoCatalog {
    private DemoCatalog() {}

    public static Path copyTo(Path dir) throws IOException {
        Path to = dir.resolve("demo");
        Path from = Path.of("demo-catalog");
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p :
                    s.filter(p -> !p.toString().contains(".ampsieve-index")).toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t);
                }
            }
        }
        return to;
    }
}
