package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.Cancelled;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Budgets every part for a stage and ranks the result. Pure: no printing, no files. */
public final class Ranker {
    private Ranker() {}

    /**
     * Fitting candidates first, by effective unit cost (no price last), then by margin, then
     * by id; then the undecided parts (a yield whose interval still holds the target), then the
     * parts that do not fit, each closest (largest margin) first.
     */
    public static final Comparator<Candidate> ORDER = Comparator.comparingInt(Ranker::group)
            .thenComparing((a, b) -> a.fits() ? Double.compare(a.effectiveCost(), b.effectiveCost()) : 0)
            .thenComparing(Comparator.comparingDouble(Candidate::margin).reversed())
            .thenComparing((a, b) -> Double.compare(a.effectiveCost(), b.effectiveCost()))
            .thenComparing(Candidate::id);

    /** 0 fits, 1 undecided, 2 does not fit. */
    static int group(Candidate c) {
        if (c.fits()) {
            return 0;
        }
        return c.verdict() == Verdict.UNDECIDED ? 1 : 2;
    }

    /** @throws Cancelled when the thread is interrupted (checked before each part) */
    public static Ranking rank(Stage stage, List<Part> parts, BudgetFunction budgets) {
        List<Candidate> candidates = new ArrayList<>();
        List<Rejected> rejected = new ArrayList<>();
        for (Part p : parts) {
            Cancelled.check();
            Budget b = budgets.compute(stage, p);
            if (b.constraintsMet()) {
                candidates.add(Candidate.of(b));
            } else {
                rejected.add(Rejected.of(b));
            }
        }
        candidates.sort(ORDER);
        rejected.sort(Comparator.comparing(Rejected::id));
        Advice advice = Advisor.advise(stage, candidates, rejected, budgets);
        return new Ranking(stage, candidates, rejected, Pareto.front(candidates), advice);
    }
}
