package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogFixtures.FULL;
import static dev.ampsieve.catalog.CatalogFixtures.with;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A catalog figure out of bounds, of the wrong sign or out of order comes back as a fact with its numbers. */
class CatalogFactsTest {

    /** The one problem at {@code field} whose fact is a {@code kind}. */
    private static Problem about(String text, String field, Class<? extends CatalogFact> kind) {
        List<Problem> ps = CatalogLoader.readPart(text, Path.of("p.yaml")).problems().stream()
                .filter(p -> p.field().equals(field) && kind.isInstance(p.fact()))
                .toList();
        assertEquals(1, ps.size(), ps.toString());
        assertEquals("", ps.get(0).message(), "a fact has no words of its own");
        return ps.get(0);
    }

    @Test
    void aVoltOfOffsetIsPastTheErrorBoundWithItsReason() {
        Problem p = about(with(FULL, "max: 2 mV", "max: 6 V"), "vos.max", CatalogFact.OutOfBounds.class);
        CatalogKeys.Bounds b = CatalogKeys.BOUNDS.get("vos.max");
        assertEquals(
                new CatalogFact.OutOfBounds(
                        new Quantity(6, Dimension.VOLTAGE), b.errorAbove(), true, true, b.signed(), b.why()),
                p.fact());
    }

    @Test
    void aNegativeGainBandwidthIsASignFactWithTheFix() {
        Problem p = about(with(FULL, "gbw: 1 MHz", "gbw: -1 MHz"), "gbw", CatalogFact.Sign.class);
        CatalogFact.Sign s = assertInstanceOf(CatalogFact.Sign.class, p.fact());
        assertEquals(new Quantity(-1e6, Dimension.FREQUENCY), s.value());
        assertEquals(false, s.zero()); // must be above zero, not merely not negative
    }

    @Test
    void typAboveMaxNamesBothKeysAndValues() {
        Problem p = about(with(FULL, "typ: 0.5 mV", "typ: 4 mV"), "vos.typ", CatalogFact.Order.class);
        CatalogFact.Order o = assertInstanceOf(CatalogFact.Order.class, p.fact());
        assertEquals("typ", o.low());
        assertEquals(new Quantity(4e-3, Dimension.VOLTAGE), o.lowValue());
        assertEquals("max", o.high());
        assertEquals(new Quantity(2e-3, Dimension.VOLTAGE), o.highValue());
    }

    @Test
    void aMaxFarAboveTypCarriesTheRatio() {
        // typ 25 uV, max 75 mV: 75e-3 / 25e-6 = 3000 (by hand)
        String text = with(with(FULL, "typ: 0.5 mV", "typ: 25 uV"), "max: 2 mV", "max: 75 mV");
        Problem p = about(text, "vos.max", CatalogFact.Spread.class);
        CatalogFact.Spread f = assertInstanceOf(CatalogFact.Spread.class, p.fact());
        assertEquals("max", f.max());
        assertEquals(75e-3, f.maxValue().value(), 1e-15);
        assertEquals("typ", f.typ());
        assertEquals(25e-6, f.typValue().value(), 1e-18);
        assertEquals(Dimension.VOLTAGE, f.typValue().dimension());
        assertEquals(3000, f.times());
    }
}
