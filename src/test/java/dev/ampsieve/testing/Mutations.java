package dev.ampsieve.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.quicktheories.core.Gen;
import org.quicktheories.core.RandomnessSource;
import org.quicktheories.impl.Constraint;

/**
 * Generators for the property tests: valid inputs (demo catalog files, demo stages, query
 * examples) broken the ways hand-typed text breaks, plus plain random text. Every choice is
 * drawn from the {@link RandomnessSource}, so the library shrinks a failing case towards fewer
 * and earlier mutations of the first seed text without a hand-written shrinker.
 */
public final class Mutations {
    private Mutations() {}

    /** Characters that mean something to YAML, to the unit parser or to the query language, and hostile ones. */
    static final String SPECIAL = ":-{}[],&*!|>'\"%@`#?~=<>.. \t\n\r/^()_+eE0123456789"
            + "\u0000\u0001\u0007\u0008\u000b\u000c\u001b\u007f\u0085\u00a0\u00b5\u03bc\u00b0\u2126\u03a9\u221a\u2103"
            + "\u2028\u2029\ufeff\ufffd\ufffe\uffff\ud800\udfff\u200b\u0301";

    /** Numbers at and past the edges of a double and of the integer types, and spellings that are not numbers. */
    static final List<String> NUMBERS = List.of(
            "1e308",
            "1.8e308",
            "1e400",
            "-1e400",
            "1e-400",
            "4.9e-324",
            "-0",
            "-0.0",
            "0",
            "NaN",
            "nan",
            "Infinity",
            "-Infinity",
            ".inf",
            "-.inf",
            ".nan",
            "1e",
            "1e+",
            "1e-",
            ".",
            "-",
            "+",
            "..",
            "1..2",
            "0x10",
            "0b101",
            "1_000",
            "1,5",
            "٣",
            "１２",
            "99999999999999999999999",
            "9223372036854775807",
            "9223372036854775808",
            "-9223372036854775809",
            "2147483647",
            "2147483648",
            "-2147483649",
            "1e2147483648",
            "0.000000000000000000000000001",
            "00001",
            "+-1",
            "--1",
            "1e0001",
            "1" + "0".repeat(400),
            "0." + "0".repeat(400) + "1");

    /** Unit text that is wrong, doubled, half there or of another dimension. */
    static final List<String> UNITS = List.of(
            "",
            " ",
            "uuV",
            "µµV",
            "V/",
            "/",
            "/V",
            "V//us",
            "dB/V",
            "mK",
            "°",
            "°°C",
            "rtHz/V",
            "%%",
            "ppm/",
            "Hz^",
            "kk",
            "K",
            "C/C",
            "V/V",
            "V/mV",
            "V/uV",
            "A/rtHz/Hz",
            "sqrt(",
            "Hz^(1/2",
            "ohm/",
            "Ω/°C",
            "yr/",
            "mohm",
            "MΩ",
            "k ohm",
            "u V",
            "V V",
            "nV/√",
            "√",
            "fF",
            "xV",
            "V\u0000",
            "\ud800V",
            "V\u0301",
            "dBm",
            "h/h",
            "y/C");

    /** Whole lines that exercise YAML features a catalog never needs. */
    static final List<String> LINES = List.of(
            "&a [*a, *a]",
            "x: *undefined",
            "x: !!binary AAAA",
            "x: !!python/object:os.system",
            "? [a]: b",
            "<<: *x",
            "---",
            "...",
            "%YAML 1.1",
            "%TAG ! tag:x:",
            "key: |",
            "a: {b: [c",
            "- - -",
            "\t- x",
            "x: &b {y: *b}",
            "'unclosed: x",
            "\"\\x\": y",
            "x: !!int 1e400",
            "x: !!float NaN",
            ": no key",
            "[1, 2]: x",
            "{a: 1}: b",
            "x: >-",
            "x:\u0000y",
            "x: 2001-12-14t21:59:43.10-05:00",
            "x: 0o17",
            "x: ~",
            "x: null",
            "x: []",
            "x: {}",
            // deep nesting, and an alias chain that doubles at each step (the "billion laughs")
            "x: " + "[".repeat(200) + "]".repeat(200),
            "x: " + "{a: ".repeat(100) + "1" + "}".repeat(100),
            "a0: &a0 [x, x]\n"
                    + java.util.stream.IntStream.range(1, 40)
                            .mapToObj(i -> "a" + i + ": &a" + i + " [*a" + (i - 1) + ", *a" + (i - 1) + "]")
                            .collect(java.util.stream.Collectors.joining("\n")));

