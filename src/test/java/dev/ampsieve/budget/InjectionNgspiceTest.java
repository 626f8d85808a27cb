package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The injection network against ngspice (a second method): a reference pair at +-2.5 V, a
 * 10 kohm trimmer between them as two resistors split at the wiper, the engine's E96 injection
 * resistor from the wiper into the op amp stage (inverting, Rf = 10 kohm, Rg = 1 kohm), the amplifier
 * a VCVS of gain A = 1e6 (as {@link NgspiceCrossCheckTest}). With the wiper at either end its own
 * resistance is 0, so the output's move is the engine's range exactly, divided by 1 + NG'/A for
 * the finite gain. The noise gain with Rinj in place is read as the output's change per volt of
 * offset in series with the + input.
 */
class InjectionNgspiceTest {

    private static final double A = 1e6;
    private static final double U = 2.5;
    private static final double R_POT = 10e3;

    private static Stage stage(TrimCircuit.Node node, double rp) {
        TrimCircuit d = TrimCircuit.defaults(TrimCircuit.Kind.INJECTION);
        TrimCircuit c = new TrimCircuit(
                d.kind(),
                d.margin(),
                node,
                U,
                d.referenceTempco(),
                d.resistorTempco(),
                d.tracking(),
                d.potSettability(),
                d.potTempco(),
                R_POT,
                d.dacBits(),
                d.dacReference(),
                d.dacOffsetDrift(),
                d.dacGainDrift(),
                d.potCost(),
                d.referenceCost(),
                d.resistorCost(),
                d.dacCost(),
                d.adjustCost());
        StageFixture f = StageFixture.inverting(10e3, 1e3);
        f.rp = rp;
        f.trim = new Trim(true, Trim.Method.ONE_POINT, 0, 0, Double.NaN, Double.NaN, c, List.of(c.kind()));
        return f.build();
    }

    private static SizedTrim sized(Stage s) {
        Part p = PartFixture.ideal().vos(null, 1e-3, null).build();
        return TrimSizing.of(s, PartValues.of(p, s));
    }

    /**
     * The netlist: wiper at {@code x} of the travel from -U (0) to +U (1); Rinj into {@code pin}
     * ("pinn": the summing node, "pinp": the + input against rp); VOS {@code vos} in series with +.
     */
    private static String netlist(double x, double rinj, String pin, double rp, double vos) {
        StringBuilder n = new StringBuilder("* ampsieve injection network\n");
        n.append(".options temp=25 tnom=25\n");
        n.append("Vtop top 0 DC ").append(Ngspice.num(U)).append('\n');
        n.append("Vbot bot 0 DC ").append(Ngspice.num(-U)).append('\n');
        Ngspice.resistor(n, "Rupper", "top", "wiper", (1 - x) * R_POT);
        Ngspice.resistor(n, "Rlower", "wiper", "bot", x * R_POT);
        n.append("Rinj wiper ")
                .append(pin)
                .append(' ')
                .append(Ngspice.num(rinj))
                .append('\n');
        n.append("Rg pinn 0 ").append(Ngspice.num(1e3)).append('\n'); // the signal source at 0 V
        n.append("Rf out pinn ").append(Ngspice.num(10e3)).append('\n');
        Ngspice.resistor(n, "Rp", "pinp", "0", rp);
        n.append("Vos nvos pinp DC ").append(Ngspice.num(vos)).append('\n');
        n.append("Eamp out 0 nvos pinn ").append(Ngspice.num(A)).append('\n');
        n.append(".control\nset numdgt=15\nop\nprint v(out)\nquit\n.endc\n.end\n");
        return n.toString();
    }

    private static double out(double x, double rinj, String pin, double rp, double vos) throws Exception {
        return Ngspice.run(netlist(x, rinj, pin, rp, vos), List.of("v(out)")).get("v(out)");
    }

    @Test
    void summingNodeRangeAtBothEndsOfTheTrimmer() throws Exception {
        SizedTrim t = sized(stage(TrimCircuit.Node.MINUS, 0));
        double rinj = t.injectionResistance();
        double finite = 1 / (1 + t.noiseGain() / A); // the VCVS's finite gain, exact for this loop
        double top = out(1, rinj, "pinn", 0, 0);
        double bottom = out(0, rinj, "pinn", 0, 0);
        // a current into the summing node leaves through Rf: +U at the wiper moves the output down
        assertEquals(-t.rangeV() * finite, top, 1e-9 * t.rangeV());
        assertEquals(t.rangeV() * finite, bottom, 1e-9 * t.rangeV());
        // the range covers 1.5 x the 11 mV offset
        assertEquals(true, Math.abs(top) >= 1.5 * 11e-3);
    }

    @Test
    void summingNodeNoiseGainWithRinjInPlace() throws Exception {
        SizedTrim t = sized(stage(TrimCircuit.Node.MINUS, 0));
        double rinj = t.injectionResistance();
        // wiper at an end (no wiper resistance): the output per volt of VOS is the noise gain
        double a = out(1, rinj, "pinn", 0, 0);
        double b = out(1, rinj, "pinn", 0, 1e-3);
        double ngSpice = (b - a) / 1e-3;
        double ng = t.noiseGain();
        assertEquals(ng / (1 + ng / A), ngSpice, 1e-9 * ng);
    }

    @Test
    void plusInputRangeAtBothEnds() throws Exception {
        double rp = 1e3;
        Stage s = stage(TrimCircuit.Node.PLUS, rp);
        SizedTrim t = sized(s);
        double rinj = t.injectionResistance();
        double finite = 1 / (1 + s.noiseGain() / A);
        // +U at the wiper raises the + pin: the output rises by NG x U x R+/(R+ + Rinj)
        assertEquals(t.rangeV() * finite, out(1, rinj, "pinp", rp, 0), 1e-9 * t.rangeV());
        assertEquals(-t.rangeV() * finite, out(0, rinj, "pinp", rp, 0), 1e-9 * t.rangeV());
    }

    @Test
    void midTravelInjectsNothing() throws Exception {
        SizedTrim t = sized(stage(TrimCircuit.Node.MINUS, 0));
        Map<String, Double> v = Ngspice.run(netlist(0.5, t.injectionResistance(), "pinn", 0, 0), List.of("v(out)"));
        assertEquals(0.0, v.get("v(out)"), 1e-12);
    }
}
