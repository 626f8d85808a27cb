package dev.ampsieve.record;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The re-check's findings on hand-made facts: each kind alone, and none when nothing changed. */
class RecheckTest {

    private static PartFacts part(String id, Map<String, String> fields, String verdict, String limiting, double cost) {
        return new PartFacts(
                id, "f.yaml", Entry.of(fields), verdict, limiting, false, 1e-3, 1e-3, 1e-3, 2e-3, cost, "USD", true);
    }

    private static RecordFacts facts(List<PartFacts> parts, PartFacts cheapest) {
        return new RecordFacts(
                RecordFacts.Kind.SHORTLIST,
                "s.yaml",
                "limit: 2 mV\n",
                "cat",
                "2026-12-02T08:00:00Z",
                "t",
                parts,
                cheapest,
                parts.size(),
                0);
    }

    private static Map<String, String> entry(String vos) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("id", "a-01");
        m.put("vos.max", vos);
        return m;
    }

    @Test
    void nothingChangedNoFinding() {
        PartFacts a = part("a-01", entry("0.000005"), "fits", "offset", 2.0);
        assertEquals(List.of(), Recheck.compare(facts(List.of(a), a), facts(List.of(a), a)));
    }

    @Test
    void eachKindOfChange() {
        PartFacts was = part("a-01", entry("0.000005"), "fits", "offset", 2.0);
        Map<String, String> revised = entry("0.00005");
        revised.put("notes", "rev C");
        PartFacts now = part("a-01", revised, "no-fit", "drift", 2.0);
        List<Finding> f = Recheck.compare(facts(List.of(was), was), facts(List.of(now), null));
        assertEquals(
                List.of(
                        new Finding.EntryChanged(
                                "a-01",
                                List.of(
                                        new Finding.FieldChange("vos.max", "0.000005", "0.00005"),
                                        new Finding.FieldChange("notes", null, "rev C"))),
                        new Finding.VerdictChanged("a-01", "fits", "no-fit"),
                        new Finding.LimitingChanged("a-01", "offset", "drift")),
                f);
    }

    @Test
    void goneAndCheaper() {
        PartFacts a = part("a-01", entry("0.000005"), "fits", "offset", 2.0);
        PartFacts b = part("b-01", Map.of("id", "b-01"), "fits", "offset", 1.99);
        // 1.99 against 2.00: a cent cheaper, more than the half cent that counts as equal
        assertEquals(
                List.of(new Finding.Disappeared("a-01"), new Finding.CheaperFits(b, a)),
                Recheck.compare(facts(List.of(a), a), facts(List.of(), b)));
        // 1.999 against 2.00: within half a cent, the same cost: no finding
        PartFacts c = part("c-01", Map.of("id", "c-01"), "fits", "offset", 1.999);
        assertEquals(List.of(), Recheck.compare(facts(List.of(a), a), facts(List.of(a), c)));
        // something fits where nothing did
        assertEquals(
                List.of(new Finding.CheaperFits(b, null)),
                Recheck.compare(facts(List.of(), null), facts(List.of(), b)));
    }
}
