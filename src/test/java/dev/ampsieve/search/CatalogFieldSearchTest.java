package dev.ampsieve.search;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.FactoryTrim;
import dev.ampsieve.catalog.Part;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every catalog field can be searched by its catalog name: booleans, the trim, text fields and
 * the section values that have no short name. Three invented parts; each expected set worked
 * out by hand from the values below.
 */
class CatalogFieldSearchTest {

    private static PartIndex index;

    @BeforeAll
    static void build() {
        List<Part> parts = List.of(
                part("QA-1")
                        .factoryTrim(FactoryTrim.LASER)
                        .nullPins(true)
                        .notes("settles in 2 us")
                        .source("sheet rev B")
                        .inputHeadroom(0.1, 1.5)
                        .outputHeadroom(0.05, 0.05)
                        .aging(5e-6, 1000 * 3600.0)
                        .build(),
                part("QA-2")
                        .factoryTrim(FactoryTrim.FUSE)
                        .notes("low power")
                        .source("sheet rev C")
                        .inputHeadroom(-0.1, -0.1)
                        .inputCapacitance(18e-12)
                        .build(),
                part("QA-3").inputHeadroom(0.5, 0.5).inputCapacitance(6e-12).build());
        index = PartIndex.inMemory(new Catalog(Path.of("no-such-folder"), parts, List.of(), 1));
    }

    @AfterAll
    static void close() throws Exception {
        index.close();
    }

    private static Set<String> ids(String query) throws Exception {
        return new TreeSet<>(
                index.search(QueryLanguage.parse(query)).stream().map(Hit::id).toList());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            value = {
                "null-pins:true                      | QA-1",
                "null-pins:false                     | QA-2 QA-3",
                "-null-pins:true                     | QA-2 QA-3",
                "factory-trim:laser                  | QA-1",
                "factory-trim:fuse                   | QA-2",
                "trim:none                           | QA-3",
                "notes:settles                       | QA-1",
                "-notes:power                        | QA-1 QA-3",
                "source:rev                          | QA-1 QA-2",
                "source:c                            | QA-2",
                "title:power                         | ''",
                // headrooms as typed: 1.5 V below V+ for QA-1, -0.1 V (beyond the rail) for QA-2, 0.5 V for QA-3
                "input-headroom.high>=1V             | QA-1",
                "input-headroom.high=0.5V            | QA-3",
                "input-headroom.low<0V               | QA-2",
                // QA-2 and QA-3 keep the builder's 1 V output headroom
                "output-headroom.high<=50mV          | QA-1",
                // 5 uV per 1000 h, as typed
                "long-term-drift.value=5uV           | QA-1",
                "long-term-drift.per=1000h           | QA-1",
                "price.quantity=1000                 | QA-1 QA-2 QA-3",
                "currency:usd                        | QA-1 QA-2 QA-3",
                // input capacitance: 18 pF on QA-2, 6 pF on QA-3, none on QA-1 (a missing value matches no comparison)
                "input-capacitance<10pF              | QA-3",
                "cin>=10pF                           | QA-2",
            })
    void matches(String query, String expected) throws Exception {
        Set<String> want = expected.isBlank()
                ? Set.of()
                : new TreeSet<>(List.of(expected.strip().split("\\s+")));
        assertEquals(want, ids(query.strip()));
    }
}
