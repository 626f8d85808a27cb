package dev.ampsieve.catalog;

import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The parts loaded from a catalog folder and every problem found on the way. Parts from a
 * file with errors are left out (unless loading was strict, which then fails as a whole).
 *
 * @param root    the folder that was read
 * @param files   number of YAML files read
 * @param sources what the parts were read from, when the loader read them: a hex SHA-256 over the
 *                loader's identity (its code and encoding) and each file's relative path and
 *                bytes, so the parts are a function of it (the search index's fingerprint uses it
 *                instead of hashing every part); null for a catalog put together otherwise
 * @param fileKeys each file read, as its parts name it ({@link Part#where()}), to the hex SHA-256 of
 *                the loader's identity and the file's bytes: a file's parts are a function of it
 *                and of which of its ids earlier files took (the index re-indexes only files whose
 *                key or kept ids changed); empty for a catalog put together otherwise
 */
public record Catalog(
        Path root, List<Part> parts, List<Problem> problems, int files, String sources, Map<Path, String> fileKeys) {
    public Catalog {
        parts = List.copyOf(parts);
        problems = List.copyOf(problems);
        fileKeys = fileKeys == null ? Map.of() : Map.copyOf(fileKeys);
    }

    /** A catalog put together in memory (tests, benchmarks, a filtered copy): no {@code sources}. */
    public Catalog(Path root, List<Part> parts, List<Problem> problems, int files) {
        this(root, parts, problems, files, null, Map.of());
    }

    public Optional<Part> find(String id) {
        return parts.stream().filter(p -> p.id().equals(id)).findFirst();
    }

    public boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }
}
