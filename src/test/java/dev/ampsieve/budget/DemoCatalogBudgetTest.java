package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.BudgetJson;
import dev.ampsieve.report.BudgetText;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Every demo part through the engine and both renderings, in three stages of different
 * kinds: whatever a part leaves out, the budget is complete, finite and deterministic.
 */
class DemoCatalogBudgetTest {

    private static List<Stage> stages() {
        StageFixture bridge =
                StageFixture.nonInverting(100e3, 100e3 / 99).limitV(6e-3).temps(-40, 85);
        bridge.rs = 350;
        bridge.rp = 649;
        bridge.supply = 5.0;
        bridge.supplyVariation = 0.25;
        bridge.cmSwing = 0.15;
        bridge.fullScale = 1.0;
        bridge.tol = 1e-3;
        bridge.tc = 10e-6;
        bridge.life = 10 * 365.25 * 86400;
        bridge.criterion = Criterion.yield(0.999);
        bridge.trim = new Trim(true, Trim.Method.ONE_POINT, 0.5e-3, 0.6);
        StageFixture inv = StageFixture.inverting(200e3, 10e3).limitV(2e-3);
        inv.supply = 30.0;
        inv.fullScale = 10.0;
        inv.fH = 5e3;
        inv.rs = 600;
        inv.criterion = Criterion.RSS;
        inv.maxPrice = 3.0;
        inv.acCoupled = true;
        StageFixture buf = StageFixture.follower().limitV(125e-6).temps(0, 50);
        buf.rs = 100;
        buf.supply = 5.0;
        buf.cmSwing = 4;
        buf.fullScale = 4.0;
        buf.fH = 20e3;
        return List.of(bridge.build(), inv.build(), buf.build());
    }

    @Test
    void everyDemoPartGetsAFullBudget() throws Exception {
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), false);
        assertFalse(c.parts().isEmpty());
        for (Stage s : stages()) {
            for (Part p : c.parts()) {
                Budget b = BudgetCalculator.compute(s, p);
                String what = p.id() + " in " + s.topology();
                assertEquals(14, b.terms().size(), what); // ten of the part, four of its operating point
                assertTrue(Double.isFinite(b.worstCaseV()) && Double.isFinite(b.rssV()), what);
                assertTrue(b.terms().stream().allMatch(t -> t.outputV() >= 0 && Double.isFinite(t.outputV())), what);
                assertTrue(
                        b.yield().low() <= b.yield().value()
                                && b.yield().value() <= b.yield().high(),
                        what);
                assertEquals(6, b.constraints().size(), what);
                assertEquals(b, BudgetCalculator.compute(s, p), "deterministic: " + what);
                assertFalse(BudgetText.render(b, "s").contains("NaN"), what);
                assertFalse(BudgetJson.render(b, "s").contains("NaN"), what);
            }
        }
    }
}
