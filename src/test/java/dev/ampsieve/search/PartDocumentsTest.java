package dev.ampsieve.search;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Part;
import java.util.Set;
import org.apache.lucene.document.Document;
import org.junit.jupiter.api.Test;

class PartDocumentsTest {

    @Test
    void everySchemaNumberIndexesTheValueTyped() {
        // one part with a different invented value in every field, each expected value written out here
        // (signed figures are indexed as magnitudes, rejections as the minimum, aging per 1000 h)
        Part p = part("A")
                .vos(-3e-6, 8e-6)
                .drift(0.05e-6, 0.2e-6)
                .ib(-40e-12, 150e-12)
                .ios(5e-12, 30e-12)
                .cmrr(96.0, 112.0)
                .psrr(92.0, 108.0)
                .aol(118.0, 130.0)
                .gbw(3.5e6)
                .slew(1.7e6)
                .noise(11e-9, 7.0, 2e-15, 40.0)
                .supply(2.7, 5.5)
                .temperature(-40, 125)
                .price(1.85)
                .iq(0.9e-3)
                .channels(2)
                .fchop(150e3)
                .aging(2e-6, 4000 * 3600.0)
                .inputHeadroom(-0.1, 1.5)
                .outputHeadroom(0.05, 0.08)
                .inputCapacitance(7.5e-12)
                .testConditions(30.0, 15.0)
                .crossover(1.2, 40e-6)
                .thetaJa(160.0)
                .choppingRipple(3e-6)
                .build();
        java.util.Map<String, Double> expected = new java.util.HashMap<>();
        expected.put(Schema.VOS, 8e-6);
        expected.put("vos.typ", 3e-6);
        expected.put("vos.max", 8e-6);
        expected.put("vos.maxtemp", null); // not typed
        expected.put(Schema.DRIFT, 0.2e-6);
        expected.put("drift.typ", 0.05e-6);
        expected.put("drift.max", 0.2e-6);
        expected.put(Schema.IB, 150e-12);
        expected.put("ib.typ", 40e-12);
        expected.put("ib.max", 150e-12);
        expected.put("ib.maxtemp", null);
        expected.put(Schema.IOS, 30e-12);
        expected.put("ios.typ", 5e-12);
        expected.put("ios.max", 30e-12);
        expected.put("ios.maxtemp", null);
        expected.put(Schema.CMRR, 96.0);
        expected.put("cmrr.min", 96.0);
        expected.put("cmrr.typ", 112.0);
        expected.put(Schema.PSRR, 92.0);
        expected.put("psrr.min", 92.0);
        expected.put("psrr.typ", 108.0);
        expected.put(Schema.AOL, 118.0);
        expected.put("aol.min", 118.0);
        expected.put("aol.typ", 130.0);
        expected.put(Schema.GBW, 3.5e6);
        expected.put(Schema.SLEW, 1.7e6);
        expected.put(Schema.EN, 11e-9);
        expected.put("en.corner", 7.0);
        expected.put(Schema.IN, 2e-15);
        expected.put("in.corner", 40.0);
        expected.put(Schema.SUPPLY_MIN, 2.7);
        expected.put(Schema.SUPPLY_MAX, 5.5);
        expected.put(Schema.TEMPERATURE_MIN, -40.0);
        expected.put(Schema.TEMPERATURE_MAX, 125.0);
        expected.put(Schema.PRICE, 1.85);
        expected.put("price.quantity", 1000.0);
        expected.put(Schema.IQ, 0.9e-3);
        expected.put(Schema.CHANNELS, 2.0);
        expected.put(Schema.FCHOP, 150e3);
        expected.put(Schema.AGING, 1e-6); // 2 µV per 4000 h x sqrt(1000/4000)
        expected.put("long-term-drift.value", 2e-6);
        expected.put("long-term-drift.per", 4000 * 3600.0);
        expected.put("input-headroom.low", -0.1);
        expected.put("input-headroom.high", 1.5);
        expected.put("output-headroom.low", 0.05);
        expected.put("output-headroom.high", 0.08);
        expected.put(Schema.CIN, 7.5e-12);
        expected.put("test-conditions.supply", 30.0);
        expected.put("test-conditions.common-mode", 15.0);
        expected.put("input-crossover.from-positive-rail", 1.2);
        expected.put("input-crossover.offset-step", 40e-6);
        expected.put(Schema.THETA_JA, 160.0);
        expected.put(Schema.RIPPLE, 3e-6);
        java.util.List<String> names = new java.util.ArrayList<>();
        Schema.NUMERIC.forEach(n -> names.add(n.name()));
        Schema.INTERVALS.forEach(i -> names.addAll(java.util.List.of(i.min(), i.max())));
        for (String name : names) {
            assertTrue(expected.containsKey(name), "a new index field needs its expected value here: " + name);
            Double want = expected.get(name);
            Double got = PartDocuments.value(name, p);
            if (want == null) {
                assertNull(got, name);
            } else {
                assertEquals(want, got, Math.abs(want) * 1e-12, name);
            }
        }
    }

