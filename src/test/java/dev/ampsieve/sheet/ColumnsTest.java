package dev.ampsieve.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.units.Units;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ColumnsTest {

    @Test
    void everyCatalogQuantityHasAColumnWithAUnitOfItsDimension() throws Exception {
        for (Map.Entry<String, dev.ampsieve.units.Dimension> e : CatalogKeys.QUANTITIES.entrySet()) {
            Columns.Column c = Columns.of(e.getKey());
            assertNotNull(c, e.getKey());
            if (c.kind() == Columns.Kind.QUANTITY) {
                Units.parse("1 " + c.unit(), e.getValue()); // throws if the unit does not fit the dimension
            }
        }
    }

    @Test
    void looseSpellingsAndAliasesFindTheirColumn() {
        assertEquals("vos.max-over-temp", Columns.find("VOS max over temp").path());
        assertEquals("noise.en", Columns.find("Noise_EN").path());
        assertEquals("supply.min", Columns.find("Vs min").path());
        assertEquals(CatalogKeys.ID, Columns.find("Part ID").path());
        for (Map.Entry<String, String> a : Columns.ALIASES.entrySet()) {
            assertEquals(a.getValue(), Columns.find(a.getKey()).path(), a.getKey());
        }
        // a bare vos could be typical or guaranteed: guessing max could make a part look better
        assertNull(Columns.find("vos"));
    }

    @Test
    void exportedNumbersReadBackExactly() throws Exception {
        Columns.Column vos = Columns.of("vos.max");
        // values as the catalog reads them: number x prefix (units.Units.parse)
        assertEquals("25", SheetExport.exact(25 * 1e-6, vos));
        // 0.8 mV as typed (0.8 x 1e-3) is not the double 800 x 1e-6: the cell keeps its own prefix
        assertEquals(false, 0.8 * 1e-3 == 800 * 1e-6);
        assertEquals("0.8 mV", SheetExport.exact(0.8 * 1e-3, vos));
        assertEquals("-40", SheetExport.exact(-40, Columns.of("temperature.min")));
        assertEquals("1000", SheetExport.exact(3.6e6, Columns.of("long-term-drift.per"))); // 1000 h in seconds
    }
}
