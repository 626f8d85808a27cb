package dev.ampsieve.search;

import java.util.List;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.DoubleRange;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.ConstantScoreQuery;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.PrefixQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermQuery;

/**
 * A parsed query: every clause must hold (AND). Built by {@link QueryLanguage#parse}.
 * Relevance: each free word scores 1, or 2 when it is in the title; constraints do not score,
 * so among equally relevant parts the caller's price order decides.
 */
public record PartQuery(String text, List<Clause> clauses) {

    public PartQuery {
        clauses = List.copyOf(clauses);
    }

    /** The comparison written in a constraint. */
    public enum Op {
        LT("<"),
        LE("<="),
        GT(">"),
        GE(">="),
        EQ("="),
        BETWEEN("=..");

        private final String symbol;

        Op(String symbol) {
            this.symbol = symbol;
        }

        public String symbol() {
            return symbol;
        }
    }

    /** One space-separated term of the query. */
    public sealed interface Clause permits Word, WordIn, KeywordIs, NumberIs, RatedAt {
        /** The term as the user wrote it. */
        String written();
    }

    /** A free word, matched in the part's words (see {@link Words}); {@code excluded} for {@code -word}. */
    public record Word(String written, String word, boolean excluded) implements Clause {}

    /** {@code notes:word}: a free word in one text field only; {@code excluded} for {@code -notes:word}. */
    public record WordIn(String written, Schema.Text field, String word, boolean excluded) implements Clause {}

    /** {@code field:value} on a keyword field; {@code excluded} for {@code -field:value}. */
    public record KeywordIs(String written, Schema.Keyword field, String value, boolean excluded) implements Clause {}

    /** A number compared with [lo, hi] (both ends inclusive; open ends infinite). */
    public record NumberIs(String written, Schema.Numeric field, Op op, double lo, double hi) implements Clause {}

    /** The part must be rated over [lo, hi] (a point when lo == hi). */
    public record RatedAt(String written, Schema.Interval field, Op op, double lo, double hi) implements Clause {}

    public boolean isEmpty() {
        return clauses.isEmpty();
    }

    /** The Lucene query this stands for. */
    public Query toLucene() {
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        boolean positive = false;
        for (Clause c : clauses) {
            if (c instanceof Word w) {
                if (w.excluded()) {
                    b.add(wordQuery(Schema.TEXT, w.word()), Occur.MUST_NOT);
                } else {
                    // constant scores: 1 for a hit anywhere, 1 more when it is in the title
                    Query scored = new BooleanQuery.Builder()
                            .add(new ConstantScoreQuery(wordQuery(Schema.TEXT, w.word())), Occur.SHOULD)
                            .add(new ConstantScoreQuery(wordQuery(Schema.TITLE, w.word())), Occur.SHOULD)
                            .setMinimumNumberShouldMatch(1)
                            .build();
                    b.add(scored, Occur.MUST);
                    positive = true;
                }
            } else if (c instanceof WordIn w) {
                if (w.excluded()) {
                    b.add(wordQuery(w.field().name(), w.word()), Occur.MUST_NOT);
                } else {
                    b.add(wordQuery(w.field().name(), w.word()), Occur.FILTER);
                    positive = true;
                }
            } else if (c instanceof KeywordIs k) {
                Query q = keywordQuery(k);
                if (k.excluded()) {
                    b.add(q, Occur.MUST_NOT);
                } else {
                    b.add(q, Occur.FILTER);
                    positive = true;
                }
            } else if (c instanceof NumberIs n) {
                b.add(DoublePoint.newRangeQuery(n.field().name(), n.lo(), n.hi()), Occur.FILTER);
                positive = true;
            } else if (c instanceof RatedAt r) {
                b.add(ratedQuery(r), Occur.FILTER);
                positive = true;
            }
        }
        if (!positive) {
            // only exclusions (or nothing): start from every part
            b.add(new MatchAllDocsQuery(), Occur.MUST);
        }
        return b.build();
    }

    /** Rated over [lo, hi]; at a single value, within the comparison tolerance of it. */
    private static Query ratedQuery(RatedAt r) {
        if (r.lo() == r.hi()) {
            double t = QueryLanguage.tol(r.lo());
            return DoubleRange.newIntersectsQuery(
                    r.field().name(), new double[] {r.lo() - t}, new double[] {r.lo() + t});
        }
        return DoubleRange.newContainsQuery(r.field().name(), new double[] {r.lo()}, new double[] {r.hi()});
    }

    /** One free word: the whole word, or for a hyphenated word its joined form or all its pieces. */
    static Query wordQuery(String field, String word) {
        List<String> words = Words.split(word);
        BooleanQuery.Builder all = new BooleanQuery.Builder();
        for (String w : words) {
            if (!w.contains("-")) {
                all.add(new TermQuery(new Term(field, w)), Occur.MUST);
                continue;
            }
            BooleanQuery.Builder pieces = new BooleanQuery.Builder();
            for (String p : Words.split(w.replace('-', ' '))) {
                pieces.add(new TermQuery(new Term(field, p)), Occur.MUST);
            }
            all.add(
                    new BooleanQuery.Builder()
                            .add(new TermQuery(new Term(field, w)), Occur.SHOULD)
                            .add(new TermQuery(new Term(field, w.replace("-", ""))), Occur.SHOULD)
                            .add(pieces.build(), Occur.SHOULD)
                            .setMinimumNumberShouldMatch(1)
                            .build(),
                    Occur.MUST);
        }
        return all.build();
    }

    private static Query keywordQuery(KeywordIs k) {
        String field =
                k.field().name().equals(Schema.ID) ? Schema.ID_LOWER : k.field().name();
        Query exact = new TermQuery(new Term(field, k.value()));
        if (!field.equals(Schema.PACKAGE)) {
            return exact;
        }
        // package:sot-23 also finds the pin-count variants sot-23-5, sot-23-6
        return new BooleanQuery.Builder()
                .add(exact, Occur.SHOULD)
                .add(new PrefixQuery(new Term(field, k.value() + "-")), Occur.SHOULD)
                .setMinimumNumberShouldMatch(1)
                .build();
    }
}
