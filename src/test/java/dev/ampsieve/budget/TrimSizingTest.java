package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Trim circuits sized by hand. The stage: inverting, Rf = 10 kohm, Rg = 1 kohm, so NG = 11 and the
 * signal gain 10; the part: vos.max 1 mV, nothing else, so the worst untrimmed offset is
 * 11 x 1 mV = 11 mV at the output. Every default of {@link TrimCircuit} is common practice.
 */
class TrimSizingTest {

    private static Trim trim(TrimCircuit c) {
        return new Trim(true, Trim.Method.ONE_POINT, 0, 0.5, Double.NaN, Double.NaN, c, List.of(c.kind()));
    }

    private static Stage stage(TrimCircuit c) {
        StageFixture f = StageFixture.inverting(10e3, 1e3);
        f.trim = trim(c);
        return f.build();
    }

    private static Part part(double vos, boolean nullPins) {
        PartFixture p = PartFixture.ideal().vos(null, vos, null);
        p.nullPins = nullPins;
        return p.build();
    }

    private static SizedTrim size(Stage s, Part p) {
        return TrimSizing.of(s, PartValues.of(p, s));
    }

    @Test
    void injectionIntoTheSummingNode() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.INJECTION);
        SizedTrim t = size(stage(c), part(1e-3, false));
        assertEquals(11e-3, t.offsetV(), 1e-15);
        // needed range 1.5 x 11 mV = 16.5 mV; u = 2.5 V; Rinj <= u Rf / range = 2.5 x 10k / 16.5 mV = 1.51515 Mohm
        assertEquals(1.515152e6, t.idealResistance(), 1);
        // IEC 60063 E96: 1.50 Mohm is the largest value not above (1.54 Mohm would shrink the range)
        assertEquals(1.50e6, t.injectionResistance());
        // range 2.5 V x 10k / 1.5M = 16.667 mV at the output, either way
        assertEquals(16.6667e-3, t.rangeV(), 1e-7);
        // resolution: 0.1 % settability x the whole travel 2 x 16.667 mV = 33.33 uV
        assertEquals(33.333e-6, t.resolutionV(), 1e-9);
        // noise gain 1 + Rf/(Rg || Rinj) = 11 + 10k/1.5M = 11.006667
        assertEquals(11.006667, t.noiseGain(), 1e-6);
        assertEquals(0.0, t.gainChange()); // inverting: the signal gain stays Rf/Rg
        // drift: c = 11 mV x (20 ppm reference + 2 x 25 ppm ratio + 100 ppm x 2.5k/(1.5M + 2.5k)) per °C
        //      = 11 mV x (70 + 0.16639) ppm = 0.77183 uV/°C at the output; 77.18 nV/°C at the input (gain 10)
        assertEquals(0.77183e-6, t.driftOutVPerC(), 1e-11);
        assertEquals(77.183e-9, t.driftInVPerC(), 1e-12);
        assertTrue(t.covers());
        // parts: reference 0.60 + trimmer 0.40 + resistor 0.01 + hand adjustment 0.75
        assertEquals(1.76, t.partsCost(), 1e-12);
    }

    @Test
    void injectionIntoThePlusInput() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.INJECTION);
        c = new TrimCircuit(
                c.kind(),
                c.margin(),
                TrimCircuit.Node.PLUS,
                c.reference(),
                c.referenceTempco(),
                c.resistorTempco(),
                c.tracking(),
                c.potSettability(),
                c.potTempco(),
                c.potResistance(),
                c.dacBits(),
                c.dacReference(),
                c.dacOffsetDrift(),
                c.dacGainDrift(),
                c.potCost(),
                c.referenceCost(),
                c.resistorCost(),
                c.dacCost(),
                c.adjustCost());
        StageFixture f = StageFixture.inverting(10e3, 1e3);
        f.rp = 1e3; // balance resistor from + to ground: R+ = 1 kohm
        f.trim = trim(c);
        SizedTrim t = size(f.build(), part(1e-3, false));
        // range NG u R+/(R+ + Rinj) >= 16.5 mV: Rinj <= 11 x 2.5 x 1k / 16.5 mV - 1k = 1.665667 Mohm -> E96 1.65 Mohm
        assertEquals(1.665667e6, t.idealResistance(), 1);
        assertEquals(1.65e6, t.injectionResistance());
        // 11 x 2.5 V x 1k / 1.651 Mohm = 16.657 mV
        assertEquals(16.6566e-3, t.rangeV(), 1e-7);
        assertEquals(11.0, t.noiseGain(), 1e-12); // nothing added at the summing node
    }

    @Test
    void dacSizedForTheRangeWithItsLsb() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.DAC);
        SizedTrim t = size(stage(c), part(1e-3, false));
        // midscale injects nothing: u = 2.5 V / 2 = 1.25 V; Rinj <= 1.25 x 10k / 16.5 mV = 757.58 kohm -> E96 750 kohm
        assertEquals(750e3, t.injectionResistance());
        assertEquals(16.6667e-3, t.rangeV(), 1e-7); // 1.25 x 10k/750k
        // LSB: 2.5 V / 2^8 = 9.765625 mV at the DAC, x 10k/750k = 130.21 uV at the output
        assertEquals(130.208e-6, t.resolutionV(), 1e-9);
        // drift: K = 0.013333, c = 11 mV, c/K = 0.825 V;
        // (10 uV + 10 ppm x (1.25 + 0.825) V) x K + 11 mV x 50 ppm = 30.75 uV x 0.013333 + 0.55 uV = 0.96 uV/°C
        assertEquals(0.96e-6, t.driftOutVPerC(), 1e-11);
        assertEquals(0.91, t.partsCost(), 1e-12); // DAC 0.90 + resistor 0.01
    }

    @Test
    void nullPinDriftRuleWorkedByHand() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.NULL_PINS);
        Stage s = stage(c);
        Part p = part(2e-3, true);
        SizedTrim t = size(s, p);
        // pins' range taken as NG x vos.max = 22 mV, which is the whole offset: covered
        assertEquals(22e-3, t.rangeV(), 1e-15);
        assertTrue(t.covers());
        // rule of thumb (common practice): nulling 2 mV at the pins adds about 2 mV / T; at 298.15 K that is
        // 6.708 uV/°C ("some 3.3 uV/°C per mV"), plus the trimmer: 2 mV x 100 ppm = 0.2 uV/°C -> 6.908 uV/°C
        // at the pins, x NG 11 = 75.99 uV/°C at the output
        assertEquals(75.99e-6, t.driftOutVPerC(), 0.01e-6);
        // over 0..70 °C the largest distance from 25 °C is 45 °C: 3.4195 mV at the output
        Budget b = BudgetCalculator.compute(s, p);
        TermResult term = b.term(NullPinDriftTerm.KEY);
        assertEquals(3.4195e-3, term.outputV(), 0.001e-3);
        // the resistors' thermal noise (Rf, Rg; about 0.6 uV here) is the one other term of this ideal part
        double noise = b.term(NoiseTerm.KEY).outputV();
        // untrimmed totals leave the circuit's term out: only the 22 mV offset counts
        assertEquals(22e-3 + noise, b.worstCaseV(), 1e-12);
        // after the trim: the null-pin drift plus the resolution 0.1 % x 2 x 22 mV = 44 uV
        assertEquals(3.4195e-3 + 44e-6 + noise, b.trimmed().worstCaseV(), 0.001e-3);
    }

    @Test
    void nullPinsOnAPartWithoutThemLeaveTheOffset() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.NULL_PINS);
        Stage s = stage(c);
        Part p = part(1e-3, false);
        SizedTrim t = size(s, p);
        assertEquals(SizedTrim.Unusable.NO_NULL_PINS, t.unusable());
        assertFalse(t.covers());
        // nothing is trimmed: the 11 mV offset stays in the trimmed total (beside the resistors' noise)
        Budget b = BudgetCalculator.compute(s, p);
        assertEquals(11e-3 + b.term(NoiseTerm.KEY).outputV(), b.trimmed().worstCaseV(), 1e-12);
    }

    @Test
    void pinsThatDoNotReachTheBiasOffsetLeaveIt() {
        TrimCircuit c = TrimCircuit.defaults(TrimCircuit.Kind.NULL_PINS);
        Stage s = stage(c);
        PartFixture pf = PartFixture.ideal().vos(null, 1e-3, null);
        pf.nullPins = true;
        pf.ib = new Spread(null, 100e-9, 100e-9);
        pf.ios = new Spread(null, 100e-9, 100e-9);
        Part p = pf.build();
        SizedTrim t = size(s, p);
        // bias error at 25 °C (inverting, R+ = 0): |NG R+ - Rf| IB + (NG R+ + Rf) IOS/2 = 10k x 100n + 10k x 50n = 1.5
        // mV
        assertEquals(11e-3 + 1.5e-3, t.offsetV(), 1e-12);
        assertEquals(1.5e-3, t.uncoveredV(), 1e-12);
    }

    @Test
    void aFollowerHasNoSummingNodeResistor() {
        StageFixture f = StageFixture.follower();
        f.trim = trim(TrimCircuit.defaults(TrimCircuit.Kind.INJECTION));
        SizedTrim t = size(f.build(), part(1e-3, false));
        assertEquals(SizedTrim.Unusable.NO_FEEDBACK_RESISTOR, t.unusable());
    }

    @Test
    void aStoredCorrectionKeepsTodaysTrim() {
        StageFixture f = StageFixture.inverting(10e3, 1e3);
        f.trim = new Trim(true, Trim.Method.ONE_POINT, 0.1e-3, 0.5);
        Stage s = f.build();
        Budget b = BudgetCalculator.compute(s, part(1e-3, false));
        assertEquals(TrimCircuit.Kind.STORED, b.trimmed().circuit().kind());
        // the resolution alone, beside the resistors' noise
        assertEquals(0.1e-3 + b.term(NoiseTerm.KEY).outputV(), b.trimmed().worstCaseV(), 1e-15);
        assertEquals(0.5, s.trim().totalCost(), 0);
    }
}
