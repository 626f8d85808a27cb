package dev.ampsieve.record;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Rejected;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageWriter;
import java.util.ArrayList;
import java.util.List;

/**
 * Everything a decision record shows: the ranking of the catalog for the stage, the shortlisted
 * parts with their full budgets, for a change the comparison of the two parts, and the facts it
 * embeds ({@link RecordFacts}).
 *
 * @param shortlist  the parts the record is about, each as the ranking has it (a part failing a
 *                   hard constraint as its budget comes closest)
 * @param comparison for a change from the first to the second part; null otherwise
 */
public record DecisionRecord(
        Stage stage, Ranking ranking, List<Candidate> shortlist, Comparison comparison, RecordFacts facts) {

    /** How many parts a record shortlists when none are named. */
    public static final int DEFAULT_SHORTLIST = 3;

    public DecisionRecord {
        shortlist = List.copyOf(shortlist);
    }

    /**
     * Ranks {@code catalogParts} in {@code stage} and builds the record.
     *
     * @param chosen the parts to shortlist, in order; null for the ranking's first
     *               {@link #DEFAULT_SHORTLIST} parts that fit, or its closest part when none fits
     * @param change a change from {@code chosen[0]} to {@code chosen[1]}
     */
    public static DecisionRecord build(
            Stage stage,
            String stagePath,
            String catalogPath,
            List<Part> catalogParts,
            List<Part> chosen,
            boolean change,
            String date,
            String toolVersion) {
        if (change && (chosen == null || chosen.size() != 2)) {
            throw new IllegalArgumentException("a change names two parts");
        }
        Ranking r = Ranker.rank(stage, catalogParts, BudgetCalculator::compute);
        List<Candidate> list = new ArrayList<>();
        if (chosen == null) {
            r.candidates().stream()
                    .filter(Candidate::fits)
                    .limit(DEFAULT_SHORTLIST)
                    .forEach(list::add);
            if (list.isEmpty() && !r.candidates().isEmpty()) {
                list.add(r.candidates().get(0));
            }
        } else {
            for (Part p : chosen) {
                list.add(candidate(r, stage, p));
            }
        }
        Comparison cmp =
                change ? Comparison.of(list.get(0).budget(), list.get(1).budget()) : null;
        Candidate pick =
                r.candidates().stream().filter(Candidate::fits).findFirst().orElse(null);
        RecordFacts facts = new RecordFacts(
                change ? RecordFacts.Kind.CHANGE : RecordFacts.Kind.SHORTLIST,
                stagePath,
                StageWriter.toYaml(stage),
                catalogPath,
                date,
                toolVersion,
                list.stream().map(PartFacts::of).toList(),
                pick == null ? null : PartFacts.of(pick),
                r.candidates().size(),
                r.rejected().size());
        return new DecisionRecord(stage, r, list, cmp, facts);
    }

    /** The part as the ranking has it; a rejected part (a hard constraint fails) as its budget comes closest. */
    private static Candidate candidate(Ranking r, Stage stage, Part p) {
        for (Candidate c : r.candidates()) {
            if (c.id().equals(p.id())) {
                return c;
            }
        }
        for (Rejected x : r.rejected()) {
            if (x.id().equals(p.id())) {
                return Candidate.of(x.budget());
            }
        }
        // a part the ranker left out altogether (its budget overflowed): budget it on its own
        return Candidate.of(BudgetCalculator.compute(stage, p));
    }
}
