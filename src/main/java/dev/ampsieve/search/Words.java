package dev.ampsieve.search;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

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
     * What separates words. Compiled once: {@code String.split} with this expression compiled it
     * for every call, a tenth of the time of building the index (bench/RESULTS.md, 2026-12-02).
     */
    private static final Pattern SEPARATORS = Pattern.compile("[^\\p{L}\\p{N}+.\\-]+");

    /** Lower-cased words of {@code text}, split on anything but letters, digits, '-', '+', '.'. */
    public static List<String> split(String text) {
        List<String> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        for (String raw : SEPARATORS.split(text.toLowerCase(Locale.ROOT))) {
            String w = strip(raw);
            if (!w.isEmpty()) {
                out.add(w);
            }
        }
        return out;
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
