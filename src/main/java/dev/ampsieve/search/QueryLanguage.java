package dev.ampsieve.search;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The part query language. Grammar (terms separated by spaces; every term must hold):
 *
 * <pre>
 * query      = { term }
 * term       = word | "-" word | constraint | ["-"] field ":" word
 * constraint = field op value
 *            | field "=" value ".." value      both ends included
 *            | field "=" value ".."            at least value  (no shell quoting needed)
 *            | field "=" ".." value            at most value   (no shell quoting needed)
 * op         = "&lt;" | "&lt;=" | "&gt;" | "&gt;=" | "="
 * value      = number [unit]                   as in the catalog: 10uV, 1.5MHz, 0.5V/us, 110dB, -40C
 * </pre>
 *
 * <p>Meanings, chosen for how an engineer reads a datasheet:
 * <ul>
 * <li>A free word matches the part's id, title, tags, notes, packages, architecture and input
 *     type, case-blind, plus synonyms: {@code zero-drift} for chopper and auto-zero parts,
 *     {@code rail-to-rail} (rri, rro, rrio) when a headroom is 0. Hyphens are optional:
 *     {@code sot23}, {@code sot-23} and {@code sot 23} find the same parts.</li>
 * <li>Limits of a spread ({@code vos}, {@code drift}, {@code ib}, {@code ios}) compare the
 *     guaranteed maximum when the catalog gives one, else the typical, as a magnitude; the
 *     {@code .typ} / {@code .max} fields compare one column only.</li>
 * <li>Rejection ratios and gain ({@code cmrr}, {@code psrr}, {@code aol}) compare the
 *     guaranteed minimum when given, else the typical.</li>
 * <li>{@code supply} and {@code temperature} ask what the part is rated for: {@code supply>=5V}
 *     and {@code supply=5V} mean it runs on 5 V (min &lt;= 5 V &lt;= max); {@code temperature>=125C}
 *     means rated up to 125 °C or beyond; {@code >} and {@code <} also need the rating to
 *     reach past the value; {@code supply=4.5V..5.5V} needs the whole interval.</li>
 * <li>Every comparison allows one part in 10^9, so {@code 10uV} and {@code 0.01mV} compare equal.</li>
 * <li>A part that lacks a value never matches a constraint on it.</li>
 * </ul>
 * Errors name the term, say what is wrong (an unknown field with the nearest name; a value of
 * the wrong kind, such as {@code vos<5nA}) and how to write it, one line each. A query of more
 * than {@value #MAX_TERMS} terms, or whose words make more than {@value #MAX_WORD_SEARCHES} word
 * searches, is refused as a whole (Lucene would refuse it with an internal error).
 */
public final class QueryLanguage {
    private QueryLanguage() {}

    /**
     * The grammar for --help, lines of at most 100 columns separated by {@code %n} (a
     * compile-time constant, so commands can use it in their help footer).
     */
    public static final String HELP = "Query: words and constraints separated by spaces; every term must hold.%n"
            + "  word            in id, title, tags, notes, packages, architecture, input%n"
            + "  -word           excludes: find 'drift<=1uV/C' -chopper (no '--' needed; -field:word too)%n"
            + "  field<value     also <=, >, >=, = ; values with units as in the catalog (10uV, 1.5MHz, 110dB)%n"
            + "  field=lo..hi    both ends included; field=lo.. (at least), field=..hi (at most) need no quotes%n"
            + "  field:word      input:cmos architecture:zero-drift package:sot-23 null-pins:true trim:laser%n"
            + "vos, drift, ib, ios: the guaranteed maximum when given, else typical (vos.max, vos.typ: one column).%n"
            + "cmrr, psrr, aol: the guaranteed minimum, else typical. A part lacking a value never matches.%n"
            + "supply>=5V or supply=5V: rated to run on 5 V; temperature>=125C: rated up to 125 C or beyond;%n"
            + "  supply=4.5V..5.5V: rated over the whole interval. Comparisons allow 1 part in 1e9.%n"
            + "Relevance: a word in the title counts 2, elsewhere 1; equal relevance lists the cheaper part first.%n"
            + "Example: ampsieve find zero-drift 'vos<10uV' 'supply>=5V' sot-23   (quote < and > in a shell)";

    /** {@link #HELP} as lines, then every field name from {@link Schema}, wrapped at 100 columns. */
    public static List<String> helpLines() {
        List<String> out = new ArrayList<>(List.of(HELP.split("%n")));
        out.addAll(wrap(
                "Words (field:word): ",
                Schema.KEYWORDS.stream().map(Schema.Keyword::name).toList(),
                ""));
        out.addAll(wrap(
                "Text (field:word, by word): ",
                Schema.TEXTS.stream().map(Schema.Text::name).toList(),
                ""));
        out.addAll(wrap(
                "Ranges (rated at a value): ",
                Schema.INTERVALS.stream().map(Schema.Interval::name).toList(),
                ""));
        out.addAll(wrap(
                "Numbers: ", Schema.NUMERIC.stream().map(Schema.Numeric::name).toList(), "."));
        out.addAll(wrap(
                "Aliases: ",
                Schema.ALIASES.entrySet().stream()
                        .map(e -> e.getKey() + " (" + e.getValue() + ")")
                        .toList(),
                "."));
        return out;
    }

    /** {@code head} then the words separated by spaces, in lines of at most 100 columns, continued with two spaces. */
    static List<String> wrap(String head, List<String> words, String end) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder(head.strip());
        for (int i = 0; i < words.size(); i++) {
            String w = words.get(i) + (i == words.size() - 1 ? end : "");
            if (line.length() + 1 + w.length() > 100) {
                lines.add(line.toString());
                line = new StringBuilder(" ");
            }
            line.append(' ').append(w);
        }
        lines.add(line.toString());
        return lines;
    }

    private static final Pattern CONSTRAINT = Pattern.compile("^([A-Za-z][A-Za-z0-9.-]*)(<=|>=|<|>|=|:)(.*)$");

    /**
     * Most terms a query may hold: far beyond a typed query, and with {@link #MAX_WORD_SEARCHES}
     * it keeps the Lucene query well inside Lucene's limit of 1024 clauses, past which the search
     * would fail with an internal error.
     */
    static final int MAX_TERMS = 64;

    /**
     * Most word searches the free words of a query may make: one per plain word, and for a
     * hyphenated word its pieces plus three (the whole, joined and pieced forms). Each is made
     * in two fields, so 200 stay under 512 Lucene clauses, leaving room for the constraints.
     */
    static final int MAX_WORD_SEARCHES = 200;

    /** Parses {@code text}; an empty text is a query for every part. */
    public static PartQuery parse(String text) throws InputException {
        List<Problem> problems = new ArrayList<>();
        List<PartQuery.Clause> clauses = new ArrayList<>();
        List<String> tokens = tokens(text == null ? "" : text);
        if (tokens.size() > MAX_TERMS) {
            throw new InputException(new Problem(
                    Problem.Severity.ERROR,
                    null,
                    0,
                    0,
                    "query",
                    "too many terms (" + tokens.size() + "; at most " + MAX_TERMS + ")",
                    "use fewer terms: a few distinctive words and constraints find the same parts"));
        }
        for (int i = 0; i < tokens.size(); i++) {
            String t = tokens.get(i);
            String next = i + 1 < tokens.size() ? tokens.get(i + 1) : null;
            try {
                term(t, null).ifPresent(clauses::add);
            } catch (TermException e) {
                // "vos<10 uV": a unit written apart from its number belongs to it
                if (e.unitMissing && next != null && !CONSTRAINT.matcher(next).matches()) {
                    try {
                        term(t, next).ifPresent(clauses::add);
                        i++;
                        continue;
                    } catch (TermException apart) {
                        // "vos<10 UV": a unit in the wrong case is still the unit; its fix is the useful one
                        if (apart.problem.message().endsWith("is not an SI prefix")) {
                            problems.add(apart.problem);
                            i++;
                            continue;
                        }
                        // otherwise the next word was not a unit after all: report the first reading
                    }
                }
                problems.add(e.problem);
            }
        }
        int searches = wordSearches(clauses);
        if (searches > MAX_WORD_SEARCHES) {
            problems.add(new Problem(
                    Problem.Severity.ERROR,
                    null,
                    0,
                    0,
                    "query",
                    "the words are too many or too long (" + searches + " word searches; at most " + MAX_WORD_SEARCHES
                            + ")",
                    "use fewer words, and fewer hyphenated pieces in each"));
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return new PartQuery(String.join(" ", tokens), clauses);
    }

    /** The word searches {@link PartQuery#toLucene} makes for the free words (see {@link #MAX_WORD_SEARCHES}). */
    private static int wordSearches(List<PartQuery.Clause> clauses) {
        int n = 0;
        for (PartQuery.Clause c : clauses) {
            if (c instanceof PartQuery.Word w) {
                for (String word : Words.split(w.word())) {
                    n += word.contains("-")
                            ? 3 + Words.split(word.replace('-', ' ')).size()
                            : 1;
                }
            }
        }
        return n;
    }

    /** Words of the query with spaces around operators removed ("vos < 10uV" reads as one term). */
    static List<String> tokens(String text) {
        String t = text.strip().replaceAll("\\s*(<=|>=|<|>|=)\\s*", "$1").replaceAll("\\s*\\.\\.\\s*", "..");
        List<String> out = new ArrayList<>();
        for (String s : t.split("\\s+")) {
            if (!s.isEmpty()) {
                out.add(s);
            }
        }
        return out;
    }

    private static final class TermException extends Exception {
        private static final long serialVersionUID = 1L;
        final transient Problem problem;
        final boolean unitMissing;

        TermException(String term, String message, String fix, boolean unitMissing) {
            super(message, null, false, false);
            this.problem = new Problem(Problem.Severity.ERROR, null, 0, 0, "query term '" + term + "'", message, fix);
            this.unitMissing = unitMissing;
        }
    }

    private static Optional<PartQuery.Clause> term(String written, String unitApart) throws TermException {
        boolean excluded = written.startsWith("-") && written.length() > 1;
        String body = excluded ? written.substring(1) : written;
        Matcher m = CONSTRAINT.matcher(body);
        if (!m.matches()) {
            List<String> words = Words.split(body);
            if (words.isEmpty()) {
                return Optional.empty(); // punctuation only: nothing to look for
            }
            return Optional.of(new PartQuery.Word(written, String.join(" ", words), excluded));
        }
        String name = m.group(1).toLowerCase(Locale.ROOT);
        String op = m.group(2);
        String value = m.group(3) + (unitApart == null ? "" : unitApart);
        String shown = unitApart == null ? written : written + " " + unitApart;
        String field = Schema.ALIASES.getOrDefault(name, name);

        Schema.Keyword kw = Schema.KEYWORDS.stream()
                .filter(k -> k.name().equals(field))
                .findFirst()
                .orElse(null);
        if (kw != null) {
            return Optional.of(keyword(shown, kw, op, value, excluded));
        }
        Schema.Text text = Schema.TEXTS.stream()
                .filter(k -> k.name().equals(field))
                .findFirst()
                .orElse(null);
        if (text != null) {
            List<String> words = Words.split(value);
            if (!op.equals(":") || words.isEmpty()) {
                throw new TermException(shown, "'" + name + "' is searched by word", "write " + name + ":word", false);
            }
            return Optional.of(new PartQuery.WordIn(shown, text, String.join(" ", words), excluded));
        }
        Schema.Numeric num = Schema.NUMERIC.stream()
                .filter(n -> n.name().equals(field))
                .findFirst()
                .orElse(null);
        Schema.Interval iv = Schema.INTERVALS.stream()
                .filter(n -> n.name().equals(field))
                .findFirst()
                .orElse(null);
        if (num == null && iv == null) {
            throw new TermException(shown, "unknown field '" + name + "'", unknownFieldFix(name), false);
        }
        if (excluded) {
            throw new TermException(
                    shown,
                    "a comparison cannot be excluded with '-'",
                    "turn the comparison round, e.g. '" + name + ">=...' instead of '-" + name + "<...'",
                    false);
        }
        Dimension dim = num != null ? num.dimension() : iv.dimension();
        if (op.equals(":")) {
            throw new TermException(
                    shown,
                    "'" + name + "' is " + dim.noun() + ", not a word",
                    "compare it: " + name + "<" + example(field, dim).replace(" ", "") + ", " + name + "=lo..hi",
                    false);
        }
        double[] v = values(shown, name, op, value, dim);
        PartQuery.Op kind = kind(op, value);
        if (num != null) {
            double[] r = compared(kind, v);
            return Optional.of(new PartQuery.NumberIs(shown, num, kind, r[0], r[1]));
        }
        double[] r = rated(kind, v);
        return Optional.of(new PartQuery.RatedAt(shown, iv, kind, r[0], r[1]));
    }

    /**
     * The fix for a field the query does not know: the nearest field names by edit distance
     * (Levenshtein, {@link Fields#nearest}), at most three, else where the list of fields is.
     */
    static String unknownFieldFix(String name) {
        List<String> near = Fields.nearest(name, Schema.queryNames(), 3);
        if (near.isEmpty()) {
            return "'ampsieve help query' lists every field";
        }
        return "did you mean "
                + String.join(" or ", near.stream().map(n -> "'" + n + "'").toList()) + "?";
    }

    private static PartQuery.KeywordIs keyword(
            String shown, Schema.Keyword kw, String op, String value, boolean excluded) throws TermException {
        if (!op.equals(":")) {
            String example = kw.values().isEmpty() ? "word" : kw.values().get(0);
            throw new TermException(
                    shown,
                    "'" + kw.name() + "' is a word field, not a number",
                    "write " + kw.name() + ":" + example,
                    false);
        }
        String v = value.strip().toLowerCase(Locale.ROOT);
        if (v.isEmpty()) {
            throw new TermException(
                    shown,
                    "no word after ':'",
                    "write " + kw.name() + ":"
                            + (kw.values().isEmpty() ? "word" : kw.values().get(0)),
                    false);
        }
        if (!kw.values().isEmpty() && !kw.values().contains(v)) {
            String near = Fields.closest(v, kw.values());
            throw new TermException(
                    shown,
                    "'" + v + "' is not a value of '" + kw.name() + "'",
                    near != null
                            ? "did you mean '" + kw.name() + ":" + near + "'?"
                            : "write one of " + String.join(", ", kw.values()),
                    false);
        }
        return new PartQuery.KeywordIs(shown, kw, v, excluded);
    }

    private static PartQuery.Op kind(String op, String value) {
        return switch (op) {
            case "<" -> PartQuery.Op.LT;
            case "<=" -> PartQuery.Op.LE;
            case ">" -> PartQuery.Op.GT;
            case ">=" -> PartQuery.Op.GE;
            default -> value.contains("..") ? PartQuery.Op.BETWEEN : PartQuery.Op.EQ;
        };
    }

    /**
     * Relative tolerance of every comparison. The catalog and the query parse values alike, but
     * the same value may be spelt two ways (10uV, 0.01mV) that differ in the last binary digit;
     * one part in 10^9 absorbs that and nothing an engineer would call a difference.
     */
    static final double TOLERANCE = 1e-9;

    static double tol(double x) {
        return Double.isInfinite(x) ? 0 : Math.max(Math.abs(x) * TOLERANCE, Double.MIN_VALUE);
    }

    /** [lo, hi], both inclusive, of the values a number may take. */
    private static double[] compared(PartQuery.Op kind, double[] v) {
        double x = v[0];
        return switch (kind) {
            case LT -> new double[] {Double.NEGATIVE_INFINITY, x - tol(x)};
            case LE -> new double[] {Double.NEGATIVE_INFINITY, x + tol(x)};
            case GT -> new double[] {x + tol(x), Double.POSITIVE_INFINITY};
            case GE -> new double[] {x - tol(x), Double.POSITIVE_INFINITY};
            case BETWEEN -> new double[] {v[0] - tol(v[0]), v[1] + tol(v[1])};
            case EQ -> new double[] {x - tol(x), x + tol(x)};
        };
    }

    /**
     * The interval a part must be rated over. The stage will see the value written:
     * {@code >=v}, {@code <=v}, {@code =v} need v itself; {@code >v} also a little above it,
     * {@code <v} a little below; {@code lo..hi} the whole interval; an open end ({@code lo..}
     * or {@code ..hi}) reads as its closed end alone. Ends move inward by the tolerance, so a
     * rating of exactly v counts as rated at v.
     */
    private static double[] rated(PartQuery.Op kind, double[] v) {
        double x = v[0];
        return switch (kind) {
            case LT -> new double[] {x - 2 * tol(x), x - tol(x)};
            case GT -> new double[] {x + tol(x), x + 2 * tol(x)};
            case LE, GE, EQ -> new double[] {x, x};
            case BETWEEN -> {
                double lo = Double.isInfinite(v[0]) ? v[1] : v[0];
                double hi = Double.isInfinite(v[1]) ? v[0] : v[1];
                yield lo + tol(lo) <= hi - tol(hi) ? new double[] {lo + tol(lo), hi - tol(hi)} : new double[] {lo, hi};
            }
        };
    }

    /** The value written, or for a range its two ends (an open end infinite). */
    private static double[] values(String shown, String name, String op, String value, Dimension dim)
            throws TermException {
        String v = value.strip();
        if (v.isEmpty() || v.equals("..")) {
            throw new TermException(
                    shown,
                    "no value after '" + op + "'",
                    "write e.g. " + name + op + example(field(name), dim).replace(" ", ""),
                    false);
        }
        int dots = v.indexOf("..");
        if (dots < 0) {
            return new double[] {quantity(shown, v, dim, example(field(name), dim))};
        }
        if (!op.equals("=")) {
            throw new TermException(shown, "a range takes '=', not '" + op + "'", "write " + name + "=lo..hi", false);
        }
        String a = v.substring(0, dots);
        String b = v.substring(dots + 2);
        double lo = a.isBlank() ? Double.NEGATIVE_INFINITY : quantity(shown, a, dim, example(field(name), dim));
        double hi = b.isBlank() ? Double.POSITIVE_INFINITY : quantity(shown, b, dim, example(field(name), dim));
        if (lo > hi) {
            throw new TermException(
                    shown,
                    "the lower end is above the upper end",
                    "write the smaller value first: " + name + "=" + b + ".." + a,
                    false);
        }
        return new double[] {lo, hi};
    }

    /** The field a name stands for (through an alias). */
    private static String field(String name) {
        return Schema.ALIASES.getOrDefault(name, name);
    }

    /**
     * A value to show in a fix, in the field's own range: a supply is volts, not the microvolts
     * of the dimension's example.
     */
    static String example(String field, Dimension dim) {
        if (field.startsWith(Schema.SUPPLY)) {
            return "5 V";
        }
        if (field.contains("headroom")) {
            return "0.1 V";
        }
        if (field.equals(Schema.PRICE)) {
            return "1.5";
        }
        if (field.equals(Schema.CHANNELS)) {
            return "2";
        }
        return dim.example();
    }

    private static double quantity(String shown, String text, Dimension dim, String example) throws TermException {
        try {
            return Units.parse(text, dim, example);
        } catch (UnitException e) {
            boolean missing = e.problem().endsWith("has no unit");
            throw new TermException(shown, e.problem(), e.fix(), missing);
        }
    }
}
