package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * {@link Words#split} scans by code point; the rule it implements was written as a regular
 * expression, {@code [^\p{L}\p{N}+.\-]+} between words (java.util.regex.Pattern's documented
 * Unicode categories). The expression is the second method here: every code point is classed
 * the same way by both, and random texts split into the same words.
 */
class WordsTest {

    private static final Pattern SEPARATORS = Pattern.compile("[^\\p{L}\\p{N}+.\\-]+");
    private static final Pattern WORD_CHAR = Pattern.compile("[\\p{L}\\p{N}+.\\-]");

    /** The split as it was written with the expression: split, then dots and dashes stripped at the ends. */
    private static List<String> byExpression(String text) {
        List<String> out = new ArrayList<>();
        for (String raw : SEPARATORS.split(text.toLowerCase(Locale.ROOT))) {
            String w = raw.replaceAll("^[.\\-]+", "").replaceAll("[.\\-]+$", "");
            if (!w.isEmpty()) {
                out.add(w);
            }
        }
        return out;
    }

    @Test
    void everyCodePointIsClassedAsTheExpressionClassesIt() {
        int differ = 0;
        for (int cp = 0; cp <= Character.MAX_CODE_POINT; cp++) {
            boolean expected =
                    WORD_CHAR.matcher(new String(Character.toChars(cp))).matches();
            if (Words.isWordChar(cp) != expected) {
                differ++;
            }
        }
        assertEquals(0, differ);
    }

    @Test
    void textsSplitAsTheExpressionSplitsThem() {
        // letters of several scripts, digits (ASCII, Arabic-Indic, superscript, Roman numeral),
        // the kept marks, separators, a supplementary letter and a lone surrogate
        String[] pieces = {
            "a",
            "Z",
            "sot",
            "23",
            "-",
            "+",
            ".",
            " ",
            ",",
            ";",
            "/",
            "µ",
            "Ω",
            "°",
            "é",
            "ß",
            "İ",
            "ж",
            "٣",
            "²",
            "Ⅻ",
            "√",
            "_",
            "\t",
            "\n",
            "𝐀",
            "\uD800",
            "(",
            ")",
            "±",
            "--",
            "..",
            "rail-to-rail"
        };
        Random r = new Random(7);
        for (int k = 0; k < 20_000; k++) {
            StringBuilder sb = new StringBuilder();
            int n = r.nextInt(12);
            for (int i = 0; i < n; i++) {
                sb.append(pieces[r.nextInt(pieces.length)]);
            }
            String text = sb.toString();
            assertEquals(byExpression(text), Words.split(text), text);
        }
    }

    @Test
    void aPartNameSplitsIntoItsWords() {
        // worked by hand: commas, spaces and '±' (a math symbol, not a letter or digit) separate;
        // the sentence dot and the edge dashes go
        assertEquals(
                List.of("sot-23-5", "low-noise", "5", "v", "op", "amp"),
                Words.split("SOT-23-5, -low-noise-  ±5 V op amp."));
    }
}
