package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.units.Dimension;
import java.util.List;
import org.junit.jupiter.api.Test;

class ConstraintsTest {

    private static ConstraintResult get(Budget b, String name) {
        return b.constraints().stream()
                .filter(c -> c.name().equals(name))
                .findFirst()
                .orElseThrow();
    }

    private static Budget budget(StageFixture s, PartFixture p) {
        return BudgetCalculator.compute(s.build(), p.build());
    }

    @Test
    void supplyRangeMustHoldTheSupplyAndItsVariation() {
        StageFixture s = StageFixture.follower().limitV(1);
        s.supply = 12.0;
        s.supplyVariation = 0.5;
        PartFixture p = PartFixture.ideal();
        p.supply = new Range(2.7, 5.5);
        ConstraintResult c = get(budget(s, p), "supply");
        assertFalse(c.ok());
        // needs 12 +/- 0.5 = 11.5 .. 12.5 V against 2.7 .. 5.5 V: 12.5 - 5.5 = 7 V short at the top only
        ConstraintFact.Span f = (ConstraintFact.Span) c.fact();
        assertEquals(ConstraintKind.SUPPLY, c.kind());
        assertTrue(c.checked());
        assertEquals(11.5, f.needLow(), 1e-12);
        assertEquals(12.5, f.needHigh(), 1e-12);
        assertEquals(2.7, f.partLow(), 1e-12);
        assertEquals(5.5, f.partHigh(), 1e-12);
        assertEquals(Dimension.VOLTAGE, f.dimension());
        assertEquals(0, f.shortLow(), 0);
        assertEquals(7.0, f.shortHigh(), 1e-12);
        p.supply = new Range(4.5, 36);
        assertTrue(get(budget(s, p), "supply").ok());
    }

    @Test
    void temperatureGrade() {
        StageFixture s = StageFixture.follower().limitV(1).temps(-40, 125);
        PartFixture p = PartFixture.ideal();
        p.temperature = new Range(-40, 85);
        ConstraintResult c = get(budget(s, p), "temperature");
        assertFalse(c.ok());
        // -40 .. 125 °C against a -40 .. 85 °C grade: 125 - 85 = 40 °C short at the top
        ConstraintFact.Span f = (ConstraintFact.Span) c.fact();
        assertEquals(Dimension.TEMPERATURE, f.dimension());
        assertEquals(0, f.shortLow(), 0);
        assertEquals(40, f.shortHigh(), 1e-12);
    }

    @Test
    void commonModeDefaultsToMidSupply() {
        // Vs 5 V, swing 2 V peak: needs mid 2.5 V +/- 2 V = 0.5 .. 4.5 V (error-model.md: dVcm is a peak change);
        // input headroom 1.5 V below the top rail reaches 3.5 V
        StageFixture s = StageFixture.follower().limitV(1);
        s.supply = 5.0;
        s.cmSwing = 2;
        PartFixture p = PartFixture.ideal();
        p.inHead = new Headroom(0, 1.5);
        ConstraintResult c = get(budget(s, p), "common-mode");
        assertFalse(c.ok());
        ConstraintFact.Span f = (ConstraintFact.Span) c.fact();
        assertEquals(0.5, f.needLow(), 1e-12);
        assertEquals(4.5, f.needHigh(), 1e-12);
        assertEquals(0, f.partLow(), 1e-12);
        assertEquals(3.5, f.partHigh(), 1e-12);
        assertEquals(1.0, f.shortHigh(), 1e-12); // 4.5 - 3.5
        assertEquals(1.5, f.headroom().fromHigh(), 0);
        assertFalse(f.headroom().assumed());
        s.cmRange = new Range(1, 3);
        assertTrue(get(budget(s, p), "common-mode").ok());
    }

    @Test
    void headroomWiderThanTheSupplyIsSaidSoNotPrintedAsAnUpsideDownRange() {
        // Vs 5 V: 3 V from the low rail and 2.5 V from the high rail leave no input range at all
        // (3 V above the low rail lies over 5 - 2.5 = 2.5 V); a follower without swing needs 2.5 V,
        // which is 0.5 V under the low edge and not above the high one
        StageFixture s = StageFixture.follower().limitV(1);
        s.supply = 5.0;
        PartFixture p = PartFixture.ideal();
        p.inHead = new Headroom(3, 2.5);
        ConstraintResult c = get(budget(s, p), "common-mode");
        assertFalse(c.ok());
        assertTrue(
                ConstraintText.detail(c)
                        .contains("part reachable nowhere on a 5.00 V supply (headroom 3.00 V from the low rail"
                                + " plus 2.50 V from the high rail)"),
                ConstraintText.detail(c));
        ConstraintFact.Span f = (ConstraintFact.Span) c.fact();
        assertTrue(f.unreachable());
        assertEquals(5.0, f.headroom().lowestSupply(), 1e-12);
        assertEquals(0.5, f.shortLow(), 1e-12); // 3 - 2.5
        assertEquals(0, f.shortHigh(), 0); // 2.5 is not above 5 - 2.5
        assertTrue(ConstraintText.detail(c).contains("short by 500 mV at the low end"), ConstraintText.detail(c));
        assertFalse(ConstraintText.detail(c).contains("3.00 V to 2.50 V"), ConstraintText.detail(c));
    }

