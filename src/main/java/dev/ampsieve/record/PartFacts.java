package dev.ampsieve.record;

import dev.ampsieve.advice.Candidate;

/**
 * What a record keeps of one part, enough to re-check it: its catalog entry (to name the fields
 * that changed) and the key figures of its outcome.
 *
 * @param file          the catalog file it was read from, as the catalog named it ("" when unknown)
 * @param verdict       {@code Verdict.key()}
 * @param limitingTerm  the term key of the largest term, or null
 * @param errorV        the total the criterion judges, output volts (after the trim when trimmed)
 * @param effectiveCost unit price at the stage quantity plus the trim cost when trimmed; NaN without a price
 * @param constraintsMet every hard constraint met
 */
public record PartFacts(
        String id,
        String file,
        Entry entry,
        String verdict,
        String limitingTerm,
        boolean trimmed,
        double errorV,
        double worstCaseV,
        double rssV,
        double limitV,
        double effectiveCost,
        String currency,
        boolean constraintsMet) {

    public static PartFacts of(Candidate c) {
        var where = c.part().where();
        String file = where == null || where.file() == null ? "" : where.file().toString();
        return new PartFacts(
                c.id(),
                file,
                Entry.of(c.part()),
                c.verdict().key(),
                c.budget().limitingTerm(),
                c.trimmed(),
                c.errorV(),
                c.budget().worstCaseV(),
                c.budget().rssV(),
                c.limitV(),
                c.effectiveCost(),
                c.currency(),
                c.constraintsMet());
    }

    /** Fits as it is or after the trim, every hard constraint met. */
    public boolean fits() {
        return constraintsMet && (verdict.equals("fits") || verdict.equals("fits-after-trim"));
    }
}
