package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The fingerprint decides whether the index on disk is stale (issue 4, point 1: rebuilt when
 * the catalog changes): it must be the same for the same catalog and differ when any value of
 * any part differs, however small or deeply nested.
 */
class CatalogFingerprintTest {

    private static Catalog demo() throws Exception {
        return CatalogLoader.load(Path.of("demo-catalog"), true);
    }

    /** {@code p} with the named components replaced, through the canonical constructor. */
    private static Part with(Part p, Map<String, Object> changes) throws Exception {
        RecordComponent[] rc = Part.class.getRecordComponents();
        Class<?>[] types = new Class<?>[rc.length];
        Object[] values = new Object[rc.length];
        for (int i = 0; i < rc.length; i++) {
            types[i] = rc[i].getType();
            values[i] = changes.containsKey(rc[i].getName()) ? changes.get(rc[i].getName()) : rc[i].getAccessor().invoke(p);
        }
        return Part.class.getDeclaredConstructor(types).newInstance(values);
    }

    private static String fingerprintWithFirstPart(Catalog c, Part first) {
        List<Part> parts = new ArrayList<>(c.parts());
        parts.set(0, first);
        return CatalogFingerprint.of(new Catalog(c.root(), parts, c.problems(), c.files()));
    }

    @Test
    void theSameCatalogLoadedTwiceHasTheSameFingerprint() throws Exception {
        assertEquals(CatalogFingerprint.of(demo()), CatalogFingerprint.of(demo()));
    }

    @Test
    void anyChangedValueChangesTheFingerprint() throws Exception {
        Catalog c = demo();
        Part p = c.parts().get(0);
        String base = CatalogFingerprint.of(c);
        double vosMax = p.vos().max() == null ? 1e-3 : p.vos().max();
        Map<String, UnaryOperator<Map<String, Object>>> cases = new LinkedHashMap<>();
        // a number two records deep, changed in its last bit
        cases.put("vos.max", m -> put(m, "vos", new Spread(p.vos().typ(), Math.nextUp(vosMax), p.vos().maxOverTemp())));
        cases.put("gbw", m -> put(m, "gbw", Math.nextUp(p.gbw())));
        cases.put("channels", m -> put(m, "channels", p.channels() + 1));
        cases.put("nullPins", m -> put(m, "nullPins", !p.nullPins()));
        cases.put("architecture", m -> put(m, "architecture",
                p.architecture() == Architecture.CHOPPER ? Architecture.AUTO_ZERO : Architecture.CHOPPER));
        cases.put("notes", m -> put(m, "notes", p.notes() + "."));
        cases.put("slew given or not", m -> put(m, "slew", p.slew() == null ? 1.0 : null));
        // the same characters split differently between two fields, or between list items
        cases.put("title/notes boundary", m -> put(put(m, "title", "ab"), "notes", "c"));
        cases.put("tags boundary", m -> put(m, "tags", List.of("ab", "c")));
        String titleNotes = fingerprintWithFirstPart(c, with(p, Map.of("title", "a", "notes", "bc")));
        String tags = fingerprintWithFirstPart(c, with(p, Map.of("tags", List.of("a", "bc"))));
        for (var e : cases.entrySet()) {
            String changed = fingerprintWithFirstPart(c, with(p, e.getValue().apply(new LinkedHashMap<>())));
            assertNotEquals(base, changed, e.getKey());
            if (e.getKey().equals("title/notes boundary")) {
                assertNotEquals(titleNotes, changed, e.getKey());
            }
            if (e.getKey().equals("tags boundary")) {
                assertNotEquals(tags, changed, e.getKey());
            }
        }
        assertEquals(base, fingerprintWithFirstPart(c, with(p, Map.of())), "an unchanged copy");
    }

    private static Map<String, Object> put(Map<String, Object> m, String k, Object v) {
        m.put(k, v);
        return m;
    }
}
