package dev.ampsieve.stage;

/**
 * How a part is judged against the limit: worst-case sum, RSS, or a yield target (0..1). Facts
 * only: {@code report.CriterionText} words it ("worst-case", "rss", "yield 99.9 %").
 */
public record Criterion(Kind kind, double yieldTarget) {

    public enum Kind {
        WORST_CASE,
        RSS,
        YIELD
    }

    public static final Criterion WORST_CASE = new Criterion(Kind.WORST_CASE, Double.NaN);
    public static final Criterion RSS = new Criterion(Kind.RSS, Double.NaN);

    public static Criterion yield(double target) {
        return new Criterion(Kind.YIELD, target);
    }
}
