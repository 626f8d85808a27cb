package dev.ampsieve.testing;

import dev.ampsieve.advice.BudgetFunction;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.TermWorking;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Follower;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.util.ArrayList;
import java.util.List;

/**
 * Stages, parts and engines shared by the advice tests (which check the numbers) and the
 * {@code report} tests (which check the words of the same advice).
 */
public final class AdviceFixtures {
    private AdviceFixtures() {}

    /**
     * A follower fed from {@code rs}, 0..70 °C, no gain terms (no full scale), no supply or
     * common-mode change, no service life, band 0.1 to 10 Hz (first order), worst case against
     * {@code limitV} at the output, no trim.
     */
    public static Stage follower(double rs, double limitV) {
        return new Stage(
                new Follower(0, rs, 0),
                0,
                70,
                5.0,
                0,
                0,
                null,
                null,
                0.1,
                10,
                1,
                null,
                0,
                0,
                0,
                Limit.output(limitV),
                Criterion.WORST_CASE,
                3,
                2000,
                2000,
                1L,
                Trim.NONE,
                1000,
                null,
                false,
                null,
                null,
                Board.NONE,
                null);
    }

    /**
     * A bipolar part (catalog figures as for the {@link #follower} stage): vos 100 µV, drift 1 µV/°C, IB 2 nA at 25 °C and
     * 4 nA over temperature, IOS 1 nA, no noise of its own.
     */
    public static Part bipolar() {
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, null).drift(null, 1e-6);
        p.id = "BIP";
        p.input = InputType.BIPOLAR;
        p.ib = new Spread(null, 2e-9, 4e-9);
        p.ios = new Spread(null, 1e-9, null);
        // the stage's own supply and common mode: no operating-point shift, none estimated
        p.testConditions = new TestConditions(5.0, 2.5);
        return p.build();
    }

    /** LinearEngine plus a finite open-loop gain term VFS x NG / (A + NG) (Sedra & Smith ch. 2). */
    public static BudgetFunction withGainError(double a) {
        LinearEngine linear = new LinearEngine();
        return (s, p) -> {
            Budget b = linear.compute(s, p);
            double vfs = s.fullScaleOutput() == null ? 0 : s.fullScaleOutput();
            double g = vfs * s.noiseGain() / (a + s.noiseGain());
            List<TermResult> terms = new ArrayList<>(b.terms());
            terms.add(new TermResult(
                    "open-loop-gain",
                    "open-loop gain",
                    g,
                    g / s.sourceGain(),
                    Double.NaN,
                    false,
                    TermWorking.plain("test")));
            double wc = b.worstCaseV() + g;
            Verdict v = wc <= b.limitV() ? Verdict.FITS : Verdict.NO_FIT;
            return new Budget(
                    p,
                    s,
                    b.noiseGain(),
                    terms,
                    wc,
                    wc,
                    0,
                    b.limitV(),
                    b.yield(),
                    b.trimmed(),
                    v,
                    b.limitingTerm(),
                    b.constraints(),
                    List.of());
        };
    }

    /**
     * LinearEngine with a yield whose lower end is 95.04 % at targets of 99 % and above and
     * 94.93 % below them (a Monte Carlo that stops at a different point for a lower target).
     */
    public static BudgetFunction yieldStoppingEarly() {
        return (st, pt) -> {
            double target = st.criterion().yieldTarget();
            double low = target >= 0.99 ? 0.9504 : 0.9493;
            Budget b = new LinearEngine().compute(st, pt);
            return new Budget(
                    pt,
                    st,
                    b.noiseGain(),
                    b.terms(),
                    b.worstCaseV(),
                    b.rssV(),
                    0,
                    b.limitV(),
                    new YieldResult(0.96, low, 0.97, 20000, "sampled"),
                    b.trimmed(),
                    low >= target ? Verdict.FITS : Verdict.NO_FIT,
                    b.limitingTerm(),
                    b.constraints(),
                    List.of());
        };
    }

    /** JFET input, IB 10 pA at 25 °C doubling every 10 °C (10.24 nA at 125 °C), drift 1 µV/°C, 1 mA, 200 °C/W. */
    public static Part hotPart() {
        PartFixture p = PartFixture.ideal();
        p.input = InputType.JFET;
        p.temperature = new Range(-40, 125);
        p.ib = new Spread(null, 10e-12, 10.24e-9);
        p.ios = new Spread(null, 0.0, 0.0);
        p.drift = new Spread(null, 1e-6, null);
        p.iq = 1e-3;
        p.thetaJa = 200.0;
        p.testConditions = new TestConditions(10.0, 5.0);
        return p.build();
    }

    /** Follower from 1 Mohm, 10 V, 0..70 °C, full scale 2.5 V, a 100 ohm load, limit 350 µV. */
    public static Stage hotStage() {
        StageFixture f = StageFixture.follower();
        f.rs = 1e6;
        f.supply = 10.0;
        f.fullScale = 2.5;
        return f.limitV(350e-6).build().toBuilder().loadResistance(100.0).build();
    }

    /** A chopper with no noise of its own, 20 µV ripple at 100 kHz, GBW 10 MHz, CMOS input on 5 V. */
    public static Part ripplingChopper() {
        PartFixture f = PartFixture.ideal();
        f.architecture = Architecture.CHOPPER;
        f.input = InputType.CMOS;
        f.gbw = 10e6;
        f.chop = 100e3;
        f.ripple = 20e-6;
        f.inHead = new Headroom(1.5, 1.5);
        f.testConditions = new TestConditions(5.0, 2.5);
        return f.build();
    }

    /** Follower from 0 ohm on 5 V, band edge 1 kHz with no filter, limit 10 µV. */
    public static Stage unfilteredStage() {
        StageFixture sf = StageFixture.follower();
        sf.supply = 5.0;
        sf.fH = 1e3;
        sf.filterOrder = 0;
        return sf.limitV(10e-6).build();
    }
}
