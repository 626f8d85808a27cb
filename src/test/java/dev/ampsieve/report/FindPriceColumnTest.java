package dev.ampsieve.report;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import java.util.List;
import org.junit.jupiter.api.Test;

/** find has no stage to pick a price break: it shows the smallest order's price and says from which quantity. */
class FindPriceColumnTest {

    @Test
    void breaksShowTheSmallestOrdersPriceWithItsQuantity() {
        Part breaks = part("breaks-01")
                .price(new Price(List.of(new Price.Break(10, 2.1), new Price.Break(1000, 1.25)), "USD"))
                .build();
        Part single = part("single-01").price(1.3).build();
        assertEquals("2.10 (from 10)", Figures.price(breaks));
        assertEquals("1.30", Figures.price(single));
        List<String> lines =
                FindReport.text("", List.of(breaks, single), 200).lines().toList();
        assertEquals(
                "price (from N): the part has price breaks; this is the unit price for orders from N up, and rank"
                        + " uses the break for the stage's quantity.",
                lines.stream()
                        .filter(l -> l.startsWith("price (from N)"))
                        .findFirst()
                        .orElseThrow());
    }
}
