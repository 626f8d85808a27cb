package dev.ampsieve.shell;

import dev.ampsieve.stage.StageKeys;
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
    private Questions() {
    }

    /** Asked first: without them no part can be judged. */
    static final List<String> FIRST = List.of("gain", Answers.TEMPERATURE, Answers.LIMIT);

    /** Left to {@code set}: derived (rg), detailed headroom, and statistics settings with sound defaults. */
    static final Set<String> NOT_ASKED = Set.of("rg", "common-mode-range.min", "common-mode-range.max",
            "output-range.min", "output-range.max", "max-to-sigma", "trials", "max-trials", "seed");

    /** Only asked when a trim is allowed. */
    static final Set<String> TRIM_DETAILS = Set.of("trim.method", "trim.resolution", "trim.cost");

    /** Every question, in order. */
    static List<String> order() {
        List<String> out = new ArrayList<>(FIRST);
        for (String p : StageKeys.paths()) {
            boolean coveredByFirst = p.equals("gain") || p.startsWith("temperature.") || p.equals("limit") || p.startsWith("limit.");
            if (!coveredByFirst && !NOT_ASKED.contains(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /** Whether {@code id} is asked given the answers so far. */
    static boolean applies(String id, Map<String, String> answers) {
        return !TRIM_DETAILS.contains(id) || "true".equals(answers.get("trim.allowed"));
    }

    /** Keys only {@code set} reaches, for the closing hint. */
    static List<String> setOnly() {
        return StageKeys.paths().stream().filter(NOT_ASKED::contains).toList();
    }

    static String why(String id) {
        if (id.equals(Answers.TEMPERATURE)) {
            return "drift and FET bias currents grow with the distance from 25 C; the part must be rated over the whole ambient range";
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
        if (id.equals(Answers.LIMIT)) {
            return "1 mV (at the output), 10 uV input, 0.1 % (of full-scale-output), 0.5 lsb 16 bits 2.5 V";
        }
        return StageKeys.get(id).example();
    }

    /** The default in words, as the key table states it. */
    static String defaultText(String id) {
        if (id.equals(Answers.TEMPERATURE)) {
            return StageKeys.get("temperature.min").defaultText() + ".." + StageKeys.get("temperature.max").defaultText();
        }
        return StageKeys.get(id).defaultText();
    }

    static boolean required(String id) {
        return defaultText(id).startsWith("required");
    }

    /** The value the answers hold for {@code id}, in the shorthand a user would type; null when unanswered. */
    static String current(String id, Map<String, String> a) {
        if (id.equals(Answers.TEMPERATURE)) {
            String lo = a.get("temperature.min");
            String hi = a.get("temperature.max");
            if (lo == null && hi == null) {
                return null;
            }
            return (lo != null ? lo : StageKeys.get("temperature.min").defaultText()) + ".."
                    + (hi != null ? hi : StageKeys.get("temperature.max").defaultText());
        }
        if (id.equals(Answers.LIMIT)) {
            if (a.containsKey("limit")) {
                return a.get("limit");
            }
            if (a.containsKey("limit.input")) {
                return a.get("limit.input") + " input";
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
