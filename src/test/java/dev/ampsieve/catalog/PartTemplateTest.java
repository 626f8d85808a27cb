package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.yaml.Problem;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The template the jar carries: the file in catalog-template, valid, in the key order import writes. */
class PartTemplateTest {

    @Test
    void theJarCarriesTheTemplateAsWritten() throws Exception {
        assertEquals(Files.readString(Path.of("catalog-template/part.yaml")), PartTemplate.text());
    }

    @Test
    void templateKeysAreInTheOrderImportWritesThem() {
        List<String> keys = new ArrayList<>();
        for (String line : PartTemplate.text().split("\n")) {
            java.util.regex.Matcher m =
                    java.util.regex.Pattern.compile("^([a-z][a-z-]*):").matcher(line);
            if (m.find()) {
                keys.add(m.group(1));
            }
        }
        // chopping-frequency and chopping-ripple are shown commented out (chopper and auto-zero parts only),
        // input-crossover too (rail-to-rail inputs only), and measured (a part with a lot measured on the bench)
        List<String> expected = new ArrayList<>(CatalogKeys.PART_KEYS);
        expected.remove(CatalogKeys.MEASURED);
        expected.remove(CatalogKeys.CHOPPING_FREQUENCY);
        expected.remove(CatalogKeys.CHOPPING_RIPPLE);
        expected.remove(CatalogKeys.INPUT_CROSSOVER);
        assertEquals(expected, keys);
        assertTrue(PartTemplate.text().contains("\n# chopping-frequency: "));
        assertTrue(PartTemplate.text().contains("\n# chopping-ripple: "));
        assertTrue(PartTemplate.text().contains("\n# input-crossover:\n#   from-positive-rail: "));
        assertTrue(PartTemplate.text().contains("\n# measured: {file: "));
    }

    @Test
    void theTemplatesInventedValuesLoad() {
        CatalogLoader.PartText r = CatalogLoader.readPart(PartTemplate.text(), Path.of("part.yaml"));
        assertEquals(List.of(), r.problems().stream().map(Problem::toString).toList());
        assertEquals("example-part-01", r.part().id());
    }
}
