package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Transimpedance;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The no-fit levers of the difference and transimpedance networks, found by the real engine's
 * bisection and checked against the boundary worked by hand.
 */
class NetworkLeverTest {

    private static Map<Change.Kind, Change> changes(Stage s, PartFixture p) {
        Ranking r = Ranker.rank(s, List.of(p.build()), BudgetCalculator::compute);
        return r.advice().noFit().changes().stream().collect(Collectors.toMap(Change::kind, c -> c));
    }

    @Test
    void aTransimpedanceStageIsOfferedASmallerFeedbackResistor() throws Exception {
        // 15 kohm with a bipolar input of 100 nA: IB x Rf = 1.5 mV against a 1 mV output limit. The source's shunt
        // (1 Tohm) leaves the noise gain at 1, the part has no offset of its own, and rf's thermal noise over a
        // 10 Hz band is about 3.3 x sqrt(4kT x 10 k x 11 Hz) = 0.15 µV: the boundary is Rf = (1 mV - 0.15 µV) / 100 nA
        // = 9.9985 kohm, printed to 3 digits on the fitting side: 9.99 kohm
        Stage s = StageLoader.parse("""
                topology: transimpedance
                rf: 15 kohm
                cf: 10 pF
                source-resistance: 1 Tohm
                source-capacitance: 10 pF
                band: {low: 0.1 Hz, high: 10 Hz, filter-order: 2}
                limit: 1 mV
                """, null);
        PartFixture p = PartFixture.ideal();
        p.ib = new Spread(null, 100e-9, null);
        p.gbw = 10e6;
        p.cin = 2e-12;
        Change c = changes(s, p).get(Change.Kind.LOWER_GAIN);
        assertEquals(9.99e3, c.values().get("rf"), 1e-9);
        // the network as built: Rf 9.99 k and Cf 10 pF x 15 k / 9.99 k = 15.015 pF, keeping Rf Cf (the signal
        // bandwidth) as it was
        Transimpedance t = (Transimpedance) c.network();
        assertEquals(9.99e3, t.rf(), 1e-9);
        assertEquals(10e-12 * 15e3 / 9.99e3, t.cf(), 1e-24);
        assertTrue(!changes(s, p).containsKey(Change.Kind.LOWER_SOURCE_RESISTANCE)); // a lower shunt only raises NG
    }

    @Test
    void aDifferenceStageIsOfferedBetterMatchedPairs() throws Exception {
        // gain 10 (r1 10 k, r2 100 k), 1 V of common mode at the source, pairs within 1 %: the worst common-mode
        // gain is at a = 10(1 + e), b = 10(1 - e): |b - a| / (1 + b) = 20e / (11 - 10e) (Difference's exact form,
        // solved by hand): 10 mV needs 20e = 0.11 - 0.1e, e = 0.54726 %. The four resistors' noise (18.2 kohm at the
        // inputs, NG 11, pi/2 x 10 Hz) takes 2.7 µV of the 10 mV, which moves e by 0.0001 %: 0.547 % printed
        Stage s = StageLoader.parse("""
                topology: difference
                gain: 10
                r2: 100 kohm
                common-mode-swing: 1 V
                band: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}
                resistor-ratio: {tolerance: 1 %}
                limit: 10 mV
                """, null);
        PartFixture p = PartFixture.ideal();
        p.gbw = 10e6;
        Change c = changes(s, p).get(Change.Kind.BETTER_RESISTORS);
        assertEquals(0.547e-2, c.values().get("ratioTolerance"), 1e-15);
    }
}
