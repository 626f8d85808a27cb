package dev.ampsieve.report;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.YieldResult;

/**
 * The figures of one ranked part that every rendering of {@code rank} shows (text, JSON, CSV),
 * chosen here once so the three cannot disagree: the figures "as ranked" are those the verdict
 * judges, after the stage's trim exactly when the part is ranked with it.
 *
 * @param candidate         the part as ranked
 * @param worstCaseV        worst-case sum as ranked, output volts
 * @param rssV              RSS total as ranked, output volts
 * @param yield             Monte Carlo yield as ranked; null when the stage is not judged by a yield
 *                          (or the trimmed yield was not simulated)
 * @param untrimmedYield    the yield without the trim; null when the stage is not judged by a yield
 * @param trimmedWorstCaseV worst-case sum after the stage's trim; NaN when the budget has no trimmed figures
 * @param trimmedRssV       RSS total after the stage's trim; NaN likewise
 * @param trimmedYield      yield after the trim: only under a yield criterion with the trim allowed, else null
 */
record RankedFigures(
        Candidate candidate,
        double worstCaseV,
        double rssV,
        YieldResult yield,
        YieldResult untrimmedYield,
        double trimmedWorstCaseV,
        double trimmedRssV,
        YieldResult trimmedYield) {

    static RankedFigures of(Candidate c) {
        Trimmed t = c.budget().trimmed();
        double tw = t == null ? Double.NaN : t.worstCaseV();
        double tr = t == null ? Double.NaN : t.rssV();
        YieldResult ty = t == null ? null : t.yield();
        YieldResult uy = c.budget().yield();
        boolean after = c.trimmed() && t != null;
        return new RankedFigures(
                c,
                after ? tw : c.budget().worstCaseV(),
                after ? tr : c.budget().rssV(),
                c.trimmed() ? ty : uy,
                uy,
                tw,
                tr,
                ty);
    }

    /** The total the criterion judges, output volts (worst-case, or RSS for the RSS and yield criteria). */
    double errorV() {
        return candidate.errorV();
    }

    /** The margin of the criterion in force, as {@link Candidate#margin()} defines it. */
    double margin() {
        return candidate.margin();
    }

    double effectiveCost() {
        return candidate.effectiveCost();
    }

    /** Key of the largest term (of the untrimmed budget, as the engine names it); null when there is none. */
    String limitingTerm() {
        return candidate.budget().limitingTerm();
    }

    /** The largest term's label with its kind tag ("initial offset", "self-heating (op)"); null when none. */
    String limitingLabel() {
        String key = limitingTerm();
        if (key == null) {
            return null;
        }
        TermResult t = candidate.budget().term(key);
        return t == null ? key : t.label() + Figures.kindTag(t.kind());
    }
}
