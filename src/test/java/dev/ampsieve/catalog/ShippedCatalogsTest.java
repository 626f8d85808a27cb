package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.yaml.Problem;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The catalogs the repository ships must load without errors: users start from them. */
class ShippedCatalogsTest {

    private static List<String> errors(Catalog c) {
        return c.problems().stream()
                .filter(Problem::isError)
                .map(Problem::toString)
                .toList();
    }

    @Test
    void theDemoCatalogLoadsWithoutErrors() throws Exception {
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), true);
        assertEquals(List.of(), errors(c));
        assertTrue(
                c.parts().size() >= 40,
                "issue 2 asks for at least 40 parts, found " + c.parts().size());
        // the scenario spans every architecture and input type (issue 2, point 8)
        assertEquals(
                EnumSet.allOf(Architecture.class),
                c.parts().stream()
                        .map(Part::architecture)
                        .collect(Collectors.toCollection(() -> EnumSet.noneOf(Architecture.class))));
        assertEquals(
                EnumSet.allOf(InputType.class),
                c.parts().stream()
                        .map(Part::input)
                        .collect(Collectors.toCollection(() -> EnumSet.noneOf(InputType.class))));
        Set<FactoryTrim> trims = c.parts().stream().map(Part::factoryTrim).collect(Collectors.toSet());
        assertTrue(trims.containsAll(Set.of(FactoryTrim.LASER, FactoryTrim.FUSE)), trims.toString());
        assertTrue(c.parts().stream().anyMatch(Part::nullPins), "some cheap bipolar parts have null pins");
    }

    @Test
    void theTemplateIsAValidPart(@TempDir Path dir) throws Exception {
        Files.copy(Path.of("catalog-template/part.yaml"), dir.resolve("part.yaml"));
        Catalog c = CatalogLoader.load(dir, true);
        assertEquals(List.of(), errors(c));
        assertEquals(
                List.of("example-part-01"), c.parts().stream().map(Part::id).toList());
    }
}