    @Test
    void spreadsUseTheMaximumElseTheTypicalAsMagnitudes() {
        Part withMax = part("A").vos(-3e-6, 8e-6).build();
        Part typOnly = part("B").vos(-150e-6, null).build();
        assertEquals(8e-6, PartDocuments.value(Schema.VOS, withMax));
        assertEquals(150e-6, PartDocuments.value(Schema.VOS, typOnly));
        assertNull(PartDocuments.value("vos.max", typOnly));
    }

    @Test
    void rejectionUsesTheMinimumElseTheTypical() {
        assertEquals(
                90.0,
                PartDocuments.value(Schema.CMRR, part("A").cmrr(90.0, 110.0).build()));
        assertEquals(
                110.0,
                PartDocuments.value(Schema.CMRR, part("A").cmrr(null, 110.0).build()));
    }

    @Test
    void agingIsScaledToOneThousandHours() {
        // 2 uV per 4000 h, scaled with the square root of time: 2 uV * sqrt(1000/4000) = 1 uV
        Part p = part("A").aging(2e-6, 4000 * 3600.0).build();
        assertEquals(1e-6, PartDocuments.value(Schema.AGING, p), 1e-18);
    }

    @Test
    void synonymsForSelfCorrectingAndRailToRailParts() {
        Set<String> chopper = Words.terms(String.join(
                " ",
                PartDocuments.words(part("A")
                        .architecture(dev.ampsieve.catalog.Architecture.CHOPPER)
                        .outputHeadroom(0, 0)
                        .build())));
        assertTrue(chopper.containsAll(Set.of("zero-drift", "zerodrift", "rail-to-rail", "rro")), chopper.toString());
        Set<String> plain =
                Words.terms(String.join(" ", PartDocuments.words(part("B").build())));
        assertTrue(!plain.contains("zero-drift") && !plain.contains("rail-to-rail"), plain.toString());
    }

    @Test
    void documentHoldsIdAndPointsOnlyForGivenValues() {
        Document d = PartDocuments.of(part("PX-9").vos(null, 5e-6).build());
        assertEquals("PX-9", d.get(Schema.ID));
        // one point per number (nothing stored, no doc values: the catalog holds the value)
        assertEquals(1, d.getFields(Schema.VOS).length);
        assertEquals(5e-6, d.getField(Schema.VOS).numericValue().doubleValue());
        assertEquals(0, d.getFields("vos.typ").length);
    }

    @Test
    void wordsKeepHyphenatedNamesWholeAndInPieces() {
        assertEquals(Set.of("sot-23-5", "sot-23", "sot23", "sot235", "sot", "23", "5"), Words.terms("SOT-23-5."));
        assertEquals(Set.of("low", "offset"), Words.terms("  low, offset. "));
    }
}
