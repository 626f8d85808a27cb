package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Transimpedance;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.testing.PartBuilder;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Outside check of the transimpedance engine against ngspice (ngspice-notes.md): the production
 * {@link DcModel}, {@link TransimpedanceResponse} (built by {@code of(stage, part values)}, so the
 * part's open-loop gain, GBW and input capacitance enter as in a budget) and
 * {@link TransimpedanceNoise#integrate}.
 *
 * <p>The amplifier is a single pole, built of noiseless parts: a VCCS of transconductance A0 into
 * a node held by a VCCS wired as a 1 S conductance (a controlled source has no thermal noise, a
 * resistor would) and a capacitor 1/(2π fa), fa = GBW/A0, so V(na) = A0/(1 + j f/fa) times the
 * input difference; a unity VCVS drives the output. Offset, bias currents and the noise
 * generators are as in {@link NgspiceCrossCheckTest}. The source is a current source into the -
 * input with its shunt Rsh and capacitance Cs; the amplifier's input capacitance is a capacitor
 * from the - input to ground beside Cs (the model adds the two).
 */
class TransimpedanceNgspiceTest {

    private static final double RF = 1e6;
    private static final double CF = 2e-12;
    private static final double RSH = 100e6;
    private static final double CS = 45e-12;
    private static final double RP = 10e3;
    private static final double CIN = 5e-12;
    private static final double AOL_DB = 100; // A0 = 1e5
    private static final double GBW = 5e6;
    private static final double EN = 10e-9;
    private static final double IN = 50e-15;
    private static final double T = 298.15;

    private static Stage stage(double fLow, double fHigh) {
        return new Stage(
                new Transimpedance(RF, CF, RSH, CS, RP),
                0,
                25,
                null,
                0,
                0,
                null,
                null,
                fLow,
                fHigh,
                0,
                1.0,
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

    private static Part part() {
        return PartBuilder.part("tia-check")
                .input(InputType.JFET)
                .aol(AOL_DB, null)
                .gbw(GBW)
                .noise(EN, 0.0, IN, 0.0)
                .inputCapacitance(CIN)
                .build();
    }

    /** The stage as a netlist; {@code control} is the analysis part of the .control block. */
    private static String netlist(double vos, double ibp, double ibm, double iin, double a0, String control) {
        double unit = Math.sqrt(4 * NgspiceCrossCheckTest.K_NGSPICE * T * NgspiceCrossCheckTest.GENERATOR_OHMS);
        StringBuilder n = new StringBuilder();
        n.append("* ampsieve transimpedance cross-check\n");
        n.append(".options temp=25 tnom=25\n");
        // the source: a current into the - input, with its shunt and capacitance
        n.append("Iin 0 pinn DC ").append(Ngspice.num(iin)).append(" AC 1\n");
        n.append("Rsh pinn 0 ").append(Ngspice.num(RSH)).append('\n');
        n.append("Cs pinn 0 ").append(Ngspice.num(CS)).append('\n');
        n.append("Cin pinn 0 ").append(Ngspice.num(CIN)).append('\n');
        n.append("Rf out pinn ").append(Ngspice.num(RF)).append('\n');
        n.append("Cf out pinn ").append(Ngspice.num(CF)).append('\n');
        n.append("Rp pinp 0 ").append(Ngspice.num(RP)).append('\n');
        n.append("Vos nvos pinp DC ").append(Ngspice.num(vos)).append('\n');
        n.append("Een namp nvos gen_en 0 ").append(Ngspice.num(EN / unit)).append('\n');
        n.append("Rgen_en gen_en 0 ")
                .append(Ngspice.num(NgspiceCrossCheckTest.GENERATOR_OHMS))
                .append('\n');
        n.append("Ibp pinp 0 DC ").append(Ngspice.num(ibp)).append('\n');
        n.append("Ibm pinn 0 DC ").append(Ngspice.num(ibm)).append('\n');
        n.append("Gip pinp 0 gen_ip 0 ").append(Ngspice.num(IN / unit)).append('\n');
        n.append("Rgen_ip gen_ip 0 ")
                .append(Ngspice.num(NgspiceCrossCheckTest.GENERATOR_OHMS))
                .append('\n');
        n.append("Gim pinn 0 gen_im 0 ").append(Ngspice.num(IN / unit)).append('\n');
        n.append("Rgen_im gen_im 0 ")
                .append(Ngspice.num(NgspiceCrossCheckTest.GENERATOR_OHMS))
                .append('\n');
        // single-pole amplifier: A0 (V(namp) - V(pinn)) into 1 S || 1/(2π fa)
        double fa = GBW / a0;
        n.append("Gamp 0 na namp pinn ").append(Ngspice.num(a0)).append('\n');
        n.append("Gload na 0 na 0 1\n");
        n.append("Cpole na 0 ").append(Ngspice.num(1 / (2 * Math.PI * fa))).append('\n');
        n.append("Eout out 0 na 0 1\n");
        n.append(".control\n");
        n.append("set numdgt=15\n");
        n.append(control);
        n.append("quit\n");
        n.append(".endc\n");
        n.append(".end\n");
        return n.toString();
    }

    /**
     * DC: offset, unequal bias currents and a source current. Ideal output
     * DcModel.of(stage).error(vos, IB, IOS) - Iin Rf, with NG = 1 + Rf/Rsh and R+ = Rp; the finite
     * gain divides every source at the input by 1 + NG/A0 (the exact closed-loop factor).
     */
    @Test
    void dcOutputIsTheProductionModelWithTheSourceCurrent() throws Exception {
        Stage s = stage(1, 1e3);
        double vos = 150e-6;
        double ibp = 12e-12;
        double ibm = 7e-12;
        double iin = -2e-6; // a photodiode's current flows out of the - input: the output rises
        double a0 = Decibels.toRatio(AOL_DB);
        Map<String, Double> v = Ngspice.run(netlist(vos, ibp, ibm, iin, a0, "op\nprint v(out)\n"), List.of("v(out)"));
        double ideal = DcModel.of(s).error(vos, (ibp + ibm) / 2, ibp - ibm) - iin * RF;
        double expected = ideal / (1 + s.noiseGain() / a0);
        assertEquals(expected, v.get("v(out)"), Math.abs(expected) * 1e-9);
        // and the hand-worked value: NG = 1.01; 1.01 (150 uV - 12 pA x 10 kohm) + 7 pA x 1 Mohm + 2 V
        assertEquals(1.01 * (150e-6 - 12e-12 * 10e3) + 7e-12 * 1e6 + 2.0, ideal, 1e-15);
    }

    /**
     * Noise over 1 Hz to 20 MHz, which holds the noise-gain zero (1/(2π (Rf||Rsh) Ct) = 3.2 kHz),
     * the feedback pole (80 kHz) and the loop crossover: ngspice's onoise_total against the
     * production integral, to 1e-3.
     */
    @Test
    void integratedNoiseAgreesWithNgspice() throws Exception {
        double f1 = 1;
        double f2 = 20e6;
        Stage s = stage(f1, f2);
        PartValues pv = PartValues.of(part(), s);
        double a0 = Decibels.toRatio(AOL_DB);
        String control = "noise v(out) iin dec 400 " + Ngspice.num(f1) + " " + Ngspice.num(f2)
                + "\nsetplot noise2\nprint onoise_total\n";
        Map<String, Double> v = Ngspice.run(netlist(0, 0, 0, 0, a0, control), List.of("onoise_total"));
        TransimpedanceResponse r = TransimpedanceResponse.of(s, pv);
        TransimpedanceNoise.Sources src = TransimpedanceNoise.sources(s, pv);
        assertEquals(T, src.kelvin(), 1e-12);
        double mine = Math.sqrt(TransimpedanceNoise.integrate(r, src, f1, f2, Stage.NO_FILTER, f2));
        assertEquals(v.get("onoise_total"), mine, v.get("onoise_total") * 1e-3);
    }

    /** |H| at DC, at fH and at the class's -3 dB frequency: the last must be |H(0)|/√2 in ngspice too. */
    @Test
    void transimpedanceAndBandwidthAgreeWithNgspiceAc() throws Exception {
        double fH = 50e3;
        Stage s = stage(1, fH);
        PartValues pv = PartValues.of(part(), s);
        TransimpedanceResponse r = TransimpedanceResponse.of(s, pv);
        double a0 = Decibels.toRatio(AOL_DB);
        double f3 = r.bandwidth();
        double[] at = {1e-3, fH, f3};
        double[] h = new double[3];
        for (int i = 0; i < 3; i++) {
            String control = "ac lin 1 " + Ngspice.num(at[i]) + " " + Ngspice.num(at[i]) + "\nprint vm(out)\n";
            h[i] = Ngspice.run(netlist(0, 0, 0, 0, a0, control), List.of("vm(out)"))
                    .get("vm(out)");
        }
        assertEquals(h[0], r.transimpedanceMagnitude(1e-3), h[0] * 1e-9);
        assertEquals(h[1], r.transimpedanceMagnitude(fH), h[1] * 1e-9);
        assertEquals(h[0] / Math.sqrt(2), h[2], h[0] * 1e-6);
        // the bandwidth term's relative error at fH, from ngspice's own magnitudes
        assertEquals(Math.abs(1 - h[1] / h[0]), BandwidthTerm.transimpedanceError(r, fH), 1e-8);
    }
}
