package dev.ampsieve.search;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * How text becomes searchable words, the same way for the index and for a query. Part
 * vocabulary is full of hyphens ({@code sot-23-5}, {@code rail-to-rail}, {@code auto-zero}),
 * which a general-purpose tokenizer splits apart; here a hyphenated word is kept whole and is
 * also indexed by its leading runs ({@code sot-23}, {@code sot23}, {@code sot235}) and in pieces
 * ({@code sot}, {@code 23}, {@code 5}), so a user finds it however they write it.
 */
public final class Words {
    private Words() {}

    /**
     * Lower-cased words of {@code text}: runs of letters ({@code \p{L}}), digits ({@code \p{N}}),
     * '-', '+' and '.', anything else separating them, with sentence dots and stray dashes at
     * either end dropped. A scan by code point rather than a regular expression: splitting by
     * {@code [^\p{L}\p{N}+.\-]+} was a tenth of the time of building the index of a large
     * catalog (bench/RESULTS.md, 2026-12-02); {@code WordsTest} checks the two agree.
     */
    public static List<String> split(String text) {
        List<String> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        String lower = text.toLowerCase(Locale.ROOT);
        int n = lower.length();
        int start = -1;
        for (int i = 0; i < n; ) {
            int cp = lower.codePointAt(i);
            int next = i + Character.charCount(cp);
            if (isWordChar(cp)) {
                if (start < 0) {
                    start = i;
                }
            } else if (start >= 0) {
                add(out, lower, start, i);
                start = -1;
            }
            i = next;
        }
        if (start >= 0) {
            add(out, lower, start, n);
        }
        return out;
    }

    private static void add(List<String> out, String text, int from, int to) {
        while (from < to && isEdge(text.charAt(from))) {
            from++;
        }
        while (to > from && isEdge(text.charAt(to - 1))) {
            to--;
        }
        if (from < to) {
            out.add(text.substring(from, to));
        }
    }

    /** A letter (category L*), a number (Nd, Nl, No), '+', '.' or '-': what {@code \p{L}\p{N}+.\-} matches. */
    static boolean isWordChar(int cp) {
        if (cp < 128) {
            return (cp >= 'a' && cp <= 'z')
                    || (cp >= 'A' && cp <= 'Z')
                    || (cp >= '0' && cp <= '9')
                    || cp == '+'
                    || cp == '.'
                    || cp == '-';
        }
        if (Character.isLetter(cp)) {
            return true;
        }
        int type = Character.getType(cp);
        return type == Character.DECIMAL_DIGIT_NUMBER
                || type == Character.LETTER_NUMBER
                || type == Character.OTHER_NUMBER;
    }

    /**
     * Every term indexed for {@code text}: each word; for a hyphenated word also its leading
     * runs of pieces, hyphenated and joined, and each piece.
     */
    public static Set<String> terms(String text) {
        Set<String> out = new LinkedHashSet<>();
        for (String w : split(text)) {
            out.add(w);
            if (w.contains("-")) {
                List<String> pieces = new ArrayList<>();
                for (String piece : w.split("-")) {
                    String p = strip(piece);
                    if (!p.isEmpty()) {
                        pieces.add(p);
                    }
                }
                // leading runs too, hyphenated and joined: sot-23-5 is also found as sot-23 and sot23
                for (int n = 2; n <= pieces.size(); n++) {
                    out.add(String.join("-", pieces.subList(0, n)));
                    out.add(String.join("", pieces.subList(0, n)));
                }
                out.addAll(pieces);
            }
        }
        return out;
    }

    /** Sentence dots and stray dashes at the ends are not part of a word ("amplifier." "-x-"). */
    private static String strip(String w) {
        int a = 0;
        int b = w.length();
        while (a < b && isEdge(w.charAt(a))) {
            a++;
        }
        while (b > a && isEdge(w.charAt(b - 1))) {
            b--;
        }
        return w.substring(a, b);
    }

    private static boolean isEdge(char c) {
        return c == '.' || c == '-';
    }
}