    /** The text of every {@code *.yaml} file below {@code dir} (the demo catalog, its stages). */
    public static List<String> yamlTexts(Path dir, boolean stages) {
        try (Stream<Path> s = Files.walk(dir)) {
            List<String> out = new ArrayList<>();
            for (Path p : s.filter(Files::isRegularFile)
                    .filter(p -> p.toString().endsWith(".yaml"))
                    .sorted()
                    .toList()) {
                boolean isStage = p.getParent().getFileName().toString().equals("stages");
                if (isStage == stages) {
                    out.add(Files.readString(p, StandardCharsets.UTF_8));
                }
            }
            return List.copyOf(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** One of {@code seeds} with up to {@code maxMutations} edits applied. */
    public static Gen<String> mutated(List<String> seeds, int maxMutations) {
        return in -> {
            String s = seeds.get(pick(in, seeds.size()));
            int n = (int) in.next(Constraint.between(0, maxMutations));
            for (int i = 0; i < n; i++) {
                s = mutate(in, s);
            }
            return s;
        };
    }

    /** Random text over {@link #SPECIAL} and letters: mostly syntax, which random Unicode rarely hits. */
    public static Gen<String> noise(int maxLength) {
        String alphabet = SPECIAL + "abcdefghijklmnopqrstuvwxyzVAHzdBCKmunpkMGTsyh%";
        return in -> {
            int n = (int) in.next(Constraint.between(0, maxLength));
            StringBuilder b = new StringBuilder(n);
            for (int i = 0; i < n; i++) {
                b.append(alphabet.charAt(pick(in, alphabet.length())));
            }
            return b.toString();
        };
    }

    /** UTF-8 bytes of {@code text} with some byte-level damage: invalid sequences, a cut multi-byte character, other BOMs. */
    public static Gen<byte[]> bytes(Gen<String> text) {
        return in -> {
            byte[] b = text.generate(in).getBytes(StandardCharsets.UTF_8);
            int n = (int) in.next(Constraint.between(0, 2));
            for (int i = 0; i < n; i++) {
                byte[][] bad = {
                    {(byte) 0xff},
                    {(byte) 0xc3},
                    {(byte) 0xed, (byte) 0xa0, (byte) 0x80},
                    {(byte) 0xfe, (byte) 0xff},
                    {(byte) 0xef, (byte) 0xbb, (byte) 0xbf},
                    {(byte) 0xf4, (byte) 0x90, (byte) 0x80, (byte) 0x80},
                    {0}
                };
                byte[] ins = bad[pick(in, bad.length)];
                int at = (int) in.next(Constraint.between(0, b.length));
                byte[] out = new byte[b.length + ins.length];
                System.arraycopy(b, 0, out, 0, at);
                System.arraycopy(ins, 0, out, at, ins.length);
                System.arraycopy(b, at, out, at + ins.length, b.length - at);
                b = out;
            }
            return b;
        };
    }

    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");
    /** The value after "key: " up to a comma, brace or comment: where a typed number goes. */
    private static final Pattern VALUE = Pattern.compile(":[ \\t]+(\"[^\"\\n]*\"|[^,{}\\[\\]#\\n]+)");

    private static final Pattern UNIT = Pattern.compile("(?<=\\d ?)[A-Za-z%°µΩ/√()^]+");

    /** One edit of a kind people and tools make: a stray, lost or swapped character, a line doubled or shifted, a bad number. */
    static String mutate(RandomnessSource in, String s) {
        int kind = pick(in, 12);
        int len = s.length();
        switch (kind) {
            case 0: { // insert a character
                int at = (int) in.next(Constraint.between(0, len));
                return s.substring(0, at) + SPECIAL.charAt(pick(in, SPECIAL.length())) + s.substring(at);
            }
            case 1: { // delete a character
                if (len == 0) {
                    return s;
                }
                int at = pick(in, len);
                return s.substring(0, at) + s.substring(at + 1);
            }
            case 2: { // swap two neighbours
                if (len < 2) {
                    return s;
                }
                int at = pick(in, len - 1);
                return s.substring(0, at) + s.charAt(at + 1) + s.charAt(at) + s.substring(at + 2);
            }
            case 3: { // duplicate a line
                List<String> lines = lines(s);
                int at = pick(in, lines.size());
                lines.add(at, lines.get(at));
                return String.join("\n", lines);
            }
            case 4: { // delete a line
                List<String> lines = lines(s);
                lines.remove(pick(in, lines.size()));
                return String.join("\n", lines);
            }
            case 5: { // change a line's indentation: more, less, or a tab
                List<String> lines = lines(s);
                int at = pick(in, lines.size());
                String line = lines.get(at);
                int how = pick(in, 3);
                lines.set(at, how == 0 ? "  " + line : how == 1 ? line.replaceFirst("^ {1,2}", "") : "\t" + line);
                return String.join("\n", lines);
            }
            case 6: // replace a number
                return replaceMatch(in, s, NUMBER, NUMBERS);
            case 7: // replace a unit
                return replaceMatch(in, s, UNIT, UNITS);
            case 8: { // insert a line of YAML the catalog never needs
                List<String> lines = lines(s);
                int at = (int) in.next(Constraint.between(0, lines.size()));
                String indent = pick(in, 2) == 0 ? "" : "    ";
                lines.add(at, indent + LINES.get(pick(in, LINES.size())));
                return String.join("\n", lines);
            }
            case 10: { // a whole value replaced by an extreme or odd number, with or without a unit
                Matcher m = VALUE.matcher(s);
                List<int[]> spans = new ArrayList<>();
                while (m.find()) {
                    spans.add(new int[] {m.start(1), m.end(1)});
                }
                if (spans.isEmpty()) {
                    return s;
                }
                int[] span = spans.get(pick(in, spans.size()));
                String unit = pick(in, 2) == 0 ? "" : " " + UNITS.get(pick(in, UNITS.size()));
                String quote = pick(in, 2) == 0 ? "" : "\"";
                return s.substring(0, span[0])
                        + quote
                        + NUMBERS.get(pick(in, NUMBERS.size()))
                        + unit
                        + quote
                        + s.substring(span[1]);
            }
            case 9: { // cut the text short
                return s.substring(0, (int) in.next(Constraint.between(0, len)));
            }
            default: { // cut a span out of the middle, as a bad paste does
                if (len == 0) {
                    return s;
                }
                int a = pick(in, len);
                int b = (int) in.next(Constraint.between(a, Math.min(len, a + 40)));
                return s.substring(0, a) + s.substring(b);
            }
        }
    }

    private static String replaceMatch(RandomnessSource in, String s, Pattern p, List<String> with) {
        Matcher m = p.matcher(s);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        String replacement = with.get(pick(in, with.size()));
        if (spans.isEmpty()) {
            return s + replacement;
        }
        int[] span = spans.get(pick(in, spans.size()));
        return s.substring(0, span[0]) + replacement + s.substring(span[1]);
    }

    private static List<String> lines(String s) {
        return new ArrayList<>(List.of(s.split("\n", -1)));
    }

    /** A uniform index below {@code n} (n >= 1); shrinks toward 0. */
    public static int pick(RandomnessSource in, int n) {
        return (int) in.next(Constraint.between(0, n - 1));
    }
}
