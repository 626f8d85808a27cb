package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Noise;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Difference;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Outside check of the difference amplifier (one amplifier, four resistors, two source legs)
 * against ngspice: the DC output with a resistor mismatch, unequal legs, an offset, unequal bias
 * currents, a common-mode and a differential input; and the integrated output noise of the
 * amplifier's en and in and the six resistors' thermal noise.
 *
 * <p>Method and conventions as {@link NgspiceCrossCheckTest} (ngspice-notes.md): a VCVS of gain
 * A = 1e6 and the exact finite-gain factor 1/(1 + NG/A) (the output reaches the - pin only, through
 * R2 against R1 + Rs-, so every input, signal or error, is scaled alike); the offset a source in
 * series with the + input; bias currents INTO the pins; {@code .options temp=25 tnom=25}; noise
 * from 1 kohm generator resistors scaled by noiseless controlled sources. The reference (R4's far
 * end) is at 0 V, the level the DC model counts errors from.
 */
class DifferenceNgspiceTest {

    static final double A = NgspiceCrossCheckTest.A;
    static final double T = NgspiceCrossCheckTest.T;

    /**
     * One difference stage: resistors, legs, the amplifier's offset, pin currents and white noise,
     * the source's common-mode and differential voltages, and a noise band [f1, f2].
     */
    record Combo(
            String name,
            double r1,
            double r2,
            double r3,
            double r4,
            double rsMinus,
            double rsPlus,
            double vos,
            double ibPlus,
            double ibMinus,
            double vcm,
            double vdm,
            double en,
            double in,
            double f1,
            double f2) {
        @Override
        public String toString() {
            return name;
        }

        Difference network() {
            return new Difference(r1, r2, r3, r4, rsMinus, rsPlus);
        }

        /** The stage, with a first-order filter at f2 (so NoiseTerm's band edge is (π/2) f2) and 25 °C resistors. */
        Stage stage() {
            return new Stage(
                    network(),
                    25,
                    25,
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
    }

    static Stream<Combo> combos() {
        return Stream.of(
                // R4/R3 0.1 % above R2/R1, legs 350 and 120 ohm: a bridge-like source at 2.5 V common mode
                new Combo(
                        "gain 10, R4 0.1 % high, legs 350/120 ohm",
                        10e3, 100e3, 10e3, 100.1e3, 350, 120, 1e-3, 105e-9, 95e-9, 2.5, 10e-3, 10e-9, 1e-12, 10, 10e3),
                // R3 0.1 % low, currents of opposite sign (a unit whose IB is small and IOS large)
                new Combo(
                        "gain 100, R3 0.1 % low, legs 175/180 ohm",
                        4.99e3, 499e3, 4.985e3, 499e3, 175, 180, -50e-6, 2e-9, -1.5e-9, -3, 20e-3, 8e-9, 0.15e-12, 0.1,
                        10),
                // the unity-gain difference stage, the minus leg driven directly (Rs- 0: a 0 V source)
                new Combo(
                        "gain 1, R4 0.1 % high, Rs- 0, Rs+ 50 ohm",
                        10e3, 10e3, 10e3, 10.01e3, 0, 50, 0.5e-3, 300e-9, 250e-9, 10, -1, 15e-9, 0.6e-12, 1, 50e3),
                // an attenuating difference stage (r2/r1 = 0.5) with currents out of the pins
                new Combo(
                        "gain 0.5, R4 0.2 % high, legs 1 k/2 k",
                        20e3, 10e3, 20e3, 10.02e3, 1e3, 2e3, -0.2e-3, -40e-9, -35e-9, 5, 2, 4e-9, 3e-12, 0.5, 5e3),
                // high gain, R3 0.1 % high, small legs: the common mode meets a large noise gain
                new Combo(
                        "gain 1000, R3 0.1 % high, legs 10/20 ohm",
                        1e3, 1e6, 1.001e3, 1e6, 10, 20, 10e-6, 1e-9, 1.2e-9, 0.1, 1e-3, 3e-9, 0.4e-12, 0.1, 100));
    }

    /** The stage as a netlist printing v(out) at DC and onoise_total over [f1, (π/2) f2]. */
    static String netlist(Combo c) {
        double unit = Math.sqrt(4 * NgspiceCrossCheckTest.K_NGSPICE * T * NgspiceCrossCheckTest.GENERATOR_OHMS);
        StringBuilder n = new StringBuilder();
        n.append("* ampsieve difference cross-check: ").append(c.name()).append('\n');
        n.append(".options temp=25 tnom=25\n");
        // the two source legs: V+ = Vcm + Vdm/2, V- = Vcm - Vdm/2; the + leg is the noise analysis' input
        n.append("Vp srcp 0 DC ").append(Ngspice.num(c.vcm() + c.vdm() / 2)).append(" AC 1\n");
        n.append("Vm srcm 0 DC ").append(Ngspice.num(c.vcm() - c.vdm() / 2)).append('\n');
        Ngspice.resistor(n, "Rsm", "srcm", "legm", c.rsMinus());
        Ngspice.resistor(n, "Rsp", "srcp", "legp", c.rsPlus());
        n.append("R1 legm pinn ").append(Ngspice.num(c.r1())).append('\n');
        n.append("R2 out pinn ").append(Ngspice.num(c.r2())).append('\n');
        n.append("R3 legp pinp ").append(Ngspice.num(c.r3())).append('\n');
        n.append("R4 pinp ref ").append(Ngspice.num(c.r4())).append('\n');
        n.append("Vref ref 0 DC 0\n");
        n.append("Vos nvos pinp DC ").append(Ngspice.num(c.vos())).append('\n');
        n.append("Een namp nvos gen_en 0 ").append(Ngspice.num(c.en() / unit)).append('\n');
        n.append("Rgen_en gen_en 0 1e3\n");
        // bias currents INTO the pins: each source carries its current from the pin to ground
        n.append("Ibp pinp 0 DC ").append(Ngspice.num(c.ibPlus())).append('\n');
        n.append("Ibm pinn 0 DC ").append(Ngspice.num(c.ibMinus())).append('\n');
        n.append("Gip pinp 0 gen_ip 0 ").append(Ngspice.num(c.in() / unit)).append('\n');
        n.append("Rgen_ip gen_ip 0 1e3\n");
        n.append("Gim pinn 0 gen_im 0 ").append(Ngspice.num(c.in() / unit)).append('\n');
        n.append("Rgen_im gen_im 0 1e3\n");
        n.append("Eamp out 0 namp pinn ").append(Ngspice.num(A)).append('\n');
        n.append(".control\nset numdgt=15\nop\nprint v(out)\n");
        n.append("noise v(out) vp lin 2 ")
                .append(Ngspice.num(c.f1()))
                .append(' ')
                .append(Ngspice.num(NoiseModel.SINGLE_POLE_ENBW * c.f2()))
                .append('\n');
        n.append("setplot noise2\nprint onoise_total\nquit\n.endc\n.end\n");
        return n.toString();
    }

    private static void assertRelative(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, Math.abs(expected) * rel, what);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("combos")
    void dcOutputAgreesWithTheDcModelAndTheNetworkGains(Combo c) throws Exception {
        Map<String, Double> v = Ngspice.run(netlist(c), List.of("v(out)", "onoise_total"));
        Stage s = c.stage();
        Difference d = c.network();
        // NG = 1 + R2/(R1 + Rs-), written from the resistors here rather than taken from the network
        double ng = 1 + c.r2() / (c.r1() + c.rsMinus());
        assertEquals(ng, s.noiseGain(), 1e-12 * ng, "noise gain");
        double finite = 1 + ng / A;
        double ib = (c.ibPlus() + c.ibMinus()) / 2;
        double ios = c.ibPlus() - c.ibMinus();
        double errors = DcModel.of(s).error(c.vos(), ib, ios);
        double signal =
                Difference.differentialGain(d.a(), d.b()) * c.vdm() + Difference.commonModeGain(d.a(), d.b()) * c.vcm();
        double out = v.get("v(out)");
        // 1e-9 relative to the largest voltage in the circuit: the solver's round-off follows the node voltages
        // (the inputs, up to 10 V here), not the output the common mode nearly cancels to (measured: 4e-10 V
        // off with 2.5 V at the pins and 0.16 V out)
        double scale = Math.max(
                Math.abs(out), Math.max(Math.abs(errors) + Math.abs(signal), Math.abs(c.vcm()) + Math.abs(c.vdm())));
        assertEquals((errors + signal) / finite, out, 1e-9 * scale, "DC output, " + c);
        // the signed pin-current form the Monte Carlo uses gives the same
        assertEquals(
                (DcModel.outputError(s, c.vos(), c.ibPlus(), c.ibMinus()) + signal) / finite,
                out,
                1e-9 * scale,
                "DcModel.outputError, " + c);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("combos")
    void outputNoiseAgreesWithTheNoiseModelAndTheNoiseTerm(Combo c) throws Exception {
        Map<String, Double> v = Ngspice.run(netlist(c), List.of("v(out)", "onoise_total"));
        Stage s = c.stage();
        double finite = 1 + s.noiseGain() / A;
        double fN = NoiseModel.SINGLE_POLE_ENBW * c.f2();
        // ngspice's k is CODATA 2014, the engine's the exact SI value: 1.8e-7 in rms, inside 1e-5
        double model = NoiseModel.outputRms(s, c.en(), 0, c.in(), 0, c.f1(), fN, T);
        assertRelative(model / finite, v.get("onoise_total"), 1e-5, "NoiseModel, " + c);
        PartFixture p = PartFixture.ideal();
        p.noise = new Noise(c.en(), 0.0, c.in(), 0.0);
        double term = NoiseTerm.rms(s, PartValues.of(p.build(), s));
        assertRelative(term / finite, v.get("onoise_total"), 1e-5, "NoiseTerm.rms, " + c);
    }
}
