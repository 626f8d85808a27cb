package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.ampsieve.report.ProblemText;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Price breaks in the catalog: the list form, its checks, and which break a build quantity pays. */
class PriceBreaksTest {

    private static final String REST = """
            architecture: standard
            input: bipolar
            vos: {max: "1 mV"}
            gbw: "1 MHz"
            supply: {min: "4.5 V", max: "36 V"}
            temperature: {min: "-40 C", max: "85 C"}
            noise: {en: "10 nV/rtHz"}
            vos-drift: {max: "5 uV/C"}
            """;

    private static CatalogLoader.PartText read(String price) {
        return CatalogLoader.readPart("id: breaks-01\n" + price + REST, Path.of("p.yaml"));
    }

    private static List<String> problems(String price) {
        // the absent-figure warnings of the minimal part (PartReader.warnAbsences) are not about prices
        return read(price).problems().stream()
                .map(ProblemText::line)
                .filter(t -> !t.contains(": not given: "))
                .toList();
    }

    @Test
    void breaksLoadSortedAndTheStageQuantityPicksOne() {
        CatalogLoader.PartText r = read("""
                price:
                  - {quantity: 1000, unit: 1.25}
                  - {quantity: 1, unit: 2.10, currency: EUR}
                  - {quantity: 100, unit: 1.60}
                """);
        assertEquals(
                List.of(),
                r.problems().stream()
                        .filter(q -> !q.toString().contains(": not given: "))
                        .toList());
        Price p = r.part().price();
        assertEquals(
                List.of(new Price.Break(1, 2.10), new Price.Break(100, 1.60), new Price.Break(1000, 1.25)), p.breaks());
        assertEquals("EUR", p.currency());
        // the break with the largest quantity not above the build quantity, read off the list by hand
        assertEquals(2.10, p.at(1), 0);
        assertEquals(2.10, p.at(99), 0);
        assertEquals(1.60, p.at(100), 0);
        assertEquals(1.60, p.at(999), 0);
        assertEquals(1.25, p.at(1000), 0);
        assertEquals(1.25, p.at(1_000_000), 0);
        assertEquals(2.10, p.unit(), 0); // what find and the index show: the smallest order's price
    }

    @Test
    void belowTheSmallestBreakItsPriceIsUsed() {
        Price p = new Price(List.of(new Price.Break(100, 3.00), new Price.Break(1000, 2.50)), null);
        assertEquals(3.00, p.at(10), 0);
        assertEquals("USD", p.currency());
    }

    @Test
    void theSinglePriceFormStaysValid() {
        CatalogLoader.PartText r = read("price: {unit: 1.20, quantity: 1000, currency: USD}\n");
        assertEquals(new Price(1.20, 1000, "USD"), r.part().price());
        assertEquals(1.20, r.part().price().at(10), 0); // one break: every quantity pays it
    }

    @Test
    void badBreaksAreNamedByItem() {
        assertEquals(
                List.of("p.yaml:4:16: price[1].quantity: quantity 100 is already a break at price[0];"
                        + " give each break its own quantity"),
                problems("price:\n  - {quantity: 100, unit: 1.60}\n  - {quantity: 100, unit: 1.50}\n"));
        assertEquals(
                List.of("p.yaml:4:42: price[1].currency: 'EUR' differs from 'USD' at price[0].currency;"
                        + " give every break in one currency"),
                problems(
                        "price:\n  - {quantity: 1, unit: 2, currency: USD}\n  - {quantity: 100, unit: 1.5, currency: EUR}\n"));
        assertEquals(
                List.of("p.yaml:3:5: price[0].quantity: required field is missing; add 'quantity: 1000'"),
                problems("price:\n  - {unit: 2}\n"));
        assertEquals(
                List.of("p.yaml:2:8: price: the list of price breaks is empty; write '- {quantity: 1, unit: 2.10}'"
                        + " items, or 'price: {unit: 1.20, quantity: 1000}'"),
                problems("price: []\n"));
        assertEquals(
                List.of("p.yaml:3:25: price[0].unit: -2 is negative, which is impossible here; write the unit price"
                        + " as a positive number"),
                problems("price:\n  - {quantity: 1, unit: -2}\n"));
        assertNull(read("price:\n  - {quantity: 1, unit: -2}\n").part());
    }

    @Test
    void aLargerOrderPricedHigherIsWarnedAbout() {
        assertEquals(
                List.of("p.yaml:3:3: warning: price: the unit price at 1000 (2.00) is above the price at 1 (1.50);"
                        + " check the columns: larger orders usually cost less per unit"),
                problems("price:\n  - {quantity: 1, unit: 1.5}\n  - {quantity: 1000, unit: 2}\n"));
    }

    @Test
    void anEmptyVosMaxIsNotAnOffset() {
        // 'max:' with nothing after it gives no figure: the part needs typ or max all the same
        CatalogLoader.PartText r = CatalogLoader.readPart(
                "id: empty-01\nprice: {unit: 1}\n" + REST.replace("vos: {max: \"1 mV\"}", "vos:\n  max:"),
                Path.of("p.yaml"));
        assertNull(r.part());
        assertEquals(
                List.of("p.yaml:6:3: vos: neither typ nor max is given; add 'max: 2.5 uV' from the datasheet's"
                        + " 25 °C column (typ when it gives no max)"),
                r.problems().stream().map(ProblemText::line).toList());
    }
}
