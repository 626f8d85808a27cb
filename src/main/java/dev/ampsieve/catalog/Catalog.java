package dev.ampsieve.catalog;

import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The parts loaded from a catalog folder and every problem found on the way. Parts from a
 * file with errors are left out (unless loading was strict, which then fails as a whole).
 *
 * @param root  the folder that was read
 * @param files number of YAML files read
 */
public record Catalog(Path root, List<Part> parts, List<Problem> problems, int files) {
    public Catalog {
        parts = List.copyOf(parts);
        problems = List.copyOf(problems);
    }

    public Optional<Part> find(String id) {
        return parts.stream().filter(p -> p.id().equals(id)).findFirst();
    }

    public boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }
}
