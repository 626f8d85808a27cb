package dev.ampsieve.shell;

import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.stage.Topology;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Which questions guided entry asks and in what order, in one place. What each key means,
 * its default and why it is asked come from {@link StageKeys}; only the two questions that
 * combine keys (the temperature range, the limit in any form) add words of their own.
 */
final class Questions {
    private Questions() {}

    /**
     * Asked first, and 'done' is offered only after them: each decides the verdict, and an
     * absent full-scale output or supply variation leaves error terms out (the verdict line
     * then says which).
     */
    static final List<String> FIRST = List.of(
            "topology",
            "gain",
            "rf",
            "source-resistance",
            "source-capacitance",
            "cf",
            Answers.TEMPERATURE,
            Answers.LIMIT,
            "full-scale-output",
            "supply.voltage",
            "supply.variation");

    /**
     * Of {@link #FIRST}, the questions asked there only for a transimpedance stage (which has no
     * gain: its parts are its gain); the other topologies meet them, where they apply, among the rest.
     */
    static final Set<String> FIRST_FOR_CURRENT_INPUT = Set.of("rf", "source-resistance", "source-capacitance", "cf");

    /** Asked after the supply when it is given: on a single supply the mid-supply default is rarely right. */
    static final List<String> HEADROOM = List.of("output-range", "common-mode-range");

    /** Left to {@code set}: derived (rg) and statistics settings with sound defaults. */
    static final Set<String> NOT_ASKED = Set.of(
            "rg",
            "r1",
            "r3",
            "r4",
            "source-resistance.minus",
            "source-resistance.plus",
            "max-to-sigma",
            "trials",
            "max-trials",
            "seed",
            // board-level sources: off unless named, set when the layout is known
            "thermal-emf.junctions",
            "thermal-emf.seebeck",
            "thermal-emf.gradient",
            "leakage.resistance",
            "leakage.voltage",
            "leakage.input",
            // trim circuits: a stored correction unless set; the circuit's keys have common-practice defaults
            "trim.circuit",
            "trim.circuits",
            "trim.margin",
            "trim.node",
            "trim.reference",
            "trim.reference-tempco",
            "trim.resistor-tempco",
            "trim.tracking",
            "trim.pot-settability",
            "trim.pot-tempco",
            "trim.pot-resistance",
            "trim.dac-bits",
            "trim.dac-reference",
            "trim.dac-offset-drift",
            "trim.dac-gain-drift",
            "trim.pot-cost",
            "trim.reference-cost",
            "trim.resistor-cost",
            "trim.dac-cost",
            "trim.adjust-cost");

    /** Only asked when a trim is allowed. */
    static final Set<String> TRIM_DETAILS = Set.of("trim.method", "trim.resolution", "trim.cost");

    /** Only asked for a two-temperature calibration. */
    static final Set<String> CALIBRATION_POINTS = Set.of("trim.cold", "trim.hot");

    /**
     * Every question, in order; the combined ranges stand for their two keys. A question may stand
     * twice (among the first for one topology, among the rest for the others): {@link #applies}
     * with its index decides which place asks it.
     */
    static List<String> order() {
        List<String> out = new ArrayList<>(FIRST);
        out.addAll(HEADROOM);
        for (String p : StageKeys.paths()) {
            if (covered(p) && !FIRST_FOR_CURRENT_INPUT.contains(p) || NOT_ASKED.contains(p) || p.equals("topology")) {
                continue;
            }
            out.add(p.equals("band.low") ? "band" : p);
        }
        return out;
    }

    /** The topology the answers name (non-inverting, the default, when none). */
    static Topology topology(Map<String, String> answers) {
        String t = answers.get("topology");
        for (Topology x : Topology.values()) {
            if (x.key().equals(t)) {
                return x;
            }
        }
        return Topology.NON_INVERTING;
    }

    /** Whether {@code id} is one of the first questions for this topology ('done' is refused there). */
    static boolean first(String id, Map<String, String> answers) {
        return FIRST.contains(id)
                && (!FIRST_FOR_CURRENT_INPUT.contains(id) || topology(answers) == Topology.TRANSIMPEDANCE);
    }

    /** Whether the question at {@code index} of {@link #order()} is asked given the answers so far. */
    static boolean applies(List<String> order, int index, Map<String, String> answers) {
        String id = order.get(index);
        boolean inFirst = index < FIRST.size();
        if (FIRST_FOR_CURRENT_INPUT.contains(id)) {
            boolean currentIn = topology(answers) == Topology.TRANSIMPEDANCE;
            if (inFirst != currentIn) {
                return false;
            }
        }
        return applies(id, answers);
    }

    /** Whether a key is asked as part of an earlier question (or, band.high, by the band question). */
    private static boolean covered(String p) {
        return p.equals("gain")
                || p.startsWith("temperature.")
                || p.equals("limit")
                || p.startsWith("limit.")
                || FIRST.contains(p)
                || p.startsWith("output-range.")
                || p.startsWith("common-mode-range.")
                || p.equals("band.high");
    }

    /** Whether {@code id} is asked given the answers so far (wherever it stands in the order). */
    static boolean applies(String id, Map<String, String> answers) {
        StageKeys.Key key = StageKeys.get(id);
        if (key != null && !StageKeys.appliesTo(key, topology(answers))) {
            return false; // another topology's resistor, or the gain of a transimpedance stage
        }
        if (HEADROOM.contains(id)) {
            return answers.containsKey("supply.voltage");
        }
        if (CALIBRATION_POINTS.contains(id)) {
            return "true".equals(answers.get("trim.allowed")) && "two-temperature".equals(answers.get("trim.method"));
        }
        return !TRIM_DETAILS.contains(id) || "true".equals(answers.get("trim.allowed"));
    }

