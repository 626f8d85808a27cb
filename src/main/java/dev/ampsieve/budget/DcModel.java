package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;

/**
 * The signed DC output error of a stage built around an ideal (infinite-gain) amplifier
 * with an input offset voltage and two input bias currents.
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
 */
public final class DcModel {
    private DcModel() {
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
}