    @Test
    void missingHeadroomIsAssumedPessimisticNotSkipped() {
        // Vs 5 V, swing 0.5 V peak: needs 2.5 +/- 0.5 = 2.0 .. 3.0 V; an assumed 1.5 V from each rail reaches
        // 1.5 .. 3.5 V (fits); a 1.5 V peak swing needs 1.0 .. 4.0 V, which the assumed headroom cannot reach
        StageFixture s = StageFixture.follower().limitV(1);
        s.supply = 5.0;
        s.cmSwing = 0.5;
        PartFixture p = PartFixture.ideal();
        p.inHead = null;
        Budget b = budget(s, p);
        assertTrue(get(b, "common-mode").ok(), ConstraintText.detail(get(b, "common-mode")));
        assertTrue(
                ((ConstraintFact.Span) get(b, "common-mode").fact()).headroom().assumed());
        assertTrue(ConstraintText.detail(get(b, "common-mode")).contains("assumed"));
        // Assumed.HEADROOM_V: 1.5 V from each rail (the same figure the reach above is worked with)
        assertTrue(
                b.assumptions().contains(new Assumption.Headroom("input-headroom", "common-mode", 1.5)),
                b.assumptions().toString());
        s.cmSwing = 1.5;
        assertFalse(get(budget(s, p), "common-mode").ok());
    }

    @Test
    void outputSwingAndSlew() {
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1);
        s.supply = 5.0;
        s.fullScale = 4.0;
        s.fH = 100e3;
        PartFixture p = PartFixture.ideal();
        p.outHead = new Headroom(0.6, 0.1);
        p.slew = 2e6;
        Budget b = budget(s, p);
        ConstraintResult out = get(b, "output-swing");
        assertFalse(out.ok());
        assertTrue(ConstraintText.detail(out).contains("at the low end"), ConstraintText.detail(out));
        // 2π x 100 kHz x 4 V = 2.51 V/µs (Franco4 ch. 6 [from memory], full-power bandwidth)
        assertEquals(2 * Math.PI * 100e3 * 4, Constraints.neededSlew(s.build()), 1e-6);
        ConstraintResult slew = get(b, "slew");
        assertFalse(slew.ok());
        ConstraintFact.Slew sf = (ConstraintFact.Slew) slew.fact();
        assertEquals(2.513274e6, sf.need(), 1); // 2π x 100 kHz x 4 V, worked by hand
        assertEquals(2e6, sf.part(), 0);
        assertEquals(0.513274e6, sf.shortfall(), 1);
        assertTrue(ConstraintText.detail(slew).contains("2.51 V/µs"), ConstraintText.detail(slew));
    }

    @Test
    void priceCeiling() {
        StageFixture s = StageFixture.follower().limitV(1);
        s.maxPrice = 2.0;
        PartFixture p = PartFixture.ideal();
        p.price = new Price(3.1, 100, "EUR");
        ConstraintResult c = get(budget(s, p), "price");
        assertFalse(c.ok());
        ConstraintFact.Price f = (ConstraintFact.Price) c.fact();
        assertEquals(2.0, f.ceiling(), 0);
        assertEquals(3.1, f.unit(), 1e-12);
        assertEquals("EUR", f.currency());
        assertEquals(1.1, f.over(), 1e-12); // 3.10 - 2.00
        assertEquals("ceiling 2.00 EUR; part 3.10 EUR; over by 1.10 EUR", ConstraintText.detail(c));
    }

    @Test
    void uncheckableConstraintsPassWithAWarning() {
        StageFixture s = StageFixture.follower().limitV(1);
        s.fullScale = 1.0;
        PartFixture p = PartFixture.ideal();
        p.slew = null;
        Budget b = budget(s, p);
        assertTrue(get(b, "slew").ok());
        assertFalse(get(b, "slew").checked());
        assertTrue(ConstraintText.detail(get(b, "slew")).startsWith("not checked"));
        // needed slew 2 pi fH VFS = 2 pi x 10 Hz x 1 V = 62.831853 V/s (by hand; the fixture's fH is 10 Hz)
        Assumption slew = b.assumptions().stream()
                .filter(a -> a instanceof Assumption.SlewNotChecked)
                .findFirst()
                .orElseThrow();
        assertEquals("slew", slew.field());
        assertEquals(62.831853, ((Assumption.SlewNotChecked) slew).needed(), 1e-6);
        assertEquals(
                List.of("supply", "temperature", "common-mode", "output-swing", "slew", "price"),
                b.constraints().stream().map(ConstraintResult::name).toList());
    }

    @Test
    void chopperCaveats() {
        StageFixture s = StageFixture.follower().limitV(1);
        s.fH = 2e3;
        PartFixture p = PartFixture.ideal();
        p.architecture = Architecture.CHOPPER;
        p.chop = 10e3;
        Budget b = budget(s, p);
        assertTrue(b.assumptions()
                .contains(
                        new Assumption.Chopper("architecture", Assumption.Rule.CHOPPER_CAVEATS, Architecture.CHOPPER)));
        // 2 kHz is above a tenth of 10 kHz (common practice: fH under fc / 10)
        assertTrue(b.assumptions().contains(new Assumption.ChoppingNearBand(Architecture.CHOPPER, 2e3, 10e3)));
        s.fH = 500;
        assertFalse(budget(s, p).assumptions().stream().anyMatch(a -> a.rule() == Assumption.Rule.CHOPPING_NEAR_BAND));
        // a band reaching past the clock: the same fact with the band edge above the chopping frequency,
        // which the report words as "above" (AssumptionTextTest)
        s.fH = 20e3;
        List<Assumption> w = budget(s, p).assumptions();
        assertTrue(w.contains(new Assumption.ChoppingNearBand(Architecture.CHOPPER, 20e3, 10e3)), w.toString());
    }
}
