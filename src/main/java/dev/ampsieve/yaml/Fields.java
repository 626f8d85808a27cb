package dev.ampsieve.yaml;

import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Function;

/**
 * Reads typed values out of a {@link Node.Mapping}, collecting a {@link Problem} for each
 * bad one instead of stopping at the first, so a user fixes a file in one pass. Every
 * reader returns null when the value is absent or unusable; the problem list says which.
 */
public final class Fields {

    private final List<Problem> problems;
    /** A field's own example value by dotted path, or null for its dimension's example. */
    private final Function<String, String> examples;

    public Fields(List<Problem> problems) {
        this(problems, path -> null);
    }

    /** @param examples the example an error suggests for a field path ({@code supply.voltage} → {@code 5 V}), or null */
    public Fields(List<Problem> problems, Function<String, String> examples) {
        this.problems = problems;
        this.examples = examples;
    }

    public List<Problem> problems() {
        return problems;
    }

    public boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }

    public void error(Located at, String field, String message, String fix) {
        problems.add(Problem.error(at, field, message, fix));
    }

    public void warning(Located at, String field, String message, String fix) {
        problems.add(Problem.warning(at, field, message, fix));
    }

    /** An error told as a fact (a number past a bound ...), worded by the report. */
    public void error(Located at, String field, ProblemFact fact) {
        problems.add(Problem.error(at, field, fact));
    }

    /** A warning told as a fact, worded by the report. */
    public void warning(Located at, String field, ProblemFact fact) {
        problems.add(Problem.warning(at, field, fact));
    }

    public static String join(String path, String key) {
        return path == null || path.isEmpty() ? key : path + "." + key;
    }

    /** The node as a mapping, or null with a problem. */
    public Node.Mapping mapping(Node n, String path) {
        if (n instanceof Node.Mapping m) {
            return m;
        }
        error(
                n.at(),
                path,
                "expected a mapping (key: value lines), found " + n.kind(),
                "indent the keys below '" + (path.isEmpty() ? "the top" : path) + "'");
        return null;
    }

    /** Reports each key not in {@code known}, with the closest known key as a suggestion. */
    public void onlyKeys(Node.Mapping m, String path, Collection<String> known) {
        onlyKeys(m, path, known, known);
    }

    /**
     * Reports each key not in {@code known}; suggestions come from {@code suggest}, which may
     * hold words valid one level up (a misspelt {@code parts:} at the top of a file).
     */
    public void onlyKeys(Node.Mapping m, String path, Collection<String> known, Collection<String> suggest) {
        for (var e : m.keyAt().entrySet()) {
            if (!known.contains(e.getKey())) {
                String near = closest(e.getKey(), suggest);
                error(
                        e.getValue(),
                        join(path, e.getKey()),
                        "unknown key",
                        near != null ? "did you mean '" + near + "'?" : "known keys here: " + String.join(", ", known));
            }
        }
    }

    public void require(Node.Mapping m, String path, String key, String example) {
        Node v = m.entries().get(key);
        if (v == null || v instanceof Node.Scalar s && s.text() == null) {
            Located at = v != null ? v.at() : m.at();
            error(at, join(path, key), "required field is missing", "add '" + key + ": " + example + "'");
        }
    }

    private Node.Scalar scalar(Node.Mapping m, String path, String key) {
        Node v = m.entries().get(key);
        if (v == null) {
            return null;
        }
        if (v instanceof Node.Scalar s) {
            return s.text() == null ? null : s;
        }
        error(v.at(), join(path, key), "expected a single value, found " + v.kind(), "write 'key: value' on one line");
        return null;
    }

    /** A quantity of dimension {@code d} in SI units, or null. */
    public Double quantity(Node.Mapping m, String path, String key, Dimension d) {
        return quantity(m, path, key, d, examples.apply(join(path, key)));
    }

    /** As {@link #quantity(Node.Mapping, String, String, Dimension)}; an error suggests {@code example}. */
    public Double quantity(Node.Mapping m, String path, String key, Dimension d, String example) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        try {
            return Units.parse(s.text(), d, example);
        } catch (UnitException e) {
            error(s.at(), join(path, key), e.problem(), e.fix());
            return null;
        }
    }

    /** Free text; a control character in it is a warning (the text is kept, and shown escaped). */
    public String text(Node.Mapping m, String path, String key) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        warnControls(s, join(path, key));
        return s.text();
    }

    /**
     * A warning when {@code s} holds a character a terminal would obey rather than show (ESC,
     * BEL, a C1 control, a bidi override): it is printed escaped, but it is almost always a
     * copy-and-paste accident, or a catalog trying to drive the reader's terminal. Line feeds and
     * tabs are left alone: YAML block scalars ({@code notes: |}) hold them legitimately.
     */
    private void warnControls(Node.Scalar s, String field) {
        s.text()
                .codePoints()
                .filter(c -> c != '\n' && c != '\t' && Visible.isControl(c))
                .findFirst()
                .ifPresent(c -> {
                    String name = Character.getName(c);
                    warning(
                            s.at(),
                            field,
                            String.format(Locale.ROOT, "contains control character U+%04X", c)
                                    + (name == null ? "" : " (" + name + ")"),
                            "remove it");
                });
    }

    public Boolean bool(Node.Mapping m, String path, String key) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        String t = s.text().toLowerCase(Locale.ROOT);
        if (Set.of("true", "yes", "on").contains(t)) {
            return Boolean.TRUE;
        }
        if (Set.of("false", "no", "off").contains(t)) {
            return Boolean.FALSE;
        }
        error(s.at(), join(path, key), "'" + s.text() + "' is not true or false", "write 'true' or 'false'");
        return null;
    }

    public Integer integer(Node.Mapping m, String path, String key, long min, long max) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        try {
            long v = Long.parseLong(s.text().replace("_", "").strip());
            if (v < min || v > max) {
                error(
                        s.at(),
                        join(path, key),
                        v + " is outside " + min + ".." + max,
                        "write a whole number from " + min + " to " + max);
                return null;
            }
            return (int) v;
        } catch (NumberFormatException e) {
            error(
                    s.at(),
                    join(path, key),
                    "'" + s.text() + "' is not a whole number",
                    "write a whole number such as 1000");
            return null;
        }
    }

    public Long longValue(Node.Mapping m, String path, String key) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        try {
            return Long.parseLong(s.text().replace("_", "").strip());
        } catch (NumberFormatException e) {
            error(
                    s.at(),
                    join(path, key),
                    "'" + s.text() + "' is not a whole number",
                    "write a whole number such as 42");
            return null;
        }
    }

    /** A plain number (no unit), finite. */
    public Double number(Node.Mapping m, String path, String key) {
        return quantity(m, path, key, Dimension.NUMBER);
    }

    /** One of {@code allowed} (case-insensitive), returned lower-case, or null. */
    public String choice(Node.Mapping m, String path, String key, List<String> allowed) {
        Node.Scalar s = scalar(m, path, key);
        if (s == null) {
            return null;
        }
        String t = s.text().strip().toLowerCase(Locale.ROOT);
        if (allowed.contains(t)) {
            return t;
        }
        String near = closest(t, allowed);
        error(
                s.at(),
                join(path, key),
                "'" + s.text() + "' is not one of " + String.join(" | ", allowed),
                near != null ? "did you mean '" + near + "'?" : "write one of " + String.join(", ", allowed));
        return null;
    }

    /** A list of plain strings; a single value is taken as a list of one. */
    public List<String> strings(Node.Mapping m, String path, String key) {
        Node v = m.entries().get(key);
        if (v == null) {
            return List.of();
        }
        if (v instanceof Node.Scalar s) {
            if (s.text() == null) {
                return List.of();
            }
            warnControls(s, join(path, key));
            return List.of(s.text());
        }
        if (v instanceof Node.Seq seq) {
            List<String> out = new ArrayList<>();
            for (int i = 0; i < seq.items().size(); i++) {
                Node item = seq.items().get(i);
                if (item instanceof Node.Scalar s && s.text() != null) {
                    warnControls(s, join(path, key) + "[" + i + "]");
                    out.add(s.text());
                } else {
                    error(
                            item.at(),
                            join(path, key) + "[" + i + "]",
                            "expected a word, found " + item.kind(),
                            "write '- word'");
                }
            }
            return out;
        }
        error(v.at(), join(path, key), "expected a list, found " + v.kind(), "write '[a, b]' or one '- item' per line");
        return List.of();
    }

    /** Where the value of {@code key} was written (or the mapping itself when absent). */
    public static Located where(Node.Mapping m, String key) {
        Node v = m.entries().get(key);
        return v != null ? v.at() : m.at();
    }

    /** The closest of {@code candidates} within an edit distance of a third of the word, or null. */
    public static String closest(String word, Collection<String> candidates) {
        String best = null;
        int bestD = Integer.MAX_VALUE;
        String w = word.toLowerCase(Locale.ROOT).replace('_', '-');
        for (String c : candidates) {
            int d = distance(w, c.toLowerCase(Locale.ROOT));
            if (d < bestD) {
                bestD = d;
                best = c;
            }
        }
        int allowed = Math.max(2, w.length() / 3);
        return bestD <= allowed ? best : null;
    }

    /**
     * Up to {@code n} of {@code candidates} within the edit distance {@link #closest} allows,
     * nearest first (ties in the candidates' order): suggestions by spelling, never by substring.
     */
    public static List<String> nearest(String word, Collection<String> candidates, int n) {
        String w = word.toLowerCase(Locale.ROOT).replace('_', '-');
        int allowed = Math.max(2, w.length() / 3);
        List<String> within = new ArrayList<>();
        for (String c : candidates) {
            if (distance(w, c.toLowerCase(Locale.ROOT)) <= allowed && !within.contains(c)) {
                within.add(c);
            }
        }
        within.sort(java.util.Comparator.comparingInt(c -> distance(w, c.toLowerCase(Locale.ROOT))));
        return List.copyOf(within.subList(0, Math.min(n, within.size())));
    }

    /** Levenshtein distance; ten lines do not justify a dependency (commons-text has one, but nothing else here needs it). */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