    /** Keys only {@code set} reaches, for the closing hint. */
    static List<String> setOnly(Map<String, String> answers) {
        return StageKeys.paths().stream()
                .filter(NOT_ASKED::contains)
                .filter(p -> StageKeys.appliesTo(StageKeys.get(p), topology(answers)))
                .toList();
    }

    static String why(String id) {
        if (id.equals(Answers.TEMPERATURE)) {
            return "drift and FET bias currents grow with the distance from 25 C; the part must be rated over the whole ambient range";
        }
        if (id.equals("band")) {
            return "the signal band: 1/f noise is integrated from its low end; at its high end the closed-loop gain falls "
                    + "and the slew rate is set";
        }
        if (id.equals("output-range")) {
            return "the output voltages needed, volts above the negative rail; the part's output must reach them. "
                    + "On a single supply the signal rarely sits at mid-supply, the default";
        }
        if (id.equals("common-mode-range")) {
            return "the input voltages needed, volts above the negative rail; the part's inputs must work there. "
                    + "On a single supply the inputs rarely sit at mid-supply, the default";
        }
        if (id.equals(Answers.SUPPLY)) {
            return "the total supply the part must run from, and its peak change (multiplied by the supply rejection)";
        }
        if (id.equals(Answers.LIMIT)) {
            return "the largest error allowed; every part is judged against it";
        }
        return StageKeys.get(id).why();
    }

    static String example(String id) {
        if (id.equals(Answers.TEMPERATURE)) {
            return "-40..85 C";
        }
        if (id.equals("band")) {
            return "0.1..10 Hz";
        }
        if (id.equals("output-range")) {
            return "0.1..4.9 V";
        }
        if (id.equals("common-mode-range")) {
            return "0.5..2.5 V";
        }
        if (id.equals(Answers.SUPPLY)) {
            return "5 V ± 0.25 V (or 5 V +- 0.25 V)";
        }
        if (id.equals("supply.voltage")) {
            return "5 V, or with its change: 5 V ± 0.25 V";
        }
        if (id.equals(Answers.LIMIT)) {
            return "1 mV (at the output), 10 uV input (transimpedance: 1 nA input), 0.1 % (of full-scale-output), "
                    + "0.5 lsb 16 bits 2.5 V";
        }
        return StageKeys.get(id).example();
    }

    /** The default in words, as the key table states it. */
    static String defaultText(String id) {
        Answers.RangeId r = Answers.range(id);
        if (r != null) {
            String lo = StageKeys.get(r.low()).defaultText();
            String hi = StageKeys.get(r.high()).defaultText();
            return lo.startsWith("mid-supply")
                    ? "mid-supply +/- " + (id.equals("output-range") ? "full-scale-output" : "common-mode-swing")
                    : lo.replace(" " + r.unit(), "") + ".." + hi;
        }
        if (id.equals(Answers.SUPPLY)) {
            return StageKeys.get("supply.voltage").defaultText();
        }
        return StageKeys.get(id).defaultText();
    }

    static boolean required(String id) {
        return defaultText(id).startsWith("required");
    }

    /** {@link #required(String)}, and the source and feedback of a transimpedance stage, which have no default. */
    static boolean required(String id, Map<String, String> answers) {
        return required(id)
                || topology(answers) == Topology.TRANSIMPEDANCE
                        && Set.of("rf", "source-resistance").contains(id);
    }

    /** The value the answers hold for {@code id}, in the shorthand a user would type; null when unanswered. */
    static String current(String id, Map<String, String> a) {
        Answers.RangeId r = Answers.range(id);
        if (r != null) {
            String lo = a.get(r.low());
            String hi = a.get(r.high());
            if (lo == null && hi == null) {
                return null;
            }
            return (lo != null ? lo : StageKeys.get(r.low()).defaultText()) + ".."
                    + (hi != null ? hi : StageKeys.get(r.high()).defaultText());
        }
        if (id.equals(Answers.SUPPLY)) {
            String v = a.get("supply.voltage");
            String dv = a.get("supply.variation");
            return v == null ? null : dv == null ? v : v + " ± " + dv;
        }
        if (id.equals(Answers.LIMIT)) {
            if (a.containsKey("limit")) {
                return a.get("limit");
            }
            if (a.containsKey("limit.input")) {
                return a.get("limit.input") + " input";
            }
            if (a.containsKey("limit.input-current")) {
                return a.get("limit.input-current") + " input";
            }
            if (a.containsKey("limit.percent-of-full-scale")) {
                String p = a.get("limit.percent-of-full-scale");
                return (p.contains("%") ? p : p + " %") + " of full scale";
            }
            if (a.containsKey("limit.lsb")) {
                return a.get("limit.lsb") + " lsb " + a.getOrDefault("limit.bits", "?") + " bits "
                        + a.getOrDefault("limit.reference", "?");
            }
            return null;
        }
        if (id.equals("gain") && !a.containsKey("gain") && a.containsKey("rf") && a.containsKey("rg")) {
            return "from rf and rg";
        }
        return a.get(id);
    }
}
