package dev.ampsieve.budget;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.ArrayList;
import java.util.List;

/**
 * One error term a budget leaves out (or counts as 0 V) because a stage or catalog value it
 * needs is absent or zero, so that every report can say so on its verdict line: a default
 * saves typing, it must never make a part look better unnoticed.
 *
 * @param term   the term's key ({@link ErrorTerm#key()})
 * @param reason why it is not counted
 */
public record NotCounted(String term, Reason reason) {

    /** Why a term is not counted; {@link #key()} is the stable word used in JSON. */
    public enum Reason {
        /** full-scale-output absent: the gain terms scale with it. */
        NO_FULL_SCALE_OUTPUT("no-full-scale-output"),
        /** supply.variation absent or 0 V: supply rejection multiplies it. */
        NO_SUPPLY_VARIATION("no-supply-variation"),
        /** common-mode swing 0 V in a stage whose inputs follow the signal. */
        NO_COMMON_MODE_SWING("no-common-mode-swing"),
        /** resistor-ratio tolerance and tempco both absent or 0 in a stage with gain resistors. */
        NO_RESISTOR_TOLERANCE("no-resistor-tolerance"),
        /** service-life absent or 0: long-term drift grows with it. */
        NO_SERVICE_LIFE("no-service-life"),
        /** the part's catalog entry lacks the figure the term needs. */
        NOT_IN_CATALOG("not-in-catalog"),
        /** supply.voltage absent: the operating point (and the die's power, a crossover's place) needs it. */
        NO_SUPPLY_VOLTAGE("no-supply-voltage"),
        /** load-resistance absent: self-heating is not counted. */
        NO_LOAD_RESISTANCE("no-load-resistance"),
        /** an AC-coupled stage counts the DC terms toward headroom only. */
        AC_COUPLED("ac-coupled");

        private final String key;

        Reason(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        /** True when the stage (not the part) is the cause: the same for every part. */
        public boolean ofStage() {
            return this != NOT_IN_CATALOG;
        }
    }

    /**
     * The terms {@link BudgetCalculator#compute} leaves out for this stage and part, in the
     * order of {@link BudgetCalculator#TERMS}. An inverting stage's common-mode swing of 0 V is
     * not listed: its + input sits at the reference, so the term is truly zero; nor is a
     * follower's resistor term, which has no gain resistors. With {@code p} null only the
     * stage's own causes are listed (for a stage described before any part is chosen).
     */
    /** Whether the amplifier's inputs move with the signal, so that a common-mode swing of 0 leaves a real term out. */
    private static boolean inputsMoveWithSignal(Stage s) {
        return switch (s.topology()) {
            case NON_INVERTING, FOLLOWER, DIFFERENCE -> true;
            case INVERTING, TRANSIMPEDANCE -> false; // the + input sits at the reference
        };
    }

    public static List<NotCounted> of(Stage s, Part p) {
        List<NotCounted> out = new ArrayList<>();
        boolean noFullScale = s.fullScaleOutput() == null;
        for (ErrorTerm t : BudgetCalculator.termsFor(s)) {
            if (!BudgetCalculator.counts(s, t)) {
                out.add(new NotCounted(t.key(), Reason.AC_COUPLED));
                continue;
            }
            Reason r = switch (t.key()) {
                case CmrrTerm.KEY ->
                    s.commonModeSwing() == 0 && inputsMoveWithSignal(s) ? Reason.NO_COMMON_MODE_SWING : null;
                case PsrrTerm.KEY -> s.supplyVariation() == 0 ? Reason.NO_SUPPLY_VARIATION : null;
                case OpenLoopGainTerm.KEY -> noFullScale ? Reason.NO_FULL_SCALE_OUTPUT : null;
                case BandwidthTerm.KEY ->
                    noFullScale
                            ? Reason.NO_FULL_SCALE_OUTPUT
                            : p == null
                                    ? null
                                    : !(p.gbw() > 0 && Double.isFinite(p.gbw())) ? Reason.NOT_IN_CATALOG : null;
                case ResistorTerm.KEY ->
                    s.network().ratioSensitivity() == 0 // no resistor sets the gain (a follower): nothing to count
                            ? null
                            : noFullScale
                                    ? Reason.NO_FULL_SCALE_OUTPUT
                                    : s.ratioTolerance() == 0 && s.ratioTempco() == 0
                                            ? Reason.NO_RESISTOR_TOLERANCE
                                            : null;
                // a missing long-term drift, bias current or noise figure is estimated (Assumed, flagged), not left out
                case AgingTerm.KEY -> s.serviceLife() <= 0 ? Reason.NO_SERVICE_LIFE : null;
                // operating point: a part without a crossover or chopping has truly none (not listed)
                case OperatingPointTerm.KEY -> s.supplyVoltage() == null ? Reason.NO_SUPPLY_VOLTAGE : null;
                case InputCrossoverTerm.KEY ->
                    s.supplyVoltage() == null
                                    && p != null
                                    && (p.inputCrossover() != null || OperatingFigures.railToRailInput(p))
                            ? Reason.NO_SUPPLY_VOLTAGE
                            : null;
                case SelfHeatingTerm.KEY ->
                    s.loadResistance() == null
                            ? Reason.NO_LOAD_RESISTANCE
                            : s.supplyVoltage() == null ? Reason.NO_SUPPLY_VOLTAGE : null;
                default -> null;
            };
            if (r != null) {
                out.add(new NotCounted(t.key(), r));
            }
        }
        return List.copyOf(out);
    }
}
