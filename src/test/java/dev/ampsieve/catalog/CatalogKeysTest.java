package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.units.Dimension;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class CatalogKeysTest {

    @Test
    void everySectionIsAPartKeyAndEveryQuantityLivesInOne() {
        assertTrue(CatalogKeys.PART_KEYS.containsAll(CatalogKeys.SECTIONS.keySet()));
        assertTrue(CatalogKeys.PART_KEYS.containsAll(CatalogKeys.REQUIRED));
        assertEquals(CatalogKeys.PART_KEYS.size(), new HashSet<>(CatalogKeys.PART_KEYS).size(), "no key twice");
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            int dot = path.indexOf('.');
            if (dot < 0) {
                assertTrue(CatalogKeys.PART_KEYS.contains(path), path);
                assertEquals(List.of(), CatalogKeys.subKeys(path), path + " is a plain key");
            } else {
                assertTrue(CatalogKeys.subKeys(path.substring(0, dot)).contains(path.substring(dot + 1)), path);
            }
        }
    }

    @Test
    void dimensionsAreThoseIssueTwoAsksFor() {
        assertEquals(Dimension.VOLTAGE, CatalogKeys.dimension("vos.max-over-temp"));
        assertEquals(Dimension.VOLTAGE_DRIFT, CatalogKeys.dimension("vos-drift.max"));
        assertEquals(Dimension.CURRENT, CatalogKeys.dimension("ios.typ"));
        assertEquals(Dimension.DECIBEL, CatalogKeys.dimension("aol.min"));
        assertEquals(Dimension.SLEW_RATE, CatalogKeys.dimension("slew"));
        assertEquals(Dimension.VOLTAGE_DENSITY, CatalogKeys.dimension("noise.en"));
        assertEquals(Dimension.CURRENT_DENSITY, CatalogKeys.dimension("noise.in"));
        assertEquals(Dimension.FREQUENCY, CatalogKeys.dimension("noise.in-corner"));
        assertEquals(Dimension.TIME, CatalogKeys.dimension("long-term-drift.per"));
        assertEquals(Dimension.VOLTAGE, CatalogKeys.dimension("output-headroom.high"));
        assertEquals(Dimension.NUMBER, CatalogKeys.dimension("price.unit"));
        assertEquals(Dimension.TEMPERATURE, CatalogKeys.dimension("temperature.min"));
        // text, whole numbers and lists are not quantities
        Set<String> notQuantities = Set.of("id", "price.quantity", "price.currency", "channels", "tags");
        for (String k : notQuantities) {
            assertEquals(null, CatalogKeys.dimension(k), k);
        }
    }

    @Test
    void anUnknownPathIsAProgrammingError() {
        assertThrows(IllegalArgumentException.class, () -> CatalogKeys.value(null, "vos.mx"));
    }
}
