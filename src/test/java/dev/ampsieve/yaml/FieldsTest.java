package dev.ampsieve.yaml;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class FieldsTest {

    @Test
    void editDistanceCountsInsertionsDeletionsAndSubstitutions() {
        // Levenshtein's textbook example: kitten -> sitting needs 3 edits [from memory]
        assertEquals(3, Fields.distance("kitten", "sitting"));
        assertEquals(0, Fields.distance("gbw", "gbw"));
        assertEquals(3, Fields.distance("", "gbw"));
    }

    @Test
    void suggestsOnlyWhatIsCloseEnough() {
        List<String> keys = List.of("vos", "vos-drift", "gbw", "slew", "long-term-drift");
        assertEquals("vos-drift", Fields.closest("vos_drift", keys)); // underscore typed for a dash
        assertEquals("vos", Fields.closest("VOS", keys)); // case
        assertEquals("long-term-drift", Fields.closest("longterm-drift", keys));
        assertNull(Fields.closest("bandwidth", keys));
    }

    @Test
    void readsWholeNumbersWithUnderscoresAndReportsTheRest() throws Exception {
        Node.Mapping m = (Node.Mapping) YamlFiles.parse("q: 1_000\nn: 1.5\n", null);
        List<Problem> problems = new ArrayList<>();
        Fields f = new Fields(problems);
        assertEquals(1000, f.integer(m, "price", "q", 1, 1_000_000));
        assertEquals(1000L, f.longValue(m, "price", "q"));
        assertNull(f.integer(m, "price", "n", 1, 10));
        assertEquals("price.n", problems.get(0).field());
        assertEquals("'1.5' is not a whole number", problems.get(0).message());
    }
}
