package dev.ampsieve.record;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/** A recorded decision against the same record made again today: what no longer holds. */
public final class Recheck {
    private Recheck() {}

    /** Cost differences below half a cent count as equal (as {@code Comparison} has it). */
    static final double COST_EPS = 0.005;

    /**
     * @param was   the facts the record embeds
     * @param today the record built again from the same stage and the recorded parts still in the catalog
     * @return the findings, each part's in the recorded order; empty when the decision holds
     */
    public static List<Finding> compare(RecordFacts was, RecordFacts today) {
        List<Finding> out = new ArrayList<>();
        for (PartFacts old : was.parts()) {
            PartFacts now = today.part(old.id());
            if (now == null) {
                out.add(new Finding.Disappeared(old.id()));
                continue;
            }
            if (!old.entry().sha256().equals(now.entry().sha256())) {
                out.add(new Finding.EntryChanged(
                        old.id(), changes(old.entry().fields(), now.entry().fields())));
            }
            if (!old.verdict().equals(now.verdict()) || old.constraintsMet() != now.constraintsMet()) {
                out.add(new Finding.VerdictChanged(old.id(), verdictWord(old), verdictWord(now)));
            }
            if (!Objects.equals(old.limitingTerm(), now.limitingTerm())) {
                out.add(new Finding.LimitingChanged(old.id(), old.limitingTerm(), now.limitingTerm()));
            }
        }
        PartFacts p = today.cheapestFit();
        PartFacts q = was.cheapestFit();
        if (p != null && (q == null || !p.id().equals(q.id()) && cheaper(p.effectiveCost(), q.effectiveCost()))) {
            out.add(new Finding.CheaperFits(p, q));
        }
        return List.copyOf(out);
    }

    /** A part failing a hard constraint is "rejected", whatever its budget's verdict. */
    private static String verdictWord(PartFacts f) {
        return f.constraintsMet() ? f.verdict() : "rejected";
    }

    /** A price where there was none counts as cheaper; no price is never cheaper. */
    private static boolean cheaper(double now, double was) {
        if (Double.isNaN(now)) {
            return false;
        }
        return Double.isNaN(was) || now < was - COST_EPS;
    }

    /** Every path whose value differs, in the catalog's key order (the recorded entry's, then new paths). */
    static List<Finding.FieldChange> changes(Map<String, String> was, Map<String, String> now) {
        Set<String> paths = new LinkedHashSet<>(was.keySet());
        paths.addAll(now.keySet());
        List<Finding.FieldChange> out = new ArrayList<>();
        for (String path : paths) {
            String a = was.get(path);
            String b = now.get(path);
            if (!Objects.equals(a, b)) {
                out.add(new Finding.FieldChange(path, a, b));
            }
        }
        return out;
    }
}
