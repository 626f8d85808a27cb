package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Chopping ripple at the output against the filter's transfer function built independently from its
 * poles (commons-math3 complex arithmetic), and alias frequencies against cases worked by hand.
 */
class ChoppingRippleTest {

    /**
     * |H(j f/fc)| of the normalised Butterworth low-pass of order n from its poles
     * s_k = exp(j π (2k + n - 1) / (2n)), k = 1..n, on the left half of the unit circle, H(s) = ∏(-s_k)/∏(s - s_k)
     * (Butterworth 1930; Williams &amp; Taylor, <i>Electronic Filter Design Handbook</i>, ch. 2 [from memory]).
     */
    private static double fromPoles(int n, double fc, double f) {
        Complex s = new Complex(0, f / fc);
        Complex num = Complex.ONE;
        Complex den = Complex.ONE;
        for (int k = 1; k <= n; k++) {
            Complex pole = new Complex(0, Math.PI * (2 * k + n - 1) / (2.0 * n)).exp();
            num = num.multiply(pole.negate());
            den = den.multiply(s.subtract(pole));
        }
        return num.divide(den).abs();
    }

    @Test
    void theFilterMatchesItsPoles() {
        for (int n = 1; n <= 8; n++) {
            for (double f : new double[] {0.0, 0.3e3, 1e3, 3.7e3, 100e3}) {
                double want = fromPoles(n, 1e3, f);
                assertEquals(
                        want,
                        ChoppingRippleTerm.butterworth(n, 1e3, f),
                        want * 1e-9,
                        "order " + n + " at " + f + " Hz");
            }
        }
        // at the corner every order is -3 dB: 1/√2
        assertEquals(Math.sqrt(0.5), fromPoles(4, 1e3, 1e3), 1e-12);
        assertEquals(1.0, ChoppingRippleTerm.butterworth(0, 1e3, 100e3), 0.0); // no filter
    }

    private static PartFixture chopper() {
        PartFixture p = PartFixture.ideal();
        p.architecture = Architecture.CHOPPER;
        p.input = InputType.CMOS;
        p.gbw = 10e6;
        p.chop = 100e3;
        p.ripple = 5e-6;
        p.inHead = new Headroom(1.5, 1.5);
        p.testConditions = new TestConditions(5.0, 2.5);
        return p;
    }

    /** Non-inverting, noise gain 10, band to 1 kHz with a filter of {@code order}. */
    private static Stage stage(int order) {
        StageFixture f = StageFixture.nonInverting(90e3, 10e3);
        f.fH = 1e3;
        f.filterOrder = order;
        f.supply = 5.0;
        return f.build();
    }

    @Test
    void theRippleAfterTheLoopAndTheFilterBySecondMethod() {
        // 5 µV at 100 kHz; the closed loop NG/(1 + j f NG/GBW) with NG 10, GBW 10 MHz, and the second-order filter
        // at 1 kHz, both evaluated here as complex numbers: |10/(1 + 0.1 j)| = 9.950372, |H| = 9.99999995e-5
        Complex loop = new Complex(10).divide(new Complex(1, 100e3 * 10 / 10e6));
        double want = 5e-6 * loop.abs() * fromPoles(2, 1e3, 100e3);
        assertEquals(4.975186e-9, want, 1e-15); // by hand: 5 µV x 9.950372 x 1e-4
        TermResult t = BudgetCalculator.compute(stage(2), chopper().build()).term(ChoppingRippleTerm.KEY);
        assertEquals(want, t.outputV(), want * 1e-9);
        assertEquals(TermKind.OPERATING_POINT, t.kind());
    }

    @Test
    void withoutAFilterOnlyTheLoopAttenuates() {
        Complex loop = new Complex(10).divide(new Complex(1, 0.1));
        TermResult t = BudgetCalculator.compute(stage(0), chopper().build()).term(ChoppingRippleTerm.KEY);
        assertEquals(5e-6 * loop.abs(), t.outputV(), 1e-15); // 49.75 µV
    }

    @Test
    void aMissingRippleIsAssumedAndFlagged() {
        // Assumed.CHOPPING_RIPPLE 20 µV, four times the typed 5 µV
        PartFixture p = chopper();
        p.ripple = null;
        Budget b = BudgetCalculator.compute(stage(0), p.build());
        TermResult t = b.term(ChoppingRippleTerm.KEY);
        assertEquals(20e-6 * new Complex(10).divide(new Complex(1, 0.1)).abs(), t.outputV(), 1e-15);
        assertTrue(t.estimated());
    }

    @Test
    void aStandardPartHasNoRipple() {
        PartFixture p = chopper();
        p.architecture = Architecture.STANDARD;
        assertEquals(
                0.0,
                BudgetCalculator.compute(stage(0), p.build())
                        .term(ChoppingRippleTerm.KEY)
                        .outputV(),
                0.0);
    }

    @Test
    void aliasesWorkedByHand() {
        // fchop 100 kHz sampled at 30 kHz: 100 - 3 x 30 = 10 kHz; 200 - 7 x 30 = -10; 300 = 10 x 30 -> 0 Hz (an
        // offset);
        // 400 - 13 x 30 = 10; 500 - 17 x 30 = -10
        List<ChoppingRippleTerm.Alias> all = ChoppingRippleTerm.aliases(100e3, 30e3, 10e3);
        assertEquals(
                List.of(1, 2, 3, 4, 5),
                all.stream().map(ChoppingRippleTerm.Alias::harmonic).toList());
        assertEquals(10e3, all.get(0).alias(), 1e-6);
        assertEquals(0.0, all.get(2).alias(), 1e-6);
        // a 1 kHz band keeps only the third harmonic's 0 Hz
        List<ChoppingRippleTerm.Alias> dc = ChoppingRippleTerm.aliases(100e3, 30e3, 1e3);
        assertEquals(1, dc.size());
        assertEquals(3, dc.get(0).harmonic());
        assertEquals(300e3, dc.get(0).frequency(), 1e-6);
        // 100 kHz at 96 kHz: 4 kHz (harmonics: 8, 12, 16, 20 kHz), inside a 5 kHz band
        List<ChoppingRippleTerm.Alias> one = ChoppingRippleTerm.aliases(100e3, 96e3, 5e3);
        assertEquals(1, one.size());
        assertEquals(4e3, one.get(0).alias(), 1e-6);
        // 250 kHz at 1 MHz: the fourth harmonic lands on 0 Hz; the others at 250 or 500 kHz
        List<ChoppingRippleTerm.Alias> fourth = ChoppingRippleTerm.aliases(250e3, 1e6, 1e3);
        assertEquals(
                List.of(4),
                fourth.stream().map(ChoppingRippleTerm.Alias::harmonic).toList());
    }

    @Test
    void theBudgetNamesTheAliasFrequency() {
        Stage s = stage(2).toBuilder().bandHigh(5e3).sampleRate(96e3).build();
        Budget b = BudgetCalculator.compute(s, chopper().build());
        // 100 kHz sampled at 96 kHz lands at 100 - 96 = 4 kHz, inside the 5 kHz band (by hand)
        assertTrue(
                b.assumptions().contains(new Assumption.ChoppingAlias(1, 100e3, 96e3, 4e3, 5e3)),
                b.assumptions().toString());
        // without a sample rate nothing is said
        Budget none = BudgetCalculator.compute(
                stage(2).toBuilder().bandHigh(5e3).build(), chopper().build());
        assertTrue(none.assumptions().stream().noneMatch(a -> a.rule() == Assumption.Rule.CHOPPING_ALIAS));
    }
}
