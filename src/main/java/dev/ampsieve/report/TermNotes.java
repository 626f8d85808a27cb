package dev.ampsieve.report;

import dev.ampsieve.budget.Operand;
import dev.ampsieve.budget.TermRemark;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.TermWorking;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Words for how each term was computed: renders a term's {@link TermWorking} (formula id,
 * operands, remarks) as the short note every report shows beside the term. The one place the
 * notes are worded and their numbers formatted; the terms themselves return facts only.
 */
public final class TermNotes {
    private TermNotes() {}

    /** The note for one term, e.g. "NG x vos 5.00 µV". */
    public static String of(TermResult t) {
        return new Render(t.key(), t.working()).text();
    }

    /**
     * The operands and remarks on one line, unworded ("en 1.00 nV/√Hz, rms ∞ V, gbw-missing"): for a
     * message that names the values a term came from (the overflow constraint) and for a formula
     * this renderer does not word; empty when there are none.
     */
    public static String facts(TermWorking w) {
        java.util.List<String> parts = new java.util.ArrayList<>();
        for (Operand o : w.operands()) {
            parts.add(o.name() + " " + Units.format(o.value(), o.dimension()));
        }
        for (dev.ampsieve.budget.TermRemark r : w.remarks()) {
            parts.add(r.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        }
        return String.join(", ", parts);
    }

    /** {@link #facts}, or the formula's id when the term has no operands. */
    public static String factsOrFormula(TermResult t) {
        String f = facts(t.working());
        return f.isEmpty() ? t.working().formula() : f;
    }

    /** An operand's value as text with its unit ("5.00 µV"), for tables of operands. */
    public static String value(Operand o) {
        return Units.format(o.value(), o.dimension(), digits(o));
    }

    /**
     * An operand's unit symbol for JSON. Temperature differences and the die's power are held as
     * plain numbers (the units print a difference of 0.05 °C as a temperature to 0.1 °C, and know no
     * power), so their unit is named here.
     */
    public static String unit(Operand o) {
        return switch (o.name()) {
            case "dT", "gradient" -> "°C";
            case "P" -> "W";
            case "trimKelvin" -> "K";
            default -> o.dimension().symbol();
        };
    }

    /** Levels in dB and sensitivities read to four digits (110.5 dB, 0.9091); the rest to three. */
    private static int digits(Operand o) {
        return o.dimension() == Dimension.DECIBEL
                        || o.name().equals("S")
                        || o.name().equals("pinShare")
                ? 4
                : 3;
    }

    private record Render(String key, TermWorking w) {

        /** The operand {@code name} with its unit. */
        private String f(String name) {
            return w.operand(name).map(TermNotes::value).orElse("n/a");
        }

        /** A plain number to {@code digits} significant digits. */
        private String n(double x, int digits) {
            return Units.format(x, Dimension.NUMBER, digits);
        }

        private boolean has(TermRemark r) {
            return w.has(r);
        }

        private boolean present(String name) {
            return w.operand(name).isPresent();
        }

        /** A rejection figure's basis: typical-only or assumed. */
        private String rejectionBasis() {
            return has(TermRemark.TYPICAL_LESS_MAX_TO_SIGMA)
                    ? " (typical less 20 log10(max-to-sigma): no guaranteed minimum)"
                    : has(TermRemark.ASSUMED_NOT_IN_CATALOG) ? " (assumed: not in the catalog)" : "";
        }

        private String typicalTimesMaxToSigma() {
            return has(TermRemark.TYPICAL_TIMES_MAX_TO_SIGMA) ? " (max-to-sigma x typical: no guaranteed maximum)" : "";
        }

        private static String filterName(int order) {
            return order == 1 ? "first-order filter at fH" : "order-" + order + " Butterworth at fH";
        }

        String text() {
            return switch (w.formula()) {
                case "offset" -> "NG x vos " + f("vos") + typicalTimesMaxToSigma();
                case "drift" ->
                    "NG x drift " + f("drift") + " x " + f("dT") + " °C"
                            + (has(TermRemark.DRIFT_CAPPED)
                                    ? "; capped: offset + drift <= NG x vos over temperature " + f("vosOverTemperature")
                                    : "")
                            + (has(TermRemark.DRIFT_FROM_VOS) ? " (estimated as vos / T)" : typicalTimesMaxToSigma());
                case "bias" ->
                    "ib " + f("ib") + ", ios " + f("ios")
                            + (has(TermRemark.BIAS_25C_LIMITS_HOLD)
                                    ? " (25 °C limits hold over the range)"
                                    : " at " + f("T"))
                            + "; R+ " + f("R+") + ", Rf " + f("Rf")
                            + (has(TermRemark.IB_ESTIMATED) ? " (ib estimated: not in the catalog)" : "");
                case "cmrr" -> "dVcm " + f("dVcm") + ", CMRR " + f("CMRR") + rejectionBasis();
                case "cmrr-difference" ->
                    "dVcm " + f("dVcm") + " at the source; resistors " + f("resistors") + " (each pair within tol "
                            + f("tol") + " + tc " + f("tc") + " x " + f("dT") + " °C); amplifier " + f("amplifier")
                            + " (pins at " + f("pinShare") + " x dVcm, CMRR " + f("CMRR") + rejectionBasis() + ")";
                case "psrr" -> "dVs " + f("dVs") + ", PSRR " + f("PSRR") + rejectionBasis();
                case "open-loop-gain" -> "VFS " + f("VFS") + ", AOL " + f("AOL") + rejectionBasis();
                case "bandwidth" -> "fH " + f("fH") + ", closed-loop pole " + f("fCL");
                case "bandwidth-transimpedance" -> "fH " + f("fH") + ", signal bandwidth (-3 dB) " + f("f-3dB");
                case "gbw-missing" -> "GBW not given: not counted";
                case "resistors" ->
                    "S " + f("S") + " x (tol " + f("tol") + " + tc " + f("tc") + " x " + f("dT") + " °C)"
                            + (has(TermRemark.FOLLOWER)
                                    ? "; a follower has no gain resistors"
                                    : has(TermRemark.RESISTOR_PAIRS)
                                            ? "; tolerance per pair, r2/r1 and r4/r3"
                                            : has(TermRemark.GAIN_IS_RF) ? "; rf's own tolerance: the gain is rf" : "");
                case "aging" ->
                    has(TermRemark.AGING_ESTIMATED)
                            ? "NG x " + f("shift") + " over " + f("life")
                                    + " (estimated: no long-term drift figure in the catalog)"
                            : "NG x " + f("maxToSigma") + " x " + f("typical") + " per " + f("per") + " x sqrt("
                                    + f("life") + " / " + f("per")
                                    + ") (random walk; max-to-sigma x the typical figure)";
                case "no-service-life" -> "no service life given";
                case "noise" -> noise();
                case "noise-transimpedance" -> noiseTransimpedance();
                case "operating-point" ->
                    "table at " + f("testSupply") + (has(TermRemark.TEST_SUPPLY_ASSUMED) ? " (assumed)" : "")
                            + ", common mode " + f("testCommonMode")
                            + (has(TermRemark.TEST_COMMON_MODE_ASSUMED) ? " (assumed)" : "") + "; NG x (dVs "
                            + f("dVs") + " / PSRR " + f("PSRR") + " + dVcm " + f("dVcm") + " / CMRR " + f("CMRR") + ")";
                case "supply-voltage-missing" ->
                    "supply.voltage not given: "
                            + (key.equals(dev.ampsieve.budget.InputCrossoverTerm.KEY) ? "not checked" : "not counted");
                case "load-resistance-missing" -> "load-resistance not given: not counted";
                case "one-input-pair" -> "no crossover: the input has one pair";
                case "crossover" ->
                    crossoverWhere() + ": NG x step " + f("step")
                            + (has(TermRemark.STEP_ASSUMED) ? " (assumed 2 x vos)" : "") + "; a trim leaves it";
                case "crossover-not-crossed" -> crossoverWhere() + ": not crossed";
                case "self-heating" ->
                    "die " + f("dieCold") + " to " + f("dieHot") + " (" + f("thetaJa") + " x "
                            + n(w.value("P") * 1e3, 3) + " mW); drift adds " + f("drift") + ", bias adds " + f("bias")
                            + " (ib " + f("ibDie") + " at the die)";
                case "chopping-ripple" -> choppingRipple();
                case "ripple-zero" -> "ripple 0 V in the catalog";
                case "not-self-correcting" -> "not a chopper or auto-zero part";
                case "thermal-emf" ->
                    "NG x " + f("junctions") + " junction(s) x " + f("seebeck") + " x " + f("gradient") + " °C = "
                            + f("emf") + " in series with the input";
                case "no-thermal-emf" -> "no thermal-emf named";
                case "leakage" ->
                    f("V") + " / " + f("R") + " = " + f("I") + " into the "
                            + (has(TermRemark.LEAKAGE_PLUS_INPUT)
                                    ? "+ input, x NG x R+ " + f("R+")
                                    : "- input, x Rf " + f("Rf"));
                case "no-leakage" -> "no leakage named";
                case "null-pin-drift" ->
                    f("nulled") + " nulled by the pins x (1/" + n(w.value("trimKelvin"), 4) + " K + trimmer "
                            + f("potTempco") + ") x " + f("dT") + " °C (rule of thumb for a bipolar pair: about V/T"
                            + (has(TermRemark.NULL_PIN_RULE_NOT_BIPOLAR) ? ", standing in for this input type" : "")
                            + ")";
                case "injection-drift" ->
                    "correction " + f("correction") + " x (reference " + f("referenceTempco") + " + resistor ratio "
                            + f("ratioTempco") + " + trimmer " + f("potTempco") + " x " + f("Rth") + "/(Rinj "
                            + f("Rinj") + " + " + f("Rth") + ")) x " + f("dT") + " °C";
                case "dac-drift" ->
                    has(TermRemark.CIRCUIT_DRIFT_CALIBRATED)
                            ? "linear in temperature: removed by the two-temperature calibration"
                            : "(DAC zero " + f("dacOffsetDrift") + " + gain " + f("dacGainDrift") + " x ("
                                    + f("dacReference")
                                    + "/2 + correction/K)) x K " + f("K") + " + correction " + f("correction")
                                    + " x resistor ratio " + f("ratioTempco") + ", x " + f("dT") + " °C";
                case "injection-gain" ->
                    "noise gain +" + f("dNG") + " on NG " + f("NG") + " scales " + f("scaled")
                            + " (drift, CMRR, PSRR, aging, noise after the trim)"
                            + (has(TermRemark.GAIN_CHANGE_CALIBRATED)
                                    ? "; the gain change " + f("gainChange") + " is calibrated by the two-point trim"
                                    : "; signal gain change " + f("gainChange") + " x VFS " + f("VFS")
                                            + " (keep the gain: choose rg so that rg || Rinj is the stated rg)")
                            + (w.value("commonMode") > 0 ? "; unbalanced common mode " + f("commonMode") : "");
                case "trim-circuit-unusable" -> "the trim circuit cannot be used with this part or stage";
                case "no-trim-circuit" -> "the stage's trim does not use this circuit";
                // a formula this renderer does not know (a test's stand-in): its facts, unworded
                default -> w.formula() + (facts(w).isEmpty() ? "" : ": " + facts(w));
            };
        }

        private String crossoverWhere() {
            String where = has(TermRemark.CROSSOVER_RANGE)
                    ? "crossover assumed " + f("crossoverFrom") + " to " + f("crossover")
                    : "crossover at " + f("crossover");
            return where + (present("cmMin") ? ", common mode " + f("cmMin") + " to " + f("cmMax") : "");
        }

        private String choppingRipple() {
            String head = "ripple " + f("ripple") + (has(TermRemark.RIPPLE_ASSUMED) ? " (assumed)" : "");
            if (has(TermRemark.CHOPPING_FREQUENCY_MISSING)) {
                return head + " x NG: chopping frequency not given, no loop or filter roll-off credited";
            }
            return head + " at " + f("fc") + " x |NG| " + f("|NG|")
                    + (has(TermRemark.NO_FILTER)
                            ? ", no filter"
                            : " x |H| " + f("|H|") + " (order " + order() + " at " + f("fH") + ")");
        }

        private int order() {
            return (int) w.value("order");
        }

        /** "6.6 x rms" and "3.3 x rms": the peak-to-peak span is twice the counted allowance. */
        private String counted() {
            return "; counted as " + n(w.value("allowance"), 2) + " x rms";
        }

        private String pp() {
            return ", pp (" + n(2 * w.value("allowance"), 2) + " x rms) " + f("pp");
        }

        private String noise() {
            String band;
            if (has(TermRemark.GBW_MISSING)) {
                band = "GBW not given: pi/2 x fH assumed";
            } else if (has(TermRemark.LOOP_SETS_NOISE_BAND)) {
                band = "closed-loop bandwidth " + f("fCL")
                        + (order() != 0
                                ? ", below the filter"
                                : has(TermRemark.FILTER_NOT_STATED) ? ", no filter stated" : ", no filter");
            } else {
                band = filterName(order());
            }
            return "en " + f("en") + ", in " + f("in") + "; rms " + f("rms") + pp() + ", " + f("fL") + " to fN "
                    + f("fN") + " (" + band + "), resistors at " + f("T") + counted();
        }

        private String noiseTransimpedance() {
            double high = w.value("NGhigh");
            return "en " + f("en") + ", in " + f("in") + "; noise gain " + f("NG") + " at DC"
                    + (Double.isFinite(high) ? " rising to " + f("NGhigh") + " (1 + Ct/Cf)" : " rising with f (no cf)")
                    + ", Ct " + f("Ct")
                    + (has(TermRemark.INPUT_CAPACITANCE_ASSUMED) ? " (input capacitance assumed)" : "")
                    + "; rms " + f("rms") + pp() + ", integrated from " + f("fL") + " through "
                    + (has(TermRemark.GBW_MISSING)
                            ? "a flat band to " + f("fN") + " (GBW not given)"
                            : order() == 0 ? "the closed loop" : filterName(order()) + " and the closed loop")
                    + ", resistors at " + f("T") + counted();
        }
    }
}
