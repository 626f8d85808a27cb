package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ErrorTerm;
import dev.ampsieve.budget.NotCounted;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The words for the terms a budget leaves out ({@link NotCounted}), said on each verdict line:
 * "open-loop gain, closed-loop bandwidth and resistor ratio not counted: no full-scale-output".
 */
public final class Uncounted {
    private Uncounted() {}

    /** Why, in words; the stage key named so the user knows what to set. */
    static String reason(NotCounted.Reason r) {
        return switch (r) {
            case NO_FULL_SCALE_OUTPUT -> "no full-scale-output";
            case NO_SUPPLY_VARIATION -> "no supply.variation";
            case NO_COMMON_MODE_SWING -> "no common-mode-swing";
            case NO_RESISTOR_TOLERANCE -> "no resistor-ratio tolerance";
            case NO_SERVICE_LIFE -> "no service-life";
            case NOT_IN_CATALOG -> "not in the catalog";
            case NO_SUPPLY_VOLTAGE -> "no supply.voltage";
            case NO_LOAD_RESISTANCE -> "no load-resistance";
            case AC_COUPLED -> "ac-coupled, headroom only";
        };
    }

    static String label(String key) {
        return BudgetCalculator.TERMS.stream()
                .filter(t -> t.key().equals(key))
                .map(ErrorTerm::label)
                .findFirst()
                .orElse(key);
    }

    /** "a, b and c not counted: why; d not counted: why", or "" when every term counts. */
    static String words(List<NotCounted> list) {
        Map<NotCounted.Reason, List<String>> by = new java.util.EnumMap<>(NotCounted.Reason.class); // full scale first
        for (NotCounted n : list) {
            by.computeIfAbsent(n.reason(), k -> new ArrayList<>()).add(label(n.term()));
        }
        List<String> parts = new ArrayList<>();
        by.forEach((r, terms) -> parts.add(join(terms) + " not counted: " + reason(r)));
        return String.join("; ", parts);
    }

    /** What a stage leaves out for every part, in words ("" when nothing): for the shell once a stage is described. */
    public static String ofStage(dev.ampsieve.stage.Stage s) {
        return words(NotCounted.of(s, null));
    }

    /** Only the entries the stage causes (the same for every part). */
    static List<NotCounted> ofStage(List<NotCounted> list) {
        return list.stream().filter(n -> n.reason().ofStage()).toList();
    }

    /** Only the entries the part's catalog figures cause. */
    static List<NotCounted> ofPart(List<NotCounted> list) {
        return list.stream().filter(n -> !n.reason().ofStage()).toList();
    }

    static String join(List<String> words) {
        if (words.size() == 1) {
            return words.get(0);
        }
        return String.join(", ", words.subList(0, words.size() - 1)) + " and " + words.get(words.size() - 1);
    }

    /** JSON: notCounted[{term, reason}]. */
    static void put(ObjectNode o, List<NotCounted> list) {
        ArrayNode a = o.putArray("notCounted");
        for (NotCounted n : list) {
            ObjectNode e = a.addObject();
            e.put("term", n.term());
            e.put("reason", n.reason().key());
        }
    }
}
