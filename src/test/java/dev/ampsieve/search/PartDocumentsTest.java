package dev.ampsieve.search;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.testing.FixtureCatalog;
import java.util.Set;
import org.apache.lucene.document.Document;
import org.junit.jupiter.api.Test;

class PartDocumentsTest {

    @Test
    void everySchemaNumberHasAValueRule() {
        for (Part p : FixtureCatalog.parts()) {
            for (Schema.Numeric n : Schema.NUMERIC) {
                PartDocuments.value(n.name(), p); // throws for a field without a rule
            }
            for (Schema.Interval i : Schema.INTERVALS) {
                PartDocuments.value(i.min(), p);
                PartDocuments.value(i.max(), p);
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
        assertEquals(90.0, PartDocuments.value(Schema.CMRR, part("A").cmrr(90.0, 110.0).build()));
        assertEquals(110.0, PartDocuments.value(Schema.CMRR, part("A").cmrr(null, 110.0).build()));
    }

    @Test
    void agingIsScaledToOneThousandHours() {
        // 2 uV per 4000 h, scaled with the square root of time: 2 uV * sqrt(1000/4000) = 1 uV
        Part p = part("A").aging(2e-6, 4000 * 3600.0).build();
        assertEquals(1e-6, PartDocuments.value(Schema.AGING, p), 1e-18);
    }

    @Test
    void synonymsForSelfCorrectingAndRailToRailParts() {
        Set<String> chopper = Words.terms(String.join(" ", PartDocuments.words(
                part("A").architecture(dev.ampsieve.catalog.Architecture.CHOPPER).outputHeadroom(0, 0).build())));
        assertTrue(chopper.containsAll(Set.of("zero-drift", "zerodrift", "rail-to-rail", "rro")), chopper.toString());
        Set<String> plain = Words.terms(String.join(" ", PartDocuments.words(part("B").build())));
        assertTrue(!plain.contains("zero-drift") && !plain.contains("rail-to-rail"), plain.toString());
    }

    @Test
    void documentHoldsIdAndPointsOnlyForGivenValues() {
        Document d = PartDocuments.of(part("PX-9").vos(null, 5e-6).build());
        assertEquals("PX-9", d.get(Schema.ID));
        double stored = java.util.Arrays.stream(d.getFields(Schema.VOS))
                .filter(f -> f.storedValue() != null)
                .mapToDouble(f -> f.storedValue().getDoubleValue())
                .findFirst().orElseThrow();
        assertEquals(5e-6, stored);
        assertEquals(0, d.getFields("vos.typ").length);
    }

    @Test
    void wordsKeepHyphenatedNamesWholeAndInPieces() {
        assertEquals(Set.of("sot-23-5", "sot-23", "sot23", "sot235", "sot", "23", "5"), Words.terms("SOT-23-5."));
        assertEquals(Set.of("low", "offset"), Words.terms("  low, offset. "));
    }
}
