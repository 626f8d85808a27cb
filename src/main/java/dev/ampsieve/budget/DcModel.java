package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;

/**
 * The signed DC output error of a stage built around an ideal (infinite-gain) amplifier
 * with an input offset voltage and two input bias currents: the one DC model of the engine.
 * The offset and drift terms, the bias term (and what a trim leaves of it) and the Monte Carlo
 * all evaluate through it, and the ngspice cross-check checks it.
 *
 * <p>Conventions: the offset {@code vos} is a source in series with the + input (the
 * amplifier amplifies V+ + vos - V-); bias currents are positive when they flow INTO the
 * pins. Then, with R+ the resistance from the + pin to the reference ({@link Stage#rPlus()})
 * and Rf the feedback resistor, superposition gives
 * <pre>
 *   Vout = NG * (vos - IB+ * R+) + IB- * Rf
 * </pre>
 * for all three topologies (the inverting input of an inverting stage sees Rg + Rs to the
 * grounded source; a follower has NG = 1 and Rf may be 0). With IB+ = IB + IOS/2 and
 * IB- = IB - IOS/2 this is NG*vos - (NG*R+ - Rf)*IB - (NG*R+ + Rf)*IOS/2, so R+ = Rf/NG
 * = Rf || Rg cancels IB and leaves -IOS*Rf (Eggleston, <i>Basic Electronics for Scientists and
 * Engineers</i>, CUP 2011, §6.4, eqs. 6.16-6.18; Franco, 4th ed., ch. 5 [from memory]).
 * Swapping the current direction flips the sign of both current terms.
 *
 * <p>An instance holds the three coefficients of one stage so the Monte Carlo evaluates it
 * per unit without recomputing them.
 *
 * @param perVos volts at the output per volt of input offset (the noise gain)
 * @param perIb  volts at the output per ampere of common bias current IB, {@code Rf - NG*R+}
 * @param perIos volts at the output per ampere of offset current IOS = IB+ - IB-,
 *               {@code -(NG*R+ + Rf)/2}
 */
public record DcModel(double perVos, double perIb, double perIos) {

    /** The coefficients of {@code s}, read off {@link #outputError} by superposition. */
    public static DcModel of(Stage s) {
        double perVos = outputError(s, 1.0, 0.0, 0.0);
        double perIb = outputError(s, 0.0, 1.0, 1.0);
        double perIos = outputError(s, 0.0, 0.5, -0.5);
        return new DcModel(perVos, perIb, perIos);
    }

    /**
     * @param s       the stage (topology, Rf, Rg, Rs, Rp)
     * @param vos     input offset voltage, V, in series with the + input
     * @param ibPlus  current into the + pin, A
     * @param ibMinus current into the - pin, A
     * @return signed output error, V
     */
    public static double outputError(Stage s, double vos, double ibPlus, double ibMinus) {
        return s.noiseGain() * (vos - ibPlus * s.rPlus()) + ibMinus * s.rf();
    }

    /** Signed output error, V, for an offset {@code vos}, a common bias current {@code ib} and an offset current {@code ios}. */
    public double error(double vos, double ib, double ios) {
        return perVos * vos + perIb * ib + perIos * ios;
    }

    /**
     * Largest output magnitude, V, of the current part when |IB| &lt;= {@code ib} and |IOS| &lt;=
     * {@code ios}: {@code |NG*R+ - Rf| * ib + (NG*R+ + Rf) * ios / 2}, reached with each current at
     * its limit with the sign of its coefficient.
     */
    public double currentBound(double ib, double ios) {
        return Math.abs(perIb) * ib + Math.abs(perIos) * ios;
    }
}
