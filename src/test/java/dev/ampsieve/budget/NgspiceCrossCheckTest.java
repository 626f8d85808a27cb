package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.testing.Networks;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Outside check of the DC and noise models against ngspice (issue 3, point 6).
 *
 * <p>Each stage is a netlist around an ideal amplifier: a VCVS of gain {@link #A} = 1e6
 * (large enough to be near ideal, small enough to keep the solver's round-off below 1e-12,
 * ngspice-notes.md), so every result is compared with the ideal value divided by
 * {@code 1 + NG/A}, the exact closed-loop factor of a finite gain.
 *
 * <p>Conventions, the same as {@link DcModel}: the offset is a DC source in series with the
 * + input ({@code V(+internal) = V(+pin) + VOS}); bias currents flow INTO the pins, modelled as
 * current sources from each pin to ground ({@code I pin 0 DC ib} draws {@code ib} out of the
 * pin's node, as the amplifier's input would). Swapping a current source's nodes would switch
 * the convention and flip the sign of its term.
 *
 * <p>Noise: ngspice has no white source usable in {@code .noise}, so each amplifier noise is
 * a 1 kohm generator resistor on a private node, scaled by a noiseless controlled source:
 * the voltage noise a VCVS in series with the + input, the current noise a VCCS into each pin
 * with its own generator (uncorrelated). ngspice's Boltzmann constant is the CODATA 2014 value
 * {@link #K_NGSPICE}; the generators are scaled with it so they give exactly en and in, and
 * the resistors' own 4kTR differs from the exact SI value by 3.5e-7 in power (1.8e-7 in rms),
 * well inside the 1e-5 tolerance.
 */
class NgspiceCrossCheckTest {

    /** Open-loop gain of the ideal amplifier's VCVS. */
    static final double A = 1e6;
    /** Boltzmann constant ngspice uses: CODATA 2014 (ngspice-notes.md, measured). */
    static final double K_NGSPICE = 1.38064852e-23;
    /** Boltzmann constant, exact since the SI Brochure, 9th ed. (2019). */
    static final double K_SI = 1.380649e-23;
    /** 25 °C in kelvin; the netlists set {@code .options temp=25 tnom=25} (default would be 27 °C). */
    static final double T = 298.15;

    static final double GENERATOR_OHMS = 1e3;

    /**
     * One stage with an amplifier's offset, bias currents and white noise densities.
     * rg is infinite for a follower; rf = 0 means direct feedback.
     */
    record Combo(
            String name,
            Topology topology,
            double rf,
            double rg,
            double rs,
            double rp,
            double vos,
            double ibPlus,
            double ibMinus,
            double en,
            double in,
            double f1,
            double f2) {
        @Override
        public String toString() {
            return name;
        }

        Stage stage() {
            return new Stage(
                    Networks.of(topology, rf, rg, rs, rp),
                    0,
                    70,
                    null,
                    0,
                    0,
                    null,
                    null,
                    f1,
                    f2,
                    1,
                    null,
                    0,
                    0,
                    0,
                    Limit.output(1e-3),
                    Criterion.WORST_CASE,
                    3,
                    20_000,
                    1_000_000,
                    1,
                    Trim.NONE,
                    1000,
                    null,
                    false,
                    null,
                    null,
                    Board.NONE,
                    null);
        }

        /** Noise gain from the resistors, written out here rather than taken from Stage. */
        double ng() {
            return switch (topology) {
                case FOLLOWER -> 1.0;
                case NON_INVERTING -> 1.0 + rf / rg;
                case INVERTING -> 1.0 + rf / (rg + rs);
                case DIFFERENCE, TRANSIMPEDANCE -> throw new IllegalArgumentException("checked in their own tests");
            };
        }
    }

    private static final double INF = Double.POSITIVE_INFINITY;
    private static final double PARALLEL_100K_1K = 100e3 * 1e3 / (100e3 + 1e3);

    static final Combo NON_INV_G100 = new Combo(
            "non-inverting, NG 100, source and balance resistors",
            Topology.NON_INVERTING,
            99e3,
            1e3,
            350,
            649,
            1e-3,
            105e-9,
            95e-9,
            10e-9,
            1e-12,
            10,
            10e3);
    static final Combo NON_INV_G1001 = new Combo(
            "non-inverting, NG 1001",
            Topology.NON_INVERTING,
            1e6,
            1e3,
            100,
            900,
            -25e-6,
            2e-9,
            1.5e-9,
            3e-9,
            0.4e-12,
            0.1,
            10);
    static final Combo NON_INV_BALANCED = new Combo(
            "non-inverting, R+ = Rf||Rg split between source and balance",
            Topology.NON_INVERTING,
            100e3,
            1e3,
            390,
            PARALLEL_100K_1K - 390,
            -50e-6,
            105e-9,
            95e-9,
            8e-9,
            0.8e-12,
            1,
            1e3);
    static final Combo INV_NG11 = new Combo(
            "inverting, NG 11 with the source in series with Rg",
            Topology.INVERTING,
            100e3,
            9.9e3,
            100,
            9.09e3,
            -0.3e-3,
            2e-9,
            2.5e-9,
            5e-9,
            0.5e-12,
            10,
            20e3);
    static final Combo INV_G99 = new Combo(
            "inverting, gain -99",
            Topology.INVERTING,
            99e3,
            1e3,
            47,
            1e3,
            0.2e-3,
            30e-9,
            45e-9,
            12e-9,
            2e-12,
            0.1,
            100);
    static final Combo FOLLOWER_RF = new Combo(
            "follower with a feedback resistor",
            Topology.FOLLOWER,
            10e3,
            INF,
            8.2e3,
            1.8e3,
            2e-3,
            300e-9,
            250e-9,
            15e-9,
            0.6e-12,
            1,
            50e3);
    static final Combo FOLLOWER_DIRECT = new Combo(
            "follower, direct feedback, currents out of the pins",
            Topology.FOLLOWER,
            0,
            INF,
            1e3,
            2.2e3,
            0.5e-3,
            -40e-9,
            -35e-9,
            4e-9,
            3e-12,
            0.5,
            5e3);
    /** reference-checks.md §2 "Compensated": IB+ 105 nA, IB- 95 nA, Rp = Rf||Rg, G 101 -> -1.000 mV. */
    static final Combo REF_COMPENSATED = new Combo(
            "reference: compensated bias currents",
            Topology.NON_INVERTING,
            100e3,
            1e3,
            0,
            PARALLEL_100K_1K,
            0,
            105e-9,
            95e-9,
            1e-9,
            1e-15,
            1,
            10);
    /** reference-checks.md §2 "No compensation": IB- 95 nA, Rf 100 k, Rp 0 -> +9.50 mV. */
    static final Combo REF_UNCOMPENSATED = new Combo(
            "reference: no bias compensation",
            Topology.NON_INVERTING,
            100e3,
            1e3,
            0,
            0,
            0,
            105e-9,
            95e-9,
            1e-9,
            1e-15,
            1,
            10);
    /** reference-checks.md §3 N2: non-inverting, Rs 1k, Rf 9k, Rg 1k, en 10 nV, in 1 pA. */
    static final Combo REF_N2 = new Combo(
            "reference N2", Topology.NON_INVERTING, 9e3, 1e3, 1e3, 0, 100e-6, 10e-9, 12e-9, 10e-9, 1e-12, 10, 10e3);
    /** reference-checks.md §3 N3: inverting, Rf 100k, Rg 10k, Rp 0, en 5 nV, in 0.5 pA. */
    static final Combo REF_N3 = new Combo(
            "reference N3", Topology.INVERTING, 100e3, 10e3, 0, 0, 1e-3, 10e-9, 12e-9, 5e-9, 0.5e-12, 10, 1e3);

    static Stream<Combo> combos() {
        return Stream.of(
                NON_INV_G100,
                NON_INV_G1001,
                NON_INV_BALANCED,
                INV_NG11,
                INV_G99,
                FOLLOWER_RF,
                FOLLOWER_DIRECT,
                REF_COMPENSATED,
                REF_UNCOMPENSATED,
                REF_N2,
                REF_N3);
    }

    // ------------------------------------------------------------------ netlist

    /** The stage as an ngspice netlist that prints v(out) at DC and onoise_total over [f1, f2]. */
    static String netlist(Combo c) {
        StringBuilder n = new StringBuilder();
        n.append("* ampsieve cross-check: ").append(c.name()).append('\n'); // the first line is the title
        n.append(".options temp=25 tnom=25\n");
        // the signal source: 0 V at DC, the reference input of the noise analysis
        n.append("Vsig src 0 DC 0 AC 1\n");
        switch (c.topology()) {
            case NON_INVERTING, FOLLOWER -> {
                Ngspice.resistor(n, "Rs", "src", "mid", c.rs());
                Ngspice.resistor(n, "Rp", "mid", "pinp", c.rp()); // in series with the source (error-model.md)
            }
            case INVERTING -> {
                Ngspice.resistor(n, "Rs", "src", "mid", c.rs());
                Ngspice.resistor(n, "Rg", "mid", "pinn", c.rg());
                Ngspice.resistor(n, "Rp", "pinp", "0", c.rp());
            }
        }
        if (c.topology() == Topology.NON_INVERTING) {
            Ngspice.resistor(n, "Rg", "pinn", "0", c.rg());
        }
        Ngspice.resistor(n, "Rf", "out", "pinn", c.rf());
        // offset in series with the + input: V(nvos) = V(pinp) + VOS
        n.append("Vos nvos pinp DC ").append(Ngspice.num(c.vos())).append('\n');
        // amplifier voltage noise, in series after the offset
        double unitGenerator = Math.sqrt(4 * K_NGSPICE * T * GENERATOR_OHMS);
        n.append("Een namp nvos gen_en 0 ")
                .append(Ngspice.num(c.en() / unitGenerator))
                .append('\n');
        n.append("Rgen_en gen_en 0 ").append(Ngspice.num(GENERATOR_OHMS)).append('\n');
        // bias currents INTO the pins: each source carries its current from the pin node to ground
        n.append("Ibp pinp 0 DC ").append(Ngspice.num(c.ibPlus())).append('\n');
        n.append("Ibm pinn 0 DC ").append(Ngspice.num(c.ibMinus())).append('\n');
        // current noise at each pin, each from its own generator so the two are uncorrelated
        n.append("Gip pinp 0 gen_ip 0 ")
                .append(Ngspice.num(c.in() / unitGenerator))
                .append('\n');
        n.append("Rgen_ip gen_ip 0 ").append(Ngspice.num(GENERATOR_OHMS)).append('\n');
        n.append("Gim pinn 0 gen_im 0 ")
                .append(Ngspice.num(c.in() / unitGenerator))
                .append('\n');
        n.append("Rgen_im gen_im 0 ").append(Ngspice.num(GENERATOR_OHMS)).append('\n');
        n.append("Eamp out 0 namp pinn ").append(Ngspice.num(A)).append('\n');
        n.append(".control\n");
        n.append("set numdgt=15\n");
        n.append("op\n");
        n.append("print v(out)\n");
        // lin 2: exactly f1 and f2 (a sweep stops at the last point at or below the stop frequency)
        n.append("noise v(out) vsig lin 2 ")
                .append(Ngspice.num(c.f1()))
                .append(' ')
                .append(Ngspice.num(c.f2()))
                .append('\n');
        n.append("setplot noise2\n");
        n.append("print onoise_total\n");
        n.append("quit\n"); // without it ngspice exits with code 1
        n.append(".endc\n");
        n.append(".end\n");
        return n.toString();
    }

    record Result(double dcOut, double noiseRms) {}

    static Result simulate(Combo c) throws Exception {
        Map<String, Double> v = Ngspice.run(netlist(c), List.of("v(out)", "onoise_total"));
        return new Result(v.get("v(out)"), v.get("onoise_total"));
    }

    // ------------------------------------------------------------------ textbook forms, written independently

    /**
     * Output error of an ideal amplifier, currents into the pins, by superposition
     * (reference-checks.md §2: Vout = IB-·Rf - IB+·Rp·(1 + Rf/Rg); Eggleston §6.4 eqs. 6.16-6.18;
     * Franco4 ch. 5 [from memory]). The source resistance on the + input counts in Rp.
     */
    static double textbookDc(Combo c) {
        return switch (c.topology()) {
            case NON_INVERTING ->
                (1 + c.rf() / c.rg()) * (c.vos() - c.ibPlus() * (c.rs() + c.rp())) + c.ibMinus() * c.rf();
            case INVERTING -> (1 + c.rf() / (c.rg() + c.rs())) * (c.vos() - c.ibPlus() * c.rp()) + c.ibMinus() * c.rf();
            case FOLLOWER -> c.vos() - c.ibPlus() * (c.rs() + c.rp()) + c.ibMinus() * c.rf();
            case DIFFERENCE, TRANSIMPEDANCE -> throw new IllegalArgumentException("checked in their own tests");
        };
    }

    /**
     * White output noise density, V/√Hz, source by source as reference-checks.md §3 N3 lists
     * them (en·NG, in·R+·NG, in·Rf, each resistor's √(4kTR) times its own gain to the output;
     * uncorrelated sources add in power, Franco4 ch. 7, AoE3 ch. 8 [from memory]).
     */
    static double textbookDensity(Combo c, double k) {
        double fourKT = 4 * k * T;
        double ng = c.ng();
        double rPlus = c.topology() == Topology.INVERTING ? c.rp() : c.rs() + c.rp();
        double p = sq(c.en() * ng) + sq(c.in() * rPlus * ng) + fourKT * rPlus * sq(ng) + sq(c.in() * c.rf());
        // Rf's own noise reaches the output with gain 1 (the - input is held by the + input)
        p += fourKT * c.rf();
        if (c.topology() != Topology.FOLLOWER) {
            // the resistance to the reference from the - input (Rg, or Rg + Rs inverting) at gain Rf/Rg'
            double rg = c.topology() == Topology.INVERTING ? c.rg() + c.rs() : c.rg();
            p += fourKT * rg * sq(c.rf() / rg);
        }
        return Math.sqrt(p);
    }

    private static double sq(double x) {
        return x * x;
    }

    private static void assertRelative(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, Math.abs(expected) * rel, what);
    }

    // ------------------------------------------------------------------ checks

    @ParameterizedTest(name = "{0}")
    @MethodSource("combos")
    void dcOutputAndNoiseAgreeWithTheTextbookForm(Combo c) throws Exception {
        Result r = simulate(c);
        double finiteGain = 1 + c.ng() / A;
        assertRelative(textbookDc(c) / finiteGain, r.dcOut(), 1e-9, "DC output, " + c);
        // ngspice's resistors use K_NGSPICE; the closed form with the same constant agrees to round-off
        double rms = textbookDensity(c, K_NGSPICE) * Math.sqrt(c.f2() - c.f1());
        assertRelative(rms / finiteGain, r.noiseRms(), 1e-9, "output noise, " + c);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("combos")
    void engineAgreesWithNgspice(Combo c) throws Exception {
        Result r = simulate(c);
        Stage s = c.stage();
        double finiteGain = 1 + s.noiseGain() / A;
        // DcModel: ideal amplifier, currents into the pins; ngspice's A = 1e6 corrected exactly
        assertRelative(
                DcModel.outputError(s, c.vos(), c.ibPlus(), c.ibMinus()) / finiteGain, r.dcOut(), 1e-9, "DC, " + c);
        // the coefficients the terms and the Monte Carlo evaluate (IB the mean of the two pin currents, IOS their
        // difference)
        double ib = (c.ibPlus() + c.ibMinus()) / 2;
        double ios = c.ibPlus() - c.ibMinus();
        assertRelative(DcModel.of(s).error(c.vos(), ib, ios) / finiteGain, r.dcOut(), 1e-9, "DcModel.of, " + c);
        // NoiseModel with white noise only (corners 0) over [f1, f2] at 25 °C; it uses the exact SI k, ngspice CODATA
        // 2014
        double engine = NoiseModel.outputRms(s, c.en(), 0, c.in(), 0, c.f1(), c.f2(), T);
        assertRelative(engine / finiteGain, r.noiseRms(), 1e-5, "noise, " + c);
    }

    @Test
    void compensatedBiasLeavesMinusIosTimesRf() throws Exception {
        // reference-checks.md §2 (Eggleston §6.4): -1.000 mV = -IOS·Rf, 1e-9 relative
        Result r = simulate(REF_COMPENSATED);
        assertRelative(-1.000e-3, r.dcOut() * (1 + REF_COMPENSATED.ng() / A), 1e-9, "compensated");
    }

    @Test
    void uncompensatedMinusInputCurrentGivesPlusIbTimesRf() throws Exception {
        // reference-checks.md §2: IB- 95 nA into the - input, Rf 100 k, Rp 0 -> +9.50 mV (the sign fixes the
        // convention)
        Result r = simulate(REF_UNCOMPENSATED);
        assertRelative(9.50e-3, r.dcOut() * (1 + REF_UNCOMPENSATED.ng() / A), 1e-9, "uncompensated");
    }

    @Test
    void noiseDensitiesMatchThePublishedExamples() throws Exception {
        // reference-checks.md §3 N2: 11.5367 nV/√Hz at the input x NG 10; N3: 153.744 nV/√Hz at the output; tolerance
        // 0.01 %
        assertRelative(115.367e-9, textbookDensity(REF_N2, K_SI), 1e-4, "N2 textbook");
        assertRelative(153.744e-9, textbookDensity(REF_N3, K_SI), 1e-4, "N3 textbook");
        Result n2 = simulate(REF_N2);
        Result n3 = simulate(REF_N3);
        double bw2 = Math.sqrt(REF_N2.f2() - REF_N2.f1());
        double bw3 = Math.sqrt(REF_N3.f2() - REF_N3.f1());
        assertRelative(115.367e-9, n2.noiseRms() * (1 + REF_N2.ng() / A) / bw2, 1e-4, "N2 ngspice");
        assertRelative(153.744e-9, n3.noiseRms() * (1 + REF_N3.ng() / A) / bw3, 1e-4, "N3 ngspice");
    }

    // ------------------------------------------------------------------ the bias term over temperature

    /** The three topologies with resistors large enough that pA to nA currents give a clear output. */
    static Stream<Combo> biasTopologies() {
        return Stream.of(
                new Combo(
                        "non-inverting NG 11, R+ 50 k",
                        Topology.NON_INVERTING,
                        1e6,
                        100e3,
                        20e3,
                        30e3,
                        0,
                        0,
                        0,
                        0,
                        0,
                        1,
                        10),
                new Combo(
                        "inverting NG 11, Rs in series with Rg",
                        Topology.INVERTING,
                        1e6,
                        90e3,
                        10e3,
                        47e3,
                        0,
                        0,
                        0,
                        0,
                        0,
                        1,
                        10),
                new Combo(
                        "follower fed through 10 M, Rf 1 M",
                        Topology.FOLLOWER,
                        1e6,
                        INF,
                        10e6,
                        0,
                        0,
                        0,
                        0,
                        0,
                        0,
                        1,
                        10));
    }

    /** A CMOS part: IB 20 pA at 25 °C and 2 nA at its rating's upper end 125 °C, IOS 10 pA and 1 nA. */
    private static dev.ampsieve.catalog.Part cmosPart() {
        dev.ampsieve.fixtures.PartFixture p = dev.ampsieve.fixtures.PartFixture.ideal();
        p.input = dev.ampsieve.catalog.InputType.CMOS;
        p.temperature = new dev.ampsieve.catalog.Range(-40, 125);
        p.ib = new dev.ampsieve.catalog.Spread(null, 20e-12, 2e-9);
        p.ios = new dev.ampsieve.catalog.Spread(null, 10e-12, 1e-9);
        return p.build();
    }

    private static Stage stageAt(Combo c, double t1, double t2, Trim trim) {
        return new Stage(
                Networks.of(c.topology(), c.rf(), c.rg(), c.rs(), c.rp()),
                t1,
                t2,
                null,
                0,
                0,
                null,
                null,
                c.f1(),
                c.f2(),
                1,
                null,
                0,
                0,
                0,
                Limit.output(1),
                Criterion.WORST_CASE,
                3,
                20_000,
                1_000_000,
                1,
                trim,
                1000,
                null,
                false,
                null,
                null,
                Board.NONE,
                null);
    }

    /** Largest |v(out)| ngspice gives with IB and IOS of either sign (vos 0), corrected for the finite gain. */
    private static double worstOfSigns(Combo c, double ib, double ios) throws Exception {
        double worst = 0;
        for (int sIb : new int[] {1, -1}) {
            for (int sIos : new int[] {1, -1}) {
                double i = sIb * ib;
                double o = sIos * ios;
                Combo run = new Combo(
                        c.name(),
                        c.topology(),
                        c.rf(),
                        c.rg(),
                        c.rs(),
                        c.rp(),
                        0,
                        i + o / 2,
                        i - o / 2,
                        0,
                        0,
                        c.f1(),
                        c.f2());
                worst = Math.max(worst, Math.abs(simulate(run).dcOut() * (1 + c.ng() / A)));
            }
        }
        return worst;
    }

    /**
     * ngspice's {@code .options temp=} does not change a DC current source, so the engine's currents
     * at each end of the range (PartValues.ibAt, iosAt: the exponential through the two datasheet
     * points) are fed to ngspice, and the production bias term (BiasTerm.evaluate, through DcModel)
     * must equal the largest output ngspice finds at either end with either sign of each current.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("biasTopologies")
    void theBiasTermAtTwoTemperaturesAgreesWithNgspice(Combo c) throws Exception {
        Stage s = stageAt(c, 40, 85, Trim.NONE);
        PartValues v = PartValues.of(cmosPart(), s);
        double atT1 = worstOfSigns(c, v.ibAt(40), v.iosAt(40));
        double atT2 = worstOfSigns(c, v.ibAt(85), v.iosAt(85));
        assertTrue(atT2 > atT1, "leakage grows with temperature: " + atT1 + " " + atT2);
        TermResult t = new BiasTerm().evaluate(s, v);
        assertRelative(Math.max(atT1, atT2), t.outputV(), 1e-9, "bias term, " + c);
        assertEquals(85.0, t.worstAtC(), 0.0);
    }

    /**
     * What a one-point trim at 25 °C leaves (BiasTerm.afterTrim): a CMOS input's currents may change sign,
     * so a unit can go from -IB(25) to +IB(T) and likewise for IOS. ngspice, fed the change of each current
     * (IB(T) + IB(25), IOS(T) + IOS(25)) with either sign, must reach exactly the residual.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("biasTopologies")
    void theBiasLeftAfterATrimAgreesWithNgspice(Combo c) throws Exception {
        Stage s = stageAt(c, 40, 85, new Trim(true, Trim.Method.ONE_POINT, 0, 0));
        PartValues v = PartValues.of(cmosPart(), s);
        double hot = worstOfSigns(c, v.ibAt(85) + v.ibAt(25), v.iosAt(85) + v.iosAt(25));
        double warm = worstOfSigns(c, v.ibAt(40) + v.ibAt(25), v.iosAt(40) + v.iosAt(25));
        assertRelative(Math.max(hot, warm), BiasTerm.afterTrim(s, v), 1e-9, "bias after a trim, " + c);
    }
}
