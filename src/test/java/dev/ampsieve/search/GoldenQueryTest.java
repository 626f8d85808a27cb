package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.testing.FixtureCatalog;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Exact hit sets over the eight fixture parts. Each expected set was worked out by hand from
 * the values in {@link FixtureCatalog} and the meanings documented in {@link QueryLanguage}.
 */
class GoldenQueryTest {

    private static PartIndex index;

    @BeforeAll
    static void build() {
        index = PartIndex.inMemory(FixtureCatalog.catalog(Path.of("no-such-folder")));
    }

    @AfterAll
    static void close() throws Exception {
        index.close();
    }

    static Set<String> ids(String query) throws InputException {
        return new TreeSet<>(
                index.search(QueryLanguage.parse(query)).stream().map(Hit::id).toList());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            value = {
                // words and synonyms
                "zero-drift                             | PX-404 PX-505",
                "zero drift                             | PX-404 PX-505",
                "zerodrift                              | PX-404 PX-505",
                "architecture:zero-drift                | PX-404 PX-505",
                "chopper                                | PX-404",
                "-chopper zero-drift                    | PX-505",
                "rail-to-rail                           | PX-303 PX-404 PX-505",
                "rail:input                             | PX-303 PX-505",
                "rrio                                   | PX-303 PX-505",
                "sot23                                  | PX-101 PX-404 PX-808",
                "sot-23                                 | PX-101 PX-404 PX-808",
                "package:sot-23                         | PX-101 PX-404 PX-808",
                "package:sot-23-5                       | PX-101 PX-404",
                "PRECISION                              | PX-202 PX-404",
                "id:px-404                              | PX-404",
                "jfet                                   | PX-606",
                "dual                                   | PX-606",
                "trim:laser                             | PX-202",
                // spreads: guaranteed maximum, else typical (PX-707 has only a typical 150 uV)
                "vos<10uV                               | PX-404",
                "vos<=10uV                              | PX-404 PX-505",
                "vos<200uV                              | PX-202 PX-404 PX-505 PX-707",
                "vos.max<200uV                          | PX-202 PX-404 PX-505",
                "vos.typ<=10uV                          | PX-202 PX-404",
                "drift<1uV/C                            | PX-202 PX-404 PX-505",
                "ib<1nA                                 | PX-303 PX-404 PX-505 PX-606",
                "en<=10nV/rtHz                          | PX-202 PX-606",
                "cmrr>=100dB                            | PX-202",
                "cmrr>90                                | PX-202",
                "aol=100dB                              | PX-101",
                // numbers
                "gbw=1MHz..10MHz                        | PX-101 PX-303 PX-404 PX-606",
                "gbw=10MHz..                            | PX-303 PX-808",
                "gbw=..1MHz                             | PX-101 PX-202 PX-505 PX-707",
                "gbw=1000kHz                            | PX-101",
                "slew>=10V/us                           | PX-606 PX-808",
                "input:jfet price<2                     | PX-606",
                "price<0.5                              | PX-101 PX-303",
                "iq<100uA                               | PX-505",
                "fchop>1kHz                             | PX-404",
                "channels>=2                            | PX-303 PX-606",
                // rated-at intervals
                "supply>=5V                             | PX-101 PX-202 PX-303 PX-404 PX-505 PX-808",
                "supply=5V                              | PX-101 PX-202 PX-303 PX-404 PX-505 PX-808",
                "supply>=36V                            | PX-101 PX-202 PX-606 PX-707",
                "supply>5.5V                            | PX-101 PX-202",
                "supply<1.8V                            | ''",
                "supply<=1.8V                           | PX-303 PX-505",
                "supply=4.5V..5.5V                      | PX-202 PX-303 PX-404 PX-505 PX-808",
                "temperature>=125C                      | PX-202 PX-303 PX-404 PX-707 PX-808",
                "temp<=-55C                             | PX-707",
                "temperature=-40C..125C                 | PX-202 PX-303 PX-404 PX-707 PX-808",
                // the example of the issue, and spacing a user may type
                "zero-drift vos<10uV supply>=5V sot-23  | PX-404",
                "vos < 10 uV                            | PX-404",
                "input:cmos gbw = 1MHz .. 20MHz         | PX-303 PX-404",
            })
    void goldenHitSets(String query, String expected) throws InputException {
        Set<String> want = expected.isBlank()
                ? Set.of()
                : new TreeSet<>(List.of(expected.trim().split("\\s+")));
        assertEquals(want, ids(query.trim()));
    }

    @org.junit.jupiter.api.Test
    void emptyQueryListsEveryPartCheapestFirst() throws InputException {
        List<String> order =
                index.search(QueryLanguage.parse("")).stream().map(Hit::id).toList();
        // fixture prices: 101 0.30, 303 0.45, 808 0.95, 505 1.10, 606 1.20, 404 1.80, 202 2.40, 707 3.10
        assertEquals(List.of("PX-101", "PX-303", "PX-808", "PX-505", "PX-606", "PX-404", "PX-202", "PX-707"), order);
    }

    @org.junit.jupiter.api.Test
    void titleHitsRankAboveOtherHitsThenPriceDecides() throws InputException {
        // "precision" is in PX-202's title (score 2) but only a tag of PX-404 (score 1),
        // although PX-404 is the cheaper part
        assertEquals(
                List.of("PX-202", "PX-404"),
                index.search(QueryLanguage.parse("precision")).stream()
                        .map(Hit::id)
                        .toList());
        // "amplifier" is in five titles (equal relevance): cheapest first
        assertEquals(
                List.of("PX-101", "PX-808", "PX-606", "PX-404", "PX-707"),
                index.search(QueryLanguage.parse("amplifier")).stream()
                        .map(Hit::id)
                        .toList());
    }
}
