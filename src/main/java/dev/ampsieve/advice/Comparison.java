package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Two parts in the same stage, term by term, and which one is preferred: the core of justifying
 * a part change ({@code report} words the conclusion).
 *
 * @param preferred id of the better part, or null when they come out equal
 */
public record Comparison(Candidate a, Candidate b, List<TermDelta> terms, String preferred) {

    public Comparison {
        terms = List.copyOf(terms);
    }

    /**
     * One term of both budgets.
     *
     * @param better      which part has the smaller output error, or {@link Side#EQUAL}
     * @param differenceV how much smaller the better one is, output volts
     * @param ratio       larger / smaller (infinite when the smaller is 0; 1 when equal)
     * @param aEstimated  part a's figure rests on an estimated, typical-only or missing value
     * @param bEstimated  likewise for part b
     */
    public record TermDelta(
            String key,
            String label,
            double aV,
            double bV,
            Side better,
            double differenceV,
            double ratio,
            boolean aEstimated,
            boolean bEstimated) {

        /**
         * The smaller figure is 0 V only because the catalog lacks the value (an estimated term at
         * 0 V): it must not win the row on that alone, so which part is better is unknown.
         */
        public boolean betterUnknown() {
            return better == Side.A ? aEstimated && aV == 0 : better == Side.B && bEstimated && bV == 0;
        }
    }

    /** Which of the two parts a figure favours. */
    public enum Side {
        A,
        B,
        EQUAL
    }

    /** Cost differences below half a cent count as equal. */
    public static final double COST_EPS = 0.005;

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
            deltas.add(delta(
                    key, label, x, y, pair[0] != null && pair[0].estimated(), pair[1] != null && pair[1].estimated()));
        });
        String preferred = preferred(a, b);
        return new Comparison(a, b, deltas, preferred);
    }

    /** One pair of output errors compared (the smaller magnitude is better). */
    public static TermDelta delta(String key, String label, double x, double y) {
        return delta(key, label, x, y, false, false);
    }

    /** As {@link #delta(String, String, double, double)}, each figure marked when it rests on an estimate. */
    public static TermDelta delta(
            String key, String label, double x, double y, boolean xEstimated, boolean yEstimated) {
        double hi = Math.max(Math.abs(x), Math.abs(y));
        double lo = Math.min(Math.abs(x), Math.abs(y));
        // equal within one part in 10^6 of the larger: finer than any printed digit
        if (hi - lo <= 1e-6 * hi) {
            return new TermDelta(key, label, x, y, Side.EQUAL, 0, 1, xEstimated, yEstimated);
        }
        Side better = Math.abs(x) < Math.abs(y) ? Side.A : Side.B;
        return new TermDelta(
                key,
                label,
                x,
                y,
                better,
                hi - lo,
                lo == 0 ? Double.POSITIVE_INFINITY : hi / lo,
                xEstimated,
                yEstimated);
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
}
