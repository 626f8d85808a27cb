package dev.ampsieve.advice;

import static dev.ampsieve.advice.Phrases.money;
import static dev.ampsieve.advice.Phrases.volts;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Two parts in the same stage, term by term, with a one-line conclusion: the core of
 * justifying a part change.
 *
 * @param preferred id of the better part, or null when they come out equal
 */
public record Comparison(Candidate a, Candidate b, List<TermDelta> terms, String preferred, String conclusion) {

    public Comparison {
        terms = List.copyOf(terms);
    }

    /**
     * One term of both budgets.
     *
     * @param better      which part has the smaller output error, or {@link Side#EQUAL}
     * @param differenceV how much smaller the better one is, output volts
     * @param ratio       larger / smaller (infinite when the smaller is 0; 1 when equal)
     */
    public record TermDelta(
            String key, String label, double aV, double bV, Side better, double differenceV, double ratio) {}

    /** Which of the two parts a figure favours. */
    public enum Side {
        A,
        B,
        EQUAL
    }

    /** Cost differences below half a cent count as equal. */
    static final double COST_EPS = 0.005;

    public static Comparison of(Budget ba, Budget bb) {
        Candidate a = Candidate.of(ba);
        Candidate b = Candidate.of(bb);
        Map<String, TermResult[]> byKey = new LinkedHashMap<>();
        for (TermResult t : ba.terms()) {
            byKey.computeIfAbsent(t.key(), k -> new TermResult[2])[0] = t;
        }
        for (TermResult t : bb.terms()) {
            byKey.computeIfAbsent(t.key(), k -> new TermResult[2])[1] = t;
        }
        List<TermDelta> deltas = new ArrayList<>();
        byKey.forEach((key, pair) -> {
            double x = pair[0] == null ? 0 : pair[0].outputV();
            double y = pair[1] == null ? 0 : pair[1].outputV();
            String label = pair[0] != null ? pair[0].label() : pair[1].label();
            deltas.add(delta(key, label, x, y));
        });
        String preferred = preferred(a, b);
        return new Comparison(a, b, deltas, preferred, conclusion(a, b, preferred));
    }

    /** One pair of output errors compared (the smaller magnitude is better). */
    public static TermDelta delta(String key, String label, double x, double y) {
        double hi = Math.max(Math.abs(x), Math.abs(y));
        double lo = Math.min(Math.abs(x), Math.abs(y));
        // equal within one part in 10^6 of the larger: finer than any printed digit
        if (hi - lo <= 1e-6 * hi) {
            return new TermDelta(key, label, x, y, Side.EQUAL, 0, 1);
        }
        Side better = Math.abs(x) < Math.abs(y) ? Side.A : Side.B;
        return new TermDelta(key, label, x, y, better, hi - lo, lo == 0 ? Double.POSITIVE_INFINITY : hi / lo);
    }

    private static String preferred(Candidate a, Candidate b) {
        if (a.fits() != b.fits()) {
            return a.fits() ? a.id() : b.id();
        }
        if (a.fits()) {
            double d = a.effectiveCost() - b.effectiveCost();
            if (Math.abs(d) >= COST_EPS) {
                return d < 0 ? a.id() : b.id();
            }
        }
        if (a.margin() == b.margin()) {
            return null;
        }
        return a.margin() > b.margin() ? a.id() : b.id();
    }

    private static String conclusion(Candidate a, Candidate b, String preferred) {
        int q = a.budget().stage().quantity();
        if (a.fits() && b.fits()) {
            Candidate p = a.id().equals(preferred) ? a : b;
            Candidate o = p == a ? b : a;
            double d = o.effectiveCost() - p.effectiveCost();
            if (preferred == null) {
                return "Both fit at the same cost with the same margin (" + Phrases.marginValue(a)
                        + "): either will do.";
            }
            if (Math.abs(d) < COST_EPS) {
                return "Both fit at the same cost; " + p.id() + " has the larger margin (" + Phrases.marginValue(p)
                        + " against " + Phrases.marginValue(o) + "): " + p.id() + ".";
            }
            return "Both fit; " + p.id() + " costs " + money(d, p.currency()) + " less per unit ("
                    + money(d * q, p.currency()) + " over " + q + " units), margin " + Phrases.marginValue(p)
                    + " against "
                    + Phrases.marginValue(o) + ": " + p.id() + ".";
        }
        if (a.fits() || b.fits()) {
            Candidate p = a.fits() ? a : b;
            Candidate o = p == a ? b : a;
            return p.id() + " fits" + (p.trimmed() ? " after the trim" : "") + " (margin " + Phrases.marginValue(p)
                    + ") and " + o.id() + " does not (" + whyNot(o) + "): " + p.id() + ".";
        }
        if (preferred == null) {
            return "Neither fits (" + a.id() + ": " + whyNot(a) + "; " + b.id() + ": " + whyNot(b) + ").";
        }
        Candidate p = a.id().equals(preferred) ? a : b;
        Candidate o = p == a ? b : a;
        return "Neither fits; " + p.id() + " comes closer (" + volts(p.errorV()) + " against " + volts(o.errorV())
                + " for a " + volts(p.limitV()) + " limit; " + whyNot(p) + ").";
    }

    private static String whyNot(Candidate c) {
        if (!c.constraintsMet()) {
            return "fails " + String.join(", ", Rejected.of(c.budget()).failed());
        }
        if (c.budget().stage().criterion().kind() == dev.ampsieve.stage.Criterion.Kind.YIELD
                && Phrases.yieldOf(c) != null) {
            // judged by the yield: an error total inside the limit would not say why it misses
            return Phrases.yieldText(c) + Phrases.limitedBy(c);
        }
        return Phrases.totalName(c.budget().stage().criterion()) + (c.trimmed() ? " after the trim " : " ")
                + volts(c.errorV()) + " against " + volts(c.limitV()) + Phrases.limitedBy(c);
    }
}
